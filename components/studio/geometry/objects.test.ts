import { describe, expect, it } from 'vitest';
import {
  applyHandle,
  hitTest,
  objectBounds,
  objectHandles,
  perchTopAt,
  segmentAngleDeg,
  segmentLength,
  topmostAt,
  translateObject,
} from './objects';
import type { HideObject, LampObject, PerchObject } from '../state/types';

const perch: PerchObject = { type: 'perch', id: 'b1', x1: 20, y1: 20, x2: 70, y2: 38, thickness: 4 };
const hide: HideObject = { type: 'hide', id: 'h1', x: 5, y: 0, width: 25, height: 14 };
const tube: LampObject = { type: 'lamp', id: 'uv', tech: 't5', form: 'tube', x: 40, y: 62, length: 55 };

describe('bounds and hit tests', () => {
  it('includes a perch’s thickness and a tube’s length', () => {
    expect(objectBounds(perch)).toEqual({ x: 18, y: 18, width: 54, height: 22 });
    const b = objectBounds(tube);
    expect(b.x).toBe(12.5);
    expect(b.width).toBe(55);
  });

  it('hits a perch within half its thickness of its axis', () => {
    expect(hitTest(perch, { x: 45, y: 29 })).toBe(true);
    expect(hitTest(perch, { x: 45, y: 40 })).toBe(false);
    expect(hitTest(perch, { x: 45, y: 33 }, 3)).toBe(true);
  });

  it('finds the topmost object (the last drawn)', () => {
    const ledge = { type: 'ledge' as const, id: 'r', x: 0, y: 0, width: 40, height: 10 };
    expect(topmostAt([ledge, hide], { x: 10, y: 5 })?.id).toBe('h1');
    expect(topmostAt([hide, ledge], { x: 10, y: 5 })?.id).toBe('r');
    expect(topmostAt([hide], { x: 100, y: 100 })).toBeUndefined();
  });
});

describe('editing', () => {
  it('translates segments and boxes', () => {
    expect(translateObject(perch, 5, -2)).toMatchObject({ x1: 25, y1: 18, x2: 75, y2: 36 });
    expect(translateObject(hide, 1, 1)).toMatchObject({ x: 6, y: 1 });
  });

  it('resizes a box from a corner, keeping the opposite corner', () => {
    const r = applyHandle(hide, 'ne', { x: 40, y: 20 });
    expect(r).toMatchObject({ x: 5, y: 0, width: 35, height: 20 });
    const l = applyHandle(hide, 'sw', { x: 10, y: 4 });
    expect(l).toMatchObject({ x: 10, y: 4, width: 20, height: 10 });
  });

  it('never turns a box inside out', () => {
    const r = applyHandle(hide, 'e', { x: -50, y: 0 });
    expect(r.width).toBe(1);
    expect(r.x).toBe(5);
  });

  it('moves one end of a segment', () => {
    expect(applyHandle(perch, 'p2', { x: 90, y: 10 })).toMatchObject({ x1: 20, y1: 20, x2: 90, y2: 10 });
  });

  it('rotates a segment about its midpoint, keeping its length', () => {
    const [rot] = objectHandles(perch).filter((h) => h.id === 'rotate');
    expect(rot).toBeDefined();
    // Dragging the handle straight up from the midpoint makes the perch level.
    const level = applyHandle(perch, 'rotate', { x: 45, y: 80 });
    expect(segmentAngleDeg(level)).toBeCloseTo(0, 6);
    expect(segmentLength(level)).toBeCloseTo(segmentLength(perch), 4);
    expect((level.x1 + level.x2) / 2).toBeCloseTo(45, 6);
    // Snapped to 15° steps.
    const snapped = applyHandle(perch, 'rotate', { x: 30, y: 60 }, true);
    const steps = segmentAngleDeg(snapped) / 15;
    expect(Math.abs(steps - Math.round(steps))).toBeLessThan(1e-4);
  });

  it('changes a tube’s length from either end', () => {
    const t = applyHandle(tube, 'len-e', { x: 100, y: 0 });
    expect(t.length).toBeCloseTo(87.5, 10);
    expect(t.x).toBeCloseTo(56.25, 10);
  });

  it('gives a level perch’s top at centre + half thickness', () => {
    const level: PerchObject = { ...perch, y1: 30, y2: 30 };
    expect(perchTopAt(level, 40)).toBe(32);
    expect(perchTopAt(level, 90)).toBeNull();
  });
});
