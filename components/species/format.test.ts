import { describe, expect, it } from 'vitest';
import { formatRange, formatTempRange, formatTempValue, hasUnverifiedFigures } from './format';

describe('species formatting', () => {
  it('formats temperature ranges in °C and °F (°F = °C × 9/5 + 32)', () => {
    expect(formatTempRange({ min: 40, max: 45 }, 'C')).toBe('40–45 °C');
    expect(formatTempRange({ min: 40, max: 45 }, 'F')).toBe('104–113 °F');
    expect(formatTempRange({ min: 12, max: 12 }, 'C')).toBe('12 °C');
    expect(formatTempValue(18, 'F')).toBe('64 °F');
  });

  it('formats other ranges and a missing one', () => {
    expect(formatRange({ min: 25, max: 50 }, 'µW/cm²')).toBe('25–50 µW/cm²');
    expect(formatRange(null, 'h')).toBe('—');
  });

  it('calls a sheet unverified when a source is from memory or missing', () => {
    expect(hasUnverifiedFigures([])).toBe(true);
    expect(hasUnverifiedFigures([{ citation: 'From memory', confidence: 'x' }])).toBe(true);
    expect(
      hasUnverifiedFigures([{ citation: 'Smith 2001, J. Herp. 1:1', confidence: 'published table' }]),
    ).toBe(false);
  });
});
