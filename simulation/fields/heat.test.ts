import { describe, expect, it } from 'vitest';
import { airTempC, KELVIN, STEFAN_BOLTZMANN, surfaceTempC, topAirRiseK } from './heat';

describe('surface energy balance', () => {
  // Steady-state energy balance q = h(Ts − Ta) + εσ(Ts⁴ − Ta⁴), ε 0.95, air 25 °C, no conduction
  // (Incropera, Fundamentals of Heat and Mass Transfer).
  it('matches worked balances', () => {
    expect(surfaceTempC(300, 25, 0.95, 5)).toBeCloseTo(51.08, 2);
    expect(surfaceTempC(500, 25, 0.95, 5)).toBeCloseTo(66.59, 2);
    expect(surfaceTempC(300, 25, 0.95, 10)).toBeCloseTo(43.45, 2);
  });

  it('satisfies the balance it solves and returns the air temperature with no flux', () => {
    const ts = surfaceTempC(1234, 31, 0.9, 7) + KELVIN;
    const ta = 31 + KELVIN;
    expect(7 * (ts - ta) + 0.9 * STEFAN_BOLTZMANN * (ts ** 4 - ta ** 4)).toBeCloseTo(1234, 6);
    expect(surfaceTempC(0, 31, 0.9, 7)).toBe(31);
  });
});

describe('air model', () => {
  const enc = { width: 120, height: 60, depth: 60 };
  it('reads the room temperature everywhere with no lamps', () => {
    expect(topAirRiseK([], enc)).toBe(0);
    for (const y of [0, 30, 45, 60]) expect(airTempC(y, 60, 24, 0)).toBe(24);
  });
  it('warms only the upper half, most at the top', () => {
    const rise = topAirRiseK([{ watts: 100, y: 55 }], enc);
    // 100 W / (5 W/m²K × 3.6 m²) = 5.6 K.
    expect(rise).toBeCloseTo(100 / 18, 6);
    expect(airTempC(10, 60, 24, rise)).toBe(24);
    expect(airTempC(45, 60, 24, rise)).toBeCloseTo(24 + rise / 2, 9);
    expect(airTempC(60, 60, 24, rise)).toBeCloseTo(24 + rise, 9);
  });
});
