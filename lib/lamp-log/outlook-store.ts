import 'server-only';
import { Op, QueryTypes } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import { Enclosure, Lamp, LampOutlook, LampType } from '@/models';
import { setOutlookRefresher } from '@/models/outlook-invalidation';
import { todayIso } from './dates';
import { lampAgeDays } from './outlook';
import { STATUS_RANK } from './status';
import {
  computeOutlooks,
  lampRow,
  outlookJson,
  type LampRow,
  summaryJson,
  type Computed,
  type LampSummary,
  type StoredOutlook,
} from './store';

/**
 * Stored lamp outlooks: computing and writing them (when what they depend on changes, and once a day as
 * dates pass), and reading them back as the lamp summaries pages, reminders and the API show.
 *
 * Safe to run twice at once: a row is written only if it was computed from a newer lamp version than the
 * stored one, or the same version for the same or a later day; two runs over the same inputs write the
 * same values. The version is read before the inputs, so a change that lands mid-computation leaves the
 * row marked out of date rather than hiding it.
 */

/** Give the event loop a turn after this much computing, so other requests are never held up long. */
const SLICE_MS = 20;
/** Lamps loaded and written per round trip by the background passes. */
const BATCH = 100;

function yielder() {
  let since = performance.now();
  return async () => {
    if (performance.now() - since < SLICE_MS) return;
    await new Promise((resolve) => setImmediate(resolve));
    since = performance.now();
  };
}

const COLUMNS = [
  'lamp_id',
  'organisation_id',
  'label',
  'enclosure_name',
  'first_used_on',
  'status',
  'status_rank',
  'next_due_on',
  'test_due_on',
  'replace_due_on',
  'falls_below_on',
  'last_reading_at',
  'remaining_fraction',
  'outlook_json',
  'as_of',
  'source_version',
  'computed_at',
] as const;

/** The columns a newer computation may overwrite; the guard columns come last (see below). */
const DATA_COLUMNS = COLUMNS.filter((c) => !['lamp_id', 'as_of', 'source_version'].includes(c));

function rowOf(c: Computed, today: string, computedAt: Date): unknown[] {
  const o = c.outlook;
  const stored = outlookJson(c.species, o);
  const dues = [o.testDueOn, o.replaceDueOn].filter((d): d is string => Boolean(d)).sort();
  const active = o.status !== 'retired' && o.status !== 'heat-only';
  return [
    c.lamp.id,
    c.enclosure.organisationId,
    c.lamp.label,
    c.enclosure.name,
    c.lamp.firstUsedOn,
    o.status,
    STATUS_RANK[o.status],
    active ? (dues[0] ?? null) : null,
    o.testDueOn,
    o.replaceDueOn,
    o.fallsBelowOn,
    o.lastReading ? new Date(o.lastReading.takenAt) : null,
    o.status === 'heat-only' ? null : o.remainingFraction,
    JSON.stringify(stored),
    today,
    c.lamp.outlookVersion,
    computedAt,
  ];
}

/**
 * Writes computed outlooks. MariaDB applies ON DUPLICATE KEY assignments left to right, each seeing the
 * columns already assigned; so every data column is decided against the old `source_version` and
 * `as_of`, `as_of` next, and `source_version` last.
 */
export async function writeOutlooks(computed: Computed[], today: string): Promise<void> {
  if (computed.length === 0) return;
  const now = new Date();
  const newer =
    '(VALUES(source_version) > source_version OR (VALUES(source_version) = source_version AND VALUES(as_of) >= as_of))';
  const assignments = [
    ...DATA_COLUMNS.map((c) => `${c} = IF(${newer}, VALUES(${c}), ${c})`),
    `as_of = IF(${newer}, VALUES(as_of), as_of)`,
    'source_version = GREATEST(source_version, VALUES(source_version))',
  ];
  const placeholders = `(${COLUMNS.map(() => '?').join(', ')})`;
  const sql =
    `INSERT INTO lamp_outlooks (${COLUMNS.join(', ')}) VALUES ${computed.map(() => placeholders).join(', ')} ` +
    `ON DUPLICATE KEY UPDATE ${assignments.join(', ')}`;
  const replacements = computed.flatMap((c) => rowOf(c, today, now));
  await retryDeadlock(() => getSequelize().query(sql, { replacements }));
  // The lamps whose stored row is now of their current version wait no longer (migration 0022: a
  // trigger sets the flag when the version moves; a bump landing after this reads as waiting again).
  await retryDeadlock(() =>
    getSequelize().query(
      `UPDATE lamps l JOIN lamp_outlooks o ON o.lamp_id = l.id
          SET l.outlook_pending = (o.source_version <> l.outlook_version)
        WHERE l.id IN (:ids) AND l.outlook_pending = 1`,
      { replacements: { ids: computed.map((c) => c.lamp.id) } },
    ),
  );
}

