import { describe, expect, it } from 'vitest';
import { targetAgainstZone, targetWarning } from './consistency';

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
});
