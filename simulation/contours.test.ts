import { describe, expect, it } from 'vitest';
import { contourBands, defaultThresholds, UVI_THRESHOLDS } from './contours';
import type { FieldGrid } from './fields/types';
import { computeFields } from './fields/grid';
import { EXAMPLE_DESIGN } from './testing/fixtures';

function gridFrom(nx: number, ny: number, cellCm: number, f: (x: number, y: number) => number): FieldGrid {
  const v = new Float32Array(nx * ny);
  for (let j = 0; j < ny; j++)
    for (let i = 0; i < nx; i++) v[j * nx + i] = f((i + 0.5) * cellCm, (j + 0.5) * cellCm);
  return { nx, ny, cellCm, width: nx * cellCm, height: ny * cellCm, uvb: v, uvi: v, tempC: v };
}

const ringArea = (r: [number, number][]) => {
  let a = 0;
  for (let k = 0; k < r.length; k++) {
    const p = r[k]!;
    const q = r[(k + 1) % r.length]!;
    a += p[0] * q[1] - q[0] * p[1];
  }
  return a / 2;
};
const inRing = (x: number, y: number, r: [number, number][]) => {
  let inside = false;
  for (let k = 0, m = r.length - 1; k < r.length; m = k++) {
    const a = r[k]!;
    const b = r[m]!;
    if (a[1] > y !== b[1] > y && x < ((b[0] - a[0]) * (y - a[1])) / (b[1] - a[1]) + a[0]) inside = !inside;
  }
  return inside;
};
const inBand = (x: number, y: number, polys: [number, number][][][]) =>
  polys.some((p) => inRing(x, y, p[0]!) && !p.slice(1).some((h) => inRing(x, y, h)));

describe('contour bands', () => {
  // A hill with a dip in the middle: rings with holes and islands.
  const hill = gridFrom(60, 40, 0.5, (x, y) => {
    const r = Math.hypot(x - 15, y - 10);
    return 10 * Math.exp(-((r - 5) ** 2) / 8);
  });
  const thresholds = [0, 2, 4, 6, 8];

  it('partitions the grid: outer rings counter-clockwise, holes clockwise, areas add up', () => {
    const bands = contourBands(hill, 'uvb', thresholds);
    let total = 0;
    for (const b of bands) {
      for (const poly of b.polygons) {
        expect(ringArea(poly[0]!)).toBeGreaterThan(0);
        for (const h of poly.slice(1)) expect(ringArea(h)).toBeLessThan(0);
        total += poly.reduce((s, r) => s + ringArea(r), 0);
      }
    }
    // d3-contour cuts each grid corner by a half-cell triangle: 4 × (0.25 cm)² / 2.
    expect(total).toBeCloseTo(30 * 20 - (4 * (0.25 * 0.25)) / 2, 6);
  });

  it('every cell centre lies in exactly the band of its value (design coordinates, y up)', () => {
    const bands = contourBands(hill, 'uvb', thresholds);
    let wrong = 0;
    for (let j = 0; j < hill.ny; j++) {
      for (let i = 0; i < hill.nx; i++) {
        const x = (i + 0.5) * 0.5;
        const y = (j + 0.5) * 0.5;
        const v = hill.uvb[j * hill.nx + i]!;
        const hits = bands.filter((b) => inBand(x, y, b.polygons));
        if (hits.length !== 1 || v < hits[0]!.lo || (v >= hits[0]!.hi && hits[0] !== bands[bands.length - 1]))
          wrong++;
      }
    }
    expect(wrong).toBe(0);
  });

  it('places every cell centre of real fields in exactly one band', () => {
    const g = computeFields(EXAMPLE_DESIGN, { cellCm: 2 });
    for (const field of ['uvb', 'uvi', 'tempC'] as const) {
      const bands = contourBands(g, field);
      let wrong = 0;
      for (let j = 0; j < g.ny; j++) {
        for (let i = 0; i < g.nx; i++) {
          const v = g[field][j * g.nx + i]!;
          const hits = bands.filter((b) => inBand((i + 0.5) * 2, (j + 0.5) * 2, b.polygons));
          const last = hits[0] === bands[bands.length - 1];
          if (hits.length !== 1 || v < hits[0]!.lo || (v >= hits[0]!.hi && !last)) wrong++;
        }
      }
      expect(wrong).toBe(0);
    }
  });

  it('keeps y up: a field rising with height puts the top band at the top', () => {
    const g = gridFrom(10, 20, 1, (_x, y) => y);
    const bands = contourBands(g, 'tempC', [0, 10]);
    const top = bands[bands.length - 1]!;
    const ys = top.polygons.flat(2).map((p) => p[1]);
    expect(Math.min(...ys)).toBeGreaterThanOrEqual(9.5);
    expect(Math.max(...ys)).toBeLessThanOrEqual(20);
  });

  it('default thresholds: UVI uses the zone boundaries, UVB nice ticks from 0', () => {
    const g = computeFields(EXAMPLE_DESIGN, { cellCm: 2 });
    const uvi = defaultThresholds('uvi', g);
    expect(uvi).toEqual(UVI_THRESHOLDS.filter((t) => t <= Math.max(...g.uvi)));
    expect(uvi).toContain(2.6);
    const uvb = defaultThresholds('uvb', g);
    expect(uvb[0]).toBe(0);
    expect(uvb.length).toBeGreaterThan(3);
    const step = uvb[1]! - uvb[0]!;
    expect(uvb.every((t, k) => Math.abs(t - k * step) < 1e-9)).toBe(true);
    const bands = contourBands(g, 'tempC');
    expect(bands.length).toBeGreaterThan(1);
  });
});
