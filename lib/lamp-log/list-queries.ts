import 'server-only';
import { QueryTypes } from 'sequelize';
import { z } from 'zod';
import { likeContains } from '@/lib/api/like';
import { sortedListFields, withSort } from '@/lib/api/pagination';
import { idSchema } from '@/lib/api/schemas';
import { getSequelize } from '@/lib/db';
import { Enclosure } from '@/models';
import { LAMP_TECH_IDS } from '@/simulation';
import { addDays, todayIso } from './dates';
import {
  DUE_WITHIN_DAYS,
  defaultLampDescending,
  LAMP_SORT_COLUMNS,
  MAX_LAMP_SEARCH,
  type LampSortColumn,
} from './list-view';
import { lampRowsOf } from './queries';
import { STATUS_RANK, STATUSES } from './status';
import { catchUpInBackground } from './stored-outlooks';

/**
 * `GET /api/lamps` query: search, filter, sort and page of one organisation's lamps, read from the
 * stored outlooks (lamp_outlooks), so a request costs a page of lamps whatever the organisation owns.
 * Offset paging with a total, like the enclosures list (see lib/enclosures/queries.ts for why).
 */
export const lampListQuery = z
  .object({
    organisationId: idSchema('The organisation id'),
    keeper: idSchema('The keeper').optional(),
    enclosure: idSchema('The enclosure').optional(),
    status: z.enum(STATUSES, { error: `The status must be one of: ${STATUSES.join(', ')}.` }).optional(),
    tech: z.enum(LAMP_TECH_IDS, { error: 'That is not a lamp technology.' }).optional(),
    due: z.coerce
      .number({ error: 'Due within must be a number of days.' })
      .refine((d) => (DUE_WITHIN_DAYS as readonly number[]).includes(d), {
        error: `Due within must be one of ${DUE_WITHIN_DAYS.join(', ')} days.`,
      })
      .optional(),
    retired: z.enum(['1', '0']).optional(),
    /** The older name of `retired=1`. */
    includeRetired: z.enum(['true', 'false']).optional(),
    ...sortedListFields(LAMP_SORT_COLUMNS, MAX_LAMP_SEARCH),
  })
  .transform(({ retired, includeRetired, ...rest }) => ({
    ...withSort('urgency', defaultLampDescending)(rest),
    includeRetired: retired === '1' || includeRetired === 'true',
  }));

export type LampListQuery = z.output<typeof lampListQuery>;
/** A list query with its scope decided: `keeperId` narrows to one keeper's enclosures. */
export type LampListFilter = Omit<LampListQuery, 'keeper'> & { keeperId?: number };

// Raw SQL only from these constants, never from input; values go in as replacements.
const ORDER: Record<LampSortColumn, (d: 'ASC' | 'DESC') => string> = {
  // status_rank then the nearest date, in one direction, so the (organisation, rank, date) index gives
  // the order without sorting.
  urgency: (d) => `o.status_rank ${d}, o.next_due_on ${d}, o.lamp_id ${d}`,
  lamp: (d) => `o.label ${d}, o.lamp_id ${d}`,
  enclosure: (d) => `o.enclosure_name ${d}, o.label ${d}, o.lamp_id ${d}`,
  // Descending age is the oldest lamp first: the earliest first use.
  age: (d) => `o.first_used_on ${d === 'ASC' ? 'DESC' : 'ASC'}, o.lamp_id ${d}`,
  // Lamps without the value (no reading, no UV output, no date) come last either way.
  lastReading: (d) => `o.last_reading_at IS NULL, o.last_reading_at ${d}, o.lamp_id ${d}`,
  remaining: (d) => `o.remaining_fraction IS NULL, o.remaining_fraction ${d}, o.lamp_id ${d}`,
  due: (d) => `o.next_due_on IS NULL, o.next_due_on ${d}, o.lamp_id ${d}`,
};

type Scope = { organisationId: number; keeperId?: number };

/** WHERE clause and replacements for a query's scope, filters and search. */
export function lampListWhere(query: LampListFilter, today: string) {
  const where: string[] = [];
  const r: Record<string, unknown> = {};
  const add = (clause: string, values: Record<string, unknown>) => {
    where.push(clause);
    Object.assign(r, values);
  };
  add('o.organisation_id = :organisationId', { organisationId: query.organisationId });
  if (query.keeperId) add('e.keeper_id = :keeperId', { keeperId: query.keeperId });
  if (query.enclosure) add('l.enclosure_id = :enclosureId', { enclosureId: query.enclosure });
  if (query.status) add('o.status_rank = :rank', { rank: STATUS_RANK[query.status] });
  else if (!query.includeRetired) add('o.status_rank < :retiredRank', { retiredRank: STATUS_RANK.retired });
  if (query.tech) add('t.tech = :tech', { tech: query.tech });
  if (query.due) add('o.next_due_on <= :dueBy', { dueBy: addDays(today, query.due) });
  // Every word must appear in the lamp's label, its type's name, the enclosure's name or its species.
  (query.q ?? '')
    .split(/\s+/)
    .filter(Boolean)
    .forEach((word, i) =>
      add(`(l.label LIKE :w${i} OR t.name LIKE :w${i} OR e.name LIKE :w${i} OR e.species_name LIKE :w${i})`, {
        [`w${i}`]: likeContains(word),
      }),
    );
  return { sql: where.join(' AND '), replacements: r };
}

