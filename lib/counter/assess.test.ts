import { describe, expect, it } from 'vitest';
import type { LampFacts, ReadingFacts } from '@/lib/lamp-log/outlook';
import { addDays, dayNumber } from '@/lib/lamp-log/dates';
import {
  assessCounterLamp,
  firstUsedFromMonths,
  METER_UNCERTAINTY,
  MIN_RETEST_DAYS,
  REPLACE_BELOW_SHARE,
} from './assess';

// An invented T5 tube type for the tests (no real product): 100 µW/cm² new at 30 cm, half-life 12 months.
// The 12-month half-life is the engine's lifetime-table value for T5 tubes (from memory); the 3-month
// test interval is the table's usual meter-check interval (common practice, no published source).
const TODAY = '2026-06-01';
const tube = (firstUsedOn: string, over: Partial<LampFacts> = {}): LampFacts => ({
  id: 1,
  label: 'Counter lamp',
  firstUsedOn,
  hoursPerDay: 12,
  retiredOn: null,
  baskingDistanceCm: null,
  baskingTransmission: null,
  type: {
    name: 'Invented T5 tube',
    tech: 't5',
    form: 'tube',
    lengthCm: 55,
    uvbAt30: 100,
    uviPerUvb: 0.03,
    halfLifeMonths: 12,
    decayPoints: null,
    replaceAfterMonths: 12,
  },
  ...over,
});
const reading = (value: number, over: Partial<ReadingFacts> = {}): ReadingFacts => ({
  takenAt: `${TODAY}T00:00:00Z`, // midnight UTC: the reading falls exactly on today's day number
  distanceCm: 30,
  value,
  unit: 'uvb',
  through: 'nothing',
  throughTransmission: null,
  warmedUp: 'yes',
  ...over,
});
// Ferguson et al. 2010 (Zoo Biology 29:317–334): a zone-3 basking spot needs at least UV Index 2.9.
const ZONE3 = { name: 'Invented desert lizard', uvZone: 3, uvbTargetUw: null };
const SIX_MONTHS = firstUsedFromMonths(TODAY, 6);
const THREE_MONTHS_DAYS = Math.round(3 * (365.25 / 12));

const days = (from: string, to: string) => dayNumber(to) - dayNumber(from);

type Assessed = Parameters<typeof assessCounterLamp>[0];
/** A six-month-old tube assessed today from these readings, with no species unless `over` gives one. */
const assess = (readings: ReadingFacts[], over: Partial<Assessed> = {}) =>
  assessCounterLamp({
    lamp: tube(SIX_MONTHS),
    readings,
    species: null,
    today: TODAY,
    ageEstimated: false,
    ...over,
  });

describe('the counter verdict, without a species', () => {
  it('keeps a lamp at new output and sets the next test at the usual three months', () => {
    const { verdict } = assess([reading(100)], { ageEstimated: true });
    expect(verdict.kind).toBe('keep');
    expect(verdict.output!.share).toBeCloseTo(1, 6);
    expect(verdict.output!.low).toBeCloseTo(1 - METER_UNCERTAINTY, 6);
    expect(verdict.testAgainOn).toBe(addDays(TODAY, THREE_MONTHS_DAYS));
    expect(verdict.uncertainty.join(' ')).toContain('approximate');
    expect(verdict.cautions.join(' ')).toMatch(/estimate/);
    expect(verdict.cautions.join(' ')).toMatch(/vet/);
  });

  it('replaces a lamp below half of new output (common practice, no published source)', () => {
    expect(REPLACE_BELOW_SHARE).toBe(0.5);
    const { verdict } = assess([reading(45)]);
    expect(verdict.kind).toBe('replace');
    expect(verdict.output!.share).toBeCloseTo(0.45, 6);
    expect(verdict.testAgainOn).toBeNull();
  });

  it('replaces a lamp that is above half only within the meter’s uncertainty', () => {
    // 55 % of new, less 15 %, is 46.75 %: it may already be below half.
    const { verdict } = assess([reading(55)]);
    expect(verdict.kind).toBe('replace');
    expect(verdict.output!.low).toBeCloseTo(0.4675, 6);
  });

  it('takes the lid out once: 50 through a lid passing half reads as the bare lamp’s 100', () => {
    const { verdict } = assess([reading(50, { through: 'lid', throughTransmission: 0.5 })]);
    expect(verdict.output!.share).toBeCloseTo(1, 6);
    expect(verdict.kind).toBe('keep');
  });

  it('asks for a new reading today when the lamp was not warmed up', () => {
    const { verdict } = assess([reading(20, { warmedUp: 'no' })]);
    expect(verdict.kind).toBe('test-again');
    expect(verdict.testAgainOn).toBe(TODAY);
    expect(verdict.output).toBeNull();
    expect(verdict.reasons.join(' ')).toMatch(/warmed up/);
  });

  it('gives no UV verdict for a heat lamp', () => {
    const heat = tube(SIX_MONTHS);
    heat.type = {
      ...heat.type,
      tech: 'ceramic',
      form: 'bulb',
      lengthCm: null,
      uvbAt30: 0,
      halfLifeMonths: null,
    };
    const { verdict } = assess([], { lamp: heat });
    expect(verdict.kind).toBe('no-verdict');
  });
});

