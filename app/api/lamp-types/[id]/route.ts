import { json, ownedRoute } from '@/lib/api';
import { lampTypePatchSchema } from '@/lib/lamp-types/schema';
import { toDto } from '@/lib/lamp-types/queries';
import { deleteLampType, updateLampType } from '@/lib/lamp-types/mutations';

export const GET = ownedRoute('lamp-type', 'read', {
  handler: async ({ thing }) => toDto(thing),
});

export const PATCH = ownedRoute('lamp-type', 'update', {
  body: lampTypePatchSchema,
  handler: async ({ thing: row, body, user }) => {
    return toDto(await updateLampType(row, body, user.id));
  },
});

/** Refused (409) while lamps in the lamp log use this type: their history depends on it. */
export const DELETE = ownedRoute('lamp-type', 'delete', {
  handler: async ({ thing: row }) => {
    await deleteLampType(row);
    return json({ ok: true });
  },
});
