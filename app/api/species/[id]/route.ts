import { allow, json, notFound, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import type { CurrentUser } from '@/lib/auth/session-user';
import { speciesPatchSchema } from '@/lib/species/schema';
import { findSheet, toDto } from '@/lib/species/queries';
import { updateSheet } from '@/lib/species/mutations';

async function load(id: number, user: CurrentUser, action: 'read' | 'update' | 'delete') {
  const row = await findSheet(id);
  if (!row) throw notFound('That species sheet');
  allow(user, action, { kind: 'species', organisationId: row.organisationId }, 'That species sheet');
  return row;
}

export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => toDto(await load(params.id, user, 'read')),
});

/** Owner and staff change any subset of the fields; the merged sheet is validated as a whole. */
export const PATCH = route({
  params: idParams,
  body: speciesPatchSchema,
  handler: async ({ params, body, user }) => {
    const row = await load(params.id, user, 'update');
    return toDto(await updateSheet(row, body, user.id));
  },
});

/** Enclosures name their species in text, so removing a sheet leaves them (and their designs) intact. */
export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const row = await load(params.id, user, 'delete');
    await row.destroy();
    return json({ ok: true });
  },
});
