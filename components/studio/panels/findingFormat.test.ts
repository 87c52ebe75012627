import { describe, expect, it } from 'vitest';
import { formatFindingNumber, humanKey, unmetText } from './findingFormat';

const metric = { length: 'cm' as const, temp: 'C' as const };

describe('finding numbers', () => {
  it('humanises keys', () => {
    expect(humanKey('baskingMeanUvi')).toBe('Basking mean UVI');
    expect(humanKey('shadeFraction')).toBe('Shade fraction');
    expect(humanKey('zoneMaxLo')).toBe('Zone max, lower bound');
  });

  it('converts temperatures and lengths by key', () => {
    expect(formatFindingNumber('hotSpotC', 35, { length: 'cm', temp: 'F' })).toEqual({
      label: 'Hot spot',
      value: '95 °F',
    });
    expect(formatFindingNumber('lampDistanceCm', 25.4, { length: 'in', temp: 'C' })).toEqual({
      label: 'Lamp distance',
      value: '10 in',
    });
    expect(formatFindingNumber('maxUvi', 3.456, metric)).toEqual({ label: 'Max UVI', value: '3.46' });
    expect(formatFindingNumber('baskingUw', 80.2, metric).value).toBe('80 µW/cm²');
  });

  it('states when the need stops being met', () => {
    expect(unmetText(7, 24)).toMatch(/month 7/);
    expect(unmetText(null, 24)).toMatch(/after 24 months/);
    expect(unmetText(0, 24)).toMatch(/even with new lamps/);
  });
});
