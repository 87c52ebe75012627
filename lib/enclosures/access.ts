import 'server-only';
import { allow } from '@/lib/access';
import type { CurrentUser } from '@/lib/auth/session-user';
import { notFound } from '@/lib/errors';
import type { Action } from '@/lib/permissions';
import { Enclosure } from '@/models';

/**
 * An enclosure together with the check that this user may do `action` to it (and so to its designs,
 * lamps and uploads, which share its ownership rules). Its organisation and keeper come from the row,
 * never from the client; someone who may not see it gets "not found".
 */
export async function enclosureFor(user: CurrentUser, id: number, action: Action): Promise<Enclosure> {
  const enclosure = await Enclosure.findByPk(id);
  if (!enclosure) throw notFound('The enclosure');
  allow(user, action, enclosureResource(enclosure), 'The enclosure');
  return enclosure;
}

/** What `can` needs to know of an enclosure. */
export const enclosureResource = (e: Enclosure) =>
  ({ kind: 'enclosure', organisationId: e.organisationId, keeperId: e.keeperId }) as const;
