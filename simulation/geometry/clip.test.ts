import { describe, expect, it } from 'vitest';
import { clipToStrip } from './clip';
import { thickSegment } from './occluders';

const buf = () =>
  [new Float64Array(16), new Float64Array(16), new Float64Array(16), new Float64Array(16)] as const;

describe('clipToStrip', () => {
  it('clips a box to a strip', () => {
    const [ox, oy, tx, ty] = buf();
    const n = clipToStrip([0, 10, 10, 0], [0, 0, 10, 10], 2, 5, ox, oy, tx, ty);
    const pts = Array.from({ length: n }, (_, k) => [ox[k], oy[k]]);
    expect(pts.map((p) => p[1]).every((y) => y! >= 2 && y! <= 5)).toBe(true);
    expect(Math.min(...pts.map((p) => p[0]!))).toBe(0);
    expect(Math.max(...pts.map((p) => p[0]!))).toBe(10);
    expect(n).toBe(4);
  });
  it('returns nothing for a box below the strip', () => {
    const [ox, oy, tx, ty] = buf();
    expect(clipToStrip([0, 10, 10, 0], [0, 0, 1, 1], 2, 5, ox, oy, tx, ty)).toBe(0);
  });
  it('clips a slanted segment', () => {
    const [ox, oy, tx, ty] = buf();
    const n = clipToStrip([0, 10], [0, 10], 2, 5, ox, oy, tx, ty);
    expect(n).toBe(2);
    expect([ox[0], oy[0], ox[1], oy[1]]).toEqual([2, 2, 5, 5]);
    expect(clipToStrip([0, 10], [6, 6], 2, 5, ox, oy, tx, ty)).toBe(0);
  });
});

describe('thickSegment', () => {
  it('builds a rectangle of the perch thickness', () => {
    const r = thickSegment(0, 0, 10, 0, 4);
    expect(r.ys).toEqual([-2, -2, 2, 2]);
    expect(r.xs).toEqual([0, 10, 10, 0]);
  });
});
