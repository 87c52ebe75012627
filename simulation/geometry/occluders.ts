/**
 * Everything that stands between a lamp and a receiver, as convex shapes in the section plane:
 * screens and glass are segments (2 vertices), perches are rectangles of their thickness around their
 * centre line, ledges, hides and foliage are boxes. Perches, ledges and hides are opaque; screens, glass
 * and foliage pass a share of the UVB and of the infrared.
 */
import type { Design, DesignObject } from '../model/schema';
import { barrierUvbTransmission } from '../model/resolve';

export type OccluderKind = 'screen' | 'glass' | 'perch' | 'ledge' | 'hide' | 'foliage';

export interface Occluder {
  id: string;
  kind: OccluderKind;
  /** Vertices, counter-clockwise for polygons; 2 for a segment. */
  xs: number[];
  ys: number[];
  /** UVB transmission (0 for opaque objects). */
  uvbT: number;
  /** IR transmission, or null for glass without its own value (depends on the lamp). */
  irT: number | null;
  ymin: number;
  ymax: number;
}

export function isOccluderObject(o: DesignObject): o is Exclude<DesignObject, { type: 'lamp' }> {
  return o.type !== 'lamp';
}

function box(x: number, y: number, w: number, h: number) {
  return { xs: [x, x + w, x + w, x], ys: [y, y, y + h, y + h] };
}

/** Rectangle of full width `thickness` around the segment; a zero-length perch becomes a square. */
export function thickSegment(x1: number, y1: number, x2: number, y2: number, thickness: number) {
  const dx = x2 - x1;
  const dy = y2 - y1;
  const len = Math.hypot(dx, dy);
  const r = thickness / 2;
  if (len < 1e-9) return box(x1 - r, y1 - r, thickness, thickness);
  const nx = (-dy / len) * r;
  const ny = (dx / len) * r;
  // p1 - n, p2 - n, p2 + n, p1 + n is counter-clockwise for n to the left of p1 -> p2.
  return { xs: [x1 - nx, x2 - nx, x2 + nx, x1 + nx], ys: [y1 - ny, y2 - ny, y2 + ny, y1 + ny] };
}

export function compileOccluder(o: Exclude<DesignObject, { type: 'lamp' }>): Occluder {
  let shape: { xs: number[]; ys: number[] };
  let uvbT = 0;
  let irT: number | null = 0;
  switch (o.type) {
    case 'screen':
      shape = { xs: [o.x1, o.x2], ys: [o.y1, o.y2] };
      uvbT = barrierUvbTransmission(o);
      irT = o.irTransmission ?? uvbT;
      break;
    case 'glass':
      shape = { xs: [o.x1, o.x2], ys: [o.y1, o.y2] };
      uvbT = barrierUvbTransmission(o);
      irT = o.irTransmission ?? null;
      break;
    case 'foliage':
      shape = box(o.x, o.y, o.width, o.height);
      uvbT = barrierUvbTransmission(o);
      irT = o.irTransmission ?? uvbT;
      break;
    case 'perch':
      shape = thickSegment(o.x1, o.y1, o.x2, o.y2, o.thickness);
      break;
    case 'ledge':
    case 'hide':
      shape = box(o.x, o.y, o.width, o.height);
      break;
  }
  return {
    id: o.id,
    kind: o.type,
    xs: shape.xs,
    ys: shape.ys,
    uvbT,
    irT,
    ymin: Math.min(...shape.ys),
    ymax: Math.max(...shape.ys),
  };
}

export function compileOccluders(design: Design): Occluder[] {
  const out: Occluder[] = [];
  for (const o of design.objects) if (isOccluderObject(o)) out.push(compileOccluder(o));
  return out;
}
