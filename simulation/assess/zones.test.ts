import { describe, expect, it } from 'vitest';
import { UV_ZONES, zonesForMaxUvi, zonesForMeanUvi } from './zones';
import { baskingStatus } from './uvFindings';

describe('UV zones (Ferguson et al. 2010, Zoo Biology 29:317–334)', () => {
  it('holds the published ranges', () => {
    expect(UV_ZONES[1]).toMatchObject({ mean: [0, 0.7], max: [0.6, 1.4] });
    expect(UV_ZONES[2]).toMatchObject({ mean: [0.7, 1.0], max: [1.1, 3.0] });
    expect(UV_ZONES[3]).toMatchObject({ mean: [1.0, 2.6], max: [2.9, 7.4] });
    expect(UV_ZONES[4]).toMatchObject({ mean: [2.6, 3.5], max: [4.5, 9.5] });
  });

  it('classifies at the published boundaries (inclusive)', () => {
    expect(zonesForMaxUvi(0.6)).toEqual([1]);
    expect(zonesForMaxUvi(1.4)).toEqual([1, 2]);
    expect(zonesForMaxUvi(2.9)).toEqual([2, 3]);
    expect(zonesForMaxUvi(3.0)).toEqual([2, 3]);
    expect(zonesForMaxUvi(4.5)).toEqual([3, 4]);
    expect(zonesForMaxUvi(7.4)).toEqual([3, 4]);
    expect(zonesForMaxUvi(9.5)).toEqual([4]);
    expect(zonesForMaxUvi(9.6)).toEqual([]);
    expect(zonesForMeanUvi(0.7)).toEqual([1, 2]);
    expect(zonesForMeanUvi(2.6)).toEqual([3, 4]);
    expect(zonesForMeanUvi(3.51)).toEqual([]);
  });

  it('passes the basking check exactly inside the zone maximum range', () => {
    expect(baskingStatus(2.9, 3)).toBe('pass');
    expect(baskingStatus(7.4, 3)).toBe('pass');
    expect(baskingStatus(2.89, 3)).toBe('attention');
    expect(baskingStatus(7.41, 3)).toBe('attention');
    expect(baskingStatus(9.3, 3)).toBe('fail'); // more than 25 % over the top of the range
    expect(baskingStatus(0.9, 3)).toBe('fail'); // below even the zone's mean range
    expect(baskingStatus(4.5, 4)).toBe('pass');
    expect(baskingStatus(0.6, 1)).toBe('pass');
    expect(baskingStatus(0, 1)).toBe('fail');
  });
});
