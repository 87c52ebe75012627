import { describe, expect, it } from 'vitest';
import { assess } from './assess';
import { depthFindings, OFF_PLANE_CM } from './depthFindings';
import type { Design, DesignObject } from '../model/schema';
import type { SpeciesSheet } from '../model/species';
import { emptyDesign } from '../testing/fixtures';

const zone3: SpeciesSheet = { name: 'Test skink', uvZone: 3, baskingSurfaceC: [35, 40], coolEndC: [22, 28] };
const lamp = (z?: number): DesignObject => ({
  type: 'lamp',
  id: 'uv',
  tech: 'compact',
  form: 'bulb',
  x: 30,
  y: 30,
  ...(z === undefined ? {} : { z }),
  uvbAt30: 100,
  uviPerUvb: 0.04,
  beamDeg: 120,
  watts: 0,
});
const withLamp = (z?: number, sectionZ?: number): Design => {
  const d = emptyDesign(120, 45, 60);
  if (sectionZ !== undefined) d.enclosure.sectionZ = sectionZ;
  return { ...d, objects: [lamp(z)] };
};
const find = (d: Design) => assess(d, zone3).findings.find((f) => f.id === 'depth-plane');

describe('lamps off the checked plane', () => {
  it('says nothing while every lamp hangs in (or near) the side view', () => {
    expect(find(withLamp())).toBeUndefined();
    expect(depthFindings(withLamp(30 + OFF_PLANE_CM - 0.1))).toEqual([]);
  });

  it('asks to check the lamp’s own plane when it hangs 20 cm behind the side view', () => {
    const d = withLamp(50);
    const f = find(d)!;
    expect(f.status).toBe('attention');
    expect(f.message).toMatch(/side view 30 cm from the front; uv hangs 20 cm behind it/);
    expect(f.message).toMatch(/estimate/i);
    expect(f.numbers).toEqual({ sectionCm: 30, lamps: 1, furthestCm: 20 });
    expect(f.where).toEqual({ kind: 'object', objectIds: ['uv'] });
    expect(assess(d, zone3).overall).not.toBe('pass');
    expect(find(withLamp(10))!.message).toMatch(/20 cm in front of it/);
  });

  it('moved to the lamp’s plane, the check reads the in-plane value again', () => {
    const off = assess(withLamp(50), zone3).findings.find((f) => f.id === 'basking-uvi')!;
    const there = assess(withLamp(50, 50), zone3);
    expect(there.findings.some((f) => f.id === 'depth-plane')).toBe(false);
    const basking = there.findings.find((f) => f.id === 'basking-uvi')!;
    // 100 µW/cm² × 0.04 = UVI 4.0 straight below at 30 cm (inverse-square law), as drawn in the plane.
    expect(basking.numbers.maxUvi).toBeCloseTo(4.0, 2);
    // 20 cm off the plane: 4.0 · (30 / √(30² + 20²))³ = 2.30 (inverse-square and cosine laws).
    expect(off.numbers.maxUvi).toBeCloseTo(2.3, 1);
  });
});
