import 'server-only';
import { Op, QueryTypes, col, fn, where as sqlWhere } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { Enclosure, Lamp, LampType, Reading, SpeciesSheet } from '@/models';
import { setOutlookRefresher } from '@/models/outlook-invalidation';
import { todayIso } from './dates';
import { lampFacts, needOfSheet, readingFacts } from './facts';
import type { SpeciesNeed } from './need';
import { lampOutlook, STATUS_LABEL, type Outlook } from './outlook';
import { STATUS_RANK } from './status';

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

export function yielder() {
  let since = performance.now();
  return async () => {
    if (performance.now() - since < SLICE_MS) return;
    await new Promise((resolve) => setImmediate(resolve));
    since = performance.now();
  };
}

export type SpeciesMatch =
  { ok: true; need: SpeciesNeed; sheetId: number } | { ok: false; missing: string; need: null };

/** The enclosure's species sheet: its species name matched to a sheet's common or scientific name. */
export async function speciesForEnclosures(enclosures: Enclosure[]): Promise<Map<number, SpeciesMatch>> {
  const out = new Map<number, SpeciesMatch>();
  const byOrg = new Map<number, Set<string>>();
  for (const e of enclosures) {
    const name = e.speciesName?.trim().toLowerCase();
    if (name)
      (byOrg.get(e.organisationId) ?? byOrg.set(e.organisationId, new Set()).get(e.organisationId)!).add(
        name,
      );
  }
  const sheets: SpeciesSheet[] = [];
  for (const [organisationId, names] of byOrg) {
    const list = [...names];
    sheets.push(
      ...(await SpeciesSheet.findAll({
        where: {
          organisationId,
          [Op.or]: [
            sqlWhere(fn('LOWER', col('common_name')), { [Op.in]: list }),
            sqlWhere(fn('LOWER', col('scientific_name')), { [Op.in]: list }),
          ],
        },
        order: [['id', 'ASC']],
      })),
    );
  }
  for (const e of enclosures) {
    const name = e.speciesName?.trim();
    if (!name) {
      out.set(e.id, {
        ok: false,
        missing: 'the species of this enclosure (set it on the enclosure)',
        need: null,
      });
      continue;
    }
    const lower = name.toLowerCase();
    const sheet = sheets.find(
      (s) =>
        s.organisationId === e.organisationId &&
        (s.commonName.toLowerCase() === lower || s.scientificName.toLowerCase() === lower),
    );
    out.set(
      e.id,
      sheet
        ? {
            ok: true,
            sheetId: sheet.id,
            need: needOfSheet(sheet),
          }
        : {
            ok: false,
            missing: `a species sheet named “${name}” (add one, or fix the enclosure’s species)`,
            need: null,
          },
    );
  }
  return out;
}

/** The part of a lamp's summary that comes from its outlook: what `lamp_outlooks` stores. */
export type StoredOutlook = ReturnType<typeof outlookJson>;

function fitJson(o: Outlook) {
  const f = o.fit;
  return {
    kind: f.kind,
    certainty: f.certainty,
    note: f.note,
    n: f.n,
    e0:
      f.kind === 'exponential' || f.kind === 'two-phase'
        ? f.e0
        : f.kind === 'default-scaled'
          ? f.scale
          : null,
    tauDays: f.kind === 'exponential' ? f.tauDays : null,
    e0Se: f.kind === 'exponential' ? f.e0Se : null,
    tauSe: f.kind === 'exponential' ? f.tauSe : null,
    rmsLog: f.kind === 'exponential' || f.kind === 'two-phase' ? f.rmsLog : null,
  };
}

export function outlookJson(species: SpeciesMatch, o: Outlook) {
  const missing = [...o.missing];
  if (!species.ok) {
    const i = missing.indexOf('a species sheet for this enclosure');
    if (i >= 0) missing[i] = species.missing;
  }
  return {
    species: species.ok
      ? { sheetId: species.sheetId, name: species.need.name, uvZone: species.need.uvZone }
      : null,
    unit: o.unit,
    lastReading: o.lastReading,
    burnIn: o.burnIn,
    readingNotes: o.readingNotes,
    ageing: o.ageing,
    remainingFraction: o.remainingFraction,
    nowAt30: o.nowAt30,
    basking: o.basking,
    missing,
    fallsBelowOn: o.fallsBelowOn,
    fallsBelowEarliestOn: o.fallsBelowEarliestOn,
    photoperiod: o.photoperiod,
    testDueOn: o.testDueOn,
    replaceDueOn: o.replaceDueOn,
    replaceBasis: o.replaceBasis,
    status: o.status,
    statusLabel: STATUS_LABEL[o.status],
    reasons: o.reasons,
    fit: fitJson(o),
  };
}

export type Loaded = { lamp: Lamp; type: LampTypeDto; enclosure: Enclosure; readings: Reading[] };

/** Loads what outlooks are computed from, for many lamps in a fixed number of queries. */
export async function loadFor(lamps: Lamp[]): Promise<Loaded[]> {
  if (lamps.length === 0) return [];
  const ids = lamps.map((l) => l.id);
  const [types, readings, enclosures] = await Promise.all([
    LampType.findAll({ where: { id: [...new Set(lamps.map((l) => l.lampTypeId))] } }),
    Reading.findAll({
      where: { lampId: ids },
      order: [
        ['takenAt', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    Enclosure.findAll({ where: { id: [...new Set(lamps.map((l) => l.enclosureId))] } }),
  ]);
  const typeById = new Map(types.map((t) => [t.id, lampTypeDto(t)]));
  const encById = new Map(enclosures.map((e) => [e.id, e]));
  const readingsByLamp = new Map<number, Reading[]>();
  for (const r of readings)
    (readingsByLamp.get(r.lampId) ?? readingsByLamp.set(r.lampId, []).get(r.lampId)!).push(r);
  return lamps.map((lamp) => ({
    lamp,
    type: typeById.get(lamp.lampTypeId)!,
    enclosure: encById.get(lamp.enclosureId)!,
    readings: readingsByLamp.get(lamp.id) ?? [],
  }));
}

export type Computed = Loaded & { species: SpeciesMatch; outlook: Outlook };

/**
 * Computes outlooks from the database's current rows. `onEach` runs after each lamp, so a long run can
 * give the event loop a turn (the passes below do).
 */
export async function computeOutlooks(
  lamps: Lamp[],
  today: string,
  onEach?: () => Promise<void> | void,
): Promise<Computed[]> {
  const loaded = await loadFor(lamps);
  const species = await speciesForEnclosures([
    ...new Map(loaded.map((l) => [l.enclosure.id, l.enclosure])).values(),
  ]);
  const out: Computed[] = [];
  for (const l of loaded) {
    const match = species.get(l.enclosure.id)!;
    const o = lampOutlook(lampFacts(l.lamp, l.type), l.readings.map(readingFacts), match.need, today);
    out.push({ ...l, species: match, outlook: o });
    await onEach?.();
  }
  return out;
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
