/**
 * Grid over the inside of the enclosure: nx = ceil(width / cellCm), ny = ceil(height / cellCm); cell (i, j)
 * has its centre at x = (i + 0.5)·cellCm, y = (j + 0.5)·cellCm (y up, origin at the inside bottom-left);
 * arrays are row-major from the bottom row: index = j·nx + i.
 */
export interface FieldGrid {
  nx: number;
  ny: number;
  cellCm: number;
  width: number;
  height: number;
  /** UVB irradiance, µW/cm². */
  uvb: Float32Array;
  /** UV Index. */
  uvi: Float32Array;
  /** Surface temperature of a dark matte surface, °C. */
  tempC: Float32Array;
}

export interface SimOptions {
  /** Cell size, cm (default 0.5). */
  cellCm?: number;
  /** Months of ageing added to every lamp's own ageMonths (default 0). */
  addMonths?: number;
  /** Natural-convection coefficient h_c, W/m²K (default 7). */
  convection?: number;
}

export type FieldName = 'uvb' | 'uvi' | 'tempC';

export interface ProbeResult {
  x: number;
  y: number;
  uvb: number;
  uvi: number;
  tempC: number;
}

export const DEFAULT_CELL_CM = 0.5;
/** Largest grid the engine accepts (cells), to keep a bad cell size from exhausting memory. */
export const MAX_CELLS = 4_000_000;

export function gridSize(width: number, height: number, cellCm: number): { nx: number; ny: number } {
  if (!(cellCm > 0) || !Number.isFinite(cellCm)) throw new RangeError('cellCm must be a positive number');
  const nx = Math.max(1, Math.ceil(width / cellCm - 1e-9));
  const ny = Math.max(1, Math.ceil(height / cellCm - 1e-9));
  if (nx * ny > MAX_CELLS) {
    throw new RangeError(
      `a ${cellCm} cm cell makes ${nx * ny} cells, more than ${MAX_CELLS}; use a larger cell`,
    );
  }
  return { nx, ny };
}
