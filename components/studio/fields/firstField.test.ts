import { describe, expect, it } from 'vitest';
import {
  contourBands,
  defaultThresholds,
  exampleDesign,
  handleRequest,
  physicsOf,
  type Design,
  type FieldName,
} from '@/simulation';
import { studioFirstField } from '@/shared/designs/studio-field';
import { cellSizeFor } from '@/shared/designs/studio-cell-size';
import { simplifyRing } from '@/shared/designs/svg-path';
import { parseStudioView, formatStudioView, DEFAULT_STUDIO_VIEW } from '@/shared/designs/studio-view-cookie';
import { contourAnswer, contourRequest } from './contourProtocol';

/** What the studio draws once its workers answer: the engine worker's grid, then the contour worker. */
function studioBands(design: Design, field: FieldName) {
  const res = handleRequest({
    id: 1,
    kind: 'simulate',
    design: physicsOf(design),
    cellCm: cellSizeFor(design.enclosure.width, design.enclosure.height, false),
    addMonths: 0,
  });
  if (res.kind !== 'result') throw new Error('engine failed');
  const ans = contourAnswer(contourRequest(1, field, res), { contourBands, defaultThresholds } as never);
  if (ans.kind !== 'bands') throw new Error('contours failed');
  return ans;
}

describe('the studio first field sent with the page', () => {
  const tall: Design = {
    ...exampleDesign(),
    enclosure: { ...exampleDesign().enclosure, width: 90, height: 180, depth: 60 },
  };
  for (const design of [exampleDesign(), tall]) {
    for (const field of ['uvi', 'uvb', 'tempC'] as const) {
      it(`has the studio's own thresholds and bands (${field}, ${design.enclosure.width}×${design.enclosure.height} cm)`, () => {
        const first = studioFirstField(design, field)!;
        const live = studioBands(design, field);
        expect(first.field).toBe(field);
        // Same colours for the same values: the legend does not change when the worker answers.
        expect(first.thresholds).toEqual(live.thresholds);
        expect(first.bands.map((b) => b.lo)).toEqual(live.bands.map((b) => b.lo));
        // Same shapes: the live rings, simplified and rounded as sent, point for point.
        const r = (v: number) => Math.round(v * 100) / 100;
        const sent = live.bands.map((b) =>
          b.polygons.map((p) => p.map((ring) => simplifyRing(ring).map(([x, y]) => [r(x), r(y)]))),
        );
        expect(first.bands.map((b) => b.polygons)).toEqual(sent);
      });
    }
  }

  it('is not drawn for a design the engine refuses', () => {
    const broken = { ...exampleDesign(), enclosure: { ...exampleDesign().enclosure, width: -5 } };
    expect(studioFirstField(broken as Design, 'uvi')).toBeNull();
  });
});

describe('the studio view cookie', () => {
  it('round-trips a field and its opacity, and "off"', () => {
    expect(parseStudioView(formatStudioView({ field: 'tempC', opacity: 0.5 }))).toEqual({
      field: 'tempC',
      opacity: 0.5,
    });
    expect(parseStudioView(formatStudioView({ field: null }))).toEqual({ field: null });
  });
  it('falls back to the studio defaults for anything else', () => {
    for (const raw of [undefined, '', 'uvi', 'heat.50', 'uvi.5', 'uvi.101', 'uvi.75;x', 'UVI.75'])
      expect(parseStudioView(raw)).toEqual(DEFAULT_STUDIO_VIEW);
  });
});
