import 'server-only';
import { literal, Op, type OrderItem, type WhereOptions } from 'sequelize';
import { z } from 'zod';
import {
  defaultPeopleDescending,
  KEEPER_SORT_COLUMNS,
  MAX_PEOPLE_SEARCH,
  MEMBER_SORT_COLUMNS,
  type MemberSortColumn,
} from '@/lib/people/list-view';
import type { Role } from '@/lib/permissions';
import { memberJson, type MemberRow } from '@/lib/organisations/queries';
import { invitationJson } from '@/lib/auth/invitations';
import { likeContains } from '@/lib/api/like';
import { sortedListFields, withSort } from '@/lib/api/pagination';
import { idSchema, roleSchema } from '@/lib/api/schemas';
import { enclosureCounts } from '@/lib/enclosures/queries';
import { Invitation, Membership, User } from '@/models';

/**
 * The keepers and members lists: search, sort and page of one organisation's people, offset paging with
 * a total like the enclosures table (see lib/enclosures/queries.ts for why). A request reads one page of
 * memberships through the (organisation_id, role, id) index with each person by primary key, counts
 * through the same index, and (keepers) counts the page's enclosures in one grouped query: the cost
 * follows the page, not the hundreds of customers a shop has. Who joined order comes from the index;
 * name, e-mail and role orders sort the organisation's memberships (a few hundred rows) in the database.
 */
/** `GET /api/keepers` query. */
export const keeperListQuery = z
  .object({
    organisationId: idSchema('The organisation id'),
    ...sortedListFields(KEEPER_SORT_COLUMNS, MAX_PEOPLE_SEARCH),
  })
  .transform(withSort('name', defaultPeopleDescending));

/** `GET /api/organisations/[id]/members` query: the list's fields and a role to narrow to. */
export const memberListQuery = z
  .object({ ...sortedListFields(MEMBER_SORT_COLUMNS, MAX_PEOPLE_SEARCH), role: roleSchema.optional() })
  .transform(withSort('role', defaultPeopleDescending));

export type PeopleListQuery = {
  organisationId: number;
  role?: Role;
  q?: string;
  sort: MemberSortColumn;
  descending: boolean;
  offset: number;
  limit: number;
};

// Raw SQL only from these constants, never from input. The Membership alias is read at run time (a
// production build minifies the class name); `user` is the association's own alias.
const M = (column: string) => `\`${Membership.name}\`.\`${column}\``;
const U = (column: string) => `\`user\`.\`${column}\``;

/** ORDER BY for a column; ties fall to the membership id, so pages never overlap or skip. */
function peopleOrder(column: MemberSortColumn, descending: boolean): OrderItem[] {
  const d = descending ? 'DESC' : 'ASC';
  const byColumn: Record<MemberSortColumn, OrderItem[]> = {
    name: [[literal(U('name')), d]],
    email: [[literal(U('email')), d]],
    // The role column is an ENUM in owner, staff, keeper order; within a role, A–Z.
    role: [
      [literal(M('role')), d],
      [literal(U('name')), 'ASC'],
    ],
    joined: [],
  };
  return [...byColumn[column], [literal(M('id')), column === 'joined' ? d : 'ASC']];
}

/** Every word of the search must appear in the person's name or e-mail (the collation ignores case). */
function peopleSearch(q: string | undefined): WhereOptions {
  const words = (q ?? '').split(/\s+/).filter(Boolean);
  if (words.length === 0) return {};
  return {
    [Op.and]: words.map((word) => {
      const like = { [Op.like]: likeContains(word) };
      return { [Op.or]: [{ '$user.name$': like }, { '$user.email$': like }] };
    }),
  };
}

/** One page of an organisation's people. The caller has checked, with `can()`, that this user may. */
export async function listPeople(query: PeopleListQuery) {
  const { organisationId, role, q, sort, descending, offset, limit } = query;
  const { rows, count } = await Membership.findAndCountAll({
    where: { organisationId, ...(role ? { role } : {}), ...peopleSearch(q) },
    include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'], required: true }],
    order: peopleOrder(sort, descending),
    offset,
    limit,
  });
  return { items: (rows as MemberRow[]).map(memberJson), total: count, offset, limit };
}

/** One page of the organisation's keepers, each with how many enclosures they keep. */
export async function listKeepers(query: Omit<PeopleListQuery, 'role'>) {
  const page = await listPeople({ ...query, role: 'keeper' });
  const counts = await enclosureCounts(
    query.organisationId,
    page.items.map((k) => k.userId),
  );
  return {
    ...page,
    items: page.items.map(({ role: _role, ...k }) => ({ ...k, enclosureCount: counts.get(k.userId) ?? 0 })),
  };
}

export type MemberListPage = Awaited<ReturnType<typeof listPeople>>;
export type KeeperListPage = Awaited<ReturnType<typeof listKeepers>>;

/**
 * Read models for the server-rendered pages. Callers check `can` first; these only fetch.
 * Pages show at most PAGE_LIMIT rows and say so when there are more.
 */
export const PAGE_LIMIT = 500;

/** One member's name (a filter or form showing who it names), or null if not a member in that role. */
export async function memberName(
  organisationId: number,
  userId: number,
  role?: Role,
): Promise<{ id: number; name: string; role: Role } | null> {
  const m = await Membership.findOne({
    where: { organisationId, userId, ...(role ? { role } : {}) },
    include: [{ model: User, as: 'user', attributes: ['id', 'name'] }],
  });
  const u = (m as (Membership & { user?: User }) | null)?.user;
  return m && u ? { id: u.id, name: u.name, role: m.role } : null;
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
