// Default objects placed by each tool: sizes a keeper would start from (cm; common practice,
// no published source), then edited in the inspector.
import type { Point } from '../geometry/camera';
import { LAMP_ON_LID_CM } from '../geometry/snap';
import type { PlaceTool as PlaceToolType } from './session';
import type { Design, DesignObject, LampObject } from './types';

export const DEFAULT_SIZES = {
  tubeLength: 55,
  perchLength: 40,
  perchThickness: 4,
  barrierLength: 40,
  ledge: { width: 30, height: 15 },
  hide: { width: 25, height: 14 },
  foliage: { width: 18, height: 40 },
} as const;

/**
 * A new T5 tube resting on the lid: the most common UVB set-up, a neutral starting point. In a
 * narrow enclosure the tube is shortened to fit (about three quarters of the width).
 */
export function defaultLamp(id: string, x: number, y: number, enclosureWidth = Infinity): LampObject {
  const length = Math.min(DEFAULT_SIZES.tubeLength, Math.max(10, Math.round(enclosureWidth * 0.75)));
  return { type: 'lamp', id, tech: 't5', form: 'tube', x, y, length, ageMonths: 0 };
}

/**
 * The object a click places at `p` (already snapped). Boxes are anchored by their bottom-left
 * corner centred on the click; a perch rises gently to the right; barriers span along the lid
 * (screen) or stand up (glass).
 */
export function objectForClick(design: Design, type: PlaceToolType, id: string, p: Point): DesignObject {
  const { width: W, height: H } = design.enclosure;
  switch (type) {
    case 'lamp':
      return defaultLamp(id, p.x, p.y, W);
    case 'screen': {
      // A click near the top makes the lid across the whole width, the usual mesh top.
      if (Math.abs(p.y - H) < 3) return { type: 'screen', id, x1: 0, y1: H, x2: W, y2: H };
      const half = DEFAULT_SIZES.barrierLength / 2;
      return { type: 'screen', id, x1: p.x - half, y1: p.y, x2: p.x + half, y2: p.y };
    }
    case 'glass': {
      const half = Math.min(DEFAULT_SIZES.barrierLength, H) / 2;
      return { type: 'glass', id, x1: p.x, y1: p.y + half, x2: p.x, y2: p.y - half };
    }
    case 'perch': {
      const len = DEFAULT_SIZES.perchLength;
      const a = (20 * Math.PI) / 180;
      const dx = (Math.cos(a) * len) / 2;
      const dy = (Math.sin(a) * len) / 2;
      return {
        type: 'perch',
        id,
        x1: round(p.x - dx),
        y1: round(p.y - dy),
        x2: round(p.x + dx),
        y2: round(p.y + dy),
        thickness: DEFAULT_SIZES.perchThickness,
      };
    }
    case 'ledge':
    case 'hide':
    case 'foliage': {
      const s = DEFAULT_SIZES[type];
      return { type, id, x: round(p.x - s.width / 2), y: p.y, width: s.width, height: s.height };
    }
  }
}

/** The object a drag from `a` to `b` draws (both already snapped); null when the drag is too small. */
export function objectForDrag(type: PlaceToolType, id: string, a: Point, b: Point): DesignObject | null {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  if (Math.hypot(dx, dy) < 1) return null;
  switch (type) {
    case 'lamp': {
      const length = Math.abs(dx);
      if (length < 5) return defaultLamp(id, a.x, a.y);
      return { ...defaultLamp(id, (a.x + b.x) / 2, a.y), length };
    }
    case 'screen':
    case 'glass':
      return { type, id, x1: a.x, y1: a.y, x2: b.x, y2: b.y };
    case 'perch':
      return { type, id, x1: a.x, y1: a.y, x2: b.x, y2: b.y, thickness: DEFAULT_SIZES.perchThickness };
    case 'ledge':
    case 'hide':
    case 'foliage': {
      const w = Math.abs(dx);
      const h = Math.abs(dy);
      if (w < 1 || h < 1) return null;
      return { type, id, x: Math.min(a.x, b.x), y: Math.min(a.y, b.y), width: w, height: h };
    }
  }
}

/** Where a lamp lands by default when placed from the keyboard: on the lid, mid-width. */
export function defaultLampPoint(design: Design): Point {
  return { x: design.enclosure.width / 2, y: design.enclosure.height + LAMP_ON_LID_CM };
}

function round(v: number): number {
  return Math.round(v * 100) / 100;
}
