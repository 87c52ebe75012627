import { DESIGN_VERSION } from '@/simulation';
import type { Design } from '../state/types';

// The example set-up lives with the engine (one source for the studio, the engine's tests and the CLI).
export { exampleDesign } from '@/simulation';

/** An empty enclosure with only a mesh lid, for "start from scratch". */
export function emptyDesign(width = 120, height = 60, depth = 60): Design {
  return {
    format: 'baskwell.design',
    version: DESIGN_VERSION,
    enclosure: { width, height, depth, roomTempC: 24 },
    objects: [{ type: 'screen', id: 'lid', x1: 0, y1: height, x2: width, y2: height }],
  };
}
