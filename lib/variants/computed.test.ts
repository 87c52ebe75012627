import { beforeEach, describe, expect, it } from 'vitest';
import { parseDesign, type Design, type SpeciesSheet } from '@/simulation';
import { assessFor } from '@/shared/designs/assessment';
import { computedCache, computedFor } from './computed';
import { bandsFor, scaleFor, simulate } from '@/shared/designs/simulate';

const design = (uvbAt30: number): Design => {
  const r = parseDesign({
    format: 'baskwell.design',
    version: 2,
    enclosure: { width: 60, height: 40, depth: 40, roomTempC: 24 },
    objects: [
      { type: 'lamp', id: 'uv', tech: 't5', form: 'tube', x: 30, y: 42, length: 30, uvbAt30 },
      { type: 'lamp', id: 'heat', tech: 'halogen', form: 'bulb', x: 45, y: 42, uvbAt30: 0, watts: 50 },
      { type: 'ledge', id: 'r', x: 35, y: 0, width: 20, height: 12 },
    ],
  });
  if (!r.ok) throw new Error(`${r.error.path}: ${r.error.message}`);
  return r.design;
};

// An invented sheet for the test (the values only need to give a definite check).
const sheet: SpeciesSheet = { name: 'Test skink', uvZone: 3, baskingSurfaceC: [35, 40], coolEndC: [22, 28] };

beforeEach(() => computedCache.clear());

describe('computedFor', () => {
  it('gives what the engine gives: the same figures, scale, bands and species check', () => {
    const d = design(50);
    const c = computedFor(d);
    const sim = simulate(d);
    expect(c.sim.figures).toEqual(sim.figures);
    const scale = scaleFor('tempC', [sim]);
    expect(c.view('tempC')).toEqual({ scale, bands: bandsFor(sim, scale) });
    expect(c.assessment(sheet)).toEqual(assessFor(d, sheet));
  });

  it('simulates a design once: a second request (a parsed copy) reuses the first run', () => {
    const d = design(50);
    const first = computedFor(d);
    const again = computedFor(structuredClone(d));
    expect(again.sim).toBe(first.sim);
    expect(again.view('uvi')).toBe(first.view('uvi'));
    expect(computedCache.size()).toBe(1);
  });

  it('keys on content and lamp age: a changed design or another month is computed afresh', () => {
    const base = computedFor(design(50));
    const stronger = computedFor(design(80));
    expect(stronger.sim).not.toBe(base.sim);
    expect(stronger.sim.figures.baskingUvbMax).toBeGreaterThan(base.sim.figures.baskingUvbMax);
    const older = computedFor(design(50), 6);
    expect(older.sim).not.toBe(base.sim);
    expect(older.sim.months).toBe(6);
  });

  it('holds a bounded number of designs', () => {
    const capacity = computedCache.capacity();
    expect(capacity).toBe(24); // the default of COMPUTED_CACHE_ENTRIES
    for (let k = 0; k < capacity + 3; k++) computedFor(design(20 + k));
    expect(computedCache.size()).toBe(capacity);
  });
});
