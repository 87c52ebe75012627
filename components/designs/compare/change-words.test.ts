import { describe, expect, it } from 'vitest';
import { changeText, offsetText, valueText } from './change-words';

describe('the "what differs" table in words', () => {
  it('says what a lamp log calibration and a lamp’s own decline curve mean, never their stored form', () => {
    // The demo's change from the old tube to a new one: age, calibration and curve all go.
    const curve = {
      points: [
        [0, 1],
        [6, 0.85],
        [12, 0.72],
        [24, 0.55],
      ] as [number, number][],
    };
    const texts = [
      changeText({ field: 'calibration', a: { at: '2026-11-05', from: '8 meter readings' }, b: undefined }),
      changeText({ field: 'decay', a: curve, b: undefined }),
      changeText({ field: 'decay', a: { halfLifeMonths: 9 }, b: { halfLifeMonths: 12 } }),
    ];
    expect(texts).toEqual([
      'output figures: calibrated 5 Nov 2026 from 8 meter readings → the catalogue’s (not calibrated)',
      'output decline: this lamp’s own curve (72 % left at 12 months) → the technology’s usual curve',
      'output decline: halves every 9 months → halves every 12 months',
    ]);
    for (const t of texts) expect(t).not.toMatch(/[{}[\]"]/);
  });

  it('gives units, shares as percentages and technologies by name', () => {
    expect(changeText({ field: 'ageMonths', a: 10.8, b: 0 })).toBe('age: 10.8 months → 0 months');
    expect(changeText({ field: 'uvbTransmission', a: 0.64, b: 0.5 })).toBe('UVB let through: 64 % → 50 %');
    expect(changeText({ field: 'irTransmission', a: undefined, b: 0.9 })).toBe(
      'infrared let through: not set (default) → 90 %',
    );
    expect(changeText({ field: 'tech', a: 't5', b: 't8' })).toBe(
      'technology: T5 fluorescent tube → T8 fluorescent tube',
    );
    expect(changeText({ field: 'x1', a: 10, b: 12.5 })).toBe('start x: 10 cm → 12.5 cm');
    // Values that differ but round alike are shown to more digits.
    expect(changeText({ field: 'uviPerUvb', a: 0.040213, b: 0.04 })).toBe(
      'UV Index per µW/cm²: 0.04021 → 0.04',
    );
    expect(changeText({ field: 'uvbTransmission', a: 0.6404, b: 0.64 })).toBe(
      'UVB let through: 64.04 % → 64 %',
    );
  });

  it('names a change to a field it does not know without printing the stored value', () => {
    expect(valueText({ any: 'thing' }, 'somethingNew')).toBe('set');
    expect(valueText(true, 'visible')).toBe('yes');
  });

  it('writes an offset as directions', () => {
    expect(offsetText(54, 0)).toBe('54 cm right');
    expect(offsetText(-2.04, -3)).toBe('2 cm left, 3 cm down');
    expect(offsetText(0, 0)).toBe('');
  });
});
