import 'server-only';
import { loadOwned } from '@/lib/access';
import type { CurrentUser } from '@/lib/auth/session-user';
import { can, type Action } from '@/lib/permissions';
import type { LampType } from '@/models';

/**
 * A lamp type whose measured curve this user may see (`read`) or adopt and withdraw (`update`): the
 * shop's owners and staff. Another organisation's type, or a keeper asking, answers 404 as a missing
 * one does.
 */
export const populationTypeFor = (user: CurrentUser, id: number, action: Action): Promise<LampType> =>
  loadOwned('lamp-type-figures', id, user, action);

/** For pages: may this user see the shop's measured curve of a type of this organisation? */
export const maySeeShopFigures = (user: CurrentUser, organisationId: number) =>
  can(user, 'read', { kind: 'shop-figures', organisationId });
