import { describe, expect, it } from 'vitest';
import { LAMP_ON_LID_CM, snapMove, snapPoint, snapToGrid, type SnapOptions } from './snap';
import { exampleDesign } from '../examples/exampleDesign';
import type { HideObject, LampObject, PerchObject } from '../state/types';

const on: SnapOptions = { grid: 1, surfaces: true, threshold: 3 };
const gridOnly: SnapOptions = { grid: 5, surfaces: false, threshold: 3 };
const design = exampleDesign(); // 120 × 60; ledge r1 at x 75–105, top 18; hide h1 x 5–30, top 14

describe('grid', () => {
  it('rounds to the step without binary noise', () => {
    expect(snapToGrid(0.1 + 0.2, 0.1)).toBe(0.3);
    expect(snapToGrid(12.6, 1.27)).toBeCloseTo(12.7, 6);
    expect(snapToGrid(7, 0)).toBe(7);
  });

  it('snaps a move by the object’s anchor', () => {
    const hide = design.objects.find((o) => o.id === 'h1') as HideObject;
    const r = snapMove(design, [hide], 7.4, 1.1, { x: hide.x, y: hide.y }, gridOnly);
    expect(hide.x + r.dx).toBe(10);
    expect(hide.y + r.dy).toBe(0);
    expect(r.guides).toEqual([]);
  });
});

describe('surfaces', () => {
  it('drops a box onto a ledge top when it overlaps the ledge', () => {
    const hide: HideObject = { type: 'hide', id: 'x', x: 80, y: 21, width: 10, height: 8 };
    const r = snapMove(design, [hide], 0.3, -1.5, { x: 80, y: 21 }, on);
    expect(hide.y + r.dy).toBe(18);
    expect(r.guides.some((g) => g.axis === 'y' && g.at === 18)).toBe(true);
  });

  it('does not land on a ledge it does not overlap', () => {
    const hide: HideObject = { type: 'hide', id: 'x', x: 40, y: 19, width: 10, height: 8 };
    const r = snapMove(design, [hide], 0, -1, { x: 40, y: 19 }, on);
    expect(hide.y + r.dy).toBe(18); // grid, not a surface
    expect(r.guides).toEqual([]);
  });

  it('puts a box against a wall', () => {
    const hide: HideObject = { type: 'hide', id: 'x', x: 2, y: 0, width: 10, height: 8 };
    const r = snapMove(design, [hide], -1.2, 0, { x: 2, y: 0 }, on);
    expect(hide.x + r.dx).toBe(0);
  });

  it('rests a lamp on the lid', () => {
    const lamp: LampObject = { type: 'lamp', id: 'l', tech: 'halogen', form: 'bulb', x: 50, y: 63.5 };
    const r = snapMove(design, [lamp], 0, 0, { x: 50, y: 63.5 }, on);
    expect(lamp.y + r.dy).toBe(60 + LAMP_ON_LID_CM);
    const placed = snapPoint(design, { x: 33.3, y: 60.9 }, 'lamp', on);
    expect(placed.point).toEqual({ x: 33, y: 62 });
  });

  it('puts a perch end on a wall and its underside on the floor', () => {
    const p: PerchObject = { type: 'perch', id: 'p', x1: 2, y1: 10, x2: 40, y2: 30, thickness: 4 };
    const r = snapMove(design, [p], -1.5, 0, { x: 2, y: 10 }, on);
    expect(p.x1 + r.dx).toBe(0);
    const end = snapPoint(design, { x: 118.6, y: 3 }, 'perch-end', on, new Set(), 4);
    expect(end.point).toEqual({ x: 120, y: 2 });
  });

  it('leaves a point alone far from surfaces when only surfaces snap', () => {
    const r = snapPoint(design, { x: 50.3, y: 30.7 }, 'box-corner', {
      grid: null,
      surfaces: true,
      threshold: 2,
    });
    expect(r.point).toEqual({ x: 50.3, y: 30.7 });
  });
});
