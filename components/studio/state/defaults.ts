// The objects each tool places: each kind's record (shared/object-kinds/) says what a click or a drag
// makes; sizes a keeper would start from, then edited in the inspector.
import type { Point } from '../geometry/camera';
import { kindOf, type ObjectType } from '@/shared/object-kinds';
import type { Design, DesignObject } from './types';

/** The object a click places at `p` (already snapped). */
export function objectForClick(design: Design, type: ObjectType, id: string, p: Point): DesignObject {
  return kindOf(type).place(design, id, p);
}

/** The object a drag from `a` to `b` draws (both already snapped); null when the drag is too small. */
export function objectForDrag(type: ObjectType, id: string, a: Point, b: Point): DesignObject | null {
  if (Math.hypot(b.x - a.x, b.y - a.y) < 1) return null;
  return kindOf(type).draw(id, a, b);
}

/** Where a new object of this kind goes when placed from the keyboard (a lamp on the lid, mid-width). */
export function keyboardPoint(design: Design, type: ObjectType): Point {
  return kindOf(type).centre(design);
}
