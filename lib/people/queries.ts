import 'server-only';
import { Op } from 'sequelize';
import { z } from 'zod';
import {
  defaultPeopleDescending,
  KEEPER_SORT_COLUMNS,
  MAX_PEOPLE_SEARCH,
  MEMBER_SORT_COLUMNS,
  type MemberSortColumn,
} from '@/lib/people/list-view';
import type { Role } from '@/lib/permissions';
import { selectRows } from '@/lib/db';
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

// Raw SQL only from these constants, never from input; values go in as replacements.
/** ORDER BY for a column; ties fall to the membership id, so pages never overlap or skip. */
function peopleOrder(column: MemberSortColumn, descending: boolean): string {
  const d = descending ? 'DESC' : 'ASC';
  const byColumn: Record<MemberSortColumn, string[]> = {
    name: [`u.name ${d}`],
    email: [`u.email ${d}`],
    // The role column is an ENUM in owner, staff, keeper order; within a role, A–Z.
    role: [`m.role ${d}`, 'u.name ASC'],
    joined: [],
  };
  return [...byColumn[column], `m.id ${column === 'joined' ? d : 'ASC'}`].join(', ');
}

/** Every word of the search must appear in the person's name or e-mail (the collation ignores case). */
function peopleSearch(q: string | undefined) {
  const words = (q ?? '').split(/\s+/).filter(Boolean);
  return {
    sql: words.map((_, i) => ` AND (u.name LIKE :w${i} OR u.email LIKE :w${i})`).join(''),
    replacements: Object.fromEntries(words.map((word, i) => [`w${i}`, likeContains(word)])),
  };
}

/** A row of the keepers and members lists. */
export type PersonRow = { userId: number; name: string; email: string; role: Role; joinedAt: string };

/**
 * One page of an organisation's people: a plain query of the columns the lists show (no model
 * instances) beside its total. The caller has checked, with `can()`, that this user may.
 */
export async function listPeople(query: PeopleListQuery) {
  const { organisationId, role, q, sort, descending, offset, limit } = query;
  const search = peopleSearch(q);
  const from = `FROM memberships m JOIN users u ON u.id = m.user_id
      WHERE m.organisation_id = :organisationId${role ? ' AND m.role = :role' : ''}${search.sql}`;
  const replacements = { organisationId, offset, limit, ...(role ? { role } : {}), ...search.replacements };
  const [items, [counted]] = await Promise.all([
    selectRows<PersonRow>(
      `SELECT m.user_id AS userId, u.name, u.email, m.role,
              DATE_FORMAT(m.created_at, '%Y-%m-%dT%H:%i:%s.000Z') AS joinedAt
         ${from} ORDER BY ${peopleOrder(sort, descending)} LIMIT :limit OFFSET :offset`,
      replacements,
    ),
    selectRows<{ n: number | string }>(`SELECT COUNT(*) AS n ${from}`, replacements),
  ]);
  return { items, total: Number(counted?.n ?? 0), offset, limit };
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
