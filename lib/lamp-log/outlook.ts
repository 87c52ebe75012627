import type { ReadingUnit } from '@/models/reading';
import type { ReadingSetup, ReadingThrough } from '@/shared/reading-setup';
import { baselineDueOn, inBurnIn } from './burn-in';
import { addDays, dayNumber, DAYS_PER_MONTH, isoDay } from './dates';
import { LAMP_LIFETIME, ORDINARY_HOURS_PER_DAY, type LampTech } from '@/simulation';
import { ageingSource, defaultDecayFor, type DecaySource } from './decay';
import { band, firstDayBelow, fitDecay, predict, type DecayFit } from './fit';
import { distanceFactor, REFERENCE_CM, toBareReference, toReference, type LampShape } from './geometry';
import { baskingNeed, pairedRatio, type SpeciesNeed } from './need';
import { photoperiodAdvice } from './photoperiod';
import { newLampAtSpot, newOutputAt30 } from './replacement';
import type { Status } from './status';

/**
 * Everything the lamp log says about one installed lamp: its age, its readings brought to 30 cm, the
 * fitted decay, when the basking zone will fall below the species' need, when it is next due for a test
 * or a replacement, and a status. Pure: the caller loads the rows and passes "today".
 */

/** How often to test a lamp with a meter, days: the technology's test interval (the engine's lifetime table). */
export function testIntervalDays(tech: LampTech): number {
  return Math.round((LAMP_LIFETIME[tech].testMonths ?? DEFAULT_TEST_MONTHS) * DAYS_PER_MONTH);
}
/** A lamp of a heat-only technology that shows UV readings is tested like a UV lamp (common practice). */
const DEFAULT_TEST_MONTHS = 3;
/** Say "test soon" / "replace" this many days ahead of the date. */
export const SOON_DAYS = 14;
/** Look this far ahead for the day the basking zone falls below the need. */
export const HORIZON_DAYS = 5 * 365;

export type LampFacts = {
  id: number;
  label: string;
  firstUsedOn: string;
  hoursPerDay: number;
  retiredOn: string | null;
  baskingDistanceCm: number | null;
  baskingTransmission: number | null;
  type: DecaySource &
    LampShape & { name: string; uvbAt30: number; uviPerUvb: number; replaceAfterMonths: number | null };
};

/** One reading; a reading without its set-up (`through`, `warmedUp`) is one that did not record it. */
export type ReadingFacts = {
  id?: number;
  takenAt: Date | string;
  distanceCm: number;
  value: number;
  unit: ReadingUnit;
} & Partial<ReadingSetup>;

export { STATUS_LABEL, type Status } from './status';

/**
 * How a reading enters the fit: `fit` (a working-life reading), `burn-in` (shown, fitted apart: it
 * would drag the start upward), `excluded` (cannot be brought to the bare lamp; `why` says so).
 */
export type PointUse = 'fit' | 'burn-in' | 'excluded';

export type NormalisedPoint = {
  id?: number;
  days: number;
  takenAt: string;
  /** The bare lamp at 30 cm (an excluded reading: brought to 30 cm only, for the chart). */
  value: number;
  raw: number;
  distanceCm: number;
  through: ReadingThrough;
  /** The set-up was not recorded, so the reading was read as a bare lamp. */
  assumedBare: boolean;
  use: PointUse;
  why: string | null;
};

export type Outlook = {
  ageDays: number;
  ageMonths: number;
  unit: ReadingUnit | null;
  points: NormalisedPoint[];
  fit: DecayFit;
  lastReading: { takenAt: string; value: number; unit: ReadingUnit; distanceCm: number } | null;
  /** The day the burn-in ends and the baseline reading is due, and whether one has been taken since. */
  burnIn: { baselineOn: string; baselineTaken: boolean; inBurnIn: boolean };
  /** Which curve the lamp ages by, in words: the catalogue's, or the shop's measured curve when adopted. */
  ageing: string;
  /** What the page should say about how the readings were used (assumed bare, burn-in, excluded). */
  readingNotes: string[];
  /** Share of the new lamp's output left today (fitted, else the catalogue curve). */
  remainingFraction: number;
  /** Fitted output today at 30 cm, in `unit`; null without readings. */
  nowAt30: number | null;
  basking: {
    distanceCm: number;
    distanceFrom: 'lamp' | 'latest reading';
    transmission: number;
    valueNow: number;
    threshold: number;
    /** The top of the zone's basking range, in the same unit; its UV Index in `ceilingUvi`. */
    ceiling: number;
    ceilingUvi: number;
    needLabel: string;
    /** What the verdict is judged by (always the zone's UV Index). */
    judgedBy: string;
    /** The sheet's µW/cm² range as a shop's rule of thumb, for reference only. */
    ruleOfThumb: string | null;
    cautions: string[];
  } | null;
  /** The lamp's hours a day against the sheet's day length; null when either is unknown or it fits. */
  photoperiod: string | null;
  /** What is missing to say when the basking zone falls below the need. */
  missing: string[];
  fallsBelowOn: string | null;
  /** The same date for the lower edge of the 95 % band: "could be as early as". */
  fallsBelowEarliestOn: string | null;
  testDueOn: string | null;
  replaceDueOn: string | null;
  replaceBasis: 'readings' | 'typical interval' | null;
  status: Status;
  reasons: string[];
};

