import { describe, expect, it } from 'vitest';
import { formatAge, formatDay, formatValue, tickLabelAnchor } from './format';

describe('lamp log formatting', () => {
  it('shows meter values as precisely as a meter does', () => {
    expect(formatValue(24.5, 'uvb')).toBe('24.5 µW/cm²');
    expect(formatValue(24, 'uvb')).toBe('24 µW/cm²');
    expect(formatValue(148.6, 'uvb')).toBe('149 µW/cm²');
    expect(formatValue(1.333, 'uvi')).toBe('1.33 UVI');
    expect(formatValue(null, 'uvb')).toBe('—');
  });

  it('gives ages in days, then months, then years, and dates without time-zone drift', () => {
    expect(formatAge(1)).toBe('1 day');
    expect(formatAge(100)).toBe('3.3 months');
    expect(formatAge(1000)).toBe('2.7 years');
    expect(formatDay('2026-01-06')).toBe('6 Jan 2026');
    expect(formatDay(null)).toBe('—');
  });

  it('keeps an axis label inside the drawing at its edges', () => {
    // The decay chart: 760 px wide, a month label about 30 px each side of its tick.
    expect(tickLabelAnchor(750, 0, 760, 30)).toBe('end');
    expect(tickLabelAnchor(380, 0, 760, 30)).toBe('middle');
    expect(tickLabelAnchor(64, 0, 760, 30)).toBe('middle');
    expect(tickLabelAnchor(20, 0, 760, 30)).toBe('start');
  });
});
