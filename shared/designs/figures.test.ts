import { describe, expect, it } from 'vitest';
import { computeFields, parseDesign, type Design } from '@/simulation';
import { keyFigures, surfacePoints, UV_FREE_UVI } from './figures';

const design = (objects: unknown[]): Design => {
  const r = parseDesign({
    format: 'baskwell.design',
    version: 2,
    enclosure: { width: 120, height: 60, depth: 60, roomTempC: 24 },
    objects,
  });
  if (!r.ok) throw new Error(`${r.error.path}: ${r.error.message}`);
  return r.design;
};

const bulb = {
  type: 'lamp',
  id: 'b',
  tech: 'compact',
  form: 'bulb',
  x: 60,
  y: 55,
  uvbAt30: 20,
  beamDeg: 360,
};
const ledge = { type: 'ledge', id: 'r', x: 50, y: 0, width: 20, height: 20 };

describe('surfacePoints', () => {
  it('reads the floor, ledge and hide tops and the top of a perch, never inside a ledge', () => {
    const d = design([
      ledge,
      { type: 'hide', id: 'h', x: 5, y: 0, width: 20, height: 10 },
      { type: 'perch', id: 'p', x1: 80, y1: 10, x2: 100, y2: 10, thickness: 4 },
    ]);
    const pts = surfacePoints(d);
    const on = (s: string) => pts.filter((p) => p.surface === s);
    expect(on('floor').length).toBeGreaterThan(0);
    expect(on('floor').every((p) => p.x <= 50 || p.x >= 70)).toBe(true);
    // Just above each top: ledge 20 cm, hide 10 cm, a level 4 cm perch at 10 + 2 cm.
    expect(on('ledge').every((p) => p.y > 20 && p.y < 20.5)).toBe(true);
    expect(on('hide').every((p) => p.y > 10 && p.y < 10.5)).toBe(true);
    expect(on('perch').every((p) => p.y > 12 && p.y < 12.5)).toBe(true);
  });
});

describe('keyFigures', () => {
  it('reads an empty enclosure as room temperature and entirely free of UV', () => {
    const d = design([]);
    const f = keyFigures(d, computeFields(d, { cellCm: 2 }));
    expect(f.baskingUviMax).toBe(0);
    expect(f.hotSpotC).toBeCloseTo(24, 6);
    expect(f.coolEndC).toBeCloseTo(24, 6);
    expect(f.uvFreeShare).toBe(100);
    expect(f.uvFreeAreaCm2).toBe(120 * 60);
  });

  it('puts the basking UV on the ledge top right under a bare bulb, by the inverse-square law', () => {
    const d = design([bulb, ledge]);
    const f = keyFigures(d, computeFields(d, { cellCm: 2 }));
    // Point source, receiver on the ledge top below it: E = uvbAt30 · 30² · h / (h² + x²)^(3/2)
    // (inverse-square and cosine laws, any radiometry text), read at the sample nearest the axis.
    const at = f.baskingUviAt!;
    expect(Math.abs(at.x - 60)).toBeLessThanOrEqual(0.5);
    expect(at.y).toBeGreaterThan(20);
    expect(at.y).toBeLessThan(20.5);
    const h = 55 - at.y;
    const dx = at.x - 60;
    expect(f.baskingUvbMax).toBeCloseTo((20 * 900 * h) / (h * h + dx * dx) ** 1.5, 2);
  });

  it('counts a shaded region as UV-free and a lit one not', () => {
    const d = design([bulb]);
    const grid = computeFields(d, { cellCm: 2 });
    const f = keyFigures(d, grid);
    let free = 0;
    for (const v of grid.uvi) if (v < UV_FREE_UVI) free++;
    expect(f.uvFreeAreaCm2).toBe(free * 4);
    expect(f.uvFreeShare).toBeGreaterThan(0);
    expect(f.uvFreeShare).toBeLessThan(100);
  });

  it('ages with the months added', () => {
    const d = design([bulb, ledge]);
    const now = keyFigures(d, computeFields(d, { cellCm: 4 }));
    const later = keyFigures(d, computeFields(d, { cellCm: 4, addMonths: 12 }), { addMonths: 12 });
    expect(later.baskingUvbMax).toBeLessThan(now.baskingUvbMax);
  });
});
