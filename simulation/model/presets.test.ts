import { describe, expect, it } from 'vitest';
import { probe } from '../fields/grid';
import type { Design, LampObject } from './schema';
import { GOOD_REFLECTOR_GAIN, LAMP_PRESETS, USEFUL_REACH_UVI, type LampPresetId } from './presets';
import { LAMP_TECHS } from './techs';
import { DEFAULT_SCREEN_UVB_TRANSMISSION, meshOpenArea } from './materials';

/** Useful reach (see presets.ts): distance straight below a new, bare lamp where the UVI falls to 1.0. */
function usefulReach(
  lamp: Omit<LampObject, 'type' | 'id' | 'x' | 'y' | 'name'>,
  extra: Partial<LampObject> = {},
) {
  const top = 400;
  const design: Design = {
    format: 'baskwell.design',
    version: 2,
    enclosure: { width: 400, height: top, depth: 60 },
    objects: [{ type: 'lamp', id: 'l', x: 200, y: top, ...lamp, ...extra } as LampObject],
  };
  let lo = 0.01;
  let hi = top;
  for (let k = 0; k < 60; k++) {
    const mid = (lo + hi) / 2;
    const uvi = probe(design, [{ x: 200, y: top - mid }])[0]!.uvi;
    if (uvi > USEFUL_REACH_UVI) lo = mid;
    else hi = mid;
  }
  return lo;
}

describe('lamp presets: useful reach of each class', () => {
  // common practice, no published source: low-output tubes ≈ 8 cm, medium ≈ 30 cm, high 40–45 cm,
  // very high 50–55 cm, mercury vapour ≈ 90 cm, metal halide ≈ 180 cm. Tolerance: ±10 % of a single
  // figure, or inside the stated range.
  const cases: [LampPresetId, number, number][] = [
    ['t5-low', 8 * 0.9, 8 * 1.1],
    ['t5-medium', 27, 33],
    ['t8-medium', 27, 33],
    ['t5-high', 40, 45],
    ['t5-very-high', 50, 55],
    ['mercury-vapour-160', 81, 99],
    ['metal-halide-70', 162, 198],
  ];
  for (const [id, lo, hi] of cases) {
    it(`${id} reaches UVI 1 at ${lo}–${hi} cm`, () => {
      const r = usefulReach(LAMP_PRESETS[id].lamp);
      expect(r).toBeGreaterThanOrEqual(lo);
      expect(r).toBeLessThanOrEqual(hi);
    });
  }

  it('a good reflector lengthens a medium tube’s reach from about 30 to about 50 cm', () => {
    // common practice, no published source. Tolerance ±10 %.
    const r = usefulReach(LAMP_PRESETS['t5-medium'].lamp, { reflectorGain: GOOD_REFLECTOR_GAIN });
    expect(r).toBeGreaterThanOrEqual(45);
    expect(r).toBeLessThanOrEqual(55);
  });

  it('every preset is a valid lamp of its technology, and lamps without UVB have no reach', () => {
    for (const p of Object.values(LAMP_PRESETS)) {
      expect(LAMP_TECHS[p.lamp.tech]).toBeDefined();
      if ((p.lamp.uvbAt30 ?? 0) === 0) expect(p.usefulReachCm).toBeNull();
      expect(p.source.length).toBeGreaterThan(10);
    }
  });
});

describe('barriers', () => {
  it('woven mesh 1.0 mm aperture, 0.25 mm wire passes 0.64 (ISO 9044 open area)', () => {
    expect(meshOpenArea(1.0, 0.25)).toBeCloseTo(0.64, 12);
    expect(meshOpenArea(0, 1)).toBe(0);
  });
  it('the default mesh lid cuts roughly a quarter to a half of the UVB', () => {
    // common practice, no published source.
    const cut = 1 - DEFAULT_SCREEN_UVB_TRANSMISSION;
    expect(cut).toBeGreaterThanOrEqual(0.25);
    expect(cut).toBeLessThanOrEqual(0.5);
  });
});
