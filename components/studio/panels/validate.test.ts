import { describe, expect, it } from 'vitest';
import { checkEnclosureEdit, checkObjectEdit, parseTyped } from './validate';
import type { LampObject, PerchObject } from '../state/types';

const cm = { length: 'cm' as const, temp: 'C' as const };
const imperial = { length: 'in' as const, temp: 'F' as const };
const perch: PerchObject = { type: 'perch', id: 'b1', x1: 20, y1: 20, x2: 70, y2: 38, thickness: 4 };
const lamp: LampObject = { type: 'lamp', id: 'uv', tech: 't5', form: 'tube', x: 40, y: 62, length: 55 };

describe('inspector validation (engine schema)', () => {
  it('accepts a valid edit and returns the parsed object', () => {
    const r = checkObjectEdit(perch, 'thickness', 6, 'length', cm);
    expect(r).toEqual({ ok: true, value: { ...perch, thickness: 6 } });
  });

  it('explains a limit in the unit being typed', () => {
    const r = checkObjectEdit(perch, 'thickness', 0, 'length', cm);
    expect(r).toEqual({ ok: false, message: 'Must be more than 0 cm.' });
    const big = checkObjectEdit(perch, 'thickness', 1000, 'length', imperial);
    expect(big.ok).toBe(false);
    expect(!big.ok && big.message).toBe('Must be at most 39.37 in.'); // 100 cm
  });

  it('checks rules across fields (a tube needs a length) and resets optional fields', () => {
    expect(checkObjectEdit(lamp, 'length', undefined, 'length', cm)).toEqual({
      ok: false,
      message: 'A tube needs a length.',
    });
    const reset = checkObjectEdit({ ...lamp, uvbAt30: 80 }, 'uvbAt30', undefined, 'plain', cm);
    expect(reset.ok && 'uvbAt30' in reset.value).toBe(false);
    expect(checkObjectEdit(lamp, 'reflectorGain', 0.5, 'plain', cm)).toEqual({
      ok: false,
      message: 'Must be at least 1.',
    });
  });

  it('validates the enclosure with temperatures in °F', () => {
    const e = { width: 120, height: 60, depth: 60 };
    const r = checkEnclosureEdit(e, 'roomTempC', 60, 'temp', imperial);
    expect(r).toEqual({ ok: false, message: 'Must be at most 122 °F.' });
  });

  it('parses typed numbers, with a decimal comma too', () => {
    expect(parseTyped(' 12,5 ')).toBe(12.5);
    expect(parseTyped('')).toBeNull();
    expect(parseTyped('12cm')).toBeNaN();
    expect(parseTyped('-3')).toBe(-3);
  });
});
