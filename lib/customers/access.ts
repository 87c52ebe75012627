import 'server-only';
import { loadOwned } from '@/lib/access';
import { nullIfNotFound } from '@/lib/errors';

import type { CurrentUser } from '@/lib/auth/session-user';
import { can, type Action } from '@/lib/permissions';
import type { CounterLamp, Customer } from '@/models';

/**
 * Loading a customer (or a counter lamp) together with the check that this user may touch it. The
 * organisation comes from the row, never from the client; someone who may not see it gets 404.
 */

export const customerFor = (user: CurrentUser, id: number, action: Action): Promise<Customer> =>
  loadOwned('customer', id, user, action);

export const counterLampFor = (user: CurrentUser, id: number, action: Action): Promise<CounterLamp> =>
  loadOwned('counter-lamp', id, user, action);

/** May this user work at the organisation's counter (see and add customers, test lamps)? */
export function mayUseCounter(user: CurrentUser, organisationId: number): boolean {
  return can(user, 'create', { kind: 'customer', organisationId });
}

/** For pages: the customer if `user` may read them, else null (the page answers 404). */
export const customerForPage = (user: CurrentUser, id: number) =>
  nullIfNotFound(() => customerFor(user, id, 'read'));

/** For pages: the counter lamp if `user` may read it, else null. */
export const counterLampForPage = (user: CurrentUser, id: number) =>
  nullIfNotFound(() => counterLampFor(user, id, 'read'));
