import type { Design } from '../model/schema';
import { FieldSolver } from './solver';
import type { FieldGrid, ProbeResult, SimOptions } from './types';

/**
 * One solver without a cache serves every one-off computation of this thread: it keeps nothing between
 * calls but its scratch space, and a computation runs to its end before the next starts.
 */
const oneOff = new FieldSolver(false);

/** UVB, UV Index and surface temperature over the grid (a fresh computation, no cache). */
export function computeFields(design: Design, opts?: SimOptions): FieldGrid {
  return oneOff.compute(design, opts);
}

/**
 * Hands back the buffer of a result of `computeFields` (`grid.uvb.buffer`) that nothing will read again,
 * for a later call of the same size to write into (FieldSolver.recycle).
 */
export function recycleFields(buffer: ArrayBufferLike): void {
  oneOff.recycle(buffer);
}

/** The three values at exact points (evaluated there, not interpolated from a grid). */
export function probe(design: Design, points: { x: number; y: number }[], opts?: SimOptions): ProbeResult[] {
  return new FieldSolver().probe(design, points, opts);
}
