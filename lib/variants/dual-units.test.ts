import { describe, expect, it } from 'vitest';
import { sizeBoth, tempBoth } from './dual-units';

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
