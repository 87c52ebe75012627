import { describe, expect, it } from 'vitest';
import { LAMP_PRESETS, GOOD_REFLECTOR_GAIN, type LampPresetId } from './model/presets';
import { DEFAULT_SCREEN_UVB_TRANSMISSION } from './model/materials';
import { LAMP_TECHS } from './model/techs';
import { UV_ZONES } from './assess/zones';
import { allZoneDistances, NEAREST_CM, zoneDistances, type ZoneLamp } from './zoneDistances';

const uvPresets = (Object.keys(LAMP_PRESETS) as LampPresetId[]).filter(
  (id) => (LAMP_PRESETS[id].lamp.uvbAt30 ?? 0) > 0,
);

describe('zone distances: the engine’s own distances below a lamp for each UV zone', () => {
  // A wide bulb (180° beam) straight below is a point source: E(d) = E30 · (30/d)² (inverse-square law;
  // IES Lighting Handbook), so the UVI falls to u at d = 30 · √(k · E30 / u), k the UVI per µW/cm².
  const bulb: ZoneLamp = { tech: 'compact', form: 'bulb', uvbAt30: 20, watts: 26, beamDeg: 180 };
  const k = bulb.uviPerUvb ?? LAMP_TECHS.compact.uviPerUvb;
  const exact = (u: number, gain = 1) => 30 * Math.sqrt((gain * k * 20) / u);

  it('a bare bulb matches the inverse-square law at every zone boundary (±1 %)', () => {
    const r = zoneDistances(bulb, 'bare');
    expect(r.zones.length).toBeGreaterThan(0);
    for (const z of r.zones) {
      const [lo, hi] = UV_ZONES[z.zone].max;
      expect(z.toCm).toBeCloseTo(exact(lo), 0);
      expect(Math.abs(z.toCm / exact(lo) - 1)).toBeLessThan(0.01);
      if (exact(hi) > NEAREST_CM) expect(Math.abs(z.fromCm / exact(hi) - 1)).toBeLessThan(0.01);
    }
  });

  it('a reflector multiplies the UVB (distances × √gain) and a mesh lid passes its open area (× √T)', () => {
    // Inverse-square law again: scaling the irradiance by g scales the distance to a given UVI by √g.
    const bare = zoneDistances(bulb, 'bare');
    const refl = zoneDistances(bulb, 'reflector');
    const mesh = zoneDistances(bulb, 'mesh');
    const one = (r: typeof bare) => r.zones.find((z) => z.zone === 1)!.toCm;
    expect(one(refl) / one(bare)).toBeCloseTo(Math.sqrt(GOOD_REFLECTOR_GAIN), 2);
    expect(one(mesh) / one(bare)).toBeCloseTo(Math.sqrt(DEFAULT_SCREEN_UVB_TRANSMISSION), 2);
  });

  for (const id of uvPresets) {
    it(`${id}: zones in order from the lamp outwards, reflector farther and mesh nearer than bare`, () => {
      const all = allZoneDistances(LAMP_PRESETS[id].lamp)!;
      const [bare, refl, mesh] = all;
      expect(bare!.zones.length).toBeGreaterThan(0);
      for (const r of all) {
        for (const z of r.zones) expect(z.toCm).toBeGreaterThan(z.fromCm);
        // Stronger zones sit nearer the lamp.
        for (let i = 1; i < r.zones.length; i++)
          expect(r.zones[i]!.toCm).toBeGreaterThan(r.zones[i - 1]!.toCm);
      }
      const far = (r: typeof bare) => Math.max(...r!.zones.map((z) => z.toCm));
      expect(far(refl)).toBeGreaterThan(far(bare));
      expect(far(mesh)).toBeLessThan(far(bare));
    });
  }

  it('lamps without UVB have no zone distances', () => {
    expect(allZoneDistances(LAMP_PRESETS['halogen-75'].lamp)).toBeNull();
    expect(allZoneDistances(LAMP_PRESETS['ceramic-100'].lamp)).toBeNull();
  });
});
