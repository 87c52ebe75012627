import { DESIGN_FORMAT, DESIGN_VERSION, type Design } from '@/simulation';

export type EnclosureSize = { widthCm: number; heightCm: number; depthCm: number };

/**
 * The starting point of a new enclosure's first design: the enclosure's own inside dimensions and a
 * mesh lid across the top, nothing else. The lid's transmission and the room temperature are left out
 * on purpose so the engine's documented defaults apply; we invent no lamp or performance figures here.
 */
export function defaultDesignFor(enclosure: EnclosureSize): Design {
  const width = roundCm(enclosure.widthCm);
  const height = roundCm(enclosure.heightCm);
  return {
    format: DESIGN_FORMAT,
    version: DESIGN_VERSION,
    enclosure: { width, height, depth: roundCm(enclosure.depthCm) },
    objects: [{ type: 'screen', id: 'lid', name: 'Mesh lid', x1: 0, y1: height, x2: width, y2: height }],
  };
}

/** Enclosure sizes come from a form in cm or inches; a tenth of a millimetre is plenty. */
const roundCm = (v: number) => Math.round(v * 100) / 100;
