/**
 * Reachable surfaces: where an animal can stand or lie — the floor, the tops of perches, ledges and hide
 * roofs; for a species that climbs, also one face of every mesh screen (a lid's underside, the outside of
 * a wire guard around a bulb), since climbers hang from mesh right under the lamps. The floor inside a hide counts (it is shaded, and that is the refuge); floor under a ledge or a
 * perch does not (it is solid). Foliage is not treated as a surface. Each surface is cut into short pieces
 * and sampled at the middle of each piece, lifted 0.01 cm off the surface.
 */
import type { Design } from '../model/schema';
import type { Segment } from './types';
import { thickSegment } from '../geometry/occluders';

export interface SurfaceSample {
  x: number;
  y: number;
  /** 'floor' or the id of the perch, ledge or hide. */
  surfaceId: string;
  kind: 'floor' | 'perch' | 'ledge' | 'hide' | 'screen';
  /** The piece of surface this sample stands for. */
  piece: Segment;
  /** Length of the piece, cm. */
  length: number;
  /** Inside a hide (shaded floor or perch inside it). */
  inHide: boolean;
}

const LIFT = 0.01;
export const DEFAULT_SAMPLE_CM = 1;

interface Box {
  x0: number;
  y0: number;
  x1: number;
  y1: number;
}

function strictlyInsideBox(x: number, y: number, b: Box): boolean {
  return x > b.x0 && x < b.x1 && y > b.y0 && y < b.y1;
}

function strictlyInsidePolygon(x: number, y: number, xs: number[], ys: number[]): boolean {
  // Convex, counter-clockwise: inside when left of every edge.
  for (let k = 0, n = xs.length; k < n; k++) {
    const ax = xs[k]!;
    const ay = ys[k]!;
    const bx = xs[(k + 1) % n]!;
    const by = ys[(k + 1) % n]!;
    if ((bx - ax) * (y - ay) - (by - ay) * (x - ax) <= 0) return false;
  }
  return true;
}

/**
 * The face of a screen a climber holds on to: the one facing away from the nearest lamp (a lid's
 * underside under a lamp on top, the outside of a guard around a bulb); with no lamp, the lower face.
 */
function climbFace(design: Design, seg: Segment): { nx: number; ny: number } {
  const len = Math.hypot(seg.x2 - seg.x1, seg.y2 - seg.y1) || 1;
  let nx = -(seg.y2 - seg.y1) / len;
  let ny = (seg.x2 - seg.x1) / len;
  const mx = (seg.x1 + seg.x2) / 2;
  const my = (seg.y1 + seg.y2) / 2;
  let best = Infinity;
  let towards = 0;
  for (const o of design.objects) {
    if (o.type !== 'lamp') continue;
    const d = Math.hypot(o.x - mx, o.y - my);
    if (d < best) {
      best = d;
      towards = (o.x - mx) * nx + (o.y - my) * ny;
    }
  }
  const flip = Number.isFinite(best) ? towards > 0 : ny > 0 || (ny === 0 && nx > 0);
  if (flip) {
    nx = -nx;
    ny = -ny;
  }
  return { nx, ny };
}

