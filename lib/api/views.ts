import 'server-only';
import { Op } from 'sequelize';
import { Enclosure, Invitation, Membership, User, type Role } from '@/models';
import { enclosureJson } from './enclosures';
import { invitationJson } from '@/lib/auth/invitations';

/**
 * Read models for the server-rendered pages. Callers check `can` first; these only fetch.
 * Pages show at most PAGE_LIMIT rows and say so when there are more.
 */
export const PAGE_LIMIT = 500;

export type MemberView = { userId: number; name: string; email: string; role: Role; joinedAt: string };

export async function memberViews(organisationId: number, role?: Role): Promise<MemberView[]> {
  const rows = await Membership.findAll({
    where: { organisationId, ...(role ? { role } : {}) },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
    order: [['id', 'ASC']],
    limit: PAGE_LIMIT,
  });
  return rows
    .map((m) => {
      const u = (m as Membership & { user?: User }).user;
      return {
        userId: m.userId,
        name: u?.name ?? '',
        email: u?.email ?? '',
        role: m.role,
        joinedAt: m.createdAt.toISOString(),
      };
    })
    .sort((a, b) => a.name.localeCompare(b.name));
}

export async function pendingInvitationViews(organisationId: number, role?: Role) {
  const rows = await Invitation.findAll({
    where: {
      organisationId,
      acceptedAt: null,
      revokedAt: null,
      expiresAt: { [Op.gt]: new Date() },
      ...(role ? { role } : {}),
    },
    order: [['createdAt', 'DESC']],
    limit: PAGE_LIMIT,
  });
  return rows.map(invitationJson);
}

export async function enclosureView(id: number) {
  const e = await Enclosure.findByPk(id, {
    include: [{ model: User, as: 'keeper', attributes: ['id', 'name'] }],
  });
  return e ? enclosureJson(e) : null;
}
