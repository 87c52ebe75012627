import { describe, expect, it } from 'vitest';
import {
  broadbandForZone,
  derivedBroadband,
  targetAgainstZone,
  targetWarning,
  zoneBaskingUvi,
  zoneTargetText,
} from './consistency';

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

describe('the species form: UV Index target first, µW/cm² derived', () => {
  it('gives the UV Index range the basking spot is judged by, shade method for zones 1–2', () => {
    // Zone 4 basking (max) 4.5–9.5; zone 1: mean 0–0.7, max 0.6–1.4, so the shade method passes from the
    // mean's middle, 0.35, to 1.4 (Ferguson et al. 2010, Zoo Biology 29:317–334).
    expect(zoneBaskingUvi(4)).toEqual({ min: 4.5, max: 9.5 });
    expect(zoneBaskingUvi(1)).toEqual({ min: 0.35, max: 1.4 });
    expect(zoneTargetText(4).target).toMatch(/^UV Index 4\.5–9\.5 at the basking spot\. /);
    expect(zoneTargetText(1).target).toMatch(
      /^UV Index 0\.35–1\.4 at the basking spot \(a shade-method zone/,
    );
  });

  it('derives µW/cm² per lamp spectrum, never as one fixed figure', () => {
    // 0.04 UV Index per µW/cm² (fluorescent, mercury vapour, metal halide) and 0.035 (LED panels) are the
    // engine's typical ratios (from memory); the ranges are rounded inwards to 5 µW/cm².
    const d = derivedBroadband(4);
    expect(d.map((x) => x.ratio)).toEqual([0.035, 0.04]);
    expect(d[0]!.range).toEqual({ min: 130, max: 270 });
    expect(d[0]!.techs).toEqual(['UVB LED panel']);
    expect(d[1]!.range).toEqual({ min: 115, max: 235 });
    expect(d[1]!.techs).toContain('Self-ballasted mercury vapour lamp');
    expect(d[1]!.techs).not.toContain('Halogen flood lamp');
    expect(derivedBroadband(1)[1]!.range).toEqual({ min: 10, max: 35 });
    const text = zoneTargetText(4).derived;
    expect(text).toMatch(/about 130–270 µW\/cm² under a UVB LED panel \(0\.035 UV Index per µW\/cm²\)/);
    expect(text).toMatch(/about 115–235 µW\/cm² under a T5 fluorescent tube, .* or metal halide UVB lamp/);
    expect(text).toMatch(/depends on the lamp and the meter/);
  });
});
