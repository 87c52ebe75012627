import type { ReadingUnit } from '@/models/reading';
import { CAUTIONS } from '@/shared/cautions';
import { addDays, dayNumber, DAYS_PER_MONTH, isoDay } from '@/lib/lamp-log/dates';
import { defaultDecayFor } from '@/lib/lamp-log/decay';
import { firstDayBelow, predict } from '@/lib/lamp-log/fit';
import type { SpeciesNeed } from '@/lib/lamp-log/need';
import { formatUv as fmt, newLampAtSpot, newOutputAt30 } from '@/lib/lamp-log/replacement';
import {
  HORIZON_DAYS,
  lampOutlook,
  SOON_DAYS,
  testIntervalDays,
  type LampFacts,
  type Outlook,
  type ReadingFacts,
} from '@/lib/lamp-log/outlook';

/**
 * The counter's answer about one customer's lamp: computed exactly as the lamp log computes an outlook
 * (`lampOutlook`: each reading brought to the bare lamp at 30 cm once, the technology's decay curve
 * scaled to one reading, its own fit from several), then put in plain words — keep it, test it again on
 * a date, or replace it — with what the figures cannot tell.
 *
 * Pure: the caller loads the lamp type, the species sheet and earlier readings, and passes "today".
 */

/**
 * A handheld UV meter's reading is good to about ±15 % (from memory: the accuracy makers quote for
 * broadband UVB and UV Index meters is of this order, and two meters of one kind differ by as much).
 */
export const METER_UNCERTAINTY = 0.15;

/**
 * Without a species and basking distance, a UV lamp is judged against a new lamp of its type: replace it
 * below half of new output (common practice, no published source: the trade's replacement intervals are
 * about when a lamp is down to half, see the engine's lifetime table).
 */
export const REPLACE_BELOW_SHARE = 0.5;

/** The earliest "test again" date, days from today: sooner is no better than a re-test at the counter. */
export const MIN_RETEST_DAYS = 7;

export type VerdictKind = 'keep' | 'test-again' | 'replace' | 'no-verdict';

export type CounterVerdict = {
  kind: VerdictKind;
  /** The verdict in one plain sentence. */
  headline: string;
  testAgainOn: string | null;
  /** The lamp now (bare, 30 cm, fitted) against a new lamp of its type in the catalogue, both in `unit`. */
  output: {
    unit: ReadingUnit;
    nowAt30: number;
    newAt30: number;
    share: number;
    /** The share within the meter's uncertainty (or the fit's band, when wider). */
    low: number;
    high: number;
  } | null;
  /** The basking spot at home today, against the species' need (null without species and distance). */
  basking: {
    unit: ReadingUnit;
    valueNow: number;
    low: number;
    threshold: number;
    needLabel: string;
    distanceCm: number;
  } | null;
  /** The month (YYYY-MM) the basking spot falls below the need, and the earliest it could. */
  fallsBelowMonth: string | null;
  fallsBelowEarliestMonth: string | null;
  reasons: string[];
  /** What a new lamp of the type would give at the basking spot, when that needs saying before it is fitted. */
  replacement: string | null;
  /** What the figures rest on and how sure they are. */
  uncertainty: string[];
  cautions: string[];
};

export type CounterInput = {
  lamp: LampFacts;
  /** Every reading of this lamp, the one taken now among them. */
  readings: ReadingFacts[];
  species: SpeciesNeed | null;
  today: string;
  /** The age was given in months, not as a date. */
  ageEstimated: boolean;
};

export type CounterAnswer = { outlook: Outlook; verdict: CounterVerdict };

const month = (iso: string | null) => (iso ? iso.slice(0, 7) : null);

/** The standing cautions of every counter answer (the customer takes them home with the verdict). */
export const COUNTER_CAUTIONS: string[] = [
  'Every figure here is an estimate from meter readings at the counter and the lamp type’s usual ageing: check the basking spot at home with a UV meter.',
  `${CAUTIONS['uv-eyes-skin'].title}: never look into a UV lamp, and watch for closed eyes or reddened skin after any change of lamp or distance.`,
  'A new lamp is stronger than the old one: fit it at the distance its maker gives, not closer, and measure again.',
  'Follow the lamp maker’s instructions, and ask a reptile-experienced vet about the animal’s own UV needs.',
];

