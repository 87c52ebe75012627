import 'server-only';
import { z } from 'zod';
import { ROLES } from '@/models/membership';
import { textSchema } from './text';

/** Field schemas shared by route handlers and forms, with messages a person can act on. */

// Free text refuses unpaired surrogates; defined apart (zod only) so browser forms can use it too.
export { BROKEN_CHARACTER_MESSAGE, isWellFormedText, textSchema } from './text';

export const idSchema = (what: string) =>
  z.coerce
    .number({ error: `${what} must be a number.` })
    .int(`${what} must be a whole number.`)
    .positive(`${what} must be a positive number.`)
    .max(4_294_967_295, `${what} is out of range.`);

export const idParams = z.object({ id: idSchema('The id') });

/** An id from a page's address ("12"), or null for anything else: the page then answers 404. */
export function parseId(text: string): number | null {
  if (!/^\d+$/.test(text)) return null;
  const r = idSchema('The id').safeParse(text);
  return r.success ? r.data : null;
}

/** Optional free text of at most `max` characters: missing, null or empty (after trimming) is null. */
export const optionalTextSchema = (max: number) =>
  textSchema()
    .trim()
    .max(max, `Use at most ${max} characters.`)
    .nullish()
    .transform((v) => (v ? v : null));

export const emailSchema = z
  .string({ error: 'Enter an e-mail address.' })
  .trim()
  .toLowerCase()
  .max(254, 'That e-mail address is too long.')
  .pipe(z.email('Enter a valid e-mail address, like name@example.com.'));

export const personNameSchema = textSchema('Enter a name.')
  .trim()
  .min(1, 'Enter a name.')
  .max(120, 'Use at most 120 characters.');

export const organisationNameSchema = textSchema('Enter the name of the organisation.')
  .trim()
  .min(2, 'Enter the name of the organisation (at least 2 characters).')
  .max(120, 'Use at most 120 characters.');

export const roleSchema = z.enum(ROLES, { error: 'The role must be owner, staff or keeper.' });
