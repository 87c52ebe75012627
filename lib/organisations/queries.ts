import 'server-only';
import { afterCursor } from '@/lib/api/pagination';
import { enclosureCounts } from '@/lib/api/enclosures';
import { Membership, Organisation, User, type Role } from '@/models';

/** Reads of an organisation and its people. Access is checked by the caller (a route's allow()). */

export type MemberRow = Membership & { user?: User };

export const memberJson = (m: MemberRow) => ({
  userId: m.userId,
  name: m.user?.name ?? '',
  email: m.user?.email ?? '',
  role: m.role,
  joinedAt: m.createdAt.toISOString(),
});

/** Members by membership id from after `cursor` (one more than `limit`, for page()), with name and e-mail. */
export async function membersOf(
  organisationId: number,
  opts: { role?: Role; cursor?: number; limit: number },
): Promise<MemberRow[]> {
  return Membership.findAll({
    where: { organisationId, ...(opts.role ? { role: opts.role } : {}), ...afterCursor(opts.cursor) },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
    order: [['id', 'ASC']],
    limit: opts.limit + 1,
  });
}

/** The keepers, as membersOf gives them, each with how many enclosures they keep. */
export async function keepersOf(organisationId: number, opts: { cursor?: number; limit: number }) {
  const rows = await membersOf(organisationId, { ...opts, role: 'keeper' });
  const counts = await enclosureCounts(
    organisationId,
    rows.map((r) => r.userId),
  );
  return { rows, json: (m: MemberRow) => ({ ...keeperJson(m), enclosureCount: counts.get(m.userId) ?? 0 }) };
}

function keeperJson(m: MemberRow) {
  const { userId, name, email, joinedAt } = memberJson(m);
  return { userId, name, email, joinedAt };
}

export async function organisationName(id: number): Promise<string | null> {
  return (await Organisation.findByPk(id, { attributes: ['name'] }))?.name ?? null;
}

/** Whether the organisation holds invented example data (the demo), which every view of it must say. */
export async function isExampleData(id: number): Promise<boolean> {
  return (await Organisation.findByPk(id, { attributes: ['exampleData'] }))?.exampleData ?? false;
}
