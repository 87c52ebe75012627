import { describe, expect, it } from 'vitest';
import { addDays, DAYS_PER_MONTH } from '@/lib/lamp-log/dates';
import { predict } from '@/lib/lamp-log/fit';
import type { LampFacts } from '@/lib/lamp-log/outlook';
import { seededRandom } from '@/lib/lamp-log/stats';
import { adoptedPoints, MIN_LAMPS, MIN_READINGS, populationCurve, type PopulationLamp } from './fit';

/** A T5-like tube of the catalogue: 40 µW/cm² new at 30 cm, 55 cm long. */
const TYPE: LampFacts['type'] = {
  name: 'Test tube',
  tech: 't5',
  form: 'tube',
  lengthCm: 55,
  uvbAt30: 40,
  uviPerUvb: 0.02,
  halfLifeMonths: 12,
  decayPoints: null,
  replaceAfterMonths: 12,
};

const TODAY = '2026-12-01';

/**
 * The generator: lamps whose bare 30 cm output is `start · k · exp(−months/τ)` of the type's new output,
 * each lamp with its own starting factor k (lognormal, 10 % spread) and every reading with 5 % meter
 * scatter (lognormal), read at 30 cm bare, at 12 hours a day so ordinary months are calendar months.
 */
function generate(opts: {
  lamps: number;
  readingsEach: number;
  seed: number;
  start: number;
  tauMonths: number;
}) {
  const random = seededRandom(opts.seed);
  const gauss = () => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
  const lamps: PopulationLamp[] = [];
  for (let i = 0; i < opts.lamps; i++) {
    const ageMonths = 2 + random() * 16; // age of the lamp today
    const firstUsedOn = addDays(TODAY, -Math.round(ageMonths * DAYS_PER_MONTH));
    const k = Math.exp(0.1 * gauss());
    const readings = Array.from({ length: opts.readingsEach }, (_, j) => {
      const atMonths = Math.max(0.5, ageMonths - j * 2);
      const value =
        TYPE.uvbAt30 * opts.start * k * Math.exp(-atMonths / opts.tauMonths) * Math.exp(0.05 * gauss());
      return {
        takenAt: `${addDays(firstUsedOn, Math.round(atMonths * DAYS_PER_MONTH))}T10:00:00Z`,
        distanceCm: 30,
        value,
        unit: 'uvb' as const,
        through: 'nothing' as const,
        throughTransmission: null,
        warmedUp: 'yes' as const,
      };
    });
    lamps.push({
      key: `lamp-${i}`,
      source: i % 2 ? 'counter' : 'enclosure',
      firstUsedOn,
      hoursPerDay: 12,
      readings,
    });
  }
  return lamps;
}

