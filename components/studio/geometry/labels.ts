// Where lamp labels go on the canvas so that they never sit on top of one another. A greedy placement:
// labels are taken left to right, and each takes the first of a few candidate spots around its lamp
// that overlaps no label already placed, no lamp and (when it can) stays on screen. When every spot
// collides, the one with the least overlap wins. All in stage pixels (y down).
import type { Rect, Viewport } from './camera';

export interface LabelRequest {
  id: string;
  /** The lamp as drawn (stage px): the label goes around it. */
  body: Rect;
  /** The label's size (px). */
  width: number;
  height: number;
}

export interface LabelPlacement {
  id: string;
  rect: Rect;
  /** False when the label sits at its usual spot, centred just above its lamp. */
  moved: boolean;
}

/** Space (px) between a label and its lamp, and between stacked labels. */
export const LABEL_GAP_PX = 3;

/** The candidate spots of one label, in order of preference. */
export function labelCandidates(r: LabelRequest): Rect[] {
  const { body, width: w, height: h } = r;
  const cx = body.x + body.width / 2 - w / 2;
  const above = body.y - h - LABEL_GAP_PX;
  const below = body.y + body.height + LABEL_GAP_PX;
  const midY = body.y + body.height / 2 - h / 2;
  const step = h + LABEL_GAP_PX;
  const spots: [number, number][] = [
    [cx, above],
    // Slid sideways along the lamp (a long tube has room above it), then left or right of it.
    [body.x, above],
    [body.x + body.width - w, above],
    [body.x - w - LABEL_GAP_PX, midY],
    [body.x + body.width + LABEL_GAP_PX, midY],
    [cx, below],
    // Stacked higher above, as a last resort before overlapping.
    [cx, above - step],
    [cx, above - 2 * step],
    [cx, below + step],
  ];
  return spots.map(([x, y]) => ({ x, y, width: w, height: h }));
}

/** The area two rects share (px²); 0 when they only touch or lie apart. */
export function overlapArea(a: Rect, b: Rect): number {
  const w = Math.min(a.x + a.width, b.x + b.width) - Math.max(a.x, b.x);
  const h = Math.min(a.y + a.height, b.y + b.height) - Math.max(a.y, b.y);
  return w > 0 && h > 0 ? w * h : 0;
}

/** How much of a rect falls outside the viewport (px²). */
function offScreenArea(r: Rect, vp: Viewport): number {
  return r.width * r.height - overlapArea(r, { x: 0, y: 0, width: vp.width, height: vp.height });
}

/**
 * A spot slid sideways into the view when it pokes out at the left or right edge (a lamp near the edge
 * keeps its label whole, with a leader line back to it); a label wider than the view stays put.
 */
function withinWidth(r: Rect, vp: Viewport): Rect {
  if (r.width > vp.width) return r;
  const x = Math.min(Math.max(r.x, 0), vp.width - r.width);
  return x === r.x ? r : { ...r, x };
}

/**
 * Places every label; the result is in the order of `requests`. Deterministic: the same lamps give
 * the same places, so labels do not jump about between frames of a drag.
 */
export function placeLabels(requests: readonly LabelRequest[], viewport?: Viewport): LabelPlacement[] {
  const order = requests
    .map((r, i) => ({ r, i }))
    .sort((a, b) => a.r.body.x - b.r.body.x || a.r.body.y - b.r.body.y || a.i - b.i);
  const bodies = requests.map((r) => r.body);
  const placed: Rect[] = [];
  const out: LabelPlacement[] = new Array<LabelPlacement>(requests.length);
  for (const { r, i } of order) {
    const own = labelCandidates(r);
    const first = own[0]!;
    const candidates = viewport ? own.map((c) => withinWidth(c, viewport)) : own;
    let best = candidates[0]!;
    let bestCost = Infinity;
    for (const c of candidates) {
      let cost = 0;
      for (const p of placed) cost += overlapArea(c, p);
      for (const b of bodies) cost += overlapArea(c, b);
      // Leaving the screen is worse than nothing but better than covering another label.
      if (viewport) cost += offScreenArea(c, viewport) * 0.25;
      if (cost < bestCost) {
        best = c;
        bestCost = cost;
        if (cost === 0) break;
      }
    }
    placed.push(best);
    out[i] = { id: r.id, rect: best, moved: best.x !== first.x || best.y !== first.y };
  }
  return out;
}
