import 'server-only';
import { allow } from '@/lib/access';
import { isDomainError, notFound } from '@/lib/errors';

import type { CurrentUser } from '@/lib/auth/session-user';
import { can, type Action } from '@/lib/permissions';
import { CounterLamp, Customer } from '@/models';

/**
 * Loading a customer (or a counter lamp) together with the check that this user may touch it. The
 * organisation comes from the row, never from the client; someone who may not see it gets 404.
 */

export async function customerFor(user: CurrentUser, id: number, action: Action): Promise<Customer> {
  const customer = await Customer.findByPk(id);
  if (!customer) throw notFound('The customer');
  allow(user, action, { kind: 'customer', organisationId: customer.organisationId }, 'The customer');
  return customer;
}

export async function counterLampFor(user: CurrentUser, id: number, action: Action): Promise<CounterLamp> {
  const lamp = await CounterLamp.findByPk(id);
  if (!lamp) throw notFound('The lamp');
  allow(user, action, { kind: 'customer', organisationId: lamp.organisationId }, 'The lamp');
  return lamp;
}

/** May this user work at the organisation's counter (see and add customers, test lamps)? */
export function mayUseCounter(user: CurrentUser, organisationId: number): boolean {
  return can(user, 'create', { kind: 'customer', organisationId });
}

async function orNull<T>(load: () => Promise<T>): Promise<T | null> {
  try {
    return await load();
  } catch (e) {
    if (isDomainError(e, 'not_found')) return null;
    throw e;
  }
}

/** For pages: the customer if `user` may read them, else null (the page answers 404). */
export const customerForPage = (user: CurrentUser, id: number) => orNull(() => customerFor(user, id, 'read'));

/** For pages: the counter lamp if `user` may read it, else null. */
export const counterLampForPage = (user: CurrentUser, id: number) =>
  orNull(() => counterLampFor(user, id, 'read'));