describe('population decay curve', () => {
  it('recovers the generator’s curve within its 95 % band (a property of the generator)', () => {
    const start = 0.9;
    const tauMonths = 15;
    const truth = (m: number) => start * Math.exp(-m / tauMonths);
    const result = populationCurve({
      type: TYPE,
      lamps: generate({ lamps: 14, readingsEach: 3, seed: 18, start, tauMonths }),
    });
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.lamps).toBe(14);
    expect(result.readings).toBe(42);
    expect(result.enclosureLamps + result.counterLamps).toBe(14);
    // Inside the ages the readings cover, the generator's curve lies within the band at every age drawn.
    for (const c of result.curve.filter((c) => c.months >= 1 && c.months <= 16)) {
      expect(truth(c.months)).toBeGreaterThanOrEqual(c.lo);
      expect(truth(c.months)).toBeLessThanOrEqual(c.hi);
    }
    // The band is a band: it has width and holds the fitted curve.
    const mid = result.curve.find((c) => c.months === 10)!;
    expect(mid.hi).toBeGreaterThan(mid.lo);
    expect(mid.share).toBeGreaterThan(mid.lo);
    // The half-life of the generator is τ·ln 2 ≈ 10.4 months.
    expect(result.halfLifeMonths).toBeGreaterThan(7);
    expect(result.halfLifeMonths).toBeLessThan(14);
  });

  it('gives the same band for the same readings (seeded from the data)', () => {
    const lamps = generate({ lamps: 8, readingsEach: 2, seed: 3, start: 1, tauMonths: 12 });
    const a = populationCurve({ type: TYPE, lamps });
    const b = populationCurve({ type: TYPE, lamps });
    expect(a).toEqual(b);
  });

  it('a steeper generator gives a band below a gentler one’s at a year', () => {
    const steep = populationCurve({
      type: TYPE,
      lamps: generate({ lamps: 12, readingsEach: 2, seed: 5, start: 1, tauMonths: 8 }),
    });
    const gentle = populationCurve({
      type: TYPE,
      lamps: generate({ lamps: 12, readingsEach: 2, seed: 5, start: 1, tauMonths: 30 }),
    });
    if (!steep.ok || !gentle.ok) throw new Error('expected both curves');
    const at12 = (r: typeof steep) => r.curve.find((c) => c.months === 12)!;
    expect(at12(steep).hi).toBeLessThan(at12(gentle).lo);
  });

  it('draws no curve from too few lamps, and says how many more tests it needs', () => {
    const lamps = generate({ lamps: MIN_LAMPS - 2, readingsEach: 3, seed: 7, start: 1, tauMonths: 12 });
    const result = populationCurve({ type: TYPE, lamps });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.lamps).toBe(3);
    expect(result).not.toHaveProperty('curve');
    expect(result.message).toContain('So far 9 readings of 3 lamps');
    expect(result.message).toContain('test 2 more lamps tested');
    expect(result.message).toContain(`${MIN_READINGS - 9} more readings`);
    // The readings are still there to draw.
    expect(result.points).toHaveLength(9);
  });

  it('draws no curve when the readings are all of one age', () => {
    const lamps = generate({ lamps: 8, readingsEach: 2, seed: 9, start: 1, tauMonths: 12 }).map((l) => ({
      ...l,
      firstUsedOn: addDays(TODAY, -200),
      readings: l.readings.map((r) => ({ ...r, takenAt: `${TODAY}T10:00:00Z` })),
    }));
    const result = populationCurve({ type: TYPE, lamps });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.message).toContain('at least 3 months apart in age');
  });

  it('brings readings through a lid and at other distances to the bare lamp at 30 cm', () => {
    const lamps = generate({ lamps: 8, readingsEach: 2, seed: 11, start: 1, tauMonths: 12 });
    const bare = populationCurve({ type: TYPE, lamps });
    // The same lamps measured through a lid passing half: each reading halves, the curve does not move.
    const lidded = populationCurve({
      type: TYPE,
      lamps: lamps.map((l) => ({
        ...l,
        readings: l.readings.map((r) => ({
          ...r,
          value: r.value / 2,
          through: 'lid' as const,
          throughTransmission: 0.5,
        })),
      })),
    });
    if (!bare.ok || !lidded.ok) throw new Error('expected both curves');
    expect(lidded.startShare).toBeCloseTo(bare.startShare, 6);
  });

  it('counts burn-in readings as left out, as the lamp log does', () => {
    const lamps = generate({ lamps: 6, readingsEach: 2, seed: 13, start: 1, tauMonths: 12 });
    lamps[0]!.readings.push({
      ...lamps[0]!.readings[0]!,
      takenAt: `${addDays(lamps[0]!.firstUsedOn, 2)}T10:00:00Z`,
    });
    const result = populationCurve({ type: TYPE, lamps });
    expect(result.left).toBe(1);
    expect(result.readings).toBe(12);
  });

  it('adopts the fitted shape divided by its start, so a new lamp stays at the catalogue’s figure', () => {
    const result = populationCurve({
      type: TYPE,
      lamps: generate({ lamps: 10, readingsEach: 2, seed: 21, start: 0.8, tauMonths: 12 }),
    });
    if (!result.ok) throw new Error('expected a curve');
    const pts = adoptedPoints(result.fit);
    expect(pts[0]).toEqual([0, 1]);
    expect(pts).toHaveLength(61);
    const at12 = pts[12]![1];
    const fitted = (predict(result.fit, 12 * DAYS_PER_MONTH, () => 1) as number) / result.startShare;
    expect(at12).toBeCloseTo(fitted, 3);
  });
});
