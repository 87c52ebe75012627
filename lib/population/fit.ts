import { ORDINARY_HOURS_PER_DAY } from '@/simulation';
import { DAYS_PER_MONTH } from '@/lib/lamp-log/dates';
import { defaultDecayFor } from '@/lib/lamp-log/decay';
import {
  band,
  fitDecay,
  fitExponential,
  predict,
  refitTwoPhase,
  type DecayFit,
  type DecayPoint,
} from '@/lib/lamp-log/fit';
import { normalise, type LampFacts, type ReadingFacts } from '@/lib/lamp-log/outlook';
import { seededRandom } from '@/lib/lamp-log/stats';

/**
 * A shop's own decay curve for one lamp type, learned from every reading of its lamps of that type (the
 * lamp log's enclosure lamps and the counter's customer lamps alike). Pure: the caller loads the lamps.
 *
 * How readings become one curve:
 *  - Each reading is brought to the bare lamp at 30 cm by the lamp log's own `normalise` (which calls
 *    `toBareReference`, and marks burn-in readings and those that cannot be referenced); only its
 *    working-life readings enter, as in a lamp's own fit.
 *  - Relative to new: each value is divided by the catalogue's new output of the type (in the reading's
 *    unit), so µW/cm² and UV Index readings share one scale, and the curve reads as "share of the
 *    catalogue's new lamp". We do not divide each lamp by its own first reading: most counter lamps are
 *    measured once, part-way through their life, and a per-lamp start would throw their information away
 *    (it would be absorbed by the lamp's own start). Lamps do differ in starting output; that spread is
 *    kept as scatter about the curve, and the band below is made from whole lamps (not single readings),
 *    so it widens when the lamps disagree — a lamp's readings are not independent of each other.
 *  - Age is counted in months of ordinary use (ORDINARY_HOURS_PER_DAY a day, the engine's lifetime
 *    table's unit): lamps wear by the hour, and a customer's lamp lit 8 hours a day ages slower.
 *  - The curve is fitted with the lamp log's own family (`fitDecay`: exponential, or two-phase when the
 *    corrected AIC prefers it) in log space.
 *  - The 95 % band: at each age, the wider of the fit's own band and the 2.5–97.5 % range of the same
 *    curve refitted to the lamps resampled with replacement (a cluster bootstrap, lamps as the unit; the
 *    standard remedy for readings grouped by lamp). Seeded from the data, so one set of readings always
 *    gives the same band.
 */

/** At least this many lamps: the band resamples whole lamps, and four lamps allow only 35 distinct
 * resamples — too few for a 2.5–97.5 % range (a statistical reason, not a published threshold). */
export const MIN_LAMPS = 5;
/** At least this many working-life readings: several per fitted parameter (four for the two-phase
 * curve), so a curve is not drawn through a handful of points (common practice, no published source). */
export const MIN_READINGS = 12;
/** Readings spread over at least this many months of lamp age: the usual test interval of most UV
 * technologies (2–3 months, the engine's lifetime table); over less, the slope is mostly meter scatter. */
export const MIN_SPAN_MONTHS = 3;
/** Lamp resamples for the band. */
export const RESAMPLES = 200;
/** The curve is drawn, and adopted, to this age (the lamp log looks five years ahead). */
export const CURVE_MONTHS = 60;

export type PopulationLamp = {
  /** Unique within the input, e.g. `lamp-12`, `counter-5`. */
  key: string;
  source: 'enclosure' | 'counter';
  firstUsedOn: string;
  hoursPerDay: number;
  readings: ReadingFacts[];
};

export type PopulationInput = { type: LampFacts['type']; lamps: PopulationLamp[] };

export type PopulationPoint = { months: number; share: number; source: 'enclosure' | 'counter' };

export type PopulationCounts = {
  lamps: number;
  readings: number;
  enclosureLamps: number;
  counterLamps: number;
  /** Months of lamp age between the youngest and the oldest reading used. */
  spanMonths: number;
  /** Readings left out: taken during burn-in, or not brought to the bare lamp (unknown glass, not warm). */
  left: number;
};

export type PopulationCurve =
  | (PopulationCounts & {
      ok: true;
      fit: DecayFit;
      /** Share of the catalogue's new output at 30 cm the fitted curve gives at month 0. */
      startShare: number;
      /** Months of ordinary use until the fitted output halves from its start. */
      halfLifeMonths: number | null;
      curve: { months: number; share: number; lo: number; hi: number }[];
      catalogue: { months: number; share: number }[];
      points: PopulationPoint[];
      note: string;
    })
  | (PopulationCounts & {
      ok: false;
      message: string;
      catalogue: { months: number; share: number }[];
      points: PopulationPoint[];
    });

