import { json, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { loadOwned } from '@/lib/access';
import { speciesPatchSchema } from '@/lib/species/schema';
import { toDto } from '@/lib/species/queries';
import { deleteSheet, updateSheet } from '@/lib/species/mutations';

export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => toDto(await loadOwned('species', params.id, user, 'read')),
});

/** Owner and staff change any subset of the fields; the merged sheet is validated as a whole. */
export const PATCH = route({
  params: idParams,
  body: speciesPatchSchema,
  handler: async ({ params, body, user }) => {
    const row = await loadOwned('species', params.id, user, 'update');
    return toDto(await updateSheet(row, body, user.id));
  },
});

/** Enclosures name their species in text, so removing a sheet leaves them (and their designs) intact. */
export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const row = await loadOwned('species', params.id, user, 'delete');
    await deleteSheet(row);
    return json({ ok: true });
  },
});
