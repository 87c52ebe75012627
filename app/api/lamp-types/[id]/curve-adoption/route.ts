import { z } from 'zod';
import { json, ownedRoute } from '@/lib/api';
import { adoptCurve, withdrawCurve } from '@/lib/population/mutations';

/**
 * Adopt the lamp type's measured curve for the organisation's lamps of this type (409 while there are too
 * few tests for one), or go back to the catalogue's curve. Either way the outlooks of the organisation's
 * lamps of this type are recomputed.
 */
export const POST = ownedRoute('lamp-type-figures', 'update', {
  body: z.strictObject({}),
  handler: async ({ thing: type, user }) => {
    return { adopted: await adoptCurve(type, user.id) };
  },
});

export const DELETE = ownedRoute('lamp-type-figures', 'update', {
  handler: async ({ thing: type, user }) => {
    await withdrawCurve(type, user.id);
    return json({ adopted: null });
  },
});