describe('the counter verdict, for a species at a basking distance', () => {
  // Measured at the basking distance with a UV Index meter, so the basking value today is the reading.
  const home = (firstUsedOn: string) => tube(firstUsedOn, { baskingDistanceCm: 30 });
  const uvi = (value: number) => reading(value, { unit: 'uvi' });
  const assessAtHome = (readings: ReadingFacts[]) =>
    assess(readings, { lamp: home(SIX_MONTHS), species: ZONE3 });

  it('replaces a lamp whose basking spot is below the zone-3 need of UVI 2.9', () => {
    const { verdict } = assessAtHome([uvi(2.5)]);
    expect(verdict.kind).toBe('replace');
    expect(verdict.basking!.threshold).toBe(2.9);
    expect(verdict.basking!.valueNow).toBeCloseTo(2.5, 6);
  });

  describe('judges the replacement at the same spot', () => {
    // Ferguson et al. 2010 (Zoo Biology 29:317–334): zone 3's basking range is UV Index 2.9–7.4, zone 4's
    // 4.5–9.5. New-lamp outputs are the invented test type's catalogue figures.
    const typed = (over: Partial<LampFacts['type']>) =>
      tube(SIX_MONTHS, { baskingDistanceCm: 30, type: { ...tube(SIX_MONTHS).type, ...over } });

    it('says nothing more when a new lamp of the type would meet the need there', () => {
      // The test type new: 100 µW/cm² × 0.03 = UVI 3.0 at 30 cm, above 2.9 and below 7.4.
      const { verdict } = assessAtHome([uvi(2.5)]);
      expect(verdict.reasons.join(' ')).not.toMatch(/new lamp of this type would/);
      expect(verdict.replacement).toBeNull();
      expect(verdict.headline).not.toMatch(/closer/);
    });

    it('tells the customer when even a new lamp would fall short there (a weaker type: UVI 2.0 new at 30 cm)', () => {
      const { verdict } = assess([uvi(1.6)], { lamp: typed({ uviPerUvb: 0.02 }), species: ZONE3 });
      expect(verdict.kind).toBe('replace');
      expect(verdict.headline).toMatch(/bring the basking spot closer: even a new lamp/);
      expect(verdict.reasons.join(' ')).toMatch(
        /new lamp of this type would give about UVI 2 at the basking spot \(30 cm/,
      );
    });

    it('does the same in µW/cm²: 100 new at 30 cm against zone 4’s UVI 4.5 ÷ 0.03 = 150', () => {
      const zone4 = { name: 'Invented forest-edge lizard', uvZone: 4, uvbTargetUw: null };
      const { verdict } = assess([reading(90)], { lamp: typed({}), species: zone4 });
      expect(verdict.kind).toBe('replace');
      expect(verdict.basking!.threshold).toBeCloseTo(150, 6);
      expect(verdict.reasons.join(' ')).toMatch(
        /about 100 µW\/cm² at the basking spot .*still below the need/,
      );
    });

    it('warns when a new lamp would give more than the top of the zone’s range there (UVI 9 against 7.4)', () => {
      // A strong type (UVI 9 new at 30 cm) that has faded to UVI 2.5: the spot is under the need today,
      // and a new lamp at the same height would give about UVI 9.
      const { verdict } = assess([uvi(2.5)], { lamp: typed({ uvbAt30: 300 }), species: ZONE3 });
      expect(verdict.kind).toBe('replace');
      const said = verdict.reasons.join(' ');
      expect(said).toMatch(
        /about UVI 9 at the basking spot .*above the top of the zone’s basking range \(UVI 7\.4\)/,
      );
      expect(said).toMatch(/farther from the basking spot/);
      expect(verdict.headline).not.toMatch(/closer/);
      // The slip the customer takes home carries it (lib/counter/slip-content.ts).
      expect(verdict.replacement).toMatch(/farther from the basking spot/);
    });
  });

  it('replaces a lamp above the need only within the meter’s uncertainty (3.2 × 0.85 = 2.72)', () => {
    const { verdict } = assessAtHome([uvi(3.2)]);
    expect(verdict.kind).toBe('replace');
    expect(verdict.basking!.low).toBeCloseTo(2.72, 6);
  });

  it('keeps a strong lamp and names the month it falls below the need', () => {
    // UVI 5 at six months, halving every 12 months: below 2.9 after 12·log2(5/2.9) ≈ 9.4 more months
    // (about March 2027); the low estimate (×0.85) after 12·log2(4.25/2.9) ≈ 6.6 months (about December 2026).
    const { verdict } = assessAtHome([uvi(5)]);
    expect(verdict.kind).toBe('keep');
    expect(verdict.testAgainOn).toBe(addDays(TODAY, THREE_MONTHS_DAYS));
    expect(verdict.fallsBelowMonth).toBe('2027-03');
    expect(verdict.fallsBelowEarliestMonth).toBe('2026-12');
  });

  it('asks for a test before the low estimate reaches the need, never sooner than a week', () => {
    // UVI 3.6: low 3.06, below 2.9 after 12·log2(3.06/2.9) ≈ 0.93 months (about 28 days).
    const { verdict } = assessAtHome([uvi(3.6)]);
    expect(verdict.kind).toBe('test-again');
    const wait = days(TODAY, verdict.testAgainOn!);
    expect(wait).toBeGreaterThanOrEqual(MIN_RETEST_DAYS);
    expect(wait).toBeLessThanOrEqual(28 - 14 + 7);
  });

  it('a second reading gives the lamp its own decay: a fast fade brings the replacement forward', () => {
    const first = { ...uvi(6), takenAt: `${addDays(TODAY, -60)}T10:00:00Z` };
    const fast = assessAtHome([first, uvi(4.5)]);
    const usual = assessAtHome([uvi(4.5)]);
    expect(fast.outlook.fit.kind).toBe('exponential');
    expect(usual.outlook.fit.kind).toBe('default-scaled');
    // 6 → 4.5 in two months is a half-life of about 4.8 months, much faster than the usual 12.
    expect(fast.verdict.fallsBelowMonth! < usual.verdict.fallsBelowMonth!).toBe(true);
  });
});
