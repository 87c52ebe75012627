// Pure geometry of design objects: bounds, hit tests, moving and handle edits. All in design cm, y up.
import type { Point, Rect } from './camera';
import { kindOf } from '@/shared/object-kinds';
import { lampExtent } from '@/shared/object-kinds/lamp';
import { halfThickness } from '@/shared/object-kinds/segment';
import { isBox, isSegment, type DesignObject, type SegmentObject } from '../state/types';

/** Visual thickness of thin barriers, for hit testing only (cm). */
export const BARRIER_HIT_CM = 1.5;
/** Smallest size a box or segment can be resized to (cm). */
export const MIN_SIZE_CM = 1;

export function objectBounds(o: DesignObject): Rect {
  return kindOf(o.type).bounds(o);
}

/** Distance from p to the segment ab. */
export function distanceToSegment(p: Point, a: Point, b: Point): number {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2));
  return Math.hypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy));
}

export function segmentEnds(o: SegmentObject): [Point, Point] {
  return [
    { x: o.x1, y: o.y1 },
    { x: o.x2, y: o.y2 },
  ];
}

/** Whether a design point hits the object; `tolerance` (cm) widens thin shapes for the pointer. */
export function hitTest(o: DesignObject, p: Point, tolerance = 0): boolean {
  if (isSegment(o)) {
    // A branch is as thick as it is drawn; a barrier's line is widened to be hit.
    const half = 'thickness' in o ? halfThickness(o) : BARRIER_HIT_CM / 2;
    const [a, b] = segmentEnds(o);
    return distanceToSegment(p, a, b) <= half + tolerance;
  }
  const r = objectBounds(o);
  return (
    p.x >= r.x - tolerance &&
    p.x <= r.x + r.width + tolerance &&
    p.y >= r.y - tolerance &&
    p.y <= r.y + r.height + tolerance
  );
}

/** The topmost object (last drawn) under the point. */
export function topmostAt(
  objects: readonly DesignObject[],
  p: Point,
  tolerance = 0,
): DesignObject | undefined {
  for (let i = objects.length - 1; i >= 0; i--) {
    const o = objects[i] as DesignObject;
    if (hitTest(o, p, tolerance)) return o;
  }
  return undefined;
}

export function translateObject<T extends DesignObject>(o: T, dx: number, dy: number): T {
  if (isSegment(o)) return { ...o, x1: o.x1 + dx, y1: o.y1 + dy, x2: o.x2 + dx, y2: o.y2 + dy };
  return { ...o, x: (o as { x: number }).x + dx, y: (o as { y: number }).y + dy };
}

/** A reference point of the object (used for grid snapping of a move). */
export function anchorPoint(o: DesignObject): Point {
  if (isSegment(o)) return { x: o.x1, y: o.y1 };
  return { x: o.x, y: o.y };
}

export type HandleId =
  'p1' | 'p2' | 'rotate' | 'nw' | 'n' | 'ne' | 'e' | 'se' | 's' | 'sw' | 'w' | 'len-w' | 'len-e';

export interface Handle {
  id: HandleId;
  x: number;
  y: number;
  label: string;
}

/** Distance (cm) of a segment's rotate handle from its midpoint, perpendicular to it. */
export const ROTATE_HANDLE_OFFSET_CM = 6;

export function objectHandles(o: DesignObject): Handle[] {
  if (isSegment(o)) {
    const mx = (o.x1 + o.x2) / 2;
    const my = (o.y1 + o.y2) / 2;
    const len = Math.hypot(o.x2 - o.x1, o.y2 - o.y1) || 1;
    // Perpendicular to the segment, on its upper side.
    let nx = -(o.y2 - o.y1) / len;
    let ny = (o.x2 - o.x1) / len;
    if (ny < 0) {
      nx = -nx;
      ny = -ny;
    }
    return [
      { id: 'p1', x: o.x1, y: o.y1, label: 'first end' },
      { id: 'p2', x: o.x2, y: o.y2, label: 'second end' },
      {
        id: 'rotate',
        x: mx + nx * ROTATE_HANDLE_OFFSET_CM,
        y: my + ny * ROTATE_HANDLE_OFFSET_CM,
        label: 'rotate',
      },
    ];
  }
  if (o.type === 'lamp') {
    if (o.form !== 'tube') return [];
    const { x1, x2 } = lampExtent(o);
    return [
      { id: 'len-w', x: x1, y: o.y, label: 'left end' },
      { id: 'len-e', x: x2, y: o.y, label: 'right end' },
    ];
  }
  const { x, y, width: w, height: h } = o;
  return [
    { id: 'nw', x, y: y + h, label: 'top left' },
    { id: 'n', x: x + w / 2, y: y + h, label: 'top' },
    { id: 'ne', x: x + w, y: y + h, label: 'top right' },
    { id: 'e', x: x + w, y: y + h / 2, label: 'right' },
    { id: 'se', x: x + w, y, label: 'bottom right' },
    { id: 's', x: x + w / 2, y, label: 'bottom' },
    { id: 'sw', x, y, label: 'bottom left' },
    { id: 'w', x, y: y + h / 2, label: 'left' },
  ];
}

