import 'server-only';
import { Op, fn, col, where as sqlWhere } from 'sequelize';
import { afterCursor } from '@/lib/api/pagination';
import { runEngineTask, type EngineTaskResult, type RunOptions } from '@/lib/engine-pool';
import { toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { Enclosure, Lamp, LampType, Reading, SpeciesSheet, User } from '@/models';
import { DAYS_PER_MONTH } from './dates';
import {
  lampAgeDays,
  lampOutlook,
  STATUS_LABEL,
  type LampFacts,
  type Outlook,
  type ReadingFacts,
} from './outlook';
import type { SpeciesNeed } from './need';
import type { ReadingThrough, ReadingWarmedUp } from '@/shared/reading-setup';

/** Database access and JSON views of the lamp log. Callers check permissions first (access.ts). */

export type LampFactsSource = Pick<
  Lamp,
  'id' | 'label' | 'firstUsedOn' | 'hoursPerDay' | 'retiredOn' | 'baskingDistanceCm' | 'baskingTransmission'
>;

export function lampFacts(lamp: LampFactsSource, type: LampTypeDto): LampFacts {
  return {
    id: lamp.id,
    label: lamp.label,
    firstUsedOn: lamp.firstUsedOn,
    hoursPerDay: lamp.hoursPerDay,
    retiredOn: lamp.retiredOn ?? null,
    baskingDistanceCm: lamp.baskingDistanceCm ?? null,
    baskingTransmission: lamp.baskingTransmission ?? null,
    type: {
      name: type.name,
      tech: type.tech,
      form: type.form,
      lengthCm: type.lengthCm,
      uvbAt30: type.uvbAt30,
      uviPerUvb: type.uviPerUvb,
      halfLifeMonths: type.halfLifeMonths,
      decayPoints: type.decayPoints,
      adoptedCurve: type.adoptedCurve ?? null,
      replaceAfterMonths: type.replaceAfterMonths,
    },
  };
}

/** A stored reading (of the lamp log, or taken at the counter: the same fields) as the outlook takes it. */
export const readingFacts = (
  r: Pick<
    Reading,
    'id' | 'takenAt' | 'distanceCm' | 'value' | 'unit' | 'through' | 'throughTransmission' | 'warmedUp'
  >,
): ReadingFacts => ({
  id: r.id,
  takenAt: r.takenAt,
  distanceCm: r.distanceCm,
  value: r.value,
  unit: r.unit,
  through: r.through,
  throughTransmission: r.throughTransmission ?? null,
  warmedUp: r.warmedUp,
});

/** What a species sheet asks of a lamp's basking zone, as the outlook takes it. */
export function needOfSheet(sheet: SpeciesSheet): SpeciesNeed {
  return {
    name: sheet.commonName,
    uvZone: sheet.uvZone,
    uvbTargetUw:
      sheet.uvbTargetMinUw !== null && sheet.uvbTargetMaxUw !== null
        ? { min: sheet.uvbTargetMinUw, max: sheet.uvbTargetMaxUw }
        : null,
    photoperiodH:
      sheet.photoperiodMinH !== null && sheet.photoperiodMaxH !== null
        ? { min: sheet.photoperiodMinH, max: sheet.photoperiodMaxH }
        : null,
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

export type LampSummary = ReturnType<typeof summaryJson>;
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
 * give the event loop a turn (outlook-store.ts does).
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
