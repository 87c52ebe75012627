import 'server-only';
import { Op } from 'sequelize';
import { afterCursor } from '@/lib/api/pagination';
import { selectRows } from '@/lib/db';
import { runEngineTask, type EngineTaskResult, type RunOptions } from '@/lib/engine-pool';
import { toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { readStoredDesign } from '@/lib/variants/stored-design';
import { Design, Enclosure, Lamp, LampOutlook, LampType, Reading, User, Variant } from '@/models';
import type { LampObject } from '@/simulation';
import type { ReadingThrough, ReadingWarmedUp } from '@/shared/reading-setup';
import type { LampWithEnclosure } from './access';
import type { Calibration } from './calibrate';
import { DAYS_PER_MONTH, todayIso } from './dates';
import { lampFacts, readingFacts } from './facts';
import { lampAgeDays } from './outlook';
import {
  computeOutlooks,
  loadFor,
  outlookJson,
  speciesForEnclosures,
  writeOutlooks,
  yielder,
  type Computed,
  type StoredOutlook,
} from './stored-outlooks';

/** Reads of the lamp log and the JSON they answer with. Callers check permissions first (access.ts). */

export type LampSummary = ReturnType<typeof summaryJson>;

/** The lamp's own fields, its enclosure and type, and its age today: read live on every view. */
export function lampJson(lamp: Lamp, type: LampTypeDto, enclosure: Enclosure, today: string) {
  const ageDays = lampAgeDays({ firstUsedOn: lamp.firstUsedOn, retiredOn: lamp.retiredOn ?? null }, today);
  return {
    id: lamp.id,
    label: lamp.label,
    enclosure: {
      id: enclosure.id,
      name: enclosure.name,
      keeperId: enclosure.keeperId,
      speciesName: enclosure.speciesName,
    },
    lampType: { id: type.id, name: type.name, tech: type.tech, form: type.form, lengthCm: type.lengthCm },
    designObjectId: lamp.designObjectId ?? null,
    firstUsedOn: lamp.firstUsedOn,
    hoursPerDay: lamp.hoursPerDay,
    baskingDistanceCm: lamp.baskingDistanceCm ?? null,
    baskingTransmission: lamp.baskingTransmission ?? null,
    retiredOn: lamp.retiredOn ?? null,
    notes: lamp.notes ?? null,
    ageDays,
    ageMonths: Math.round((ageDays / DAYS_PER_MONTH) * 10) / 10,
  };
}

/** A lamp's summary: its live fields and its stored (or just computed) outlook. */
export function summaryJson(
  lamp: Lamp,
  type: LampTypeDto,
  enclosure: Enclosure,
  stored: StoredOutlook,
  today: string,
) {
  return { ...lampJson(lamp, type, enclosure, today), ...stored };
}

/**
 * What a lamp table row shows, and nothing more: a list page sends every row twice (as HTML and as the
 * data the table hydrates from), so the whole outlook — its fit, figures, every reason — stays on the
 * lamp's own page.
 */
export type LampRowSource = Pick<LampSummary, 'id' | 'label' | 'ageDays' | 'hoursPerDay'> & {
  lampType: Pick<LampSummary['lampType'], 'name' | 'tech'>;
  enclosure: LampSummary['enclosure'];
} & Pick<
    StoredOutlook,
    | 'lastReading'
    | 'remainingFraction'
    | 'fit'
    | 'fallsBelowOn'
    | 'fallsBelowEarliestOn'
    | 'basking'
    | 'missing'
    | 'status'
    | 'statusLabel'
    | 'reasons'
  >;

export function lampRow(s: LampRowSource) {
  return {
    id: s.id,
    label: s.label,
    lampType: { name: s.lampType.name, tech: s.lampType.tech },
    enclosure: {
      id: s.enclosure.id,
      name: s.enclosure.name,
      keeperId: s.enclosure.keeperId,
      speciesName: s.enclosure.speciesName,
    },
    ageDays: s.ageDays,
    hoursPerDay: s.hoursPerDay,
    lastReading: s.lastReading
      ? {
          value: s.lastReading.value,
          unit: s.lastReading.unit,
          distanceCm: s.lastReading.distanceCm,
          takenAt: s.lastReading.takenAt,
        }
      : null,
    remainingFraction: s.remainingFraction,
    fit: { kind: s.fit.kind, certainty: s.fit.certainty },
    fallsBelowOn: s.fallsBelowOn,
    fallsBelowEarliestOn: s.fallsBelowEarliestOn,
    /** Whether the basking zone could be judged (when no date is given: "not within 5 years"). */
    judged: Boolean(s.basking),
    missing: s.missing,
    status: s.status,
    statusLabel: s.statusLabel,
    /** The first reason for the status: the one the table shows. */
    reason: s.reasons[0] ?? null,
  };
}

export type LampRow = ReturnType<typeof lampRow>;

/** Summaries computed from scratch, as every page did before outlooks were stored: the reference. */
export async function summariseLive(lamps: Lamp[], today: string): Promise<LampSummary[]> {
  return (await computeOutlooks(lamps, today)).map((c) =>
    summaryJson(c.lamp, c.type, c.enclosure, outlookJson(c.species, c.outlook), today),
  );
}

export async function lampsOfEnclosure(enclosureId: number, opts: { cursor?: number; limit: number }) {
  return Lamp.findAll({
    where: { enclosureId, ...(opts.cursor ? { id: { [Op.gt]: opts.cursor } } : {}) },
    order: [['id', 'ASC']],
    limit: opts.limit + 1,
  });
}

/** A lamp's readings, oldest first, from after `cursor` (one more than `limit`, for page()). */
export async function readingsOf(
  lampId: number,
  opts: { cursor?: number; limit: number },
): Promise<Reading[]> {
  return Reading.findAll({
    where: { lampId, ...afterCursor(opts.cursor) },
    order: [['id', 'ASC']],
    limit: opts.limit + 1,
  });
}

export function readingJson(r: Reading & { takenBy?: User | null }) {
  return {
    id: r.id,
    lampId: r.lampId,
    takenAt: r.takenAt.toISOString(),
    distanceCm: r.distanceCm,
    value: r.value,
    unit: r.unit,
    through: r.through as ReadingThrough,
    throughTransmission: r.throughTransmission ?? null,
    warmedUp: r.warmedUp as ReadingWarmedUp,
    meter: r.meter ?? null,
    note: r.note ?? null,
    takenById: r.takenById,
    uploadId: r.uploadId ?? null,
  };
}

type Fitted = EngineTaskResult<'lampChart'>;

/**
 * A lamp's fitted chart for one version of what it is computed from and one day: everything it depends
 * on (its readings and settings, its lamp type, its enclosure's species and sheet) adds one to
 * `outlook_version` when it changes (models/outlook-invalidation.ts), so a page viewed again that day,
 * unchanged, reuses the fit instead of queueing another on the engine's threads. Bounded; per process.
 */
const charts = new Map<string, Fitted>();
const CHART_CACHE_SIZE = 500;

/**
 * One lamp with its readings and what the chart draws: points at 30 cm, the fitted curve and its band.
 * The fit runs on an engine worker thread: its cost grows with the lamp's readings, and a page view must
 * not hold up anyone else's request.
 */
export async function lampDetail(lamp: Lamp, today: string, options?: RunOptions) {
  const [loaded] = await loadFor([lamp]);
  const { type, enclosure, readings } = loaded!;
  const species = (await speciesForEnclosures([enclosure])).get(enclosure.id)!;
  const key = `${lamp.id}:${lamp.outlookVersion}:${today}`;
  let fitted = charts.get(key);
  if (!fitted) {
    fitted = await runEngineTask(
      'lampChart',
      { facts: lampFacts(lamp, type), readings: readings.map(readingFacts), need: species.need, today },
      options,
    );
    charts.set(key, fitted);
    // Oldest first out: a Map keeps its insertion order.
    if (charts.size > CHART_CACHE_SIZE) charts.delete(charts.keys().next().value!);
  }
  const { outlook: o, curve, needAt30 } = fitted;
  return {
    lamp: summaryJson(lamp, type, enclosure, outlookJson(species, o), today),
    readings: readings.map(readingJson),
    chart: {
      unit: o.unit,
      firstUsedOn: lamp.firstUsedOn,
      todayDays: o.ageDays,
      points: o.points.map((p) => ({ ...p })),
      curve,
      needAt30,
      needLabel: o.basking?.needLabel ?? null,
      certainty: o.fit.certainty,
    },
  };
}

export type LampDetail = Awaited<ReturnType<typeof lampDetail>>;

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

/** A lamp's table row as the database gives it (LAMP_ROW_SQL's columns). */
export type LampRowRaw = {
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
 * The columns of a lamp's table row and the tables they come from, the lamp `l` with its enclosure,
 * type and stored outlook; the caller adds the WHERE clause (or joins the lamps it has chosen first).
 */
export const LAMP_ROW_SQL = {
  columns: `l.id, l.label, DATE_FORMAT(l.first_used_on, '%Y-%m-%d') AS firstUsedOn,
            DATE_FORMAT(l.retired_on, '%Y-%m-%d') AS retiredOn, l.hours_per_day AS hoursPerDay,
            l.outlook_version AS version, e.id AS enclosureId, e.name AS enclosureName,
            e.keeper_id AS keeperId, e.species_name AS speciesName, t.name AS typeName, t.tech,
            o.outlook_json AS outlookJson, o.source_version AS sourceVersion,
            DATE_FORMAT(o.as_of, '%Y-%m-%d') AS asOf`,
  joins: `JOIN enclosures e ON e.id = l.enclosure_id JOIN lamp_types t ON t.id = l.lamp_type_id
       LEFT JOIN lamp_outlooks o ON o.lamp_id = l.id`,
};

/**
 * Table rows of these lamps, in the order of `ids`: one plain query of the columns a row shows (no
 * model instances, no lamp type's curves parsed), since a list page asks for a page of them on every
 * view. A lamp whose stored outlook is out of date goes through summariesOf instead (recomputed and
 * stored), so a row is never older than the lamp's last change.
 */
export async function lampRowsOf(ids: readonly number[], today = todayIso()): Promise<LampRow[]> {
  if (ids.length === 0) return [];
  const raw = await selectRows<LampRowRaw>(
    `SELECT ${LAMP_ROW_SQL.columns} FROM lamps l ${LAMP_ROW_SQL.joins} WHERE l.id IN (:ids)`,
    { ids: [...ids] },
  );
  return lampRowsFrom(raw, ids, today);
}

/** Table rows, in the order of `ids`, from rows read with LAMP_ROW_SQL (see lampRowsOf). */
export async function lampRowsFrom(
  raw: readonly LampRowRaw[],
  ids: readonly number[],
  today: string,
): Promise<LampRow[]> {
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

/**
 * Calibration of a logged lamp against the design lamp it is (the object whose id is the lamp's
 * `designObjectId`), in every variant of the enclosure's designs that has it.
 */

export type CalibrationTarget = {
  variant: { id: number; name: string; version: number; designId: number; designName: string };
  object: LampObject;
  calibration: Calibration;
};

export async function calibrationTargets(lamp: LampWithEnclosure): Promise<CalibrationTarget[]> {
  if (!lamp.designObjectId) return [];
  const [type, readings, designs] = await Promise.all([
    LampType.findByPk(lamp.lampTypeId),
    Reading.findAll({ where: { lampId: lamp.id }, order: [['takenAt', 'ASC']] }),
    Design.findAll({ where: { enclosureId: lamp.enclosureId }, attributes: ['id', 'name'] }),
  ]);
  if (!type || designs.length === 0) return [];
  const facts = lampFacts(lamp, lampTypeDto(type));
  const variants = await Variant.findAll({
    where: { designId: designs.map((d) => d.id) },
    order: [['id', 'ASC']],
  });
  const names = new Map(designs.map((d) => [d.id, d.name]));
  const found: Omit<CalibrationTarget, 'calibration'>[] = [];
  for (const v of variants) {
    const design = readStoredDesign(v.designJson);
    const object = design.objects.find((o) => o.type === 'lamp' && o.id === lamp.designObjectId);
    if (!object || object.type !== 'lamp') continue;
    found.push({
      variant: {
        id: v.id,
        name: v.name,
        version: v.version,
        designId: v.designId,
        designName: names.get(v.designId) ?? '',
      },
      object,
    });
  }
  if (found.length === 0) return [];
  // The fits run on an engine worker thread: their cost grows with the lamp's readings.
  const calibrations = await runEngineTask('calibrations', {
    lamp: facts,
    readings: readings.map(readingFacts),
    objects: found.map((t) => t.object),
    today: todayIso(),
  });
  return found.map((t, i) => ({ ...t, calibration: calibrations[i]! }));
}

export async function calibrationProposal(lamp: LampWithEnclosure) {
  const list = await calibrationTargets(lamp);
  return {
    designObjectId: lamp.designObjectId ?? null,
    hint: !lamp.designObjectId
      ? 'Link this lamp to its lamp in a design (the design lamp’s id) to calibrate it.'
      : list.length === 0
        ? `No design of this enclosure has a lamp with the id “${lamp.designObjectId}”.`
        : null,
    targets: list,
  };
}
