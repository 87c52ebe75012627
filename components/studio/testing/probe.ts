// What the browser journeys read of a running studio (tests/browser/studio-helpers.ts): the engine's
// round trips, timed for the benchmark they print, and the camera, so a test can point at a design
// position. Only the build `npm test` makes (NEXT_PUBLIC_STUDIO_PROBE=1) keeps it; elsewhere the
// condition is false when the app is built and the bundler drops what it guards, so a production build
// carries no hook on `window`.
import type { Camera } from '../geometry/camera';

export interface StudioProbe {
  roundTrips: number[];
  /** The engine's own compute time for the same answers (the rest is messaging and the main thread). */
  computeMs: number[];
  camera?: () => Camera;
}

declare global {
  interface Window {
    __baskwellStudio?: StudioProbe;
  }
}

/** The page's probe in a test build, null in any other. */
export function studioProbe(): StudioProbe | null {
  if (process.env.NEXT_PUBLIC_STUDIO_PROBE !== '1') return null;
  return (window.__baskwellStudio ??= { roundTrips: [], computeMs: [] });
}

/** Records one answer's round trip, keeping the last thousand or so. */
export function recordRoundTrip(probe: StudioProbe, roundTripMs: number, computeMs: number): void {
  probe.roundTrips.push(roundTripMs);
  probe.computeMs.push(computeMs);
  if (probe.roundTrips.length > 2000) {
    probe.roundTrips.splice(0, 1000);
    probe.computeMs.splice(0, 1000);
  }
}
