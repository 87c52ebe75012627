import { describe, expect, it } from 'vitest';
import { formatAge, formatDay, formatValue, readableDays, tickLabelAnchor } from './format';

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

describe('reasons in the lamp log', () => {
  it('write their days as the rest of the page does, and leave other numbers alone', () => {
    expect(readableDays('The basking zone falls below the species’ need on about 2026-12-13.')).toBe(
      'The basking zone falls below the species’ need on about 13 Dec 2026.',
    );
    expect(
      readableDays(
        'Within the fit’s uncertainty it could fall below the need as early as 2026-10-16: measure it before then.',
      ),
    ).toBe(
      'Within the fit’s uncertainty it could fall below the need as early as 16 Oct 2026: measure it before then.',
    );
    expect(readableDays('Readings scatter about 12 % at 30 cm.')).toBe(
      'Readings scatter about 12 % at 30 cm.',
    );
  });
});
