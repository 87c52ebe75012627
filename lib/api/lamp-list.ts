import 'server-only';
import { QueryTypes } from 'sequelize';
import { z } from 'zod';
import { getSequelize } from '@/lib/db';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import {
  DUE_WITHIN_DAYS,
  defaultLampDescending,
  LAMP_SORT_COLUMNS,
  MAX_LAMP_SEARCH,
  type LampSortColumn,
} from '@/lib/lamp-log/list-view';
import {
  catchUpInBackground,
  SUMMARY_INCLUDE,
  summariesOf,
  type LampWithOutlook,
} from '@/lib/lamp-log/outlook-store';
import { STATUS_RANK, STATUSES } from '@/lib/lamp-log/status';
import { SORT_DIRECTIONS } from '@/lib/list-view';
import { Enclosure, Lamp } from '@/models';
import { LAMP_TECH_IDS } from '@/simulation';
import { likeContains } from './like';
import { offsetQuery, pageQuery } from './pagination';
import { idSchema, textSchema } from './schemas';

/**
 * `GET /api/lamps` query: search, filter, sort and page of one organisation's lamps, read from the
 * stored outlooks (lamp_outlooks), so a request costs a page of lamps whatever the organisation owns.
 * Offset paging with a total, like the enclosures list (see enclosure-list.ts for why).
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
    q: textSchema('The search must be text.')
      .trim()
      .max(MAX_LAMP_SEARCH, `Keep the search to ${MAX_LAMP_SEARCH} characters.`)
      .optional(),
    sort: z
      .enum(LAMP_SORT_COLUMNS, { error: `Sort by one of: ${LAMP_SORT_COLUMNS.join(', ')}.` })
      .default('urgency'),
    dir: z.enum(SORT_DIRECTIONS, { error: 'The direction must be asc or desc.' }).optional(),
    offset: offsetQuery,
    limit: pageQuery.limit,
  })
  .transform(({ dir, retired, includeRetired, ...rest }) => ({
    ...rest,
    includeRetired: retired === '1' || includeRetired === 'true',
    descending: dir ? dir === 'desc' : defaultLampDescending(rest.sort),
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
  const where = ['o.organisation_id = :organisationId'];
  const r: Record<string, unknown> = { organisationId: query.organisationId };
  if (query.keeperId) {
    where.push('e.keeper_id = :keeperId');
    r.keeperId = query.keeperId;
  }
  if (query.enclosure) {
    where.push('l.enclosure_id = :enclosureId');
    r.enclosureId = query.enclosure;
  }
  if (query.status) {
    where.push('o.status_rank = :rank');
    r.rank = STATUS_RANK[query.status];
  } else if (!query.includeRetired) {
    where.push('o.status_rank < :retiredRank');
    r.retiredRank = STATUS_RANK.retired;
  }
  if (query.tech) {
    where.push('t.tech = :tech');
    r.tech = query.tech;
  }
  if (query.due) {
    where.push('o.next_due_on <= :dueBy');
    r.dueBy = addDays(today, query.due);
  }
  // Every word must appear in the lamp's label, its type's name, the enclosure's name or its species.
  (query.q ?? '')
    .split(/\s+/)
    .filter(Boolean)
    .forEach((word, i) => {
      where.push(
        `(l.label LIKE :w${i} OR t.name LIKE :w${i} OR e.name LIKE :w${i} OR e.species_name LIKE :w${i})`,
      );
      r[`w${i}`] = likeContains(word);
    });
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
 * The organisation's stored statuses in one grouped COUNT over lamp_outlooks alone: it reads the
 * (organisation, status, as of) index and no table rows (tests check the plan says so), so it costs
 * index entries, not the three-table join a count of everything once was.
 */
async function statusCounts(organisationId: number, today: string): Promise<StatusCounts> {
  const rows = await getSequelize().query<{ rank: number; n: number | string; stale: number | string }>(
    `SELECT status_rank AS \`rank\`, COUNT(*) AS n, SUM(as_of < :today) AS stale
       FROM lamp_outlooks WHERE organisation_id = :organisationId GROUP BY status_rank`,
    { replacements: { organisationId, today }, type: QueryTypes.SELECT },
  );
  return {
    byRank: new Map(rows.map((r) => [Number(r.rank), Number(r.n)])),
    staleByDate: rows.reduce((sum, r) => sum + Number(r.stale ?? 0), 0),
  };
}

