import { forbidden, route } from '@/lib/api';
import { loadOwned, type EnclosureWithKeeper } from '@/lib/access';
import { enclosureJson } from '@/lib/enclosures/queries';
import { deleteEnclosure, updateEnclosure } from '@/lib/enclosures/mutations';
import { updateEnclosureBody } from '@/lib/enclosures/schemas';
import { idParams } from '@/lib/api/schemas';
import type { CurrentUser } from '@/lib/auth/session-user';
import { can } from '@/lib/permissions';

export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const enclosure = await loadOwned('enclosure', params.id, user, 'read');
    return enclosureJson(enclosure);
  },
});

export const PATCH = route({
  params: idParams,
  body: updateEnclosureBody,
  handler: async ({ params, body, user }) => {
    const enclosure = await loadOwned('enclosure', params.id, user, 'update');
    if (body.keeperId !== undefined && body.keeperId !== enclosure.keeperId) {
      assertMayHandOver(user, enclosure, body.keeperId);
    }
    return enclosureJson(await updateEnclosure(enclosure, body));
  },
});

export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const enclosure = await loadOwned('enclosure', params.id, user, 'delete');
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
