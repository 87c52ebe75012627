import { describe, expect, it } from 'vitest';
import { broadbandForZone, targetAgainstZone, targetWarning } from './consistency';

describe('broadband target against the UV zone', () => {
  it('converts with the ratio and compares with the zone basking range (Ferguson et al. 2010)', () => {
    // Zone 1 basking (max) UV Index 0.6–1.4 (Ferguson et al. 2010, Zoo Biology 29:317–334).
    const c = targetAgainstZone(1, { min: 12, max: 25 }, 0.04);
    expect(c.uvi.min).toBeCloseTo(0.48, 6);
    expect(c.uvi.max).toBeCloseTo(1.0, 6);
    expect(c.zoneMax).toEqual({ min: 0.6, max: 1.4 });
    expect(c.overlaps).toBe(true);
  });

  it('warns when one lamp cannot meet both (zone 4 basking 4.5–9.5 against 25–50 µW/cm² at 0.04)', () => {
    expect(targetAgainstZone(4, { min: 25, max: 50 }, 0.04).overlaps).toBe(false);
    expect(targetWarning(4, { min: 25, max: 50 })).toMatch(/UV Index 1–2, outside zone 4/);
    expect(targetWarning(4, null)).toBeNull();
    expect(targetWarning(1, { min: 12, max: 25 })).toBeNull();
  });

  it('derives the broadband hint from the zone, rounded inwards so it stays inside the zone', () => {
    // Zone 4 basking (max) UV Index 4.5–9.5, zone 1 0.6–1.4 (Ferguson et al. 2010, Zoo Biology 29:317–334);
    // 0.04 UV Index per µW/cm² is the engine's fluorescent ratio (from memory).
    expect(broadbandForZone(4)).toEqual({ min: 115, max: 235 });
    expect(broadbandForZone(1)).toEqual({ min: 15, max: 35 });
    // A lamp with more UV Index per µW/cm² stands for the same zone with fewer µW/cm².
    expect(broadbandForZone(4, 0.05)).toEqual({ min: 90, max: 190 });
    for (const zone of [1, 2, 3, 4] as const) {
      expect(targetAgainstZone(zone, broadbandForZone(zone)).overlaps).toBe(true);
      expect(targetWarning(zone, broadbandForZone(zone))).toBeNull();
    }
  });
});