/**
 * Lamps whose stored outlook is missing or of an older version than the lamp (a change not yet
 * recomputed), in one pass over the organisation's lamps by index. Rows computed before today are
 * left to statusCounts, so no lamp is counted twice.
 */
async function versionPending(scope: Scope, today: string): Promise<number> {
  const keeper = scope.keeperId ? 'AND e.keeper_id = :keeperId' : '';
  const [row] = await getSequelize().query<{ n: number | string }>(
    `SELECT COUNT(*) AS n FROM enclosures e JOIN lamps l ON l.enclosure_id = e.id
       LEFT JOIN lamp_outlooks o ON o.lamp_id = l.id
      WHERE e.organisation_id = :organisationId ${keeper}
        AND (o.lamp_id IS NULL OR (o.source_version <> l.outlook_version AND o.as_of >= :today))`,
    { replacements: { ...scope, today }, type: QueryTypes.SELECT },
  );
  return Number(row?.n ?? 0);
}

/**
 * The summary line's counts for everything the person may see (not narrowed by search or filters): the
 * stored statuses, and how many are not yet up to date. For owners and staff the statuses come from
 * the organisation's grouped count (statusCounts); a keeper's, from their own enclosures' lamps.
 */
export async function lampCounts(scope: Scope, today = todayIso()): Promise<LampCounts> {
  const n = (v: string | number | null | undefined) => Number(v ?? 0);
  if (!scope.keeperId) {
    const [{ byRank, staleByDate }, notCurrent] = await Promise.all([
      statusCounts(scope.organisationId, today),
      versionPending(scope, today),
    ]);
    const rank = (r: number) => byRank.get(r) ?? 0;
    return {
      replace: rank(STATUS_RANK.replace),
      testSoon: rank(STATUS_RANK['test-soon']),
      inUse: [...byRank].filter(([r]) => r < STATUS_RANK.retired).reduce((sum, [, c]) => sum + c, 0),
      pending: notCurrent + staleByDate,
    };
  }
  const [row] = await getSequelize().query<Record<keyof LampCounts, string | number | null>>(
    `SELECT SUM(o.status_rank = 0) AS \`replace\`, SUM(o.status_rank = 1) AS testSoon,
            SUM(o.status_rank < 4) AS inUse,
            SUM(o.source_version <> l.outlook_version OR o.as_of < :today)
              + (SELECT COUNT(*) FROM lamps l2 JOIN enclosures e2 ON e2.id = l2.enclosure_id
                   LEFT JOIN lamp_outlooks o2 ON o2.lamp_id = l2.id
                  WHERE e2.organisation_id = :organisationId AND e2.keeper_id = :keeperId
                    AND o2.lamp_id IS NULL) AS pending
       FROM lamp_outlooks o JOIN lamps l ON l.id = o.lamp_id JOIN enclosures e ON e.id = l.enclosure_id
      WHERE o.organisation_id = :organisationId AND e.keeper_id = :keeperId`,
    { replacements: { ...scope, today }, type: QueryTypes.SELECT },
  );
  return {
    replace: n(row?.replace),
    testSoon: n(row?.testSoon),
    inUse: n(row?.inUse),
    pending: n(row?.pending),
  };
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
  // The plain list (everything in use, no search or filter) totals what the counts already give; any
  // other view is counted by its own query.
  const plain =
    !query.keeperId &&
    !query.enclosure &&
    !query.status &&
    !query.tech &&
    !query.due &&
    !query.includeRetired &&
    !(query.q ?? '').trim();
  const [ids, counts, [total]] = await Promise.all([
    sequelize.query<{ id: number }>(pageSql, { replacements, type: QueryTypes.SELECT }),
    lampCounts(scope, today),
    plain
      ? Promise.resolve([null])
      : sequelize.query<{ n: number | string }>(countSql, { replacements, type: QueryTypes.SELECT }),
  ]);
  const lamps = ids.length
    ? ((await Lamp.findAll({
        where: { id: ids.map((r) => r.id) },
        include: SUMMARY_INCLUDE,
      })) as LampWithOutlook[])
    : [];
  const byId = new Map(lamps.map((l) => [l.id, l]));
  const { items } = await summariesOf(
    ids.map((r) => byId.get(r.id)).filter((l): l is LampWithOutlook => Boolean(l)),
    today,
  );
  // Rows out of date are recomputed above for this page; the rest catch up behind the answer.
  if (counts.pending > 0) catchUpInBackground(query.organisationId, today);
  return {
    items,
    total: plain ? counts.inUse : Number(total?.n ?? 0),
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
