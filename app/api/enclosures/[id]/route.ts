import { forbidden, ownedRoute } from '@/lib/api';
import { type EnclosureWithKeeper } from '@/lib/access';
import { enclosureJson } from '@/lib/enclosures/queries';
import { deleteEnclosure, updateEnclosure } from '@/lib/enclosures/mutations';
import { updateEnclosureBody } from '@/lib/enclosures/schemas';
import type { CurrentUser } from '@/lib/auth/session-user';
import { can } from '@/lib/permissions';

export const GET = ownedRoute('enclosure', 'read', {
  handler: async ({ thing: enclosure }) => {
    return enclosureJson(enclosure);
  },
});

export const PATCH = ownedRoute('enclosure', 'update', {
  body: updateEnclosureBody,
  handler: async ({ thing: enclosure, body, user }) => {
    if (body.keeperId !== undefined && body.keeperId !== enclosure.keeperId) {
      assertMayHandOver(user, enclosure, body.keeperId);
    }
    return enclosureJson(await updateEnclosure(enclosure, body));
  },
});

export const DELETE = ownedRoute('enclosure', 'delete', {
  handler: async ({ thing: enclosure, params }) => {
    await deleteEnclosure(enclosure);
    return { ok: true, id: params.id };
  },
});

/** Moving an enclosure to another keeper: the caller must be allowed to own it under the new keeper too. */
function assertMayHandOver(user: CurrentUser, enclosure: EnclosureWithKeeper, keeperId: number) {
  if (!can(user, 'update', { kind: 'enclosure', organisationId: enclosure.organisationId, keeperId })) {
    throw forbidden('Only owners and staff can move an enclosure to another keeper.');
  }
}