/** Which unit to fit: the one with more readings; broadband µW/cm² on a tie. */
export function mainUnit(readings: readonly ReadingFacts[]): ReadingUnit | null {
  const uvb = readings.filter((r) => r.unit === 'uvb').length;
  const uvi = readings.length - uvb;
  if (readings.length === 0) return null;
  return uvb >= uvi ? 'uvb' : 'uvi';
}

export function normalise(
  lamp: LampFacts,
  readings: readonly ReadingFacts[],
  unit: ReadingUnit,
): NormalisedPoint[] {
  const start = dayNumber(lamp.firstUsedOn);
  return readings
    .filter((r) => r.unit === unit && r.distanceCm > 0)
    .map((r): NormalisedPoint => {
      const takenAt = typeof r.takenAt === 'string' ? r.takenAt : r.takenAt.toISOString();
      const days = dayNumber(r.takenAt) - start;
      const ref = toBareReference(lamp.type, r);
      const common = {
        ...(r.id !== undefined ? { id: r.id } : {}),
        days,
        takenAt,
        raw: r.value,
        distanceCm: r.distanceCm,
        through: r.through ?? 'not-recorded',
      };
      if (!ref.ok) {
        return {
          ...common,
          value: toReference(lamp.type, r.value, r.distanceCm),
          assumedBare: false,
          use: 'excluded',
          why: ref.reason,
        };
      }
      const burnIn = inBurnIn(days, lamp.hoursPerDay);
      return {
        ...common,
        value: ref.value,
        assumedBare: ref.assumedBare,
        use: burnIn ? 'burn-in' : 'fit',
        why: burnIn ? 'taken during burn-in: shown, fitted apart' : null,
      };
    })
    .sort((a, b) => a.days - b.days);
}

/**
 * The decay fit of the working-life readings. Burn-in readings are left out (a new lamp reads high and
 * would lift the fitted start); only while there are no others is the usual curve scaled to them, and
 * said to be so.
 */
function fitPoints(points: readonly NormalisedPoint[], decay: (d: number) => number): DecayFit {
  const of = (use: PointUse) =>
    points.filter((p) => p.use === use).map((p) => ({ days: p.days, value: p.value }));
  const working = of('fit');
  if (working.length > 0) return fitDecay(working, decay);
  const burnIn = of('burn-in');
  if (burnIn.length === 0) return fitDecay([], decay);
  const fit = fitDecay(burnIn, decay);
  if (fit.kind === 'none') return fit;
  return {
    ...fit,
    certainty: 'uncertain',
    note: 'Only burn-in readings so far: the curve is scaled to them and reads high until the baseline reading.',
  };
}

function readingNotesOf(points: readonly NormalisedPoint[], unit: ReadingUnit | null): string[] {
  const notes: string[] = [];
  const count = (n: number) => `${n} reading${n === 1 ? '' : 's'}`;
  const assumed = points.filter((p) => p.use !== 'excluded' && p.assumedBare).length;
  if (assumed > 0) {
    notes.push(
      `${count(assumed)} ${assumed === 1 ? 'does' : 'do'} not say what was between lamp and meter: taken as the bare lamp. If ${assumed === 1 ? 'it was' : 'they were'} measured through the lid, the lamp is stronger than shown — record the set-up (“Change set-up” beside each reading) before moving the lamp closer.`,
    );
  }
  const burnIn = points.filter((p) => p.use === 'burn-in').length;
  if (burnIn > 0) notes.push(`${count(burnIn)} taken during burn-in: shown, not used for the decay.`);
  for (const p of points.filter((q) => q.use === 'excluded')) {
    notes.push(`The reading of ${p.takenAt.slice(0, 10)} was ${p.why}.`);
  }
  if (unit && points.length > 0 && points.every((p) => p.use === 'excluded'))
    notes.push('No reading can be used for the decay yet.');
  return notes;
}

