// Snapping: to the grid, and to the enclosure's surfaces (walls, floor, lid, the tops of ledges
// and hides). Surfaces win over the grid when within the threshold, as users expect things to
// "land" on a shelf rather than on the nearest grid line.
import type { Point } from './camera';
import { kindOf, type PointRole } from '@/shared/object-kinds';
import { halfThickness } from '@/shared/object-kinds/segment';
import { LAMP_ON_LID_CM, LAMP_UNDER_LID_CM, lampExtent } from '@/shared/object-kinds/lamp';
import { isBox, isSegment, type Design, type DesignObject } from '../state/types';

export { LAMP_ON_LID_CM, type PointRole };

export interface SnapOptions {
  /** Grid step in cm, or null for no grid snapping. */
  grid: number | null;
  /** Snap to walls, floor, lid and tops. */
  surfaces: boolean;
  /** Pull distance in cm (the caller converts from screen pixels). */
  threshold: number;
}

export interface Guide {
  axis: 'x' | 'y';
  /** The snapped line's position (cm). */
  at: number;
  label: string;
}

export interface Target {
  at: number;
  label: string;
  /** Optional x-range (for y targets) where the surface exists. */
  from?: number;
  to?: number;
}

export function snapToGrid(v: number, step: number): number {
  if (!(step > 0)) return v;
  const r = Math.round(v / step) * step;
  // Remove binary noise such as 30.000000000000004 so stored values stay tidy.
  return Math.round(r * 1e6) / 1e6;
}

function wallTargets(design: Design): Target[] {
  return [
    { at: 0, label: 'left wall' },
    { at: design.enclosure.width, label: 'right wall' },
  ];
}

/** Surfaces an object can rest on: the floor and the tops of what bears weight (ledges and hides). */
export function restingTargets(design: Design, exclude: ReadonlySet<string>): Target[] {
  const out: Target[] = [{ at: 0, label: 'floor', from: 0, to: design.enclosure.width }];
  for (const o of design.objects) {
    if (exclude.has(o.id)) continue;
    if (kindOf(o.type).snap.bearsWeight && isBox(o)) {
      out.push({ at: o.y + o.height, label: `top of ${o.name ?? o.id}`, from: o.x, to: o.x + o.width });
    }
  }
  return out;
}

function lampTargets(design: Design): Target[] {
  const h = design.enclosure.height;
  return [
    { at: h + LAMP_ON_LID_CM, label: 'on the lid' },
    { at: h - LAMP_UNDER_LID_CM, label: 'under the lid' },
  ];
}

interface Feature {
  /** Current position of the feature (cm) before the snap delta. */
  at: number;
  targets: Target[];
  /** Offset added to the target (e.g. half a perch's thickness). */
  offset?: number;
  /** x-range of the feature, for y targets limited to a surface's extent. */
  span?: [number, number];
}

function overlaps(span: [number, number] | undefined, t: Target, dx: number): boolean {
  if (!span || t.from === undefined || t.to === undefined) return true;
  // A point (a perch end) may sit right at a surface's edge; a box must really overlap it.
  if (span[0] === span[1]) return span[0] + dx >= t.from && span[0] + dx <= t.to;
  return span[1] + dx > t.from && span[0] + dx < t.to;
}

/** Features of an object on each axis that can snap, and what they snap to. */
function features(
  design: Design,
  o: DesignObject,
  exclude: ReadonlySet<string>,
): { x: Feature[]; y: Feature[] } {
  const walls = wallTargets(design);
  const h = design.enclosure.height;
  const lidAndFloor: Target[] = [
    { at: 0, label: 'floor' },
    { at: h, label: 'lid' },
  ];
  if (o.type === 'lamp') {
    const { x1, x2 } = lampExtent(o);
    return {
      x:
        o.form === 'tube'
          ? [
              { at: x1, targets: walls },
              { at: x2, targets: walls },
            ]
          : [],
      y: [{ at: o.y, targets: lampTargets(design) }],
    };
  }
  if (isBox(o)) {
    const span: [number, number] = [o.x, o.x + o.width];
    return {
      x: [
        { at: o.x, targets: walls },
        { at: o.x + o.width, targets: walls },
      ],
      y: [
        { at: o.y, targets: restingTargets(design, exclude), span },
        { at: o.y + o.height, targets: [{ at: h, label: 'lid' }] },
      ],
    };
  }
  if (isSegment(o)) {
    const half = halfThickness(o);
    const ends: Point[] = [
      { x: o.x1, y: o.y1 },
      { x: o.x2, y: o.y2 },
    ];
    const yTargets =
      kindOf(o.type).snap.restsOn === 'surfaces' ? restingTargets(design, exclude) : lidAndFloor;
    return {
      x: ends.map((e) => ({ at: e.x, targets: walls })),
      y: ends.map((e) => ({
        at: e.y,
        targets: yTargets,
        offset: half,
        span: [e.x, e.x] as [number, number],
      })),
    };
  }
  return { x: [], y: [] };
}

