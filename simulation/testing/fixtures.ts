/** Designs used by tests and the benchmark (invented scenarios). */
import type { Design } from '../model/schema';

/** The example design (one source: simulation/model/example.ts). */
export { EXAMPLE_DESIGN } from '../model/example';

/** An empty enclosure of the given size. */
export function emptyDesign(width = 120, height = 60, depth = 60, roomTempC = 24): Design {
  return {
    format: 'baskwell.design',
    version: 2,
    enclosure: { width, height, depth, roomTempC },
    objects: [],
  };
}

/**
 * The benchmark's demo-scale design: 120 × 60 cm, two UVB tubes and one heat bulb above a mesh lid,
 * twelve barriers. `lampScale` and `occluderScale` multiply the lamps and barriers for scaled variants.
 */
export function benchDesign(lampScale = 1, occluderScale = 1): Design {
  const objects: Design['objects'] = [];
  for (let k = 0; k < lampScale; k++) {
    const dx = (k * 7) % 20;
    objects.push(
      {
        type: 'lamp',
        id: `t5-${k}`,
        tech: 't5',
        form: 'tube',
        x: 35 + dx,
        y: 62 + k,
        length: 55,
        uvbAt30: 45,
        reflectorGain: 1.8,
        watts: 24,
      },
      {
        type: 'lamp',
        id: `t8-${k}`,
        tech: 't8',
        form: 'tube',
        x: 70 + dx,
        y: 63 + k,
        length: 45,
        uvbAt30: 25,
        watts: 18,
      },
      {
        type: 'lamp',
        id: `heat-${k}`,
        tech: 'halogen',
        form: 'bulb',
        x: 95 - dx,
        y: 66 + k,
        watts: 50,
        beamDeg: 60,
      },
    );
  }
  for (let k = 0; k < occluderScale; k++) {
    const s = k * 0.7; // shift copies a little so they are not identical
    const id = (n: string) => (k === 0 ? n : `${n}-${k}`);
    objects.push(
      { type: 'screen', id: id('lid'), x1: 0, y1: 60 - s, x2: 120, y2: 60 - s, uvbTransmission: 0.7 },
      { type: 'glass', id: id('left'), x1: 0.2 + s, y1: 0, x2: 0.2 + s, y2: 60 },
      { type: 'glass', id: id('right'), x1: 119.8 - s, y1: 0, x2: 119.8 - s, y2: 60 },
      { type: 'perch', id: id('branch1'), x1: 15 + s, y1: 15, x2: 60 + s, y2: 35, thickness: 4 },
      { type: 'perch', id: id('branch2'), x1: 70, y1: 40 - s, x2: 100, y2: 30 - s, thickness: 3 },
      { type: 'perch', id: id('branch3'), x1: 30, y1: 45 + s / 2, x2: 45, y2: 47 + s / 2, thickness: 2.5 },
      { type: 'ledge', id: id('rock'), x: 80 + s, y: 0, width: 25, height: 16 },
      { type: 'ledge', id: id('shelf'), x: 5, y: 30 + s, width: 15, height: 3 },
      { type: 'hide', id: id('hide'), x: 8 + s, y: 0, width: 22, height: 12 },
      { type: 'hide', id: id('cave'), x: 50, y: 0, width: 18 - s, height: 10 },
      { type: 'foliage', id: id('plant'), x: 105, y: 0, width: 12, height: 38 - s, uvbTransmission: 0.3 },
      { type: 'foliage', id: id('vine'), x: 60 + s, y: 42, width: 15, height: 12, uvbTransmission: 0.5 },
    );
  }
  return {
    format: 'baskwell.design',
    version: 2,
    enclosure: { width: 120, height: 60, depth: 60, roomTempC: 24 },
    objects,
  };
}

/**
 * The heaviest design of the benchmark's family the server accepts: 27 lamps and 108 barriers in
 * 120 × 60 cm, about 91 % of MAX_DESIGN_WORK (simulation/model/work.ts). One more copy of either the
 * lamps or the barriers is over the bound.
 */
export function heaviestAllowedDesign(): Design {
  return benchDesign(9, 9);
}