/** Whole days a lamp has been in use by `today` (up to its retirement). */
export function lampAgeDays(lamp: Pick<LampFacts, 'firstUsedOn' | 'retiredOn'>, today: string): number {
  const start = dayNumber(lamp.firstUsedOn);
  const endDay = lamp.retiredOn ? Math.min(dayNumber(lamp.retiredOn), dayNumber(today)) : dayNumber(today);
  return Math.max(0, Math.floor(endDay - start));
}

export function lampOutlook(
  lamp: LampFacts,
  readings: readonly ReadingFacts[],
  species: SpeciesNeed | null,
  today: string,
): Outlook {
  const start = dayNumber(lamp.firstUsedOn);
  const ageDays = lampAgeDays(lamp, today);
  const ageMonths = ageDays / DAYS_PER_MONTH;
  const decay = defaultDecayFor(lamp.type, lamp.hoursPerDay);
  const unit = mainUnit(readings);
  const points = unit ? normalise(lamp, readings, unit) : [];
  const fit = fitPoints(points, decay);
  const baselineOn = baselineDueOn(lamp.firstUsedOn, lamp.hoursPerDay);
  const burnIn = {
    baselineOn,
    baselineTaken: points.some((p) => p.use === 'fit'),
    inBurnIn: lampAgeDays(lamp, today) < dayNumber(baselineOn) - start,
  };
  const readingNotes = readingNotesOf(points, unit);
  const latest = [...readings].sort((a, b) => dayNumber(b.takenAt) - dayNumber(a.takenAt))[0];
  const lastReading = latest
    ? {
        takenAt: typeof latest.takenAt === 'string' ? latest.takenAt : latest.takenAt.toISOString(),
        value: latest.value,
        unit: latest.unit,
        distanceCm: latest.distanceCm,
      }
    : null;
  const curve = (d: number) => predict(fit, d, decay);
  const nowAt30 = curve(ageDays);
  const atStart = curve(0);
  const remainingFraction = nowAt30 !== null && atStart ? nowAt30 / atStart : decay(ageDays);

  const base = {
    ageDays,
    ageMonths,
    unit,
    points,
    fit,
    lastReading,
    remainingFraction,
    nowAt30,
    burnIn,
    readingNotes,
    ageing: ageingSource(lamp.type),
  };
  const reasons: string[] = [];
  const missing: string[] = [];

  // A retired lamp and a heat lamp with nothing measured have no basking figures, dates or tests.
  const unscheduled = (status: 'retired' | 'heat-only', reason: string): Outlook => ({
    ...base,
    basking: null,
    missing,
    fallsBelowOn: null,
    fallsBelowEarliestOn: null,
    photoperiod: null,
    testDueOn: null,
    replaceDueOn: null,
    replaceBasis: null,
    status,
    reasons: [reason],
  });
  if (lamp.retiredOn) return unscheduled('retired', `Retired on ${lamp.retiredOn}.`);
  if (!(lamp.type.uvbAt30 > 0) && readings.length === 0) {
    return unscheduled(
      'heat-only',
      'A heat lamp with no UV output: replace it when it fails. Check temperatures with a thermometer.',
    );
  }

  // Test schedule: the baseline once the burn-in is over, then every few months.
  const testDueOn =
    lastReading && burnIn.baselineTaken
      ? addDays(isoDay(dayNumber(lastReading.takenAt)), testIntervalDays(lamp.type.tech))
      : baselineOn;

  // Basking zone: the fitted 30 cm output brought to the basking distance, through whatever lies between.
  let basking: Outlook['basking'] = null;
  let fallsBelowOn: string | null = null;
  let fallsBelowEarliestOn: string | null = null;
  const distance = lamp.baskingDistanceCm ?? lastReading?.distanceCm ?? null;
  const distanceFrom = lamp.baskingDistanceCm ? 'lamp' : 'latest reading';
  const ratio = pairedRatio(readings) ?? { value: lamp.type.uviPerUvb, from: 'lamp type' as const };
  const need = unit ? baskingNeed(species, unit, ratio) : null;
  if (!unit) missing.push('a meter reading');
  if (need && !need.ok) missing.push(need.missing);
  if (!distance) missing.push('the distance from the lamp to the basking spot');
  if (unit && need?.ok && distance && nowAt30 !== null) {
    const transmission = lamp.baskingTransmission ?? 1;
    const k = distanceFactor(lamp.type, REFERENCE_CM, distance) * transmission;
    basking = {
      distanceCm: distance,
      distanceFrom,
      transmission,
      valueNow: nowAt30 * k,
      threshold: need.threshold,
      ceiling: need.ceiling,
      ceilingUvi: need.ceilingUvi,
      needLabel: need.label,
      judgedBy: need.judgedBy,
      ruleOfThumb: need.ruleOfThumb,
      cautions: need.cautions,
    };
    const threshold30 = need.threshold / k;
    const cross = firstDayBelow(curve, threshold30, 0, HORIZON_DAYS);
    if (cross !== null) fallsBelowOn = isoDay(start + cross);
    const lower = (d: number) => band(fit, d)?.[0] ?? curve(d);
    const early = firstDayBelow(lower, threshold30, 0, HORIZON_DAYS);
    if (early !== null) fallsBelowEarliestOn = isoDay(start + early);
  }

  // Replacement: from the readings when we can, else the lamp type's typical interval (months of
  // ordinary days, stretched or shortened by the lamp's own hours a day).
  let replaceDueOn: string | null = fallsBelowOn;
  let replaceBasis: Outlook['replaceBasis'] = fallsBelowOn ? 'readings' : null;
  if (!basking && lamp.type.replaceAfterMonths) {
    const days = (lamp.type.replaceAfterMonths * DAYS_PER_MONTH * ORDINARY_HOURS_PER_DAY) / lamp.hoursPerDay;
    replaceDueOn = isoDay(start + Math.round(days));
    replaceBasis = 'typical interval';
  }

  const soon = isoDay(dayNumber(today) + SOON_DAYS);
  let status: Status = 'fine';
  if (replaceDueOn && replaceDueOn <= soon) {
    status = 'replace';
    reasons.push(
      replaceBasis === 'readings'
        ? replaceDueOn <= today
          ? 'The basking zone is now below the species’ need (fitted from the readings).'
          : `The basking zone falls below the species’ need on about ${replaceDueOn}.`
        : `The usual replacement age of this lamp type is reached on ${replaceDueOn} (no readings-based date).`,
    );
    // Before the keeper fits the new lamp: would one of this type meet the need at this spot, or overshoot it?
    const fresh =
      basking && unit && nowAt30 !== null
        ? newLampAtSpot(basking, nowAt30, newOutputAt30(lamp.type, unit), unit).reason
        : null;
    if (fresh) reasons.push(fresh);
  }
  if (status === 'fine') {
    if (testDueOn <= soon) {
      status = 'test-soon';
      reasons.push(
        burnIn.baselineTaken
          ? `A new reading is due on ${testDueOn}.`
          : testDueOn > today
            ? `Burning in: take the baseline reading on or after ${testDueOn}.`
            : 'The burn-in is over: take the baseline reading now.',
      );
    } else if (fallsBelowEarliestOn && fallsBelowEarliestOn <= isoDay(dayNumber(today) + 60)) {
      status = 'test-soon';
      reasons.push(
        fallsBelowEarliestOn <= today
          ? 'It may already be below the need (within the fit’s uncertainty): measure it now.'
          : `Within the fit’s uncertainty it could fall below the need as early as ${fallsBelowEarliestOn}: measure it before then.`,
      );
    } else if (fit.certainty === 'uncertain') {
      reasons.push('Few readings: the curve is uncertain. More readings make the dates firmer.');
    }
  }
  if (status === 'fine' && reasons.length === 0) reasons.push('Above the need, and tested recently.');
  return {
    ...base,
    basking,
    missing,
    fallsBelowOn,
    fallsBelowEarliestOn,
    photoperiod: photoperiodAdvice(lamp, species),
    testDueOn,
    replaceDueOn,
    replaceBasis,
    status,
    reasons,
  };
}
