import { describe, expect, it } from 'vitest';
import { bandColors, hexToRgb, labelColorOn, rampColor, relativeLuminance, rgbToHex } from './colour-ramps';

describe('colour ramps', () => {
  it('round-trips hex', () => {
    expect(rgbToHex(hexToRgb('#26828e'))).toBe('#26828e');
  });

  it('hits the end stops and clamps outside [0, 1]', () => {
    expect(rampColor('viridis', 0)).toBe('#440154');
    expect(rampColor('viridis', 1)).toBe('#fde725');
    expect(rampColor('viridis', -3)).toBe('#440154');
    expect(rampColor('viridis', 7)).toBe('#fde725');
  });

  it('gets lighter monotonically along each ramp (a property of perceptually uniform maps, van der Walt & Smith 2015)', () => {
    for (const ramp of ['viridis', 'inferno'] as const) {
      let prev = -1;
      for (let i = 0; i <= 40; i++) {
        const l = relativeLuminance(rampColor(ramp, i / 40));
        expect(l).toBeGreaterThanOrEqual(prev - 1e-3);
        prev = l;
      }
    }
  });

  it('gives one distinct colour per band', () => {
    const c = bandColors('viridis', 6);
    expect(c).toHaveLength(6);
    expect(new Set(c).size).toBe(6);
    expect(bandColors('inferno', 0)).toEqual([]);
  });

  it('draws a field of one band in the low end of the ramp, as the first band of any field is', () => {
    expect(bandColors('viridis', 1)).toEqual([bandColors('viridis', 6)[0]]);
    expect(bandColors('inferno', 1)).toEqual([rampColor('inferno', 0)]);
  });

  it('chooses a readable label colour (WCAG relative luminance)', () => {
    expect(labelColorOn('#fde725')).toBe('#1c1f1a');
    expect(labelColorOn('#440154')).toBe('#f5f6f4');
  });
});
