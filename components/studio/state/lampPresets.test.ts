import { describe, expect, it } from 'vitest';
import { lampSchema } from '@/simulation';
import {
  applyCatalogueType,
  applyForm,
  applyPreset,
  applyTech,
  matchingCatalogueCurve,
  matchingCatalogueType,
  matchingPreset,
} from './lampPresets';
import type { LampObject, StudioCatalogueType } from './types';

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

// Invented example curves of the shape the population fit adopts (months of ordinary use, share of new).
const measured: [number, number][] = [
  [0, 1],
  [6, 0.62],
  [12, 0.41],
];
const t5: StudioCatalogueType = {
  id: '7',
  name: 'Example T5 HO tube',
  lamps: 9,
  lamp: {
    type: 'lamp',
    id: 'catalogue-7',
    name: 'Example T5 HO tube',
    tech: 't5',
    form: 'tube',
    x: 0,
    y: 0,
    length: 85,
    uvbAt30: 80,
    uviPerUvb: 0.04,
    reflectorGain: 1.8,
    beamDeg: 110,
    watts: 39,
    radiantFraction: 0.3,
    ageMonths: 0,
    decay: { points: measured },
  },
};
const mv: StudioCatalogueType = {
  id: '8',
  name: 'Example self-ballasted bulb',
  lamps: 6,
  lamp: {
    ...t5.lamp,
    id: 'catalogue-8',
    tech: 'mercury-vapour',
    form: 'bulb',
    length: undefined,
    uvbAt30: 200,
    decay: {
      points: [
        [0, 1],
        [6, 0.8],
      ],
    },
  },
};

describe('catalogue types with an adopted curve', () => {
  it('apply their output and measured table, keeping the fixture (place, name, reflector, age)', () => {
    const custom = { ...lamp, decay: { halfLifeMonths: 4 }, watts: 54 };
    const applied = applyCatalogueType(custom, t5);
    expect(applied).toMatchObject({
      id: 'uv1',
      name: 'Main UVB',
      x: 40,
      y: 62,
      reflectorGain: 2,
      ageMonths: 3,
    });
    expect(applied).toMatchObject({ tech: 't5', form: 'tube', length: 85, uvbAt30: 80, watts: 39 });
    expect(applied.decay).toEqual({ points: measured });
    expect(lampSchema.safeParse(applied).success).toBe(true);
    // A bulb type drops the tube's length rather than keeping the old lamp's.
    const bulb = applyCatalogueType(applied, mv);
    expect('length' in bulb).toBe(false);
    expect(bulb).toMatchObject({ tech: 'mercury-vapour', form: 'bulb', uvbAt30: 200 });
    expect(lampSchema.safeParse(bulb).success).toBe(true);
  });

  it('are recognised by the decay table’s content, and as the whole type only while unchanged', () => {
    const applied = applyCatalogueType(lamp, t5);
    expect(matchingCatalogueType(applied, [mv, t5])?.id).toBe('7');
    expect(matchingCatalogueCurve(applied, [mv, t5])?.id).toBe('7');
    // A copy of the table (a lamp the guided start placed, then saved and loaded) still matches.
    const copied = { ...applied, decay: { points: measured.map(([m, f]): [number, number] => [m, f]) } };
    expect(matchingCatalogueCurve(copied, [t5])?.id).toBe('7');
    // An overridden output figure: no longer the type, but still ageing by its measured curve.
    const metered = { ...applied, uvbAt30: 66 };
    expect(matchingCatalogueType(metered, [t5])).toBeNull();
    expect(matchingCatalogueCurve(metered, [t5])?.id).toBe('7');
    // Another table, a half-life, or none: not the shop's curve.
    const other = {
      ...applied,
      decay: { points: [...measured.slice(0, 2), [12, 0.4]] as [number, number][] },
    };
    expect(matchingCatalogueCurve(other, [t5, mv])).toBeNull();
    expect(matchingCatalogueCurve({ ...applied, decay: { halfLifeMonths: 12 } }, [t5])).toBeNull();
    expect(matchingCatalogueCurve(lamp, [t5])).toBeNull();
    expect(matchingCatalogueCurve(applied, [])).toBeNull();
  });
});