const monthsOf = (ordinaryDays: number) => ordinaryDays / DAYS_PER_MONTH;

function newAt30(type: LampFacts['type'], unit: 'uvb' | 'uvi'): number {
  return unit === 'uvb' ? type.uvbAt30 : type.uvbAt30 * type.uviPerUvb;
}

type LampPoints = { key: string; source: PopulationLamp['source']; points: DecayPoint[] };

/** Each lamp's usable readings as (ordinary-use days, share of the catalogue's new output). */
export function populationPoints(input: PopulationInput): { lamps: LampPoints[]; left: number } {
  let left = 0;
  const lamps: LampPoints[] = [];
  for (const l of input.lamps) {
    const facts: LampFacts = {
      id: 0,
      label: l.key,
      firstUsedOn: l.firstUsedOn,
      hoursPerDay: l.hoursPerDay,
      retiredOn: null,
      baskingDistanceCm: null,
      baskingTransmission: null,
      type: input.type,
    };
    const pace = l.hoursPerDay / ORDINARY_HOURS_PER_DAY;
    const points: DecayPoint[] = [];
    for (const unit of ['uvb', 'uvi'] as const) {
      const reference = newAt30(input.type, unit);
      for (const p of normalise(facts, l.readings, unit)) {
        if (p.use !== 'fit' || !(reference > 0) || !(p.value > 0) || p.days < 0) {
          left++;
          continue;
        }
        points.push({ days: p.days * pace, value: p.value / reference });
      }
    }
    if (points.length > 0) lamps.push({ key: l.key, source: l.source, points });
  }
  return { lamps, left };
}

