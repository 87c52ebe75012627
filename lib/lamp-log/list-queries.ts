import 'server-only';
import { z } from 'zod';
import { likeContains } from '@/lib/api/like';
import { sortedListFields, withSort } from '@/lib/api/pagination';
import { idSchema } from '@/lib/api/schemas';
import { selectRows } from '@/lib/db';
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
import { LAMP_ROW_SQL, lampRowsFrom, type LampRowRaw } from './queries';
import { STATUS_RANK, STATUSES } from './status';
import { catchUpInBackground } from './stored-outlooks';
import { isCursor } from '@/lib/list-view';

/**
 * `GET /api/lamps` query: search, filter, sort and page of one organisation's lamps, read from the
 * stored outlooks (lamp_outlooks), so a request costs a page of lamps whatever the organisation owns.
 *
 * Keyset ("seek") paging with a total: each answer carries a cursor for the row after its last (`next`)
 * and before its first (`prev`), and `after`/`before` start the page there, through the sort's index,
 * so a deep page costs what the first does. The table still says "page 7 of 40": the page number rides
 * in the address beside the cursor. `offset` remains for a page named by number alone (a shared link,
 * a cursor of another sort): the rows are right, only the cost grows with the depth.
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
    after: z.string().refine(isCursor, { error: 'That is not a cursor of this list.' }).optional(),
    before: z.string().refine(isCursor, { error: 'That is not a cursor of this list.' }).optional(),
  })
  .transform(({ retired, includeRetired, ...rest }) => ({
    ...withSort('urgency', defaultLampDescending)(rest),
    includeRetired: retired === '1' || includeRetired === 'true',
  }));

export type LampListQuery = z.output<typeof lampListQuery>;
/** A list query with its scope decided: `keeperId` narrows to one keeper's enclosures. */
export type LampListFilter = Omit<LampListQuery, 'keeper'> & { keeperId?: number };

// Raw SQL only from these constants, never from input; values go in as replacements.
/**
 * One key of a sort: its expression, its direction relative to the one asked (`same`, `opposite`, or
 * always ascending), and whether it may be NULL (MariaDB puts NULL first ascending, last descending).
 */
type SortKey = { sql: string; dir: 'same' | 'opposite' | 'asc'; nullable?: boolean };
const key = (sql: string, dir: SortKey['dir'] = 'same', nullable = false): SortKey => ({
  sql,
  dir,
  nullable,
});
const ID = key('o.lamp_id');

const ORDER: Record<LampSortColumn, SortKey[]> = {
  // status_rank then the nearest date, in one direction, so the (organisation, rank, date) index gives
  // the order without sorting.
  urgency: [key('o.status_rank'), key('o.next_due_on', 'same', true), ID],
  lamp: [key('o.label'), ID],
  enclosure: [key('o.enclosure_name'), key('o.label'), ID],
  // Descending age is the oldest lamp first: the earliest first use. Ties run by id against the date,
  // so the first-use index is descending and gives both directions.
  age: [key('o.first_used_on', 'opposite'), ID],
  // Lamps without the value (no reading, no UV output, no date) come last either way: ascending, a
  // virtual column holding the value with a blank read as the largest possible one (indexed);
  // descending, see sortKeys.
  lastReading: [key('o.last_reading_last'), ID],
  remaining: [key('o.remaining_last'), ID],
  due: [key('o.due_last'), ID],
};

/** The column behind each sort whose blanks come last in both directions. */
const BLANK_LAST: Partial<Record<LampSortColumn, string>> = {
  lastReading: 'o.last_reading_at',
  remaining: 'o.remaining_fraction',
  due: 'o.next_due_on',
};

/** The sort's keys: each order is one an index gives (with the organisation, and the status if filtered). */
function sortKeys(query: Pick<LampListFilter, 'sort' | 'due' | 'descending'>): SortKey[] {
  const column = BLANK_LAST[query.sort];
  if (!column) return ORDER[query.sort];
  // With a due filter every row has a date, and the plain order reads the date index.
  if (query.sort === 'due' && query.due) return [key(column), ID];
  // Descending, MariaDB's own order puts a blank (NULL, the smallest) last: the column's index backwards.
  return query.descending ? [key(column, 'same', true), ID] : ORDER[query.sort];
}

/**
 * The index that gives a sort's order, with the organisation (and the status when one is asked). The
 * optimiser, left to itself, may prefer the status index for the range "not retired" (it holds every
 * column the page needs) and sort every lamp in use for each page; named, the page is read in order and
 * stops at its end. Index names come from the migrations, never from input.
 */
