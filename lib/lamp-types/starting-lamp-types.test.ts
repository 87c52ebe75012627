import { describe, expect, it } from 'vitest';
import { LAMP_PRESETS, LAMP_TECHS, lampSchema } from '@/simulation';
import { lampTypeInputSchema } from './schema';
import { STARTING_LAMP_TYPES } from './starting-lamp-types';
import { lampObjectFromType } from './to-engine';

describe('starting lamp catalogue', () => {
  it('has one entry per engine preset, each with a unique name', () => {
    expect(STARTING_LAMP_TYPES.map((l) => l.presetKey).sort()).toEqual(Object.keys(LAMP_PRESETS).sort());
    expect(new Set(STARTING_LAMP_TYPES.map((l) => l.name)).size).toBe(STARTING_LAMP_TYPES.length);
  });

  it('covers every technology of the design file', () => {
    expect(new Set(STARTING_LAMP_TYPES.map((l) => l.tech))).toEqual(new Set(Object.keys(LAMP_TECHS)));
  });

  it('takes its figures from the engine, not a copy', () => {
    for (const l of STARTING_LAMP_TYPES) {
      const preset = LAMP_PRESETS[l.presetKey];
      const tech = LAMP_TECHS[preset.lamp.tech];
      expect(l.uvbAt30).toBe(preset.lamp.uvbAt30 ?? tech.uvbAt30);
      expect(l.uviPerUvb).toBe(tech.uviPerUvb);
      expect(l.radiantFraction).toBe(tech.radiantFraction);
      expect(l.watts).toBe(preset.lamp.watts ?? tech.watts);
    }
  });

  it.each(STARTING_LAMP_TYPES.map((l) => [l.name, l] as const))('%s is valid and sourced', (_n, l) => {
    const { presetKey: _p, ...input } = l;
    const r = lampTypeInputSchema.safeParse(input);
    expect(r.success, JSON.stringify(!r.success && r.error.issues)).toBe(true);
    for (const f of [
      'uvbAt30',
      'uviPerUvb',
      'radiantFraction',
      'beamDeg',
      'watts',
      'replaceAfterMonths',
    ] as const) {
      expect(l.sources[f], `${f} has no source`).toBeTruthy();
    }
    if (l.form === 'tube') expect(l.lengthCm).toBeGreaterThan(0);
  });

  it('heat-only lamps have no UVB and no UV decay', () => {
    for (const l of STARTING_LAMP_TYPES.filter((x) =>
      ['halogen', 'incandescent', 'ceramic'].includes(x.tech),
    )) {
      expect(l.uvbAt30).toBe(0);
      expect(l.halfLifeMonths).toBeNull();
      expect(l.replaceAfterMonths).toBeNull();
    }
  });

  it('turns into a lamp object the design schema accepts', () => {
    for (const l of STARTING_LAMP_TYPES) {
      const obj = lampObjectFromType(l, { id: 'l1', x: 30, y: 62 });
      const r = lampSchema.safeParse(obj);
      expect(r.success, `${l.name}: ${JSON.stringify(!r.success && r.error.issues)}`).toBe(true);
    }
  });
});

describe('source notes of the starting catalogue', () => {
  it('keep only the clauses about the field, in words people read', async () => {
    const { clauses } = await import('./starting-lamp-types');
    expect(clauses('a: x; radiantFraction 0.5 (from memory); decay: y', ['radiantFraction'])).toBe(
      'radiantFraction 0.5 (from memory)',
    );
    expect(clauses('nothing relevant', ['beam'])).toBe('nothing relevant');
    for (const l of STARTING_LAMP_TYPES) {
      for (const note of Object.values(l.sources)) expect(note).not.toMatch(/LAMP_TECHS|presets\.ts/);
    }
  });
});
