import 'server-only';
import { loadOwned, type LampWithEnclosure, type ReadingWithLamp } from '@/lib/access';
import { nullIfNotFound } from '@/lib/errors';

import type { CurrentUser } from '@/lib/auth/session-user';
import { can, type Action } from '@/lib/permissions';
import { enclosureFor } from '@/lib/enclosures/access';
import type { Enclosure } from '@/models';

/**
 * Loading a lamp (or reading) with the enclosure that owns it, then asking `can` (`loadOwned`). Ownership
 * comes from the enclosure, never from the client; someone who may not see it gets 404.
 */
export type { LampWithEnclosure, ReadingWithLamp };

const resource = (e: Enclosure, kind: 'lamp' | 'reading' | 'enclosure') => ({
  kind,
  organisationId: e.organisationId,
  keeperId: e.keeperId,
});

export const lampFor = (user: CurrentUser, id: number, action: Action): Promise<LampWithEnclosure> =>
  loadOwned('lamp', id, user, action);

export const readingFor = (user: CurrentUser, id: number, action: Action): Promise<ReadingWithLamp> =>
  loadOwned('reading', id, user, action);

/** For pages: the lamp if `user` may read it (else null), its access resource, and whether they may change it. */
export async function lampForPage(user: CurrentUser, id: number) {
  const lamp = await nullIfNotFound(() => lampFor(user, id, 'read'));
  if (!lamp) return null;
  const owner = resource(lamp.enclosure, 'lamp');
  return { lamp, resource: owner, canEdit: can(user, 'update', owner) };
}

/** For pages: the enclosure if `user` may read its lamps (else null), and whether they may change them. */
export async function enclosureForLampsPage(user: CurrentUser, id: number) {
  const enclosure = await nullIfNotFound(() => enclosureFor(user, id, 'read'));
  return enclosure && { enclosure, canEdit: can(user, 'update', resource(enclosure, 'lamp')) };
}
