import { describe, expect, it } from 'vitest';
import { distanceFactor, toReference } from './geometry';

describe('distance normalisation', () => {
  it('follows the inverse-square law for a bulb (any radiometry text: E ∝ 1/d² on the axis)', () => {
    const bulb = { form: 'bulb' as const, lengthCm: null };
    expect(toReference(bulb, 100, 15)).toBeCloseTo(25, 9);
    expect(distanceFactor(bulb, 30, 60)).toBeCloseTo(0.25, 9);
  });

  it('falls about as 1/d close to a long tube and as 1/d² far from it (IES aspect-factor method)', () => {
    const tube = { form: 'tube' as const, lengthCm: 120 };
    // Close: d ≪ L, α → π/2, E → (π/2)/d: halving the distance about doubles the reading.
    expect(distanceFactor(tube, 5, 2.5)).toBeGreaterThan(1.9);
    expect(distanceFactor(tube, 5, 2.5)).toBeLessThan(2.05);
    // Far: d ≫ L, E → (L/d)/d: doubling the distance quarters it.
    expect(distanceFactor(tube, 2000, 4000)).toBeCloseTo(0.25, 3);
  });

  it('is exact at the reference distance and refuses a non-positive distance', () => {
    const tube = { form: 'tube' as const, lengthCm: 55 };
    expect(toReference(tube, 42, 30)).toBe(42);
    expect(() => toReference(tube, 42, 0)).toThrow(RangeError);
  });
});
