import { describe, expect, it } from 'vitest';
import type { Rect } from './camera';
import { LABEL_GAP_PX, labelCandidates, placeLabels, type LabelRequest } from './labels';

const overlaps = (a: Rect, b: Rect) =>
  a.x < b.x + b.width && b.x < a.x + a.width && a.y < b.y + b.height && b.y < a.y + a.height;

const lamp = (id: string, x: number, y: number, width = 20, height = 20): LabelRequest => ({
  id,
  body: { x, y, width, height },
  width: 90,
  height: 14,
});

describe('lamp label placement', () => {
  it('puts a lone label centred just above its lamp', () => {
    const [p] = placeLabels([lamp('a', 100, 100)]);
    expect(p).toEqual({
      id: 'a',
      rect: { x: 110 - 45, y: 100 - 14 - LABEL_GAP_PX, width: 90, height: 14 },
      moved: false,
    });
  });

  it('keeps labels of lamps far apart at their usual spot', () => {
    const ps = placeLabels([lamp('a', 0, 100), lamp('b', 300, 100)]);
    expect(ps.map((p) => p.moved)).toEqual([false, false]);
  });

  it('moves the second of two lamps side by side so the labels do not collide', () => {
    const ps = placeLabels([lamp('a', 100, 100), lamp('b', 130, 100)]);
    expect(overlaps(ps[0]!.rect, ps[1]!.rect)).toBe(false);
    // The leftmost keeps its spot; the other moved, and covers no lamp either.
    expect(ps[0]!.moved).toBe(false);
    expect(ps[1]!.moved).toBe(true);
    for (const p of ps) {
      expect(overlaps(p.rect, { x: 100, y: 100, width: 20, height: 20 })).toBe(false);
      expect(overlaps(p.rect, { x: 130, y: 100, width: 20, height: 20 })).toBe(false);
    }
  });

  it('places five lamps in a row (as a shop shelf of bulbs) without any two labels touching', () => {
    const reqs = [0, 1, 2, 3, 4].map((i) => lamp(`l${i}`, 200 + i * 25, 200));
    const ps = placeLabels(reqs);
    for (let i = 0; i < ps.length; i++)
      for (let j = i + 1; j < ps.length; j++) expect(overlaps(ps[i]!.rect, ps[j]!.rect)).toBe(false);
    // Results come back in the order asked, whatever order they were placed in.
    expect(ps.map((p) => p.id)).toEqual(['l0', 'l1', 'l2', 'l3', 'l4']);
  });

  it('slides a label along a long tube before leaving it', () => {
    // A 300 px tube with a bulb's label already over its middle.
    const tube: LabelRequest = {
      id: 't',
      body: { x: 100, y: 100, width: 300, height: 8 },
      width: 90,
      height: 14,
    };
    const bulb: LabelRequest = {
      id: 'b',
      body: { x: 205, y: 60, width: 30, height: 30 },
      width: 90,
      height: 14,
    };
    const [t] = placeLabels([tube, bulb]);
    expect(t!.moved).toBe(true);
    expect(t!.rect.y).toBe(100 - 14 - LABEL_GAP_PX);
    expect([100, 400 - 90]).toContain(t!.rect.x);
  });

  it('stays on screen when a spot inside is free', () => {
    // A lamp at the top edge: above it would be off screen, so the label goes beside or below it.
    const [p] = placeLabels([lamp('a', 150, 2)], { width: 400, height: 300 });
    expect(p!.rect.y).toBeGreaterThanOrEqual(0);
    expect(p!.moved).toBe(true);
  });

  it('slides a label poking out at an edge back into the view, whole', () => {
    // A lamp in the top right corner with a long label: no spot around it fits the view (above is off
    // the top, beside pokes out at an edge), so the label is slid in rather than cut.
    const view = { width: 300, height: 300 };
    const [p] = placeLabels([{ ...lamp('a', 280, 2), width: 290 }], view);
    expect(p!.rect.x + p!.rect.width).toBeLessThanOrEqual(view.width);
    expect(p!.rect.x).toBeGreaterThanOrEqual(0);
    expect(p!.moved).toBe(true);
    // A label wider than the view is left where it was.
    const [wide] = placeLabels([{ ...lamp('b', 150, 100), width: 400 }], view);
    expect(wide!.rect.width).toBe(400);
    // Away from the edges nothing changes: centred above, not moved.
    const [mid] = placeLabels([lamp('c', 150, 100)], view);
    expect(mid!.moved).toBe(false);
  });

  it('picks the spot with the least overlap when every spot collides, and is deterministic', () => {
    const reqs = Array.from({ length: 12 }, (_, i) => lamp(`x${i}`, 100 + (i % 3), 100));
    const a = placeLabels(reqs);
    const b = placeLabels(reqs);
    expect(a).toEqual(b);
    // Every candidate of a label is one of its own spots.
    const spots = labelCandidates(reqs[5]!).map((r) => JSON.stringify(r));
    expect(spots).toContain(JSON.stringify(a[5]!.rect));
  });
});
