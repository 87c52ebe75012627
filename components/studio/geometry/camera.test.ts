import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  designToStage,
  fitCamera,
  MAX_ZOOM,
  niceStepCm,
  panBy,
  rectFromPoints,
  rectsIntersect,
  stageToDesign,
  visibleDesignRect,
  zoomAt,
  type Camera,
} from './camera';

const cam: Camera = { zoom: 4, originX: 50, originY: 400 };

describe('design ↔ stage mapping', () => {
  it('puts the design origin at the camera origin and flips y (design y up, stage y down)', () => {
    expect(designToStage(cam, { x: 0, y: 0 })).toEqual({ x: 50, y: 400 });
    expect(designToStage(cam, { x: 10, y: 10 })).toEqual({ x: 90, y: 360 });
  });

  it('is inverted exactly by stageToDesign', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: -500, max: 500, noNaN: true }),
        fc.double({ min: 0.5, max: 60, noNaN: true }),
        (x, y, zoom) => {
          const c = { zoom, originX: 13, originY: 700 };
          const back = stageToDesign(c, designToStage(c, { x, y }));
          expect(back.x).toBeCloseTo(x, 6);
          expect(back.y).toBeCloseTo(y, 6);
        },
      ),
    );
  });
});

describe('zoomAt', () => {
  it('keeps the point under the pointer fixed', () => {
    const anchor = { x: 321, y: 123 };
    const before = stageToDesign(cam, anchor);
    const z = zoomAt(cam, anchor, 1.7);
    const after = stageToDesign(z, anchor);
    expect(z.zoom).toBeCloseTo(6.8, 10);
    expect(after.x).toBeCloseTo(before.x, 10);
    expect(after.y).toBeCloseTo(before.y, 10);
  });

  it('clamps the zoom', () => {
    expect(zoomAt(cam, { x: 0, y: 0 }, 1000).zoom).toBe(MAX_ZOOM);
  });
});

describe('fitCamera', () => {
  it('centres the bounds and fits the limiting side', () => {
    const c = fitCamera({ x: 0, y: 0, width: 120, height: 60 }, { width: 1000, height: 600 }, 40);
    // width limits: (1000 - 80) / 120
    expect(c.zoom).toBeCloseTo(920 / 120, 10);
    const centre = designToStage(c, { x: 60, y: 30 });
    expect(centre.x).toBeCloseTo(500, 10);
    expect(centre.y).toBeCloseTo(300, 10);
    const vis = visibleDesignRect(c, { width: 1000, height: 600 });
    expect(vis.x).toBeLessThan(0);
    expect(vis.x + vis.width).toBeGreaterThan(120);
  });
});

describe('helpers', () => {
  it('pans in stage pixels', () => {
    expect(panBy(cam, 5, -5)).toEqual({ zoom: 4, originX: 55, originY: 395 });
  });

  it('normalises and intersects rectangles', () => {
    const r = rectFromPoints({ x: 10, y: 5 }, { x: 0, y: 20 });
    expect(r).toEqual({ x: 0, y: 5, width: 10, height: 15 });
    expect(rectsIntersect(r, { x: 9, y: 19, width: 5, height: 5 })).toBe(true);
    expect(rectsIntersect(r, { x: 11, y: 0, width: 5, height: 5 })).toBe(false);
  });

  it('picks nice ruler steps', () => {
    expect(niceStepCm(4, 40, 1)).toBe(10); // 40 px / 4 px per cm = 10 cm
    expect(niceStepCm(4, 50, 1)).toBe(20);
    expect(niceStepCm(10, 40, 2.54)).toBeCloseTo(2 * 2.54, 10); // 40 px = 1.57 in -> 2 in
  });
});
