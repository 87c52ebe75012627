import type { Transaction } from 'sequelize';
import { z } from 'zod';
import { afterCursor, allow, conflict, notFound, page, pageQuery, route } from '@/lib/api';
import { endAllSessions } from '@/lib/account/service';
import { idParams, idSchema, roleSchema } from '@/lib/api/schemas';
import { getSequelize } from '@/lib/db';
import { Membership, User } from '@/models';

const memberJson = (m: Membership & { user?: User }) => ({
  userId: m.userId,
  name: m.user?.name ?? '',
  email: m.user?.email ?? '',
  role: m.role,
  joinedAt: m.createdAt.toISOString(),
});

/** The organisation's members (owner and staff). */
export const GET = route({
  params: idParams,
  query: z.object({ ...pageQuery, role: roleSchema.optional() }),
  handler: async ({ params, query, user }) => {
    allow(user, 'read', { kind: 'member', organisationId: params.id }, 'That organisation');
    const rows = await Membership.findAll({
      where: {
        organisationId: params.id,
        ...(query.role ? { role: query.role } : {}),
        ...afterCursor(query.cursor),
      },
      include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
      order: [['id', 'ASC']],
      limit: query.limit + 1,
    });
    return page(rows, query.limit, memberJson);
  },
});

/** Changes a member's role. Owner only; an organisation always keeps at least one owner. */
export const PATCH = route({
  params: idParams,
  body: z.object({ userId: idSchema('The user id'), role: roleSchema }),
  handler: async ({ params, body, user }) => {
    allow(
      user,
      'update',
      { kind: 'member', organisationId: params.id, userId: body.userId },
      'That organisation',
    );
    const sequelize = getSequelize();
    return sequelize.transaction(async (transaction) => {
      const owners = await lockOwners(params.id, transaction);
      const member = await Membership.findOne({
        where: { organisationId: params.id, userId: body.userId },
        include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
        lock: transaction.LOCK.UPDATE,
        transaction,
      });
      if (!member) throw notFound('That member');
      if (member.role === 'owner' && body.role !== 'owner') assertAnotherOwner(owners);
      member.role = body.role;
      await member.save({ transaction });
      return memberJson(member);
    });
  },
});

/** Removes a member (`?userId=`). Owner only. Their sessions end at once: the session version is bumped. */
export const DELETE = route({
  params: idParams,
  query: z.object({ userId: idSchema('The user id') }),
  handler: async ({ params, query, user }) => {
    allow(
      user,
      'delete',
      { kind: 'member', organisationId: params.id, userId: query.userId },
      'That organisation',
    );
    const sequelize = getSequelize();
    await sequelize.transaction(async (transaction) => {
      const owners = await lockOwners(params.id, transaction);
      const member = await Membership.findOne({
        where: { organisationId: params.id, userId: query.userId },
        lock: transaction.LOCK.UPDATE,
        transaction,
      });
      if (!member) throw notFound('That member');
      if (member.role === 'owner') assertAnotherOwner(owners);
      await member.destroy({ transaction });
      await endAllSessions(query.userId, transaction);
    });
    return { ok: true };
  },
});

/** Locks the owner rows first (always in this order), so two owners cannot demote each other at once. */
function lockOwners(organisationId: number, transaction: Transaction) {
  return Membership.findAll({
    where: { organisationId, role: 'owner' },
    lock: transaction.LOCK.UPDATE,
    transaction,
  });
}

function assertAnotherOwner(owners: Membership[]) {
  if (owners.length < 2) {
    throw conflict(
      'An organisation needs at least one owner. Make someone else an owner first.',
      'last_owner',
    );
  }
}
