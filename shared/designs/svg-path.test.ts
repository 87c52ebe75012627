import { describe, expect, it } from 'vitest';
import { computeFields, contourBands, parseDesign } from '@/simulation';
import { bandPath, ringPath, simplifyLine } from './svg-path';

const points = (d: string) =>
  d
    .replace(/Z/g, '')
    .split(/[ML]/)
    .filter(Boolean)
    .map((p) => p.split(',').map(Number) as [number, number]);

describe('simplifyLine', () => {
  it('drops points on a straight run and keeps the corners', () => {
    const run: [number, number][] = [
      [0, 0],
      [1, 0],
      [2, 0],
      [3, 0],
      [3, 1],
      [3, 2],
    ];
    expect(simplifyLine(run)).toEqual([
      [0, 0],
      [3, 0],
      [3, 2],
    ]);
  });

  it('keeps a point further from the line than the tolerance', () => {
    const bent: [number, number][] = [
      [0, 0],
      [1, 0.2],
      [2, 0],
    ];
    expect(simplifyLine(bent, 0.05)).toHaveLength(3);
    expect(simplifyLine(bent, 0.5)).toHaveLength(2);
  });
});

describe('ringPath', () => {
  it('writes a square ring drawn with many edge points as its four corners', () => {
    const ring: [number, number][] = [];
    for (let x = 0; x <= 10; x += 0.5) ring.push([x, 0]);
    for (let y = 0.5; y <= 10; y += 0.5) ring.push([10, y]);
    for (let x = 9.5; x >= 0; x -= 0.5) ring.push([x, 10]);
    for (let y = 9.5; y >= 0; y -= 0.5) ring.push([0, y]);
    const d = ringPath(ring);
    expect(points(d).sort()).toEqual(
      [
        [0, 0],
        [10, 0],
        [10, 10],
        [0, 10],
      ].sort(),
    );
    expect(d.startsWith('M0,0')).toBe(true);
  });

  it('keeps only the engine’s own points of real contours, far fewer of them', () => {
    const r = parseDesign({
      format: 'baskwell.design',
      version: 2,
      enclosure: { width: 120, height: 60, depth: 60, roomTempC: 24 },
      objects: [
        { type: 'lamp', id: 'uv', tech: 't5', form: 'tube', x: 40, y: 62, length: 55, uvbAt30: 60 },
        { type: 'lamp', id: 'heat', tech: 'halogen', form: 'bulb', x: 90, y: 62, uvbAt30: 0, watts: 75 },
        { type: 'ledge', id: 'r', x: 75, y: 0, width: 30, height: 18 },
      ],
    });
    if (!r.ok) throw new Error(r.error.message);
    const grid = computeFields(r.design, { cellCm: 0.5 });
    const bands = contourBands(grid, 'tempC');
    const all = bands.flatMap((b) => b.polygons.flat(2));
    const raw = all.length;
    const kept = bands.flatMap((b) => points(bandPath(b.polygons)));
    expect(kept.length).toBeLessThan(raw / 2);
    // Every kept point is one of the engine's points (rounded to 0.01 cm), not an invented one.
    const key = (p: number[]) => `${Math.round(p[0]! * 100)},${Math.round(p[1]! * 100)}`;
    const engine = new Set(all.map(key));
    expect(kept.filter((p) => !engine.has(key(p)))).toEqual([]);
  });
});
