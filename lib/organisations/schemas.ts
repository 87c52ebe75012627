import { z } from 'zod';
import { patchOf } from '@/lib/api/patch';
import { textSchema } from '@/lib/api/text';

// No server imports: the organisation settings form checks its draft with this same schema in the browser.

/** Empty text means "not given": stored as null. */
const orNull = (v: string | null | undefined) => (v ? v : null);

export const contactFields = {
  contactPhone: textSchema('Enter the phone number as text.')
    .trim()
    .max(40, 'Use at most 40 characters for the phone number.')
    .refine((v) => v === '' || /^[0-9+()\-./ ]{3,40}$/.test(v), {
      message: 'Enter the phone number with digits, spaces and + ( ) - . / only.',
    })
    .nullish()
    .transform(orNull),
  contactEmail: z
    .union([
      z.literal(''),
      z
        .string({ error: 'Enter an e-mail address.' })
        .trim()
        .toLowerCase()
        .max(254, 'That e-mail address is too long.')
        .pipe(z.email('Enter a valid e-mail address, like shop@example.com.')),
    ])
    .nullish()
    .transform(orNull),
  contactAddress: textSchema('Enter the address as text.')
    .trim()
    .max(200, 'Use at most 200 characters for the address.')
    .refine((v) => !/[\r\n]/.test(v), { message: 'Write the address on one line.' })
    .nullish()
    .transform(orNull),
};

/** The owner's change to how customers reach the shop; any field left out stays as it is. */
export const organisationContactBody = patchOf(contactFields);

export type OrganisationContact = {
  contactPhone: string | null;
  contactEmail: string | null;
  contactAddress: string | null;
};

/** The contact as one line for a slip or an e-mail ("12 Fern Row · 01234 567890 · shop@example.com"), or null. */
export function contactLine(c: OrganisationContact): string | null {
  const parts = [c.contactAddress, c.contactPhone, c.contactEmail].filter((p): p is string => Boolean(p));
  return parts.length ? parts.join(' · ') : null;
}
