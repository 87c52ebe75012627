import { describe, expect, it } from 'vitest';
import { lampTypeInputSchema } from '@/lib/lamp-types/schema';
import { STARTING_LAMP_TYPES } from '@/lib/lamp-types/starting-lamp-types';
import { initialLampState, lampPayload, techDefaults, withLengthUnit } from './lamp-form-state';

const t5 = {
  ...STARTING_LAMP_TYPES.find((t) => t.presetKey === 't5-high')!,
  id: 1,
  organisationId: 1,
  updatedAt: '',
};

describe('lamp type form state', () => {
  it('round-trips a catalogue entry', () => {
    const { presetKey: _p, id: _i, organisationId: _o, updatedAt: _u, decayPoints: _d, ...expected } = t5;
    const parsed = lampTypeInputSchema.parse(lampPayload(initialLampState(t5, 'cm')));
    expect({ ...parsed, decayPoints: undefined }).toEqual({ ...expected, decayPoints: undefined });
  });

  it('shows tube lengths in inches and sends centimetres (1 in = 2.54 cm)', () => {
    const st = initialLampState(t5, 'in');
    expect(st.length).toBe('21.65');
    expect(lampTypeInputSchema.parse(lampPayload(st)).lengthCm).toBeCloseTo(55, 1);
    expect(withLengthUnit(st, 'cm').length).toBe('54.99');
  });

  it('fills a technology’s defaults from the engine', () => {
    const d = techDefaults('ceramic', 'cm');
    expect(d).toMatchObject({ form: 'bulb', uvbAt30: '0', halfLifeMonths: '' });
  });
});