const FROM = `FROM lamp_outlooks o
  JOIN lamps l ON l.id = o.lamp_id
  JOIN enclosures e ON e.id = l.enclosure_id
  JOIN lamp_types t ON t.id = l.lamp_type_id`;

export type LampCounts = {
  replace: number;
  testSoon: number;
  inUse: number;
  /** Lamps whose stored outlook waits to be recomputed (or was never computed): order and counts may move. */
  pending: number;
};

/** Lamps counted by stored status, and how many of those rows were computed before today. */
type StatusCounts = { byRank: Map<number, number>; staleByDate: number };

/**
 * The organisation's stored statuses from its counts rows (`lamp_outlook_counts`: one row a status and
 * day computed for, kept by the database's triggers as outlooks are written and deleted), so the summary
 * costs a handful of rows however many lamps the organisation owns.
 */
async function statusCounts(organisationId: number, today: string): Promise<StatusCounts> {
  const rows = await getSequelize().query<{ rank: number; n: number | string; stale: number | string }>(
    `SELECT status_rank AS \`rank\`, SUM(n) AS n, SUM(IF(as_of < :today, n, 0)) AS stale
       FROM lamp_outlook_counts WHERE organisation_id = :organisationId GROUP BY status_rank`,
    { replacements: { organisationId, today }, type: QueryTypes.SELECT },
  );
  return {
    byRank: new Map(rows.map((r) => [Number(r.rank), Number(r.n)])),
    staleByDate: rows.reduce((sum, r) => sum + Number(r.stale ?? 0), 0),
  };
}

/**
 * Lamps with no stored outlook of their current version (new, or changed and not yet recomputed): the
 * lamps flagged `outlook_pending` (kept by triggers), read through that flag's index, so the cost follows
 * the lamps waiting, not the organisation. Those whose stored row is also from before today are already
 * in statusCounts' stale count and are taken out here, so no lamp is counted twice.
 */
async function versionPending(scope: Scope, today: string): Promise<number> {
  const keeper = scope.keeperId ? 'AND e.keeper_id = :keeperId' : '';
  const [row] = await getSequelize().query<{ n: number | string; old: number | string | null }>(
    // STRAIGHT_JOIN: from the waiting lamps (few) to their enclosures, never from the organisation's
    // enclosures (many) to their lamps.
    `SELECT STRAIGHT_JOIN COUNT(*) AS n, SUM(o.as_of < :today) AS old
       FROM lamps l JOIN enclosures e FORCE INDEX (PRIMARY) ON e.id = l.enclosure_id
       LEFT JOIN lamp_outlooks o ON o.lamp_id = l.id
      WHERE l.outlook_pending = 1 AND e.organisation_id = :organisationId ${keeper}`,
    { replacements: { ...scope, today }, type: QueryTypes.SELECT },
  );
  return Number(row?.n ?? 0) - Number(row?.old ?? 0);
}

type Counted = { counts: LampCounts; byRank: Map<number, number> | null };

/**
 * The summary line's counts for everything the person may see (not narrowed by search or filters): the
 * stored statuses, and how many are not yet up to date. For owners and staff the statuses come from
 * the organisation's counts rows (statusCounts, also answered as `byRank`); a keeper's, from their own
 * enclosures' lamps.
 */
