import 'server-only';
import { allow } from '@/lib/access';
import { notFound } from '@/lib/errors';
import type { CurrentUser } from '@/lib/auth/session-user';
import { findLampType } from '@/lib/lamp-types/queries';
import { can, type Action } from '@/lib/permissions';
import type { LampType } from '@/models';

/**
 * A lamp type whose measured curve this user may see (`read`) or adopt and withdraw (`update`): the
 * shop's owners and staff. Another organisation's type, or a keeper asking, answers 404 as a missing
 * one does.
 */
export async function populationTypeFor(user: CurrentUser, id: number, action: Action): Promise<LampType> {
  const row = await findLampType(id);
  if (!row) throw notFound('That lamp type');
  allow(user, action, { kind: 'shop-figures', organisationId: row.organisationId }, 'That lamp type');
  return row;
}

/** For pages: may this user see the shop's measured curve of a type of this organisation? */
export const maySeeShopFigures = (user: CurrentUser, organisationId: number) =>
  can(user, 'read', { kind: 'shop-figures', organisationId });
