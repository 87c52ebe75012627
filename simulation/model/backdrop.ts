/**
 * The design's photo backdrop (schema.ts, `backdrop`) is the user's tracing aid, never physics: the
 * engine's inputs are the enclosure, the objects and the probes. `physicsOf` is the design as the
 * engine sees it, and `samePhysics` tells whether two versions differ only in what the engine ignores
 * (the photo's placement, the notes), so moving the photo never recomputes the fields.
 */
import type { Design } from './schema';

export function physicsOf(design: Design): Design {
  if (design.backdrop === undefined) return design;
  const { backdrop: _backdrop, ...rest } = design;
  return rest;
}

export function samePhysics(a: Design, b: Design): boolean {
  return a.enclosure === b.enclosure && a.objects === b.objects && a.probes === b.probes;
}
