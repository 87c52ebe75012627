// What the segment kinds (screen, glass, perch) share: two ends in design cm.
import type { DesignObject } from '@/simulation';
import type { Point, Rect, SnapRole, SvgNode } from './types';

export type SegmentObject = Extract<DesignObject, { x1: number }>;

/** Default length of a new barrier (cm; common practice, no published source). */
export const BARRIER_LENGTH_CM = 40;

/** A barrier's ends snap to the lid and the floor; nothing rests on it. */
export const BARRIER_SNAP: SnapRole = {
  click: 'barrier-end',
  drag: 'barrier-end',
  ends: 'barrier-end',
  restsOn: 'lid-and-floor',
  bearsWeight: false,
};

/** Half the drawn thickness of a segment that has one (a perch's branch); barriers are lines. */
export function halfThickness(o: SegmentObject): number {
  return 'thickness' in o ? o.thickness / 2 : 0;
}

export function segmentBounds(o: SegmentObject): Rect {
  const pad = halfThickness(o);
  const x = Math.min(o.x1, o.x2) - pad;
  const y = Math.min(o.y1, o.y2) - pad;
  return { x, y, width: Math.abs(o.x2 - o.x1) + 2 * pad, height: Math.abs(o.y2 - o.y1) + 2 * pad };
}

export function ends(a: Point, b: Point) {
  return { x1: a.x, y1: a.y, x2: b.x, y2: b.y };
}

export function segmentLine(o: SegmentObject, style: SvgNode['attrs']): SvgNode {
  return { tag: 'line', attrs: { x1: o.x1, y1: o.y1, x2: o.x2, y2: o.y2, ...style } };
}
