import 'server-only';
import { selectRows } from '@/lib/db';
import type { MembershipClaim, SessionUser } from '@/lib/permissions';
import { Membership, Organisation, User, type Role } from '@/models';

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

type SessionRow = {
  email: string;
  name: string;
  sessionVersion: number | string;
  ended: number | string;
  organisationId: number | string | null;
  role: Role | null;
  organisationName: string | null;
  exampleData: number | boolean | null;
};

/**
 * `loadSessionUser` for a session that may have been signed out: null also when `sid` was ended. One
 * query (the account, a row a membership, and whether the session was ended) rather than three, as
 * every signed-in page and API request asks it before anything else.
 */
export async function loadUnendedSessionUser(
  userId: number,
  sessionVersion: number,
  sid: string,
): Promise<CurrentUser | null> {
  const rows = await selectRows<SessionRow>(
    `SELECT u.email, u.name, u.session_version AS sessionVersion,
            EXISTS (SELECT 1 FROM ended_sessions e WHERE e.sid = :sid) AS ended,
            m.organisation_id AS organisationId, m.role, o.name AS organisationName,
            o.example_data AS exampleData
       FROM users u
       LEFT JOIN memberships m ON m.user_id = u.id
       LEFT JOIN organisations o ON o.id = m.organisation_id
      WHERE u.id = :userId
      ORDER BY m.id`,
    { userId, sid },
  );
  const first = rows[0];
  if (!first || Number(first.ended) || Number(first.sessionVersion) !== sessionVersion) return null;
  return {
    id: userId,
    email: first.email,
    name: first.name,
    sessionVersion,
    memberships: rows
      .filter((r) => r.organisationId !== null && r.role !== null)
      .map((r) => ({
        organisationId: Number(r.organisationId),
        organisationName: r.organisationName ?? '',
        role: r.role as Role,
        exampleData: Boolean(r.exampleData),
      })),
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
    include: [{ model: Organisation, as: 'organisation', attributes: ['id', 'name', 'exampleData'] }],
    order: [['id', 'ASC']],
  });
  return rows.map((m) => {
    const org = (m as Membership & { organisation?: Organisation }).organisation;
    return {
      organisationId: m.organisationId,
      organisationName: org?.name ?? '',
      role: m.role,
      exampleData: org?.exampleData ?? false,
    };
  });
}
