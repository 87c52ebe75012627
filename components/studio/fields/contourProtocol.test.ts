import { describe, expect, it } from 'vitest';
import { computeFields, contourBands, defaultThresholds } from '@/simulation';
import { contourAnswer, contourRequest } from './contourProtocol';
import { exampleDesign } from '../examples/exampleDesign';

describe('contour worker answer', () => {
  it('gives the same bands as the engine on the full grid, for each field', () => {
    const g = computeFields(exampleDesign(), { cellCm: 2 });
    for (const field of ['uvb', 'uvi', 'tempC'] as const) {
      const r = contourAnswer(contourRequest(1, field, g), { contourBands, defaultThresholds } as never);
      expect(r.kind).toBe('bands');
      if (r.kind !== 'bands') return;
      expect(r.thresholds).toEqual(defaultThresholds(field, g));
      expect(r.bands).toEqual(contourBands(g, field, r.thresholds));
      expect(r.bands.length).toBeGreaterThan(1);
    }
  });

  it('answers an error instead of throwing', () => {
    const r = contourAnswer(
      { id: 2, field: 'uvb', nx: 2, ny: 2, cellCm: 1, width: 2, height: 2, values: new Float32Array(4) },
      {
        defaultThresholds: () => {
          throw new Error('boom');
        },
        contourBands: () => [],
      },
    );
    expect(r).toEqual({ id: 2, kind: 'error', message: 'boom' });
  });
});
