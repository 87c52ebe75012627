// Reading a computed field grid at any design point (the probe under the pointer), by bilinear
// interpolation between cell centres. Exact values for pinned probes come from the engine itself.
import type { FieldGrid, FieldName } from '@/simulation';

export interface Reading {
  uvb: number;
  uvi: number;
  tempC: number;
}

/** Value of one field at (x, y) in cm; null outside the enclosure. */
export function sampleField(grid: FieldGrid, field: FieldName, x: number, y: number): number | null {
  if (!(x >= 0 && x <= grid.width && y >= 0 && y <= grid.height)) return null;
  const { nx, ny, cellCm } = grid;
  // Continuous cell coordinates, centres at integers.
  const fx = Math.min(nx - 1, Math.max(0, x / cellCm - 0.5));
  const fy = Math.min(ny - 1, Math.max(0, y / cellCm - 0.5));
  const i0 = Math.floor(fx);
  const j0 = Math.floor(fy);
  const i1 = Math.min(nx - 1, i0 + 1);
  const j1 = Math.min(ny - 1, j0 + 1);
  const tx = fx - i0;
  const ty = fy - j0;
  const a = grid[field];
  const v00 = a[j0 * nx + i0] ?? 0;
  const v10 = a[j0 * nx + i1] ?? 0;
  const v01 = a[j1 * nx + i0] ?? 0;
  const v11 = a[j1 * nx + i1] ?? 0;
  return (v00 * (1 - tx) + v10 * tx) * (1 - ty) + (v01 * (1 - tx) + v11 * tx) * ty;
}

export function sampleAll(grid: FieldGrid, x: number, y: number): Reading | null {
  const uvb = sampleField(grid, 'uvb', x, y);
  if (uvb === null) return null;
  return { uvb, uvi: sampleField(grid, 'uvi', x, y) ?? 0, tempC: sampleField(grid, 'tempC', x, y) ?? 0 };
}

/** Smallest and largest value of a field (for legends and scales). */
export function fieldRange(grid: FieldGrid, field: FieldName): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of grid[field]) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return Number.isFinite(lo) ? [lo, hi] : [0, 0];
}
