import type { Design } from './schema';

/**
 * The example set-up of the design file: a 120 × 60 × 60 cm enclosure with a
 * T5 tube and a halogen flood on a mesh lid, a perch, a ledge, a hide and planting. The one source for
 * the studio's scratch start, the engine's tests and the CLI's; its numbers are an illustration, not a
 * recommendation. Shared by all of them: take a copy (`exampleDesign()`) to change anything.
 */
export const EXAMPLE_DESIGN: Design = {
  format: 'baskwell.design',
  version: 2,
  enclosure: { width: 120, height: 60, depth: 60, roomTempC: 24 },
  objects: [
    {
      type: 'lamp',
      id: 'uv1',
      tech: 't5',
      form: 'tube',
      x: 40,
      y: 62,
      length: 55,
      uvbAt30: 60,
      uviPerUvb: 0.04,
      reflectorGain: 2,
      beamDeg: 120,
      watts: 24,
      ageMonths: 0,
    },
    {
      type: 'lamp',
      id: 'heat1',
      tech: 'halogen',
      form: 'bulb',
      x: 90,
      y: 62,
      uvbAt30: 0,
      watts: 75,
      beamDeg: 30,
      ageMonths: 0,
    },
    { type: 'screen', id: 'lid', x1: 0, y1: 60, x2: 120, y2: 60, uvbTransmission: 0.6 },
    { type: 'perch', id: 'b1', x1: 20, y1: 20, x2: 70, y2: 38, thickness: 4 },
    { type: 'ledge', id: 'r1', x: 75, y: 0, width: 30, height: 18 },
    { type: 'hide', id: 'h1', x: 5, y: 0, width: 25, height: 14 },
    { type: 'foliage', id: 'p1', x: 100, y: 0, width: 18, height: 40, uvbTransmission: 0.3 },
    { type: 'glass', id: 'side', x1: 0, y1: 60, x2: 0, y2: 0, uvbTransmission: 0 },
  ],
};

/** A fresh, editable copy of the example. */
export function exampleDesign(): Design {
  return structuredClone(EXAMPLE_DESIGN);
}