function countsOf(lamps: LampPoints[], left: number): PopulationCounts {
  const all = lamps.flatMap((l) => l.points);
  const days = all.map((p) => p.days);
  return {
    lamps: lamps.length,
    readings: all.length,
    enclosureLamps: lamps.filter((l) => l.source === 'enclosure').length,
    counterLamps: lamps.filter((l) => l.source === 'counter').length,
    spanMonths: all.length ? monthsOf(Math.max(...days) - Math.min(...days)) : 0,
    left,
  };
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** The plain sentence shown instead of a curve: what there is, and how many more tests it takes. */
export function notEnoughMessage(c: PopulationCounts): string {
  const needs: string[] = [];
  if (c.lamps < MIN_LAMPS) needs.push(`${plural(MIN_LAMPS - c.lamps, 'more lamp')} tested`);
  if (c.readings < MIN_READINGS) needs.push(plural(MIN_READINGS - c.readings, 'more reading'));
  if (c.spanMonths < MIN_SPAN_MONTHS)
    needs.push(`readings of lamps at least ${MIN_SPAN_MONTHS} months apart in age`);
  const have =
    c.readings === 0
      ? 'No usable readings of this type yet'
      : `So far ${plural(c.readings, 'reading')} of ${plural(c.lamps, 'lamp')}, over ${c.spanMonths.toFixed(1)} months of lamp age`;
  return `${have}. A curve of your own needs at least ${MIN_LAMPS} lamps, ${MIN_READINGS} readings and ${MIN_SPAN_MONTHS} months of lamp age between them: test ${needs.join(', ')}.`;
}

function refit(fit: DecayFit, pts: DecayPoint[]): DecayFit | null {
  if (fit.kind === 'exponential') return fitExponential(pts);
  if (fit.kind === 'two-phase') return refitTwoPhase(pts, fit);
  return null;
}

function quantile(sorted: number[], q: number): number {
  const i = (sorted.length - 1) * q;
  const lo = Math.floor(i);
  const hi = Math.ceil(i);
  return (sorted[lo] as number) + ((sorted[hi] as number) - (sorted[lo] as number)) * (i - lo);
}

/** A seed from the data, so the same readings give the same band on every server. */
function seedOf(lamps: LampPoints[]): number {
  let h = 2166136261;
  for (const l of lamps)
    for (const p of l.points) {
      h = Math.imul(h ^ Math.round(p.days * 10), 16777619);
      h = Math.imul(h ^ Math.round(p.value * 1e6), 16777619);
    }
  return h >>> 0;
}

export function populationCurve(input: PopulationInput): PopulationCurve {
  const { lamps, left } = populationPoints(input);
  const counts = countsOf(lamps, left);
  const decay = defaultDecayFor(input.type, ORDINARY_HOURS_PER_DAY);
  const catalogue = Array.from({ length: 25 }, (_, i) => {
    const months = (CURVE_MONTHS * i) / 24;
    return { months, share: decay(months * DAYS_PER_MONTH) };
  });
  const points = lamps.flatMap((l) =>
    l.points.map((p) => ({ months: monthsOf(p.days), share: p.value, source: l.source })),
  );
  const refuse = (message: string): PopulationCurve => ({ ok: false, ...counts, message, catalogue, points });
  if (counts.lamps < MIN_LAMPS || counts.readings < MIN_READINGS || counts.spanMonths < MIN_SPAN_MONTHS)
    return refuse(notEnoughMessage(counts));

  const all = lamps.flatMap((l) => l.points);
  const fit = fitDecay(all, decay);
  if (fit.kind !== 'exponential' && fit.kind !== 'two-phase')
    return refuse(
      `The ${plural(counts.readings, 'reading')} of ${plural(counts.lamps, 'lamp')} show no decline with age yet, so there is no curve to fit. Older lamps of this type, tested, would show one.`,
    );

  // Cluster bootstrap: resample whole lamps, refit the chosen curve, keep its value at each age.
  const grid = Array.from({ length: 31 }, (_, i) => (CURVE_MONTHS * i) / 30);
  const random = seededRandom(seedOf(lamps));
  const samples: number[][] = grid.map(() => []);
  for (let b = 0; b < RESAMPLES; b++) {
    const pts: DecayPoint[] = [];
    for (let k = 0; k < lamps.length; k++) pts.push(...lamps[Math.floor(random() * lamps.length)]!.points);
    const again = refit(fit, pts);
    if (!again) continue;
    grid.forEach((m, i) => {
      const v = predict(again, m * DAYS_PER_MONTH, decay);
      if (v !== null && Number.isFinite(v)) samples[i]!.push(v);
    });
  }
  const curve = grid.map((months, i) => {
    const share = predict(fit, months * DAYS_PER_MONTH, decay) as number;
    const own = band(fit, months * DAYS_PER_MONTH);
    const s = samples[i]!.sort((a, b) => a - b);
    const boot: [number, number] | null = s.length >= 20 ? [quantile(s, 0.025), quantile(s, 0.975)] : null;
    const lo = Math.min(own?.[0] ?? share, boot?.[0] ?? share, share);
    const hi = Math.max(own?.[1] ?? share, boot?.[1] ?? share, share);
    return { months, share, lo, hi };
  });
  const startShare = predict(fit, 0, decay) as number;
  return {
    ok: true,
    ...counts,
    fit,
    startShare,
    halfLifeMonths: halfLife(fit, decay, startShare),
    curve,
    catalogue,
    points,
    note:
      fit.kind === 'two-phase'
        ? `A fast early drop, then slow wear, fitted to ${plural(counts.readings, 'reading')} of ${plural(counts.lamps, 'lamp')}.`
        : `An exponential decay fitted to ${plural(counts.readings, 'reading')} of ${plural(counts.lamps, 'lamp')}.`,
  };
}

function halfLife(fit: DecayFit, decay: (d: number) => number, start: number): number | null {
  for (let m = 0.25; m <= CURVE_MONTHS * 4; m += 0.25) {
    if ((predict(fit, m * DAYS_PER_MONTH, decay) ?? start) <= start / 2) return m;
  }
  return null;
}

/**
 * The fitted shape as the decay table the catalogue, outlook and studio read (month of ordinary use,
 * output factor). Divided by its own start, so it starts at 1: a shop adopting its curve adopts how its
 * lamps age, while a new lamp's output stays the catalogue's figure — the studio never shows a new lamp
 * weaker than the catalogue says, which would hide a basking spot that is too strong.
 */
export function adoptedPoints(fit: DecayFit): [number, number][] {
  const start = predict(fit, 0, () => 1) || 1;
  const out: [number, number][] = [];
  for (let m = 0; m <= CURVE_MONTHS; m++) {
    const v = (predict(fit, m * DAYS_PER_MONTH, () => 1) ?? 0) / start;
    out.push([m, Math.round(Math.min(1, Math.max(0, v)) * 10000) / 10000]);
  }
  return out;
}
