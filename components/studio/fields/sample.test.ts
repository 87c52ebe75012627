import { describe, expect, it } from 'vitest';
import { fieldRange, sampleAll, sampleField } from './sample';
import type { FieldGrid } from '@/simulation';

/** 4 × 2 cells of 10 cm; uvb = x (cm) of the cell centre, so interpolation must return x itself. */
function linearGrid(): FieldGrid {
  const nx = 4;
  const ny = 2;
  const uvb = new Float32Array(nx * ny);
  const uvi = new Float32Array(nx * ny);
  const tempC = new Float32Array(nx * ny).fill(24);
  for (let j = 0; j < ny; j++)
    for (let i = 0; i < nx; i++) {
      uvb[j * nx + i] = (i + 0.5) * 10;
      uvi[j * nx + i] = (j + 0.5) * 10;
    }
  return { nx, ny, cellCm: 10, width: 40, height: 20, uvb, uvi, tempC };
}

describe('sampleField', () => {
  it('reproduces a linear field exactly between cell centres', () => {
    const g = linearGrid();
    expect(sampleField(g, 'uvb', 12, 7)).toBeCloseTo(12, 5);
    expect(sampleField(g, 'uvi', 33, 11)).toBeCloseTo(11, 5);
  });

  it('holds the edge value in the half cell outside the centres, and is null outside', () => {
    const g = linearGrid();
    expect(sampleField(g, 'uvb', 1, 5)).toBeCloseTo(5, 5);
    expect(sampleField(g, 'uvb', 41, 5)).toBeNull();
    expect(sampleField(g, 'uvb', 10, -0.1)).toBeNull();
  });

  it('reads all three fields and their ranges', () => {
    const g = linearGrid();
    expect(sampleAll(g, 20, 10)).toEqual({ uvb: 20, uvi: 10, tempC: 24 });
    expect(fieldRange(g, 'uvb')).toEqual([5, 35]);
  });
});