export function reachableSurfaces(
  design: Design,
  spacing = DEFAULT_SAMPLE_CM,
  opts: { climbs?: boolean } = {},
): SurfaceSample[] {
  const { width: W, height: H } = design.enclosure;
  const solids: { id: string; test: (x: number, y: number) => boolean }[] = [];
  const hides: Box[] = [];
  const surfaces: { id: string; kind: SurfaceSample['kind']; seg: Segment; nx: number; ny: number }[] = [
    { id: 'floor', kind: 'floor', seg: { x1: 0, y1: 0, x2: W, y2: 0 }, nx: 0, ny: 1 },
  ];
  for (const o of design.objects) {
    if (o.type === 'ledge' || o.type === 'hide') {
      const b = { x0: o.x, y0: o.y, x1: o.x + o.width, y1: o.y + o.height };
      if (o.type === 'ledge') solids.push({ id: o.id, test: (x, y) => strictlyInsideBox(x, y, b) });
      else hides.push(b);
      surfaces.push({
        id: o.id,
        kind: o.type,
        seg: { x1: b.x0, y1: b.y1, x2: b.x1, y2: b.y1 },
        nx: 0,
        ny: 1,
      });
    } else if (o.type === 'perch') {
      const r = thickSegment(o.x1, o.y1, o.x2, o.y2, o.thickness);
      solids.push({ id: o.id, test: (x, y) => strictlyInsidePolygon(x, y, r.xs, r.ys) });
      // The upper long side: vertices 2-3 (p2 + n, p1 + n) or 0-1 (p1 − n, p2 − n), whichever is higher.
      const upper = r.ys[2]! + r.ys[3]! >= r.ys[0]! + r.ys[1]! ? [3, 2] : [0, 1];
      const a = upper[0]!;
      const b = upper[1]!;
      const seg = { x1: r.xs[a]!, y1: r.ys[a]!, x2: r.xs[b]!, y2: r.ys[b]! };
      const len = Math.hypot(seg.x2 - seg.x1, seg.y2 - seg.y1) || 1;
      // Upward normal of the side.
      let nx = -(seg.y2 - seg.y1) / len;
      let ny = (seg.x2 - seg.x1) / len;
      if (ny < 0 || (ny === 0 && nx < 0)) {
        nx = -nx;
        ny = -ny;
      }
      surfaces.push({ id: o.id, kind: 'perch', seg, nx, ny });
    } else if (o.type === 'screen' && opts.climbs) {
      const seg = { x1: o.x1, y1: o.y1, x2: o.x2, y2: o.y2 };
      surfaces.push({ id: o.id, kind: 'screen', seg, ...climbFace(design, seg) });
    }
  }
  const out: SurfaceSample[] = [];
  for (const s of surfaces) {
    const { x1, y1, x2, y2 } = s.seg;
    const len = Math.hypot(x2 - x1, y2 - y1);
    if (!(len > 0)) continue;
    const n = Math.max(1, Math.ceil(len / spacing));
    for (let k = 0; k < n; k++) {
      const ta = k / n;
      const tb = (k + 1) / n;
      const tm = (ta + tb) / 2;
      const x = x1 + (x2 - x1) * tm + s.nx * LIFT;
      const y = y1 + (y2 - y1) * tm + s.ny * LIFT;
      if (x < 0 || x > W || y < 0 || y > H) continue;
      if (solids.some((b) => b.id !== s.id && b.test(x, y))) continue;
      out.push({
        x,
        y,
        surfaceId: s.id,
        kind: s.kind,
        piece: {
          x1: x1 + (x2 - x1) * ta,
          y1: y1 + (y2 - y1) * ta,
          x2: x1 + (x2 - x1) * tb,
          y2: y1 + (y2 - y1) * tb,
        },
        length: len / n,
        inHide: hides.some((b) => strictlyInsideBox(x, y, b)),
      });
    }
  }
  return out;
}

/** Merge the pieces of the selected samples into runs along each surface. */
export function runsOf(samples: SurfaceSample[], selected: (k: number) => boolean): Segment[] {
  const segs: Segment[] = [];
  let cur: Segment | null = null;
  let curId = '';
  samples.forEach((s, k) => {
    if (!selected(k)) {
      cur = null;
      return;
    }
    const p = s.piece;
    if (cur && curId === s.surfaceId && Math.abs(cur.x2 - p.x1) < 1e-9 && Math.abs(cur.y2 - p.y1) < 1e-9) {
      cur.x2 = p.x2;
      cur.y2 = p.y2;
    } else {
      cur = { ...p };
      curId = s.surfaceId;
      segs.push(cur);
    }
  });
  return segs;
}
