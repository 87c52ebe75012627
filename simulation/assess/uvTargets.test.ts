import { describe, expect, it } from 'vitest';
import { assess } from './assess';
import type { Design, DesignObject } from '../model/schema';
import type { SpeciesSheet } from '../model/species';
import { emptyDesign } from '../testing/fixtures';
import { shortWaveCaution } from './uvTargets';
import { isShortWaveRatio, SUNLIGHT_UVI_PER_UVB } from '../sources/uv';

// Zone 3 basking UV Index 2.9–7.4 (Ferguson et al. 2010, Zoo Biology 29:317–334). The sheet's broadband
// rule of thumb of 115–235 µW/cm² is the zone 4 hint at 0.04 UVI per µW/cm² (common practice, no
// published source), so a lamp several times that ratio meets the zone with far fewer µW/cm².
const zone3: SpeciesSheet = {
  name: 'Test skink',
  uvZone: 3,
  baskingSurfaceC: [35, 40],
  coolEndC: [22, 28],
  uvbTargetUw: [115, 235],
};
const design = (ratio: number): Design => ({
  ...emptyDesign(120, 60),
  objects: [
    {
      type: 'lamp',
      id: 'uv',
      name: 'Spot lamp',
      tech: 'compact',
      form: 'bulb',
      x: 30,
      y: 30,
      // 30 cm above the floor: UVI = uvbAt30 × ratio straight below, 4.0 here.
      uvbAt30: 4 / ratio,
      uviPerUvb: ratio,
      beamDeg: 90,
      watts: 0,
    } as DesignObject,
  ],
});
const byId = (d: Design, id: string) => assess(d, zone3).findings.find((f) => f.id === id);

describe('UV targets in the unit that is meant', () => {
  it('judges a zone-3 species under a high-ratio lamp by UV Index, not the µW/cm² rule of thumb', () => {
    const d = design(0.12);
    const uvi = byId(d, 'basking-uvi')!;
    expect(uvi.numbers.maxUvi).toBeGreaterThan(2.9);
    expect(uvi.numbers.maxUvi).toBeLessThan(7.4);
    expect(uvi.status).toBe('pass');
    expect(uvi.message).toMatch(/Judged by UV Index/);
    const uvb = byId(d, 'basking-uvb')!;
    // About 33 µW/cm², far below the 115–235 rule of thumb: said, but it does not override the UV Index.
    expect(uvb.numbers.maxUvb).toBeLessThan(115);
    expect(uvb.status).toBe('pass');
    expect(uvb.title).toMatch(/shop rule of thumb/);
    expect(uvb.message).toMatch(/the UV Index decides/);
    expect(uvb.message).toMatch(/meters differ in spectral response/);
    const sw = byId(d, 'short-wave-uvb')!;
    expect(sw.status).toBe('attention');
    expect(sw.message).toMatch(/photokeratoconjunctivitis/);
    expect(sw.message).toMatch(/vet/);
  });

  it('gives no short-wave caution for a lamp near sunlight’s ratio', () => {
    expect(byId(design(0.04), 'short-wave-uvb')).toBeUndefined();
    expect(shortWaveCaution(0.04)).toBeNull();
    // from memory: high midday sun gives about UVI 10 with 250 µW/cm² of broadband UVB.
    expect(SUNLIGHT_UVI_PER_UVB).toBeCloseTo(10 / 250, 6);
    expect(isShortWaveRatio(0.079)).toBe(false);
    expect(isShortWaveRatio(0.08)).toBe(true);
  });

  it('asks for attention on the rule of thumb only when the UV Index check fails too', () => {
    const weak: Design = design(0.04);
    (weak.objects[0] as { uvbAt30: number }).uvbAt30 = 40; // UVI 1.6 below, under zone 3's 2.9
    expect(byId(weak, 'basking-uvi')!.status).not.toBe('pass');
    expect(byId(weak, 'basking-uvb')!.status).toBe('attention');
  });
});