function orderIndex(query: Pick<LampListFilter, 'sort' | 'descending' | 'status' | 'due'>): string {
  const byStatus = Boolean(query.status);
  const asc = !query.descending;
  // With a due filter every row has a date and the order is the plain date's (see sortKeys).
  if (query.sort === 'due' && query.due) return `lamp_outlooks_org_${byStatus ? 'urgency' : 'due'}`;
  const column: Record<LampSortColumn, string> = {
    urgency: 'urgency',
    lamp: 'label',
    enclosure: 'enclosure_label',
    age: 'first_used_desc',
    lastReading: asc ? 'last_reading_last' : 'last_reading',
    remaining: asc ? 'remaining_last' : 'remaining',
    due: asc ? 'due_last' : byStatus ? 'urgency' : 'due',
  };
  const name = column[query.sort];
  // The urgency index starts with the status: it serves both.
  return `lamp_outlooks_org_${byStatus && name !== 'urgency' ? 'status_' : ''}${name}`;
}

/** Whether a view narrows the lamps by nothing but the status (or retired lamps shown or not). */
const onlyByStatus = (query: LampListFilter) =>
  !query.keeperId && !query.enclosure && !query.tech && !query.due && !(query.q ?? '').trim();

/**
 * Whether the order's index is also the best for the view's filter: lamps due within some days, in the
 * order of their due dates, are one range of the due index. Left to itself the optimiser has chosen
 * another index and sorted the range, depending on the table's statistics at the time.
 */
const orderServesFilter = (query: LampListFilter) =>
  query.sort === 'due' && !query.keeperId && !query.enclosure && !query.tech && !(query.q ?? '').trim();

/** Each key's SQL direction for the order asked (`reverse`: the order read backwards, for Previous). */
function directions(keys: SortKey[], descending: boolean, reverse: boolean): ('ASC' | 'DESC')[] {
  return keys.map((k) => {
    const desc = k.dir === 'asc' ? false : k.dir === 'opposite' ? !descending : descending;
    return desc !== reverse ? 'DESC' : 'ASC';
  });
}

/** A row's place in a sort: the sort it belongs to and its keys' values (dates as UTC text). */
type Cursor = { s: string; v: (string | number | null)[] };

const cursorValue = (v: unknown): string | number | null =>
  v === null || v === undefined
    ? null
    : v instanceof Date
      ? v.toISOString().replace('T', ' ').replace('Z', '')
      : typeof v === 'number' || typeof v === 'string'
        ? v
        : Number(v);

export function encodeCursor(sortId: string, values: unknown[]): string {
  const c: Cursor = { s: sortId, v: values.map(cursorValue) };
  return Buffer.from(JSON.stringify(c)).toString('base64url');
}

/** The cursor's values if it was made for this sort, else null (the page falls back to its offset). */
function decodeCursor(text: string, sortId: string, length: number): (string | number | null)[] | null {
  try {
    const c = JSON.parse(Buffer.from(text, 'base64url').toString('utf8')) as Cursor;
    const ok =
      c?.s === sortId &&
      Array.isArray(c.v) &&
      c.v.length === length &&
      c.v.every((v) => v === null || typeof v === 'number' || typeof v === 'string');
    return ok ? c.v : null;
  } catch {
    return null;
  }
}

/**
 * The rows strictly beyond a cursor in the order given: for each key in turn, equal on the keys before
 * it and past it on this one, NULL placed as MariaDB orders it (first ascending, last descending).
 */
function seekWhere(keys: SortKey[], dirs: ('ASC' | 'DESC')[], values: (string | number | null)[]) {
  const r: Record<string, unknown> = {};
  const parts = keys.map((k, i) => {
    const v = values[i] ?? null;
    if (v !== null) r[`k${i}`] = v;
    // `<=> NULL`, not `IS NULL`: MariaDB reads an index backwards past `IS NULL` only by sorting first.
    const equal = v === null ? `${k.sql} <=> NULL` : `${k.sql} = :k${i}`;
    let past: string | null;
    if (dirs[i] === 'ASC') past = v === null ? `${k.sql} IS NOT NULL` : `${k.sql} > :k${i}`;
    else if (v === null) past = null;
    else past = k.nullable ? `(${k.sql} < :k${i} OR ${k.sql} IS NULL)` : `${k.sql} < :k${i}`;
    return { equal, past };
  });
  const branches: string[] = [];
  parts.forEach(({ past }, i) => {
    if (past) branches.push([...parts.slice(0, i).map((p) => p.equal), past].join(' AND '));
  });
  return {
    sql: branches.length ? `(${branches.map((b) => `(${b})`).join(' OR ')})` : 'FALSE',
    replacements: r,
  };
}

type Scope = { organisationId: number; keeperId?: number };

