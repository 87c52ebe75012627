import { describe, expect, it } from 'vitest';
import { airTempC, finishRow, KELVIN, STEFAN_BOLTZMANN, surfaceTempC, topAirRiseK } from './heat';
import { assess } from '../assess/assess';
import { parseDesign } from '../model/parse';
import { DESIGN_FORMAT, DESIGN_VERSION } from '../model/schema';

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

  it('solves a grid row (a looser Newton stop) to within 5e-5 K of the point solution', () => {
    // Fluxes from a glimmer to far past any basking spot, cold and warm air, still and moving air.
    const qs = [0, 1e-3, 0.5, 3, 20, 75, 150, 300, 600, 1200, 2500, 5000, 1e4, 3e4, 1e5];
    const row = {
      u: new Float64Array(qs.length),
      v: new Float64Array(qs.length),
      q: Float64Array.from(qs, (q) => q / 0.95),
    };
    const n = qs.length + 2;
    const fields = { uvb: new Float64Array(n), uvi: new Float64Array(n), tempC: new Float64Array(n) };
    const out = fields.tempC;
    let worst = 0;
    for (const airC of [0, 18, 24, 35, 45]) {
      for (const hc of [3, 7, 15]) {
        finishRow(row, 0, qs.length, airC, 0.95, 0.95, hc, fields, 2);
        expect(out[2]).toBe(airC);
        qs.forEach((q, c) => {
          worst = Math.max(worst, Math.abs(out[2 + c]! - surfaceTempC(q, airC, 0.95, hc)));
        });
      }
    }
    expect(worst).toBeLessThan(5e-5);
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

describe('walls of the enclosure', () => {
  const enc = { width: 120, height: 60, depth: 60 };
  it('sets the wall loss: wood and PVC hold about twice the rise of glass, mesh far less', () => {
    // U: glass 5, wood 2.5, PVC 2.5, mesh 15 W/m²K (model/walls.ts, from memory); area 3.6 m².
    const glass = topAirRiseK([{ watts: 100, y: 55 }], enc);
    expect(topAirRiseK([{ watts: 100, y: 55 }], { ...enc, walls: 'glass' })).toBe(glass);
    expect(topAirRiseK([{ watts: 100, y: 55 }], { ...enc, walls: 'wood' })).toBeCloseTo(100 / 9, 6);
    expect(topAirRiseK([{ watts: 100, y: 55 }], { ...enc, walls: 'pvc' })).toBeCloseTo(2 * glass, 6);
    expect(topAirRiseK([{ watts: 100, y: 55 }], { ...enc, walls: 'mesh' })).toBeCloseTo(100 / 54, 6);
  });
  it('warms the air, and so the surfaces, of a wooden enclosure more than a glass one', () => {
    const design = (walls?: 'wood') => ({
      format: DESIGN_FORMAT,
      version: DESIGN_VERSION,
      enclosure: { width: 120, height: 60, depth: 60, roomTempC: 22, ...(walls ? { walls } : {}) },
      objects: [
        {
          type: 'lamp' as const,
          id: 'h',
          tech: 'ceramic' as const,
          form: 'bulb' as const,
          x: 100,
          y: 55,
          watts: 150,
        },
        { type: 'ledge' as const, id: 'shelf', x: 0, y: 40, width: 20, height: 5 },
      ],
    });
    const sheet = {
      name: 'Test',
      uvZone: 1 as const,
      baskingSurfaceC: [30, 35] as [number, number],
      coolEndC: [20, 25] as [number, number],
    };
    const hottest = (d: ReturnType<typeof design>) =>
      assess(parseOrThrow(d), sheet).findings.find((f) => f.id === 'hot-spot')!.numbers.hotC!;
    expect(hottest(design('wood'))).toBeGreaterThan(hottest(design()) + 1);
    expect(parseDesign({ ...design(), enclosure: { ...design().enclosure, walls: 'stone' } }).ok).toBe(false);
  });
});

function parseOrThrow(d: unknown) {
  const r = parseDesign(d);
  if (!r.ok) throw new Error(r.error.message);
  return r.design;
}
