import 'server-only';
import type { MembershipClaim, SessionUser } from '@/lib/permissions';
import { Membership, Organisation, User } from '@/models';

export type CurrentUser = SessionUser & { email: string; name: string; sessionVersion: number };

/**
 * The user behind a session, fresh from the database: null when the account is gone or its session
 * version moved on (signed out everywhere, removed from an organisation). Two small indexed queries.
 */
export async function loadSessionUser(userId: number, sessionVersion: number): Promise<CurrentUser | null> {
  const user = await User.findByPk(userId, { attributes: ['id', 'email', 'name', 'sessionVersion'] });
  if (!user || user.sessionVersion !== sessionVersion) return null;
  return {
    id: user.id,
    email: user.email,
    name: user.name,
    sessionVersion,
    memberships: await memberships(userId),
  };
}

/** Right after a password check: whatever session version the account has now. */
export async function loadUserById(userId: number): Promise<CurrentUser | null> {
  const user = await User.findByPk(userId, { attributes: ['sessionVersion'] });
  return user ? loadSessionUser(userId, user.sessionVersion) : null;
}

export async function memberships(userId: number): Promise<MembershipClaim[]> {
  const rows = await Membership.findAll({
    where: { userId },
    include: [{ model: Organisation, as: 'organisation', attributes: ['id', 'name'] }],
    order: [['id', 'ASC']],
  });
  return rows.map((m) => {
    const org = (m as Membership & { organisation?: Organisation }).organisation;
    return { organisationId: m.organisationId, organisationName: org?.name ?? '', role: m.role };
  });
}