export function assessCounterLamp(input: CounterInput): CounterAnswer {
  const { lamp, readings, species, today } = input;
  const outlook = lampOutlook(lamp, readings, species, today);
  return { outlook, verdict: counterVerdict(input, outlook) };
}

export function counterVerdict(input: CounterInput, outlook: Outlook): CounterVerdict {
  const { lamp, today } = input;
  const cautions = [...COUNTER_CAUTIONS, ...(outlook.basking?.cautions ?? [])];
  const uncertainty: string[] = [];
  if (input.ageEstimated)
    uncertainty.push('The lamp’s age was given in months, so its dates are approximate.');
  uncertainty.push(outlook.fit.note, outlook.ageing);
  const base = {
    fallsBelowMonth: null,
    fallsBelowEarliestMonth: null,
    cautions,
    uncertainty,
    replacement: null,
  };

  if (!(lamp.type.uvbAt30 > 0)) {
    return {
      ...base,
      kind: 'no-verdict',
      headline: 'A heat lamp with no UV: nothing to measure with a UV meter. Replace it when it fails.',
      testAgainOn: null,
      output: null,
      basking: null,
      reasons: ['Check the basking temperature at home with a thermometer.'],
    };
  }
  const latest = [...outlook.points].sort((a, b) => b.days - a.days)[0];
  if (!latest || latest.use === 'excluded' || outlook.nowAt30 === null || outlook.unit === null) {
    return {
      ...base,
      kind: 'test-again',
      headline: 'Measure again today: this reading cannot be judged.',
      testAgainOn: today,
      output: null,
      basking: null,
      reasons: [
        latest?.why
          ? `The reading was ${latest.why}.`
          : 'No reading could be brought to the bare lamp at 30 cm.',
        'Switch the lamp on for at least ten minutes and measure the bare lamp straight below it.',
      ],
    };
  }

  const unit = outlook.unit;
  const decay = defaultDecayFor(lamp.type, lamp.hoursPerDay);
  const curve = (d: number) => predict(outlook.fit, d, decay);
  const start = dayNumber(lamp.firstUsedOn);
  const newAt30 = newOutputAt30(lamp.type, unit);
  const nowAt30 = outlook.nowAt30;
  const share = nowAt30 / newAt30;
  const u = METER_UNCERTAINTY;
  const output = {
    unit,
    nowAt30,
    newAt30,
    share,
    low: share * (1 - u),
    high: share * (1 + u),
  };
  uncertainty.push(
    `Meter readings are good to about ±${Math.round(u * 100)} %; the output left is ${pct(output.low)}–${pct(output.high)} of a new lamp of this type.`,
    'A new lamp’s output is the catalogue’s typical figure for the type: lamps of one type differ.',
  );

  const nextRegular = addDays(today, testIntervalDays(lamp.type.tech));
  const soon = addDays(today, SOON_DAYS);
  const notBefore = addDays(today, MIN_RETEST_DAYS);
  const ageDays = outlook.ageDays;
  // The day a curve (scaled by `k`) first goes below `level` at 30 cm, from today on; null beyond the horizon.
  const crossing = (level: number, k: number) => {
    const d = firstDayBelow((t) => (curve(t) ?? 0) * k, level, ageDays, ageDays + HORIZON_DAYS);
    return d === null ? null : isoDay(start + d);
  };
  const retestBefore = (date: string | null) => {
    if (!date) return nextRegular;
    const before = addDays(date, -SOON_DAYS);
    const pick = before < nextRegular ? before : nextRegular;
    return pick < notBefore ? notBefore : pick;
  };

  const b = outlook.basking;
  if (b) {
    const basking = {
      unit,
      valueNow: b.valueNow,
      low: b.valueNow * (1 - u),
      threshold: b.threshold,
      needLabel: b.needLabel,
      distanceCm: b.distanceCm,
    };
    const threshold30 = (nowAt30 / b.valueNow) * b.threshold;
    const fallsLow = crossing(threshold30, 1 - u);
    const withMonths = {
      ...base,
      fallsBelowMonth: month(outlook.fallsBelowOn),
      fallsBelowEarliestMonth: month(fallsLow),
      output,
      basking,
    };
    // A replacement is judged where the animal basks too: a new lamp of the type, at the same spot.
    const fresh = newLampAtSpot(b, nowAt30, newAt30, unit);
    if (b.valueNow < b.threshold) {
      return {
        ...withMonths,
        kind: 'replace',
        headline: fresh.tooWeak
          ? 'Replace it, and bring the basking spot closer: even a new lamp of this type would give less UV there than the species needs.'
          : 'Replace it: the basking spot at home gets less UV than the species needs.',
        testAgainOn: null,
        replacement: fresh.reason,
        reasons: [
          `About ${fmt(b.valueNow, unit)} at the basking spot today; the need is ${b.needLabel}.`,
          ...(fresh.reason ? [fresh.reason] : []),
        ],
      };
    }
    if (basking.low < b.threshold || (outlook.fallsBelowOn && outlook.fallsBelowOn <= soon)) {
      return {
        ...withMonths,
        kind: 'replace',
        headline:
          'Replace it: the basking spot is at or within the meter’s uncertainty of the species’ need.',
        testAgainOn: null,
        replacement: fresh.reason,
        reasons: [
          `About ${fmt(b.valueNow, unit)} at the basking spot today (as low as ${fmt(basking.low, unit)} within the meter’s uncertainty); the need is ${b.needLabel}.`,
          ...(fresh.reason ? [fresh.reason] : []),
        ],
      };
    }
    const testAgainOn = retestBefore(fallsLow);
    const close = fallsLow !== null && addDays(fallsLow, -SOON_DAYS) < nextRegular;
    return {
      ...withMonths,
      kind: close ? 'test-again' : 'keep',
      headline: close
        ? `Test it again by ${testAgainOn}: it is close to the species’ need.`
        : `Keep it, and test it again by ${testAgainOn}.`,
      testAgainOn,
      reasons: [
        `About ${fmt(b.valueNow, unit)} at the basking spot today; the need is ${b.needLabel}.`,
        outlook.fallsBelowOn
          ? `At this rate it falls below the need around ${month(outlook.fallsBelowOn)}${fallsLow && fallsLow < outlook.fallsBelowOn ? ` (as early as ${month(fallsLow)})` : ''}.`
          : 'It stays above the need for the next five years at this rate: test it all the same.',
      ],
    };
  }

  // No species or basking distance: judged against a new lamp of its type.
  const missing = outlook.missing.filter((m) => m !== 'a meter reading');
  const reasons = [
    `It gives ${pct(share)} of a new lamp of this type (${fmt(nowAt30, unit)} against ${fmt(newAt30, unit)} at 30 cm, bare).`,
    `For a verdict about the animal’s own need, give ${missing.length ? missing.join(' and ') : 'the species and the basking distance at home'}.`.replace(
      'a species sheet for this enclosure',
      'the species',
    ),
  ];
  const withOutput = { ...base, output, basking: null };
  if (share < REPLACE_BELOW_SHARE || output.low < REPLACE_BELOW_SHARE) {
    return {
      ...withOutput,
      kind: 'replace',
      headline:
        share < REPLACE_BELOW_SHARE
          ? 'Replace it: it gives less than half the UV of a new lamp of its type.'
          : 'Replace it: within the meter’s uncertainty it may give less than half the UV of a new lamp.',
      testAgainOn: null,
      reasons,
    };
  }
  const halfLow = crossing(REPLACE_BELOW_SHARE * newAt30, 1 - u);
  const testAgainOn = retestBefore(halfLow);
  const close = halfLow !== null && addDays(halfLow, -SOON_DAYS) < nextRegular;
  return {
    ...withOutput,
    kind: close ? 'test-again' : 'keep',
    headline: close
      ? `Test it again by ${testAgainOn}: it is nearing half of a new lamp’s UV.`
      : `Keep it, and test it again by ${testAgainOn}.`,
    testAgainOn,
    reasons,
  };
}

/** Date of first use of a lamp `months` old by `today` (an age given in months). */
export function firstUsedFromMonths(today: string, months: number): string {
  return isoDay(dayNumber(today) - Math.round(months * DAYS_PER_MONTH));
}

const pct = (v: number) => `${Math.round(v * 100)} %`;
