// Depth edits (pure): where the side view cuts the enclosure (`enclosure.sectionZ`) and how far from the
// front each lamp hangs (a lamp's `z`), both cm from the front and kept inside the enclosure's depth.
// Like every document edit, an edit that changes nothing returns the same design (no empty undo step).
import { formatLength, type LengthUnit } from '@/shared/units';
import { lampZ, sectionZ } from '@/simulation';
import type { Design, LampObject } from './types';

/** Depth positions are kept to a tenth of a millimetre, so typed and dragged values read back cleanly. */
const round = (z: number) => Math.round(z * 1000) / 1000;

export function clampDepth(design: Design, z: number): number {
  return round(Math.min(design.enclosure.depth, Math.max(0, z)));
}

export function sectionDepth(design: Design): number {
  return sectionZ(design.enclosure);
}

export function lampDepth(design: Design, lamp: Pick<LampObject, 'z'>): number {
  return lampZ(lamp, design.enclosure);
}

/** Moves the side view's plane to `z` cm from the front (clamped to the depth). */
export function setSectionZ(design: Design, z: number): Design {
  const next = clampDepth(design, z);
  if (design.enclosure.sectionZ === next) return design;
  return { ...design, enclosure: { ...design.enclosure, sectionZ: next } };
}

/** Moves lamps to `z` cm from the front (clamped); other objects and unknown ids are left alone. */
export function setLampsZ(design: Design, ids: readonly string[], z: number): Design {
  const next = clampDepth(design, z);
  const set = new Set(ids);
  let changed = false;
  const objects = design.objects.map((o) => {
    if (o.type !== 'lamp' || !set.has(o.id) || o.z === next) return o;
    changed = true;
    return { ...o, z: next };
  });
  return changed ? { ...design, objects } : design;
}

/** Moves lamps by dz cm in depth (+ towards the back), each from where it is, clamped to the depth. */
export function moveLampsZ(design: Design, ids: readonly string[], dz: number): Design {
  let out = design;
  for (const o of design.objects) {
    if (o.type === 'lamp' && ids.includes(o.id)) out = setLampsZ(out, [o.id], lampDepth(design, o) + dz);
  }
  return out;
}

/**
 * After the enclosure's depth changed: the plane and lamps that now lie beyond the back move to the back,
 * so the design stays valid (and those left at the default follow the new middle by themselves).
 */
export function keepWithinDepth(design: Design): Design {
  const depth = design.enclosure.depth;
  let out = design;
  if (out.enclosure.sectionZ !== undefined && out.enclosure.sectionZ > depth) out = setSectionZ(out, depth);
  const beyond = out.objects.filter((o) => o.type === 'lamp' && o.z !== undefined && o.z > depth);
  return beyond.length
    ? setLampsZ(
        out,
        beyond.map((o) => o.id),
        depth,
      )
    : out;
}

/** Lamps among the ids (the selection), in drawing order. */
export function lampsOf(design: Design, ids: readonly string[]): LampObject[] {
  return design.objects.filter((o): o is LampObject => o.type === 'lamp' && ids.includes(o.id));
}

/** Where a lamp hangs relative to the side view, in words ("20 cm behind the side view"). */
export function depthRelation(design: Design, lamp: Pick<LampObject, 'z'>, unit: LengthUnit): string {
  const dz = lampDepth(design, lamp) - sectionDepth(design);
  if (Math.abs(dz) < 0.05) return 'on the side view';
  return `${formatLength(Math.abs(dz), unit)} ${dz > 0 ? 'behind' : 'in front of'} the side view`;
}
