import { ownedRoute } from '@/lib/api';
import { toDto } from '@/lib/lamp-types/queries';
import { adoptionHistory, populationFor } from '@/lib/population/queries';

/**
 * A lamp type's decay curve measured from all the organisation's readings of it (or why there is none
 * yet), the curve in force and the type's adoptions. Owners and staff only.
 */
export const GET = ownedRoute('lamp-type-figures', 'read', {
  handler: async ({ thing: type }) => {
    const [curve, history] = await Promise.all([populationFor(type), adoptionHistory(type.id)]);
    return { curve, adopted: toDto(type).adoptedCurve ?? null, history };
  },
});
