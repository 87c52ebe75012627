import { json, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { loadOwned } from '@/lib/access';
import { lampTypePatchSchema } from '@/lib/lamp-types/schema';
import { toDto } from '@/lib/lamp-types/queries';
import { deleteLampType, updateLampType } from '@/lib/lamp-types/mutations';

export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => toDto(await loadOwned('lamp-type', params.id, user, 'read')),
});

export const PATCH = route({
  params: idParams,
  body: lampTypePatchSchema,
  handler: async ({ params, body, user }) => {
    const row = await loadOwned('lamp-type', params.id, user, 'update');
    return toDto(await updateLampType(row, body, user.id));
  },
});

/** Refused (409) while lamps in the lamp log use this type: their history depends on it. */
export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const row = await loadOwned('lamp-type', params.id, user, 'delete');
    await deleteLampType(row);
    return json({ ok: true });
  },
});