async function countsOf(scope: Scope, today: string): Promise<Counted> {
  const n = (v: string | number | null | undefined) => Number(v ?? 0);
  if (!scope.keeperId) {
    const [{ byRank, staleByDate }, notCurrent] = await Promise.all([
      statusCounts(scope.organisationId, today),
      versionPending(scope, today),
    ]);
    const rank = (r: number) => byRank.get(r) ?? 0;
    return {
      counts: {
        replace: rank(STATUS_RANK.replace),
        testSoon: rank(STATUS_RANK['test-soon']),
        inUse: [...byRank].filter(([r]) => r < STATUS_RANK.retired).reduce((sum, [, c]) => sum + c, 0),
        pending: notCurrent + staleByDate,
      },
      byRank,
    };
  }
  // The keeper's enclosures first (by the keeper's index), then their lamps and outlooks by key: the
  // cost follows the keeper's lamps, not the organisation's.
  const [row] = await getSequelize().query<Record<keyof LampCounts, string | number | null>>(
    `SELECT STRAIGHT_JOIN SUM(o.status_rank = 0) AS \`replace\`, SUM(o.status_rank = 1) AS testSoon,
            SUM(o.status_rank < 4) AS inUse,
            SUM(l.outlook_pending = 1 OR o.as_of < :today) AS pending
       FROM enclosures e JOIN lamps l ON l.enclosure_id = e.id LEFT JOIN lamp_outlooks o ON o.lamp_id = l.id
      WHERE e.keeper_id = :keeperId AND e.organisation_id = :organisationId`,
    { replacements: { ...scope, today }, type: QueryTypes.SELECT },
  );
  return {
    counts: {
      replace: n(row?.replace),
      testSoon: n(row?.testSoon),
      inUse: n(row?.inUse),
      pending: n(row?.pending),
    },
    byRank: null,
  };
}

export async function lampCounts(scope: Scope, today = todayIso()): Promise<LampCounts> {
  return (await countsOf(scope, today)).counts;
}

/**
 * The total of a view the counts rows already answer (an owner's or staff member's list, filtered by
 * status at most), or null when the view needs its own COUNT.
 */
function totalFromCounts(query: LampListFilter, byRank: Map<number, number> | null): number | null {
  if (!byRank || query.keeperId || query.enclosure || query.tech || query.due || (query.q ?? '').trim())
    return null;
  if (query.status) return byRank.get(STATUS_RANK[query.status]) ?? 0;
  let total = 0;
  for (const [rank, n] of byRank) if (query.includeRetired || rank < STATUS_RANK.retired) total += n;
  return total;
}

/** The page's and the total's SQL (tests EXPLAIN them). */
export function lampListSql(query: LampListFilter, today: string) {
  const { sql, replacements } = lampListWhere(query, today);
  const d = query.descending ? 'DESC' : 'ASC';
  // With a due filter every row has a date, and the plain order lets the (organisation, date) index
  // give it without sorting.
  const order =
    query.sort === 'due' && query.due ? `o.next_due_on ${d}, o.lamp_id ${d}` : ORDER[query.sort](d);
  return {
    // STRAIGHT_JOIN: read the organisation's outlooks in index order and stop at the page's end. Left to
    // itself the optimiser may start from a small enclosures table and sort every lamp of it.
    pageSql: `SELECT STRAIGHT_JOIN o.lamp_id AS id ${FROM} WHERE ${sql} ORDER BY ${order} LIMIT :limit OFFSET :offset`,
    countSql: `SELECT COUNT(*) AS n ${FROM} WHERE ${sql}`,
    replacements: { ...replacements, limit: query.limit, offset: query.offset },
  };
}

/**
 * One page of an organisation's lamps with their summaries, the total matching, and the counts. The
 * caller has decided with `can()` whose lamps this user may see and passes `keeperId` for a keeper.
 */
export async function listLamps(query: LampListFilter) {
  const sequelize = getSequelize();
  const today = todayIso();
  const { pageSql, countSql, replacements } = lampListSql(query, today);
  const scope = { organisationId: query.organisationId, keeperId: query.keeperId };
  // Views the counts rows answer (the plain list, a status) take their total from them; any other view
  // is counted by its own query, started beside them.
  const countable =
    !query.keeperId && !query.enclosure && !query.tech && !query.due && !(query.q ?? '').trim();
  const [ids, counted, [counting]] = await Promise.all([
    sequelize.query<{ id: number }>(pageSql, { replacements, type: QueryTypes.SELECT }),
    countsOf(scope, today),
    countable
      ? Promise.resolve([null])
      : sequelize.query<{ n: number | string }>(countSql, { replacements, type: QueryTypes.SELECT }),
  ]);
  const { counts } = counted;
  const total = totalFromCounts(query, counted.byRank) ?? Number(counting?.n ?? 0);
  const items = await lampRowsOf(
    ids.map((r) => r.id),
    today,
  );
  // Rows out of date are recomputed above for this page; the rest catch up behind the answer.
  if (counts.pending > 0) catchUpInBackground(query.organisationId, today);
  return {
    items,
    total,
    offset: query.offset,
    limit: query.limit,
    counts,
  };
}

export type LampListPage = Awaited<ReturnType<typeof listLamps>>;

/** The enclosure a lamp-log filter names, if this person may see it (its name for the page's notice). */
export async function filteredEnclosure(organisationId: number, id: number, keeperId?: number) {
  return Enclosure.findOne({
    where: { id, organisationId, ...(keeperId ? { keeperId } : {}) },
    attributes: ['id', 'name'],
  });
}
