import { describe, expect, it } from 'vitest';
import type { FieldGrid } from '@/simulation';
import { bandLabel, bandOf, sharedScale, UVI_EDGES } from './field-scale';

const grid = (values: number[]): FieldGrid => {
  const a = Float32Array.from(values);
  return { nx: values.length, ny: 1, cellCm: 1, width: values.length, height: 1, uvb: a, uvi: a, tempC: a };
};

describe('sharedScale', () => {
  it('uses the Ferguson zone edges for the UV Index whatever the grids hold', () => {
    const s = sharedScale('uvi', [grid([0, 50])]);
    expect(s.thresholds).toEqual(UVI_EDGES);
    expect(s.colors).toHaveLength(UVI_EDGES.length);
    // Ferguson et al. 2010: zone 3 mean 1.0–2.6, zone 4 mean 2.6–3.5.
    expect(bandLabel(s, bandOf(s, 2))).toBe('1–2.6');
    expect(bandLabel(s, bandOf(s, 0.05))).toBe('0–0.1');
    expect(bandLabel(s, bandOf(s, 3))).toBe('2.6–3.5');
    expect(bandLabel(s, bandOf(s, 40))).toBe('≥ 9.5');
    expect(bandOf(s, -1)).toBe(0);
  });

  it('spans both grids for temperature, so the same value gets the same colour on both sides', () => {
    const a = grid(Array.from({ length: 100 }, (_, i) => 24 + i * 0.1)); // 24…33.9
    const b = grid(Array.from({ length: 100 }, (_, i) => 24 + i * 0.2)); // 24…43.8
    const s = sharedScale('tempC', [a, b]);
    expect(s.thresholds[0]).toBeLessThanOrEqual(24);
    expect(s.thresholds.at(-1)!).toBeGreaterThanOrEqual(40);
    expect(sharedScale('tempC', [b, a])).toEqual(s);
  });

  it('is not stretched by a few extreme cells under a lamp', () => {
    const values = Array.from({ length: 1000 }, (_, i) => 24 + (i % 20));
    values[0] = 900;
    const s = sharedScale('tempC', [grid(values)]);
    expect(s.thresholds.at(-1)!).toBeLessThan(60);
    expect(bandLabel(s, bandOf(s, 900))).toMatch(/^≥/);
  });

  it('ends at the given top (the hottest reachable surface), leaving hotter air to the top band', () => {
    const values = Array.from({ length: 1000 }, (_, i) => 24 + (i % 200));
    const s = sharedScale('tempC', [grid(values)], { top: 45 });
    expect(s.thresholds.at(-1)!).toBeLessThanOrEqual(46);
    expect(s.thresholds.at(-1)!).toBeGreaterThanOrEqual(44);
    expect(s.thresholds.length).toBeGreaterThanOrEqual(4);
  });

  it('spreads a flat field over a readable range', () => {
    const s = sharedScale('tempC', [grid([24, 24, 24])]);
    expect(s.thresholds[0]).toBe(24);
    expect(s.thresholds.at(-1)!).toBeGreaterThanOrEqual(32);
    expect(s.thresholds[1]! - s.thresholds[0]!).toBeGreaterThanOrEqual(1);
    expect(bandOf(s, 24)).toBeGreaterThanOrEqual(0);
  });
});
