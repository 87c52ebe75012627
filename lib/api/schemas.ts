import { z } from 'zod';
import { ROLES } from '@/models/membership';

/** Field schemas shared by route handlers and forms, with messages a person can act on. */

export const idSchema = (what: string) =>
  z.coerce
    .number({ error: `${what} must be a number.` })
    .int(`${what} must be a whole number.`)
    .positive(`${what} must be a positive number.`)
    .max(4_294_967_295, `${what} is out of range.`);

export const idParams = z.object({ id: idSchema('The id') });

export const emailSchema = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .max(254, 'That e-mail address is too long.')
  .pipe(z.email('Enter a valid e-mail address, like name@example.com.'));

export const personNameSchema = z
  .string({ error: 'Enter a name.' })
  .trim()
  .min(1, 'Enter a name.')
  .max(120, 'Use at most 120 characters.');

export const organisationNameSchema = z
  .string({ error: 'Enter the name of the organisation.' })
  .trim()
  .min(2, 'Enter the name of the organisation (at least 2 characters).')
  .max(120, 'Use at most 120 characters.');

export const roleSchema = z.enum(ROLES, { error: 'The role must be owner, staff or keeper.' });
