// The worker protocol as the engine's public API defines it (simulation/worker/protocol.ts).
// TEMPORARY mirror until the engine's worker lands; then this file re-exports it.
import type { Assessment, Design, SpeciesSheet } from '@/simulation';

export type SimRequest = {
  id: number;
  kind: 'simulate';
  design: Design;
  cellCm?: number;
  addMonths?: number;
  species?: SpeciesSheet;
  probes?: { x: number; y: number }[];
};

export type SimResponse =
  | {
      id: number;
      kind: 'result';
      nx: number;
      ny: number;
      cellCm: number;
      width: number;
      height: number;
      uvb: Float32Array;
      uvi: Float32Array;
      tempC: Float32Array;
      assessment?: Assessment;
      monthsUntilUnmet?: number | null;
      probes?: { x: number; y: number; uvb: number; uvi: number; tempC: number }[];
      ms: number;
    }
  | { id: number; kind: 'error'; message: string }
  | { id: number; kind: 'superseded' };
