import { describe, expect, it } from 'vitest';
import { toEngineSheet } from './to-engine';

const base = {
  commonName: 'Test lizard',
  uvZone: 3,
  baskingSurfaceC: { min: 35, max: 40 },
  coolAirC: { min: 22, max: 26 },
  nightMinC: null,
  uvbTargetUw: null,
};

describe('toEngineSheet', () => {
  it('maps ranges to tuples and the cool side air to the cool-end target', () => {
    expect(toEngineSheet(base)).toEqual({
      name: 'Test lizard',
      uvZone: 3,
      baskingSurfaceC: [35, 40],
      coolEndC: [22, 26],
    });
  });

  it('passes the night minimum and the meter target only when given', () => {
    const s = toEngineSheet({ ...base, nightMinC: 18, uvbTargetUw: { min: 25, max: 50 } });
    expect(s.nightMinC).toBe(18);
    expect(s.uvbTargetUw).toEqual([25, 50]);
  });
});
