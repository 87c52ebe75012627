import { describe, expect, it } from 'vitest';
import { speciesInputSchema } from '@/lib/species/schema';
import { STARTING_SHEETS } from '@/lib/species/starting-sheets';
import { initialState, toPayload, withUnit } from './form-state';

const sheet = { ...STARTING_SHEETS[0]!, id: 1, organisationId: 1, updatedAt: '' };

describe('species form state', () => {
  it('round-trips a sheet through the form unchanged', () => {
    const payload = toPayload(initialState(sheet, 'C'));
    const parsed = speciesInputSchema.parse(payload);
    const { seedKey: _s, id: _i, organisationId: _o, updatedAt: _u, ...expected } = sheet;
    expect(parsed).toEqual(expected);
  });

  it('shows °F and still sends °C (°F = °C × 9/5 + 32)', () => {
    const s = initialState(sheet, 'F');
    expect(s.temps.baskingSurfaceC).toEqual({ min: '104', max: '113' });
    const p = speciesInputSchema.parse(toPayload(s));
    expect(p.baskingSurfaceC).toEqual({ min: 40, max: 45 });
    expect(p.nightMinC).toBe(18);
  });

  it('converts typed temperatures when the unit changes', () => {
    const s = { ...initialState(null, 'C'), nightMin: '20' };
    s.temps.coolAirC = { min: '22.', max: '' };
    const f = withUnit(s, 'F');
    expect(f.nightMin).toBe('68');
    expect(f.temps.coolAirC).toEqual({ min: '71.6', max: '' });
  });

  it('sends empty optional pairs as null and unreadable numbers for the schema to refuse', () => {
    const s = initialState(null, 'C');
    const p = toPayload({ ...s, uvZone: 'x' });
    expect(p.uvbTargetUw).toBeNull();
    expect(p.photoperiodH).toBeNull();
    expect(Number.isNaN(p.uvZone)).toBe(true);
    expect(speciesInputSchema.safeParse(p).success).toBe(false);
  });
});
