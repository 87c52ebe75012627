import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { EXAMPLE_DESIGN, type FieldGrid } from '@/simulation';
import type { FieldScale } from '@/shared/field-scale';
import { renderFieldRaster } from './raster';

// A field made by hand, not by the engine, so that this checks only how the objects are drawn over it:
// the hash was taken before the object kinds moved into one record each.
function stripes(width: number, height: number, cellCm: number): FieldGrid {
  const nx = Math.ceil(width / cellCm);
  const ny = Math.ceil(height / cellCm);
  const values = Float32Array.from({ length: nx * ny }, (_, k) => (k % nx) / nx);
  return { nx, ny, cellCm, width, height, uvb: values, uvi: values, tempC: values };
}

const SCALE: FieldScale = {
  field: 'uvi',
  thresholds: [0, 0.25, 0.5, 0.75],
  colors: ['#102030', '#405060', '#708090', '#a0b0c0'],
  label: 'UV Index',
  heading: 'UV Index',
};

describe('renderFieldRaster', () => {
  it('draws the example design (every kind, tube and bulb lamps) pixel for pixel as before', () => {
    const { width: w, height: h } = EXAMPLE_DESIGN.enclosure;
    const r = renderFieldRaster(EXAMPLE_DESIGN, stripes(w, h, 2), SCALE);
    expect([r.width, r.height]).toEqual([960, 542]);
    expect(createHash('sha256').update(r.data).digest('hex')).toMatchSnapshot();
  });

  it('draws the lamp in the lamp kind colours, not in ink', () => {
    const r = renderFieldRaster(EXAMPLE_DESIGN, stripes(120, 60, 2), SCALE);
    const pxPerCm = (960 - 32) / 120;
    // The middle of the example's UVB tube, which rests on the lid.
    const tube = EXAMPLE_DESIGN.objects.find((o) => o.type === 'lamp' && o.form === 'tube')!;
    const x = Math.round(16 + (tube as { x: number }).x * pxPerCm);
    const y = Math.round(r.height - 16 - (tube as { y: number }).y * pxPerCm);
    const k = (y * r.width + x) * 4;
    expect([...r.data.slice(k, k + 3)]).not.toEqual([28, 31, 26]);
    expect([...r.data.slice(k, k + 3)]).not.toEqual([255, 255, 255]);
  });
});
