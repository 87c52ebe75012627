import { route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { toDto } from '@/lib/lamp-types/queries';
import { populationTypeFor } from '@/lib/population/access';
import { adoptionHistory, populationFor } from '@/lib/population/queries';

/**
 * A lamp type's decay curve measured from all the organisation's readings of it (or why there is none
 * yet), the curve in force and the type's adoptions. Owners and staff only.
 */
export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const type = await populationTypeFor(user, params.id, 'read');
    const [curve, history] = await Promise.all([populationFor(type), adoptionHistory(type.id)]);
    return { curve, adopted: toDto(type).adoptedCurve ?? null, history };
  },
});
