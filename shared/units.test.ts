import { describe, expect, it } from 'vitest';
import {
  sizeBoth,
  tempBoth,
  rulerText,
  cDeltaToDisplay,
  cToDisplay,
  cmToDisplay,
  displayToC,
  displayToCm,
  formatLength,
  formatNumber,
  formatTemp,
} from './units';

describe('length units', () => {
  it('converts with the exact inch (1 in = 2.54 cm, international yard and pound agreement, 1959)', () => {
    expect(cmToDisplay(2.54, 'in')).toBeCloseTo(1, 12);
    expect(cmToDisplay(120, 'in')).toBeCloseTo(47.244, 3);
    expect(displayToCm(12, 'in')).toBeCloseTo(30.48, 12);
    expect(cmToDisplay(42, 'cm')).toBe(42);
  });

  it('round-trips display and storage', () => {
    for (const v of [0, 0.5, 33.3, 120, -4]) {
      expect(displayToCm(cmToDisplay(v, 'in'), 'in')).toBeCloseTo(v, 10);
    }
  });

  it('formats with the unit label', () => {
    expect(formatLength(30.48, 'in')).toBe('12 in');
    expect(formatLength(12.345, 'cm')).toBe('12.3 cm');
  });
});

describe('temperature units', () => {
  it('uses the Fahrenheit scale definition (F = C × 9/5 + 32; water freezes at 32 °F, boils at 212 °F)', () => {
    expect(cToDisplay(0, 'F')).toBe(32);
    expect(cToDisplay(100, 'F')).toBe(212);
    expect(cToDisplay(-40, 'F')).toBe(-40);
    expect(displayToC(95, 'F')).toBeCloseTo(35, 12);
    expect(cToDisplay(24, 'C')).toBe(24);
  });

  it('converts a difference without the offset', () => {
    expect(cDeltaToDisplay(10, 'F')).toBe(18);
  });

  it('formats readings', () => {
    expect(formatTemp(35, 'F')).toBe('95 °F');
    expect(formatTemp(24.04, 'C')).toBe('24 °C');
  });
});

describe('formatNumber', () => {
  it('never prints negative zero or NaN', () => {
    expect(formatNumber(-0.01, 1)).toBe('0');
    expect(formatNumber(Number.NaN)).toBe('–');
  });
});

describe('rulerText', () => {
  it('reads a 3-4-5 measurement in cm and in inches', () => {
    const ruler = { a: { x: 10, y: 10 }, b: { x: 40, y: 50 } };
    expect(rulerText(ruler, 'cm')).toBe('50 cm  (30 cm across, 40 cm up)  53°');
    // 50 cm = 19.69 in, 30 cm = 11.81 in, 40 cm = 15.75 in (1 in = 2.54 cm exactly).
    expect(rulerText(ruler, 'in')).toBe('19.7 in  (11.8 in across, 15.7 in up)  53°');
  });
});

describe('figures in both unit systems', () => {
  it('gives °F beside °C', () => {
    // °F = °C × 9/5 + 32 (definition of the Fahrenheit scale).
    expect(tempBoth(35)).toBe('35 °C (95 °F)');
    expect(tempBoth(24.04)).toBe('24 °C (75.3 °F)');
  });

  it('gives inches beside centimetres', () => {
    // 1 in = 2.54 cm exactly (international inch, 1959).
    expect(sizeBoth({ width: 120, height: 60, depth: 45.72 })).toBe(
      '120 × 60 × 45.7 cm (47.2 × 23.6 × 18 in)',
    );
  });
});
