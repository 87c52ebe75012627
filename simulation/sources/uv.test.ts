import { describe, expect, it } from 'vitest';
import { erythemaWeight, uviFromErythemal, uviPerUvbFromSpectrum } from './uv';

describe('UV Index', () => {
  // WHO, Global Solar UV Index: A Practical Guide (2002): 0.025 W/m² erythemally weighted is UVI 1.
  it('converts erythemally weighted irradiance to UVI', () => {
    expect(uviFromErythemal(0.025)).toBeCloseTo(1, 12);
    expect(uviFromErythemal(0.2)).toBeCloseTo(8, 12);
  });

  // ISO/CIE 17166 erythema reference action spectrum values.
  it('weights wavelengths by the erythema action spectrum', () => {
    expect(erythemaWeight(298)).toBe(1);
    expect(erythemaWeight(300)).toBeCloseTo(0.64863, 4);
    expect(erythemaWeight(310)).toBeCloseTo(0.074473, 5);
    expect(erythemaWeight(328)).toBeCloseTo(0.0015136, 6);
    expect(erythemaWeight(400)).toBeCloseTo(1.2589e-4, 8);
    expect(erythemaWeight(450)).toBe(0);
  });

  it('derives the UVI per µW/cm² ratio from a spectrum', () => {
    // A flat spectrum of 1 W/m²/nm at 290–298 nm (weight 1) read by a 280–315 nm meter:
    // erythemal 8 W/m², UVB 8 W/m² = 800 µW/cm², UVI 320 -> 0.4 UVI per µW/cm².
    const flat: [number, number][] = [
      [290, 1],
      [298, 1],
    ];
    expect(uviPerUvbFromSpectrum(flat)).toBeCloseTo(0.4, 10);
    // A line at 310 nm: ratio 0.4 × 0.074473.
    const line: [number, number][] = [
      [309.5, 0],
      [310, 1],
      [310.5, 0],
    ];
    expect(uviPerUvbFromSpectrum(line)).toBeCloseTo(0.4 * 0.074473, 3);
    expect(uviPerUvbFromSpectrum([])).toBe(0);
  });
});
