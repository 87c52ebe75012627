import 'server-only';
import { z } from 'zod';
import { pageQuery } from '@/lib/api/pagination';
import { patchOf } from '@/lib/api/patch';
import { emailSchema, idSchema, optionalTextSchema, personNameSchema, textSchema } from '@/lib/api/schemas';

/** Request shapes of the customer routes and forms, with messages a person can act on. */

const phoneSchema = textSchema('Enter the phone number as text.')
  .trim()
  .max(40, 'Use at most 40 characters for the phone number.')
  .refine((v) => v === '' || /^[0-9+()\-./ ]{3,40}$/.test(v), {
    message: 'Enter the phone number with digits, spaces and + ( ) - . / only.',
  })
  .nullish()
  .transform((v) => (v ? v : null));

export const customerFields = {
  name: personNameSchema,
  // Optional: a walk-in may give only a name. Empty text means none.
  email: z
    .union([z.literal(''), emailSchema])
    .nullish()
    .transform((v) => (v ? v : null)),
  phone: phoneSchema,
  notes: optionalTextSchema(5000),
  /** Whether the customer agrees to reminder e-mails now; the date is recorded when it is given. */
  reminderConsent: z.boolean({ error: 'Reminder consent must be yes or no.' }).default(false),
};

export const createCustomerBody = z
  .strictObject({ organisationId: idSchema('The organisation id'), ...customerFields })
  .refine((b) => !b.reminderConsent || b.email, {
    message: 'Reminder e-mails need an e-mail address.',
    path: ['email'],
  });

export const updateCustomerBody = patchOf(customerFields);

/** Linking a customer to the keeper account they became. */
export const keeperLinkBody = z.strictObject({ keeperId: idSchema('The keeper') });

export const customerListQuery = z.object({
  organisationId: idSchema('The organisation id'),
  q: textSchema().trim().max(100, 'Search for at most 100 characters.').optional(),
  ...pageQuery,
});

export type CustomerInput = z.output<typeof createCustomerBody>;
export type CustomerPatch = z.output<typeof updateCustomerBody>;
