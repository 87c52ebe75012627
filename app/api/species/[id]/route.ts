import { json, ownedRoute } from '@/lib/api';
import { speciesPatchSchema } from '@/lib/species/schema';
import { toDto } from '@/lib/species/queries';
import { deleteSheet, updateSheet } from '@/lib/species/mutations';

export const GET = ownedRoute('species', 'read', {
  handler: async ({ thing }) => toDto(thing),
});

/** Owner and staff change any subset of the fields; the merged sheet is validated as a whole. */
export const PATCH = ownedRoute('species', 'update', {
  body: speciesPatchSchema,
  handler: async ({ thing: row, body, user }) => {
    return toDto(await updateSheet(row, body, user.id));
  },
});

/** Enclosures name their species in text, so removing a sheet leaves them (and their designs) intact. */
export const DELETE = ownedRoute('species', 'delete', {
  handler: async ({ thing: row }) => {
    await deleteSheet(row);
    return json({ ok: true });
  },
});
