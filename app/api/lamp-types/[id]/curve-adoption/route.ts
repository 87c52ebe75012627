import { z } from 'zod';
import { json, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { populationTypeFor } from '@/lib/population/access';
import { adoptCurve, withdrawCurve } from '@/lib/population/mutations';

/**
 * Adopt the lamp type's measured curve for the organisation's lamps of this type (409 while there are too
 * few tests for one), or go back to the catalogue's curve. Either way the outlooks of the organisation's
 * lamps of this type are recomputed.
 */
export const POST = route({
  params: idParams,
  body: z.strictObject({}),
  handler: async ({ params, user }) => {
    const type = await populationTypeFor(user, params.id, 'update');
    return { adopted: await adoptCurve(type, user.id) };
  },
});

export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const type = await populationTypeFor(user, params.id, 'update');
    await withdrawCurve(type, user.id);
    return json({ adopted: null });
  },
});
