import { describe, expect, it } from 'vitest';
import { beamTan, coneSolidAngle, intensityFromE30, pointIrradiance } from './point';

describe('point source', () => {
  const I = intensityFromE30(100);
  // Inverse-square law (any radiometry text): 100 µW/cm² at 30 cm is 25 at 60 cm.
  it('follows the inverse-square law', () => {
    expect(pointIrradiance(I, 30, 0)).toBeCloseTo(100, 10);
    expect(pointIrradiance(I, 60, 0)).toBeCloseTo(25, 10);
  });
  // Inverse-square and cosine laws: 30 down and 30 across -> 100 · cos45° / 2 = 35.355.
  it('follows the cosine law off axis', () => {
    expect(pointIrradiance(I, 30, 30)).toBeCloseTo(35.355, 3);
    // 30 down, 15 across: 100 · (30/33.541)³ = 71.554.
    expect(pointIrradiance(I, 30, 15)).toBeCloseTo(71.554, 3);
  });
  it('gives nothing to receivers level with or above the lamp (they face away)', () => {
    expect(pointIrradiance(I, 0, 5)).toBe(0);
    expect(pointIrradiance(I, -3, 0)).toBe(0);
  });
  it('computes cone solid angles (2π(1 − cos half-angle))', () => {
    expect(coneSolidAngle(360)).toBeCloseTo(4 * Math.PI, 12);
    expect(coneSolidAngle(180)).toBeCloseTo(2 * Math.PI, 12);
    expect(coneSolidAngle(60)).toBeCloseTo(2 * Math.PI * (1 - Math.cos(Math.PI / 6)), 12);
  });
  it('has a beam half-width factor', () => {
    expect(beamTan(90)).toBeCloseTo(1, 12);
    expect(beamTan(200)).toBe(Infinity);
  });
});