/** A table the list may join beside the outlooks (`o`): the lamp, its enclosure, its type. */
type Joined = 'l' | 'e' | 't';

/**
 * Every outlook has its lamp, and every lamp its enclosure and type (foreign keys, not null), so a join
 * that no clause names changes no row and is left out: joined anyway, the optimiser may start from the
 * small lamp types table and read every lamp to count a view the outlooks' own index answers.
 */
const JOINS: Record<Joined, string> = {
  l: 'JOIN lamps l ON l.id = o.lamp_id',
  e: 'JOIN enclosures e ON e.id = l.enclosure_id',
  t: 'JOIN lamp_types t ON t.id = l.lamp_type_id',
};

/**
 * WHERE clause and replacements for a query's scope, filters and search, and the FROM clause with only
 * the tables the WHERE clause names.
 */
export function lampListWhere(query: LampListFilter, today: string) {
  const where: string[] = [];
  const r: Record<string, unknown> = {};
  const joined = new Set<Joined>();
  const add = (clause: string, values: Record<string, unknown>, tables: Joined[] = []) => {
    where.push(clause);
    Object.assign(r, values);
    // The enclosure and the type are reached through the lamp.
    for (const t of tables) joined.add('l').add(t);
  };
  add('o.organisation_id = :organisationId', { organisationId: query.organisationId });
  if (query.keeperId) add('e.keeper_id = :keeperId', { keeperId: query.keeperId }, ['e']);
  if (query.enclosure) add('l.enclosure_id = :enclosureId', { enclosureId: query.enclosure }, ['l']);
  if (query.status) add('o.status_rank = :rank', { rank: STATUS_RANK[query.status] });
  else if (!query.includeRetired) add('o.status_rank < :retiredRank', { retiredRank: STATUS_RANK.retired });
  if (query.tech) add('t.tech = :tech', { tech: query.tech }, ['t']);
  if (query.due) add('o.next_due_on <= :dueBy', { dueBy: addDays(today, query.due) });
  // Every word must appear in the lamp's label, its type's name, the enclosure's name or its species.
  (query.q ?? '')
    .split(/\s+/)
    .filter(Boolean)
    .forEach((word, i) =>
      add(
        `(l.label LIKE :w${i} OR t.name LIKE :w${i} OR e.name LIKE :w${i} OR e.species_name LIKE :w${i})`,
        { [`w${i}`]: likeContains(word) },
        ['t', 'e'],
      ),
    );
  const from = [
    'FROM lamp_outlooks o',
    ...(['l', 'e', 't'] as const).filter((t) => joined.has(t)).map((t) => JOINS[t]),
  ];
  return { sql: where.join(' AND '), replacements: r, from: from.join(' ') };
}

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
  const rows = await selectRows<{ rank: number; n: number | string; stale: number | string }>(
    `SELECT status_rank AS \`rank\`, SUM(n) AS n, SUM(IF(as_of < :today, n, 0)) AS stale
       FROM lamp_outlook_counts WHERE organisation_id = :organisationId GROUP BY status_rank`,
    { organisationId, today },
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
  const [row] = await selectRows<{ n: number | string; old: number | string | null }>(
    // STRAIGHT_JOIN: from the waiting lamps (few) to their enclosures, never from the organisation's
    // enclosures (many) to their lamps.
    `SELECT STRAIGHT_JOIN COUNT(*) AS n, SUM(o.as_of < :today) AS old
       FROM lamps l JOIN enclosures e FORCE INDEX (PRIMARY) ON e.id = l.enclosure_id
       LEFT JOIN lamp_outlooks o ON o.lamp_id = l.id
      WHERE l.outlook_pending = 1 AND e.organisation_id = :organisationId ${keeper}`,
    { ...scope, today },
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
  const [row] = await selectRows<Record<keyof LampCounts, string | number | null>>(
    `SELECT STRAIGHT_JOIN SUM(o.status_rank = 0) AS \`replace\`, SUM(o.status_rank = 1) AS testSoon,
            SUM(o.status_rank < 4) AS inUse,
            SUM(l.outlook_pending = 1 OR o.as_of < :today) AS pending
       FROM enclosures e JOIN lamps l ON l.enclosure_id = e.id LEFT JOIN lamp_outlooks o ON o.lamp_id = l.id
      WHERE e.keeper_id = :keeperId AND e.organisation_id = :organisationId`,
    { ...scope, today },
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
  if (!byRank || !onlyByStatus(query)) return null;
  if (query.status) return byRank.get(STATUS_RANK[query.status]) ?? 0;
  let total = 0;
  for (const [rank, n] of byRank) if (query.includeRetired || rank < STATUS_RANK.retired) total += n;
  return total;
}

/** The page's and the total's SQL (tests EXPLAIN them). */
export function lampListSql(query: LampListFilter, today: string) {
  const { sql, replacements, from } = lampListWhere(query, today);
  const keys = sortKeys(query);
  const id = sortId(query);
  const seek = query.after ?? query.before;
  const values = seek ? decodeCursor(seek, id, keys.length) : null;
  // Previous reads the order backwards from the page's first row; the rows are turned round after.
  const backwards = Boolean(values && query.before && !query.after);
  const dirs = directions(keys, query.descending, backwards);
  const order = keys.map((k, i) => `${k.sql} ${dirs[i]}`).join(', ');
  const seekAt = values ? seekWhere(keys, dirs, values) : null;
  const where = seekAt ? `${sql} AND ${seekAt.sql}` : sql;
  const keyColumns = keys.map((k, i) => `${k.sql} AS k${i}`).join(', ');
  // STRAIGHT_JOIN: read the organisation's outlooks in index order and stop at the page's end. Left to
  // itself the optimiser may start from a small enclosures table and sort every lamp of it. A view
  // narrowed by the status at most names the index of its order (other filters may do better by theirs).
  const ordered =
    onlyByStatus(query) || orderServesFilter(query)
      ? from.replace(/^FROM lamp_outlooks o\b/, `FROM lamp_outlooks o FORCE INDEX (${orderIndex(query)})`)
      : from;
  const pageSql = `SELECT STRAIGHT_JOIN o.lamp_id AS id, ${keyColumns} ${ordered} WHERE ${where} ORDER BY ${order} LIMIT :limit${
    values ? '' : ' OFFSET :offset'
  }`;
  const pageKeys = keys.map((_, i) => `p.k${i}`);
  return {
    pageSql,
    // The page's rows in the same round trip: the page is found by the index alone (rows skipped by an
    // OFFSET are never joined), then its few lamps are read by key and put in the page's order again.
    rowsSql: `SELECT ${LAMP_ROW_SQL.columns}, ${pageKeys.join(', ')}
       FROM (${pageSql}) p JOIN lamps l ON l.id = p.id ${LAMP_ROW_SQL.joins}
      ORDER BY ${pageKeys.map((k, i) => `${k} ${dirs[i]}`).join(', ')}`,
    countSql: `SELECT COUNT(*) AS n ${from} WHERE ${sql}`,
    replacements: { ...replacements, ...seekAt?.replacements, limit: query.limit, offset: query.offset },
    backwards,
    sought: Boolean(values),
    sortId: id,
  };
}

/** What a cursor is tied to: the sort, its direction and whether the due filter changed the keys. */
const sortId = (query: Pick<LampListFilter, 'sort' | 'descending' | 'due'>) =>
  `${query.sort}.${query.descending ? 'd' : 'a'}${query.sort === 'due' && query.due ? '.f' : ''}`;

/**
 * One page of an organisation's lamps with their summaries, the total matching, and the counts. The
 * caller has decided with `can()` whose lamps this user may see and passes `keeperId` for a keeper.
 */
export async function listLamps(query: LampListFilter) {
  const today = todayIso();
  const { rowsSql, countSql, replacements, backwards, sortId: sorted } = lampListSql(query, today);
  const scope = { organisationId: query.organisationId, keeperId: query.keeperId };
  // Views the counts rows answer (the plain list, a status) take their total from them; any other view
  // is counted by its own query, started beside them.
  const countable = onlyByStatus(query);
  const [found, counted, [counting]] = await Promise.all([
    selectRows<LampRowRaw & Record<string, unknown>>(rowsSql, replacements),
    countsOf(scope, today),
    countable ? Promise.resolve([null]) : selectRows<{ n: number | string }>(countSql, replacements),
  ]);
  const { counts } = counted;
  const total = totalFromCounts(query, counted.byRank) ?? Number(counting?.n ?? 0);
  const ids = backwards ? [...found].reverse() : found;
  const items = await lampRowsFrom(
    ids,
    ids.map((r) => r.id),
    today,
  );
  const keyCount = sortKeys(query).length;
  const cursorOf = (row: Record<string, unknown> | undefined) =>
    row
      ? encodeCursor(
          sorted,
          Array.from({ length: keyCount }, (_, i) => row[`k${i}`]),
        )
      : null;
  // Rows out of date are recomputed above for this page; the rest catch up behind the answer.
  if (counts.pending > 0) catchUpInBackground(query.organisationId, today);
  return {
    items,
    total,
    offset: query.offset,
    limit: query.limit,
    counts,
    /** Where the next page starts (after this page's last row) and the previous ends (before its first). */
    cursors: { next: cursorOf(ids.at(-1)), prev: cursorOf(ids[0]) },
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
