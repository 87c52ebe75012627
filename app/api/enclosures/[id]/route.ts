import { allow, forbidden, route } from '@/lib/api';
import { enclosureJson, enclosureWithKeeper, type EnclosureWithKeeper } from '@/lib/enclosures/queries';
import { updateEnclosure } from '@/lib/enclosures/mutations';
import { updateEnclosureBody } from '@/lib/enclosures/schemas';
import { idParams } from '@/lib/api/schemas';
import type { CurrentUser } from '@/lib/auth/session-user';
import { can } from '@/lib/permissions';

function resourceOf(e: EnclosureWithKeeper) {
  return { kind: 'enclosure', organisationId: e.organisationId, keeperId: e.keeperId } as const;
}

export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const enclosure = await enclosureWithKeeper(params.id);
    allow(user, 'read', resourceOf(enclosure), 'That enclosure');
    return enclosureJson(enclosure);
  },
});

export const PATCH = route({
  params: idParams,
  body: updateEnclosureBody,
  handler: async ({ params, body, user }) => {
    const enclosure = await enclosureWithKeeper(params.id);
    allow(user, 'update', resourceOf(enclosure), 'That enclosure');
    if (body.keeperId !== undefined && body.keeperId !== enclosure.keeperId) {
      assertMayHandOver(user, enclosure, body.keeperId);
    }
    return enclosureJson(await updateEnclosure(enclosure, body));
  },
});

export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const enclosure = await enclosureWithKeeper(params.id);
    allow(user, 'delete', resourceOf(enclosure), 'That enclosure');
    await enclosure.destroy();
    return { ok: true, id: params.id };
  },
});

/** Moving an enclosure to another keeper: the caller must be allowed to own it under the new keeper too. */
function assertMayHandOver(user: CurrentUser, enclosure: EnclosureWithKeeper, keeperId: number) {
  if (!can(user, 'update', { ...resourceOf(enclosure), keeperId })) {
    throw forbidden('Only owners and staff can move an enclosure to another keeper.');
  }
}
