import { allow, forbidden, notFound, route } from '@/lib/api';
import { assertKeeperInOrganisation, enclosureJson, updateEnclosureBody } from '@/lib/api/enclosures';
import { idParams } from '@/lib/api/schemas';
import type { CurrentUser } from '@/lib/auth/session-user';
import { can } from '@/lib/permissions';
import { Enclosure, User } from '@/models';

async function load(id: number) {
  const enclosure = await Enclosure.findByPk(id, {
    include: [{ model: User, as: 'keeper', attributes: ['id', 'name'] }],
  });
  if (!enclosure) throw notFound('That enclosure');
  return enclosure as Enclosure & { keeper?: User | null };
}

function resourceOf(e: Enclosure) {
  return { kind: 'enclosure', organisationId: e.organisationId, keeperId: e.keeperId } as const;
}

export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const enclosure = await load(params.id);
    allow(user, 'read', resourceOf(enclosure), 'That enclosure');
    return enclosureJson(enclosure);
  },
});

export const PATCH = route({
  params: idParams,
  body: updateEnclosureBody,
  handler: async ({ params, body, user }) => {
    const enclosure = await load(params.id);
    allow(user, 'update', resourceOf(enclosure), 'That enclosure');
    if (body.keeperId !== undefined && body.keeperId !== enclosure.keeperId) {
      await assertMayHandOver(user, enclosure, body.keeperId);
    }
    await enclosure.update(body);
    return enclosureJson(await load(params.id));
  },
});

export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const enclosure = await load(params.id);
    allow(user, 'delete', resourceOf(enclosure), 'That enclosure');
    await enclosure.destroy();
    return { ok: true, id: params.id };
  },
});

/** Moving an enclosure to another keeper: the caller must be allowed to own it under the new keeper too. */
async function assertMayHandOver(user: CurrentUser, enclosure: Enclosure, keeperId: number) {
  if (!can(user, 'update', { ...resourceOf(enclosure), keeperId })) {
    throw forbidden('Only owners and staff can move an enclosure to another keeper.');
  }
  await assertKeeperInOrganisation(enclosure.organisationId, keeperId);
}