function bestSnap(
  feats: Feature[],
  delta: number,
  threshold: number,
  crossDelta: number,
): { delta: number; target: Target } | null {
  let best: { delta: number; target: Target; dist: number } | null = null;
  for (const f of feats) {
    for (const t of f.targets) {
      if (!overlaps(f.span, t, crossDelta)) continue;
      const want = t.at + (f.offset ?? 0) - f.at;
      const dist = Math.abs(want - delta);
      if (dist <= threshold && (!best || dist < best.dist)) best = { delta: want, target: t, dist };
    }
  }
  return best ? { delta: best.delta, target: best.target } : null;
}

/**
 * Adjusts a move of the `moving` objects by (dx, dy) so that the first object (the one under the
 * pointer) lands on a surface or on the grid. All objects move by the same delta.
 */
export function snapMove(
  design: Design,
  moving: readonly DesignObject[],
  dx: number,
  dy: number,
  anchor: Point,
  opts: SnapOptions,
): { dx: number; dy: number; guides: Guide[] } {
  const lead = moving[0];
  if (!lead) return { dx, dy, guides: [] };
  const exclude = new Set(moving.map((o) => o.id));
  const guides: Guide[] = [];
  let sx = opts.grid ? snapToGrid(anchor.x + dx, opts.grid) - anchor.x : dx;
  let sy = opts.grid ? snapToGrid(anchor.y + dy, opts.grid) - anchor.y : dy;
  if (opts.surfaces) {
    const f = features(design, lead, exclude);
    const bx = bestSnap(f.x, dx, opts.threshold, 0);
    if (bx) {
      sx = bx.delta;
      guides.push({ axis: 'x', at: bx.target.at, label: bx.target.label });
    }
    const by = bestSnap(f.y, dy, opts.threshold, sx);
    if (by) {
      sy = by.delta;
      guides.push({ axis: 'y', at: by.target.at, label: by.target.label });
    }
  }
  return { dx: sx, dy: sy, guides };
}

/** Snaps one point (a handle, a placement click) for its role; `thickness` is a perch's thickness. */
export function snapPoint(
  design: Design,
  p: Point,
  role: PointRole,
  opts: SnapOptions,
  exclude: ReadonlySet<string> = new Set(),
  thickness = 0,
): { point: Point; guides: Guide[] } {
  let x = opts.grid ? snapToGrid(p.x, opts.grid) : p.x;
  let y = opts.grid ? snapToGrid(p.y, opts.grid) : p.y;
  const guides: Guide[] = [];
  if (opts.surfaces && role !== 'free' && role !== 'probe') {
    const h = design.enclosure.height;
    const xT = role === 'lamp' ? [] : wallTargets(design);
    let yT: Target[];
    let offset = 0;
    if (role === 'lamp') yT = lampTargets(design);
    else if (role === 'perch-end') {
      yT = restingTargets(design, exclude);
      offset = thickness / 2;
    } else if (role === 'barrier-end') {
      yT = [
        { at: 0, label: 'floor' },
        { at: h, label: 'lid' },
      ];
    } else yT = [...restingTargets(design, exclude), { at: h, label: 'lid' }];
    const bx = bestSnap([{ at: p.x, targets: xT }], 0, opts.threshold, 0);
    if (bx) {
      x = p.x + bx.delta;
      guides.push({ axis: 'x', at: bx.target.at, label: bx.target.label });
    }
    const by = bestSnap([{ at: p.y, targets: yT, offset, span: [x, x] }], 0, opts.threshold, 0);
    if (by) {
      y = p.y + by.delta;
      guides.push({ axis: 'y', at: by.target.at, label: by.target.label });
    }
  }
  return { point: { x, y }, guides };
}
