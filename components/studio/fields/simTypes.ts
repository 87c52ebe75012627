// What the studio shows from the engine's latest answer.
import type { FieldGrid } from '@/simulation';
import type { Reading } from './sample';
import type { Assessment } from './engineTypes';

export interface SimView {
  grid: FieldGrid | null;
  assessment: Assessment | null;
  /** Month at which the basking UV stops meeting the need; null: holds; undefined: not computed. */
  monthsUntilUnmet: number | null | undefined;
  /** Exact engine readings of the pinned probes, by probe id. */
  probeReadings: Map<string, Reading>;
  /** Request → answer time of the latest result, ms. */
  roundTripMs: number | null;
  status: 'starting' | 'computing' | 'ready' | 'error';
  error: string | null;
}

export const EMPTY_SIM: SimView = {
  grid: null,
  assessment: null,
  monthsUntilUnmet: undefined,
  probeReadings: new Map(),
  roundTripMs: null,
  status: 'starting',
  error: null,
};