/**
 * Two passes upserting the same rows can deadlock in InnoDB, the more so as every write of an
 * organisation's outlooks also updates its few counts rows (their triggers): the loser tries again.
 */
async function retryDeadlock(run: () => Promise<unknown>): Promise<void> {
  for (let attempt = 1; ; attempt++) {
    try {
      await run();
      return;
    } catch (e) {
      const errno = (e as { parent?: { errno?: number } }).parent?.errno;
      if (errno !== 1213 || attempt >= 8) throw e;
      await new Promise((resolve) => setTimeout(resolve, Math.random() * 20 * attempt));
    }
  }
}

/** Computes and stores the outlooks of these lamps for `today`. */
export async function refreshOutlooks(lampIds: readonly number[], today = todayIso()): Promise<number> {
  let done = 0;
  const next = yielder();
  for (let i = 0; i < lampIds.length; i += BATCH) {
    // Versions are read here, before computeOutlooks reads the readings and settings.
    const lamps = await Lamp.findAll({ where: { id: lampIds.slice(i, i + BATCH) } });
    const computed = await computeOutlooks(lamps, today, next);
    await writeOutlooks(computed, today);
    done += computed.length;
    await next();
  }
  return done;
}

setOutlookRefresher(async (ids) => {
  await refreshOutlooks(ids);
});

/** Lamps whose stored outlook is missing, of an older version, or computed before `today`. */
export async function staleLampIds(
  today: string,
  opts: { organisationId?: number; limit?: number } = {},
): Promise<number[]> {
  const rows = await getSequelize().query<{ id: number }>(
    `SELECT l.id FROM lamps l
       ${opts.organisationId ? 'JOIN enclosures e ON e.id = l.enclosure_id AND e.organisation_id = :org' : ''}
       LEFT JOIN lamp_outlooks o ON o.lamp_id = l.id
      WHERE o.lamp_id IS NULL OR o.source_version <> l.outlook_version OR o.as_of < :today
      ORDER BY l.id ${opts.limit ? 'LIMIT :limit' : ''}`,
    {
      replacements: { today, org: opts.organisationId ?? 0, limit: opts.limit ?? 0 },
      type: QueryTypes.SELECT,
    },
  );
  return rows.map((r) => r.id);
}

/**
 * Brings every stored outlook up to date: the daily pass (dates move on: "test soon" becomes due) and
 * the catch-up after start-up, a migration or a failed recompute. Runs in slices; safe to overlap.
 */
export async function refreshStaleOutlooks(today = todayIso()): Promise<number> {
  let total = 0;
  for (;;) {
    const ids = await staleLampIds(today, { limit: 1000 });
    if (ids.length === 0) return total;
    const done = await refreshOutlooks(ids, today);
    total += done;
    // Lamps deleted since they were listed are simply gone; never loop on them.
    if (done === 0) return total;
  }
}

type Holder = { running?: Map<number, Promise<unknown>> };
const holder = globalThis as unknown as { __baskwellOutlookCatchUp?: Holder };

/** Starts (at most one per organisation at a time) a background catch-up of its out-of-date rows. */
export function catchUpInBackground(organisationId: number, today = todayIso()): void {
  holder.__baskwellOutlookCatchUp ??= {};
  const running = (holder.__baskwellOutlookCatchUp.running ??= new Map());
  if (running.has(organisationId)) return;
  const run = (async () => {
    for (;;) {
      const ids = await staleLampIds(today, { organisationId, limit: 500 });
      if (ids.length === 0 || (await refreshOutlooks(ids, today)) === 0) return;
    }
  })()
    .catch((e: unknown) => console.error('lamp outlook: catch-up failed', e instanceof Error ? e.message : e))
    .finally(() => running.delete(organisationId));
  running.set(organisationId, run);
}

export type LampWithOutlook = Lamp & {
  enclosure: Enclosure;
  lampType: LampType;
  outlook: LampOutlook | null;
};

/** The include that loads a lamp with everything its summary shows, in the same query. */
export const SUMMARY_INCLUDE = [
  { model: Enclosure, as: 'enclosure', required: true },
  { model: LampType, as: 'lampType', required: true },
  { model: LampOutlook, as: 'outlook', required: false },
];

const isCurrent = (l: LampWithOutlook, today: string) =>
  Boolean(l.outlook && l.outlook.sourceVersion === l.outlookVersion && l.outlook.asOf === today);

/**
 * Summaries of lamps loaded with SUMMARY_INCLUDE, in their order. A lamp whose stored outlook is out of
 * date is recomputed here (a page shows a bounded number of lamps) and stored, so what a page shows is
 * never older than its last change; `recomputed` counts how many needed it.
 */
