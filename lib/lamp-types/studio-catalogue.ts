import 'server-only';
import type { CurrentUser } from '@/lib/auth/session-user';
import { can } from '@/lib/permissions';
import type { StudioCatalogueType } from '@/shared/designs/catalogue-type';
import { adoptedLampTypes } from './queries';
import { studioCatalogueType } from './to-engine';

/**
 * The catalogue types of the design's organisation that age by the shop's adopted curve, as the studio
 * offers them; empty for someone who may not read that organisation's catalogue.
 */
export async function studioCatalogueFor(
  user: CurrentUser,
  organisationId: number,
): Promise<StudioCatalogueType[]> {
  if (!can(user, 'read', { kind: 'lamp-type', organisationId })) return [];
  const types = await adoptedLampTypes(organisationId);
  return types.flatMap((t) => studioCatalogueType(t) ?? []);
}
