import { describe, expect, it } from 'vitest';
import { fieldUnit } from '@/shared/field-scale';
import { colorFor, legendFor } from './legend';

describe('legend', () => {
  it('has one entry per band, in the display unit', () => {
    const l = legendFor('tempC', [20, 30, 40], 'F');
    expect(l.map((e) => e.label)).toEqual(['68 – 86', '86 – 104', '≥ 104']);
    expect(fieldUnit('tempC', 'F')).toBe('°F');
    expect(legendFor('uvi', [0, 0.7, 1, 2.6], 'C').map((e) => e.label)).toEqual([
      '0 – 0.7',
      '0.7 – 1',
      '1 – 2.6',
      '≥ 2.6',
    ]);
  });

  it('adds decimals until neighbouring bands read differently', () => {
    // A weak heat source: a couple of degrees over many bands.
    const labels = legendFor('tempC', [24, 24.3, 24.6, 25.1, 25.4, 26], 'C').map((e) => e.label);
    expect(labels).toEqual(['24 – 24.3', '24.3 – 24.6', '24.6 – 25.1', '25.1 – 25.4', '25.4 – 26', '≥ 26']);
    expect(new Set(labels).size).toBe(labels.length);
    // Whole degrees stay whole.
    expect(legendFor('tempC', [20, 30], 'C').map((e) => e.label)).toEqual(['20 – 30', '≥ 30']);
    expect(legendFor('uvb', [0, 0.02, 0.04], 'C').map((e) => e.label)).toEqual([
      '0 – 0.02',
      '0.02 – 0.04',
      '≥ 0.04',
    ]);
  });

  it('uses distinct colours and finds the band of a value', () => {
    const l = legendFor('uvb', [0, 10, 20, 30], 'C');
    expect(new Set(l.map((e) => e.color)).size).toBe(4);
    expect(colorFor(l, 15)).toBe(l[1]?.color);
    expect(colorFor(l, -1)).toBe(l[0]?.color);
    expect(legendFor('uvb', [5], 'C').map((e) => e.label)).toEqual(['≥ 5']);
    expect(legendFor('uvb', [], 'C')).toEqual([]);
  });
});
