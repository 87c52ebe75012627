import { describe, expect, it } from 'vitest';
import { LAMP_PRESETS } from './presets';
import { LAMP_TECHS } from './techs';
import { DEFAULT_SCREEN_UVB_TRANSMISSION, meshOpenArea } from './materials';

describe('lamp presets', () => {
  it('every preset is a valid lamp of its technology and says where its figures come from', () => {
    for (const p of Object.values(LAMP_PRESETS)) {
      expect(LAMP_TECHS[p.lamp.tech]).toBeDefined();
      expect(p.source.length).toBeGreaterThan(10);
      // No preset carries a distance of its own: how far its UV goes is the engine's (zoneDistances.ts).
      expect(Object.keys(p)).toEqual(['label', 'lamp', 'source']);
    }
  });
});

describe('barriers', () => {
  it('woven mesh 1.0 mm aperture, 0.25 mm wire passes 0.64 (ISO 9044 open area)', () => {
    expect(meshOpenArea(1.0, 0.25)).toBeCloseTo(0.64, 12);
    expect(meshOpenArea(0, 1)).toBe(0);
  });
  it('the default mesh lid cuts roughly a quarter to a half of the UVB', () => {
    // common practice, no published source.
    const cut = 1 - DEFAULT_SCREEN_UVB_TRANSMISSION;
    expect(cut).toBeGreaterThanOrEqual(0.25);
    expect(cut).toBeLessThanOrEqual(0.5);
  });
});
