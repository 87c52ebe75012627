/**
 * Messages between the studio and the engine's Web Worker. Field arrays travel as transferable buffers.
 * The worker answers every request exactly once: a result, an error, or "superseded" when a newer request
 * arrived before this one started.
 */
import type { Design } from '../model/schema';
import type { SpeciesSheet } from '../model/species';
import type { Assessment } from '../assess/types';
import type { FieldGrid, ProbeResult } from '../fields/types';

export type SimRequest = {
  id: number;
  kind: 'simulate';
  design: Design;
  cellCm?: number;
  addMonths?: number;
  species?: SpeciesSheet;
  probes?: { x: number; y: number }[];
  /**
   * Buffers of earlier results the page no longer reads, transferred back: the worker computes later
   * fields into them instead of allocating new ones (FieldSolver.recycle).
   */
  recycle?: ArrayBuffer[];
};

/** A computed field (the grid and its arrays) with what the studio asked for beside it. */
export type SimResult = FieldGrid & {
  id: number;
  kind: 'result';
  assessment?: Assessment;
  monthsUntilUnmet?: number | null;
  probes?: ProbeResult[];
  /** Time spent computing, ms. */
  ms: number;
};

export type SimResponse =
  SimResult | { id: number; kind: 'error'; message: string } | { id: number; kind: 'superseded' };

/** The buffers of a response to hand over with postMessage (none for errors). */
export function transferables(res: SimResponse): ArrayBuffer[] {
  if (res.kind !== 'result') return [];
  const out: ArrayBuffer[] = [];
  for (const a of [res.uvb, res.uvi, res.tempC]) {
    if (a.buffer instanceof ArrayBuffer && !out.includes(a.buffer)) out.push(a.buffer);
  }
  return out;
}