export async function summariesOf(
  lamps: LampWithOutlook[],
  today = todayIso(),
): Promise<{ items: LampSummary[]; recomputed: number }> {
  const stale = lamps.filter((l) => !isCurrent(l, today));
  const fresh = new Map<number, Computed>();
  if (stale.length > 0) {
    // In slices, as the background passes do: a page of stale lamps never holds the event loop long.
    const computed = await computeOutlooks(stale, today, yielder());
    await writeOutlooks(computed, today);
    for (const c of computed) fresh.set(c.lamp.id, c);
  }
  const items = lamps.map((l) => {
    const c = fresh.get(l.id);
    const stored: StoredOutlook = c
      ? outlookJson(c.species, c.outlook)
      : (JSON.parse(l.outlook!.outlookJson) as StoredOutlook);
    return summaryJson(l, lampTypeDto(l.lampType), l.enclosure, stored, today);
  });
  return { items, recomputed: stale.length };
}

/** Summaries of these lamps (any order of ids), read from the stored outlooks. */
export async function summarise(lamps: Lamp[], today = todayIso()): Promise<LampSummary[]> {
  if (lamps.length === 0) return [];
  const loaded = (await Lamp.findAll({
    where: { id: { [Op.in]: lamps.map((l) => l.id) } },
    include: SUMMARY_INCLUDE,
  })) as LampWithOutlook[];
  const byId = new Map(loaded.map((l) => [l.id, l]));
  const ordered = lamps.map((l) => byId.get(l.id)).filter((l): l is LampWithOutlook => Boolean(l));
  return (await summariesOf(ordered, today)).items;
}

type RawRow = {
  id: number;
  label: string;
  firstUsedOn: string;
  retiredOn: string | null;
  hoursPerDay: number;
  version: number;
  enclosureId: number;
  enclosureName: string;
  keeperId: number;
  speciesName: string | null;
  typeName: string;
  tech: LampRow['lampType']['tech'];
  outlookJson: string | null;
  sourceVersion: number | null;
  asOf: string | null;
};

/**
 * Table rows of these lamps, in the order of `ids`: one plain query of the columns a row shows (no
 * model instances, no lamp type's curves parsed), since a list page asks for a page of them on every
 * view. A lamp whose stored outlook is out of date goes through summariesOf instead (recomputed and
 * stored), so a row is never older than the lamp's last change.
 */
export async function lampRowsOf(ids: readonly number[], today = todayIso()): Promise<LampRow[]> {
  if (ids.length === 0) return [];
  const raw = await getSequelize().query<RawRow>(
    `SELECT l.id, l.label, DATE_FORMAT(l.first_used_on, '%Y-%m-%d') AS firstUsedOn,
            DATE_FORMAT(l.retired_on, '%Y-%m-%d') AS retiredOn, l.hours_per_day AS hoursPerDay,
            l.outlook_version AS version, e.id AS enclosureId, e.name AS enclosureName,
            e.keeper_id AS keeperId, e.species_name AS speciesName, t.name AS typeName, t.tech,
            o.outlook_json AS outlookJson, o.source_version AS sourceVersion,
            DATE_FORMAT(o.as_of, '%Y-%m-%d') AS asOf
       FROM lamps l JOIN enclosures e ON e.id = l.enclosure_id JOIN lamp_types t ON t.id = l.lamp_type_id
       LEFT JOIN lamp_outlooks o ON o.lamp_id = l.id
      WHERE l.id IN (:ids)`,
    { replacements: { ids: [...ids] }, type: QueryTypes.SELECT },
  );
  const rows = new Map<number, LampRow>();
  const stale: number[] = [];
  for (const r of raw) {
    if (r.outlookJson === null || Number(r.sourceVersion) !== Number(r.version) || r.asOf !== today) {
      stale.push(r.id);
      continue;
    }
    const stored = JSON.parse(r.outlookJson) as StoredOutlook;
    rows.set(
      r.id,
      lampRow({
        ...stored,
        id: r.id,
        label: r.label,
        ageDays: lampAgeDays({ firstUsedOn: r.firstUsedOn, retiredOn: r.retiredOn }, today),
        hoursPerDay: r.hoursPerDay,
        lampType: { name: r.typeName, tech: r.tech },
        enclosure: {
          id: r.enclosureId,
          name: r.enclosureName,
          keeperId: r.keeperId,
          speciesName: r.speciesName,
        },
      }),
    );
  }
  if (stale.length > 0) {
    const lamps = (await Lamp.findAll({
      where: { id: stale },
      include: SUMMARY_INCLUDE,
    })) as LampWithOutlook[];
    for (const s of (await summariesOf(lamps, today)).items) rows.set(s.id, lampRow(s));
  }
  return ids.map((id) => rows.get(id)).filter((r): r is LampRow => Boolean(r));
}
