import { describe, expect, it } from 'vitest';
import { lampSchema } from '@/simulation';
import { applyForm, applyPreset, applyTech, matchingPreset } from './lampPresets';
import type { LampObject } from './types';

const lamp: LampObject = {
  type: 'lamp',
  id: 'uv1',
  name: 'Main UVB',
  tech: 't5',
  form: 'tube',
  x: 40,
  y: 62,
  length: 55,
  uvbAt30: 60,
  uviPerUvb: 0.05,
  reflectorGain: 2,
  ageMonths: 3,
};

describe('lamp presets', () => {
  it('applies a preset, keeping the fixture (place, name, reflector, age)', () => {
    const mv = applyPreset(lamp, 'mercury-vapour-160');
    expect(mv).toMatchObject({ id: 'uv1', name: 'Main UVB', x: 40, y: 62, reflectorGain: 2, ageMonths: 3 });
    expect(mv).toMatchObject({ tech: 'mercury-vapour', form: 'bulb', uvbAt30: 225, watts: 160, beamDeg: 90 });
    expect('length' in mv).toBe(false);
    expect('uviPerUvb' in mv).toBe(false);
    expect(lampSchema.safeParse(mv).success).toBe(true);
    expect(matchingPreset(mv)).toBe('mercury-vapour-160');
  });

  it('reports a custom lamp once an output value is overridden', () => {
    const t = applyPreset(lamp, 't5-high');
    expect(matchingPreset(t)).toBe('t5-high');
    expect(matchingPreset({ ...t, uvbAt30: 44 })).toBeNull();
    expect(matchingPreset({ ...t, uviPerUvb: 0.03 })).toBeNull();
  });

  it('switches technology and form with valid results', () => {
    const h = applyTech(lamp, 'halogen');
    expect(h).toMatchObject({ tech: 'halogen', form: 'bulb' });
    expect(lampSchema.safeParse(h).success).toBe(true);
    const back = applyTech(h, 't8');
    expect(back).toMatchObject({ form: 'tube', length: 55 });
    expect(lampSchema.safeParse(applyForm(lamp, 'bulb')).success).toBe(true);
    expect(lampSchema.safeParse(applyForm(applyForm(lamp, 'bulb'), 'tube')).success).toBe(true);
  });
});