/** Angle step (degrees) used when rotating with snapping on. */
export const ROTATE_SNAP_DEG = 15;

/**
 * The object after dragging one of its handles to `p` (already snapped by the caller).
 * `start` is the object as it was when the drag began, so resizing never accumulates error.
 */
export function applyHandle<T extends DesignObject>(
  start: T,
  handle: HandleId,
  p: Point,
  snapAngle = false,
): T {
  if (isSegment(start)) {
    if (handle === 'p1') return { ...start, x1: p.x, y1: p.y };
    if (handle === 'p2') return { ...start, x2: p.x, y2: p.y };
    if (handle === 'rotate') {
      const mx = (start.x1 + start.x2) / 2;
      const my = (start.y1 + start.y2) / 2;
      const half = Math.hypot(start.x2 - start.x1, start.y2 - start.y1) / 2;
      // The handle sits on the normal; the segment direction is the handle direction turned by -90°.
      let angle = Math.atan2(p.y - my, p.x - mx) - Math.PI / 2;
      if (snapAngle) {
        const step = (ROTATE_SNAP_DEG * Math.PI) / 180;
        angle = Math.round(angle / step) * step;
      }
      const ux = Math.cos(angle) * half;
      const uy = Math.sin(angle) * half;
      return { ...start, x1: round6(mx - ux), y1: round6(my - uy), x2: round6(mx + ux), y2: round6(my + uy) };
    }
    return start;
  }
  if (start.type === 'lamp') {
    if (start.form !== 'tube') return start;
    const { x1, x2 } = lampExtent(start);
    if (handle === 'len-w') {
      const nx1 = Math.min(p.x, x2 - MIN_SIZE_CM);
      return { ...start, x: (nx1 + x2) / 2, length: x2 - nx1 };
    }
    if (handle === 'len-e') {
      const nx2 = Math.max(p.x, x1 + MIN_SIZE_CM);
      return { ...start, x: (x1 + nx2) / 2, length: nx2 - x1 };
    }
    return start;
  }
  if (!isBox(start)) return start;
  let left = start.x;
  let right = start.x + start.width;
  let bottom = start.y;
  let top = start.y + start.height;
  if (handle.includes('w')) left = Math.min(p.x, right - MIN_SIZE_CM);
  if (handle.includes('e')) right = Math.max(p.x, left + MIN_SIZE_CM);
  if (handle.includes('s')) bottom = Math.min(p.y, top - MIN_SIZE_CM);
  if (handle.includes('n')) top = Math.max(p.y, bottom + MIN_SIZE_CM);
  return { ...start, x: left, y: bottom, width: right - left, height: top - bottom };
}

function round6(v: number): number {
  return Math.round(v * 1e6) / 1e6;
}

export function segmentLength(o: SegmentObject): number {
  return Math.hypot(o.x2 - o.x1, o.y2 - o.y1);
}

/** Angle of a segment in degrees, counter-clockwise from the +x axis. */
export function segmentAngleDeg(o: SegmentObject): number {
  return (Math.atan2(o.y2 - o.y1, o.x2 - o.x1) * 180) / Math.PI;
}

/** The top surface of a perch at x (for "the animal on the perch"), or null outside it. */
export function perchTopAt(o: SegmentObject & { type: 'perch' }, x: number): number | null {
  const lo = Math.min(o.x1, o.x2);
  const hi = Math.max(o.x1, o.x2);
  if (x < lo || x > hi) return null;
  const t = o.x2 === o.x1 ? 0 : (x - o.x1) / (o.x2 - o.x1);
  const yc = o.y1 + t * (o.y2 - o.y1);
  const cos = Math.cos(Math.atan2(o.y2 - o.y1, o.x2 - o.x1));
  return yc + o.thickness / 2 / Math.max(Math.abs(cos), 1e-6);
}
