import { afterEach, describe, expect, it, vi } from 'vitest';
import { recordRoundTrip, studioProbe, type StudioProbe } from './probe';

describe('studio probe', () => {
  afterEach(() => {
    vi.unstubAllEnvs();
    vi.unstubAllGlobals();
  });

  it('is absent unless the build is the test build', () => {
    vi.stubGlobal('window', {});
    vi.stubEnv('NEXT_PUBLIC_STUDIO_PROBE', '');
    expect(studioProbe()).toBeNull();
    expect((globalThis.window as Window).__baskwellStudio).toBeUndefined();
  });

  it('in the test build, is one object on the page that every call returns', () => {
    vi.stubGlobal('window', {});
    vi.stubEnv('NEXT_PUBLIC_STUDIO_PROBE', '1');
    const probe = studioProbe();
    expect(probe).toEqual({ roundTrips: [], computeMs: [] });
    expect(studioProbe()).toBe(probe);
    expect((globalThis.window as Window).__baskwellStudio).toBe(probe);
  });

  it('keeps the latest round trips, dropping the oldest thousand past two thousand', () => {
    const probe: StudioProbe = { roundTrips: [], computeMs: [] };
    for (let k = 0; k < 2001; k++) recordRoundTrip(probe, k, k / 2);
    expect(probe.roundTrips).toHaveLength(1001);
    expect(probe.roundTrips[0]).toBe(1000);
    expect(probe.computeMs[1000]).toBe(1000);
  });
});
