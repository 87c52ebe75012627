// Messages to the studio's contour worker: contour bands are computed off the main thread because
// tracing them on a fine grid takes longer than a frame, and the canvas must stay responsive.
import type { ContourBand, FieldGrid, FieldName } from '@/simulation';

export interface ContourRequest {
  id: number;
  field: FieldName;
  nx: number;
  ny: number;
  cellCm: number;
  width: number;
  height: number;
  /** The field's values (a copy, transferred). */
  values: Float32Array;
}

/** The request for one field of a computed grid: its size and a copy of its values, to transfer. */
export function contourRequest(
  id: number,
  field: FieldName,
  grid: Pick<FieldGrid, 'nx' | 'ny' | 'cellCm' | 'width' | 'height' | FieldName>,
): ContourRequest {
  const { nx, ny, cellCm, width, height } = grid;
  return { id, field, nx, ny, cellCm, width, height, values: grid[field].slice() };
}

export type ContourResponse =
  | { id: number; kind: 'bands'; field: FieldName; thresholds: number[]; bands: ContourBand[]; ms: number }
  | { id: number; kind: 'error'; message: string }
  | { id: number; kind: 'superseded' };

/** Computes one answer (pure; used by the worker and by tests). */
export function contourAnswer(
  req: ContourRequest,
  lib: {
    defaultThresholds: (f: FieldName, g: never) => number[];
    contourBands: (g: never, f: FieldName, t: number[]) => ContourBand[];
  },
): ContourResponse {
  const t0 = performance.now();
  try {
    const { field, nx, ny, cellCm, width, height, values } = req;
    // The engine functions read only the named field of the grid.
    const grid = { nx, ny, cellCm, width, height, uvb: values, uvi: values, tempC: values } as never;
    const thresholds = lib.defaultThresholds(field, grid);
    const bands = lib.contourBands(grid, field, thresholds);
    return { id: req.id, kind: 'bands', field, thresholds, bands, ms: performance.now() - t0 };
  } catch (e) {
    return { id: req.id, kind: 'error', message: e instanceof Error ? e.message : String(e) };
  }
}
