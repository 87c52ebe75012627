import { ForeignKeyConstraintError, UniqueConstraintError } from 'sequelize';
import { conflict, json, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { loadOwned } from '@/lib/access';
import { lampTypePatchSchema } from '@/lib/lamp-types/schema';
import { toDto } from '@/lib/lamp-types/queries';
import { updateLampType } from '@/lib/lamp-types/mutations';

export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => toDto(await loadOwned('lamp-type', params.id, user, 'read')),
});

export const PATCH = route({
  params: idParams,
  body: lampTypePatchSchema,
  handler: async ({ params, body, user }) => {
    const row = await loadOwned('lamp-type', params.id, user, 'update');
    try {
      return toDto(await updateLampType(row, body, user.id));
    } catch (e) {
      if (e instanceof UniqueConstraintError) throw conflict('Another lamp type already has that name.');
      throw e;
    }
  },
});

/** Refused (409) while lamps in the lamp log use this type: their history depends on it. */
export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const row = await loadOwned('lamp-type', params.id, user, 'delete');
    try {
      await row.destroy();
    } catch (e) {
      if (e instanceof ForeignKeyConstraintError) {
        throw conflict('Lamps in the lamp log use this lamp type, so it cannot be removed.', 'in_use');
      }
      throw e;
    }
    return json({ ok: true });
  },
});
