import { describe, expect, it } from 'vitest';
import { LAMP_LIFETIME, lifetimeSources, NO_DECAY, techDecay } from './lifetime';
import { decayFactor, LAMP_TECH_IDS, LAMP_TECHS } from './techs';

const halfAt = (curve: Parameters<typeof decayFactor>[0]) => {
  let m = 0;
  while (decayFactor(curve, m) > 0.5 && m < 1000) m += 0.25;
  return m;
};

describe('the lamp lifetime table', () => {
  it('has a row for every technology, each figure with its mark', () => {
    expect(Object.keys(LAMP_LIFETIME).sort()).toEqual([...LAMP_TECH_IDS].sort());
    for (const t of LAMP_TECH_IDS) {
      const l = LAMP_LIFETIME[t];
      const uv = LAMP_TECHS[t].uvbAt30 > 0;
      expect(l.decay !== null, t).toBe(uv);
      expect(l.testMonths !== null, t).toBe(uv);
      if (l.decay) expect(l.decayMark, t).toMatch(/^(from memory|common practice, no published source)$/);
      if (l.replaceMonths !== null) expect(l.replaceMark, t).toBeTruthy();
      if (l.testMonths !== null) expect(l.testMark, t).toBeTruthy();
      expect(l.note.length, t).toBeGreaterThan(10);
    }
  });

  // common practice, no published source: T5 UVB tubes are replaced after about 12 months, T8 tubes and
  // compact lamps after about 6, mercury vapour after 6–12 months (the short end taken), metal halide after
  // about 12; no established interval for UVB LEDs; a UV lamp is measured every few months.
  it('gives the trade’s replacement intervals', () => {
    expect(LAMP_LIFETIME.t5.replaceMonths).toBe(12);
    expect(LAMP_LIFETIME.t8.replaceMonths).toBe(6);
    expect(LAMP_LIFETIME.compact.replaceMonths).toBe(6);
    expect(LAMP_LIFETIME['mercury-vapour'].replaceMonths).toBe(6);
    expect(LAMP_LIFETIME['metal-halide'].replaceMonths).toBe(12);
    expect(LAMP_LIFETIME['led-uvb'].replaceMonths).toBeNull();
    for (const t of ['halogen', 'incandescent', 'ceramic'] as const) {
      expect(LAMP_LIFETIME[t].replaceMonths).toBeNull();
      expect(techDecay(t)).toBe(NO_DECAY);
      expect(decayFactor(techDecay(t), 120)).toBe(1);
    }
  });

  // from memory: a UV lamp's output is down to about half by the time the trade says to replace it, so the
  // half-life is never longer than the usual replacement interval (a longer one would let "months until
  // unmet" run past the lamp type's own advice).
  it('halves no later than the usual replacement age', () => {
    for (const t of LAMP_TECH_IDS) {
      const l = LAMP_LIFETIME[t];
      if (!l.decay || l.replaceMonths === null) continue;
      expect(halfAt(l.decay), t).toBeLessThanOrEqual(l.replaceMonths);
      expect(halfAt(l.decay), t).toBeGreaterThanOrEqual(l.replaceMonths / 2);
    }
    // The mercury vapour class often loses much of its output within months (from memory).
    expect(halfAt(techDecay('mercury-vapour'))).toBeLessThanOrEqual(8);
  });

  it('starts at 1 and falls; tables interpolate', () => {
    for (const t of LAMP_TECH_IDS) expect(decayFactor(techDecay(t), 0)).toBe(1);
    const table = {
      points: [
        [0, 1],
        [6, 0.7],
        [12, 0.6],
      ] as [number, number][],
    };
    expect(decayFactor(table, 3)).toBeCloseTo(0.85, 12);
    expect(decayFactor(table, 24)).toBeCloseTo(0.6, 12);
  });

  it('says where each figure comes from', () => {
    expect(lifetimeSources('t8').decay).toMatch(/half-life 6 months .*\(from memory\)/);
    expect(lifetimeSources('t8').replace).toMatch(/6 months \(common practice, no published source\)/);
    expect(lifetimeSources('led-uvb').replace).toMatch(/no established replacement interval/);
    expect(lifetimeSources('ceramic').replace).toMatch(/replace it when it fails/);
  });
});
