// Pure edits of the design document. Every function returns a new document (or the same
// reference when nothing changed, so the history records no empty steps).
import { translateObject } from '../geometry/objects';
import { keepWithinDepth } from './depth';
import type { Backdrop, Design, DesignObject, Enclosure, ProbePoint } from './types';

/** The next free id for a type: "perch-3". Ids are unique within the design (schema rule). */
export function nextId(design: Design, prefix: string, taken: ReadonlySet<string> = new Set()): string {
  const used = new Set([
    ...design.objects.map((o) => o.id),
    ...(design.probes ?? []).map((p) => p.id),
    ...taken,
  ]);
  for (let n = 1; ; n++) {
    const id = `${prefix}-${n}`;
    if (!used.has(id)) return id;
  }
}

export function findObject(design: Design, id: string): DesignObject | undefined {
  return design.objects.find((o) => o.id === id);
}

export function addObject(design: Design, object: DesignObject): Design {
  return { ...design, objects: [...design.objects, object] };
}

/** Replaces objects by id; objects not in the map are kept as they are. */
export function replaceObjects(design: Design, next: ReadonlyMap<string, DesignObject>): Design {
  let changed = false;
  const objects = design.objects.map((o) => {
    const n = next.get(o.id);
    if (n && n !== o) {
      changed = true;
      return n;
    }
    return o;
  });
  return changed ? { ...design, objects } : design;
}

export function updateObject(design: Design, id: string, patch: Partial<DesignObject>): Design {
  const o = findObject(design, id);
  if (!o) return design;
  const merged = { ...o, ...patch } as DesignObject;
  // Undefined in a patch means "back to the default": drop the key so the stored file stays clean.
  for (const [k, v] of Object.entries(patch)) {
    if (v === undefined) delete (merged as Record<string, unknown>)[k];
  }
  return replaceObjects(design, new Map([[id, merged]]));
}

export function removeObjects(design: Design, ids: readonly string[]): Design {
  if (ids.length === 0) return design;
  const drop = new Set(ids);
  const objects = design.objects.filter((o) => !drop.has(o.id));
  const probes = design.probes?.filter((p) => !drop.has(p.id));
  if (objects.length === design.objects.length && probes?.length === design.probes?.length) return design;
  return withProbes({ ...design, objects }, probes);
}

export function moveObjects(design: Design, ids: readonly string[], dx: number, dy: number): Design {
  if (ids.length === 0 || (dx === 0 && dy === 0)) return design;
  const set = new Set(ids);
  const next = new Map<string, DesignObject>();
  for (const o of design.objects) if (set.has(o.id)) next.set(o.id, translateObject(o, dx, dy));
  let out = replaceObjects(design, next);
  if (design.probes?.some((p) => set.has(p.id))) {
    out = withProbes(
      out,
      design.probes.map((p) => (set.has(p.id) ? { ...p, x: p.x + dx, y: p.y + dy } : p)),
    );
  }
  return out;
}

/** Copies the objects with fresh ids, offset so the copy is visible; returns the new ids in order. */
export function duplicateObjects(
  design: Design,
  ids: readonly string[],
  dx = 5,
  dy = 5,
): { design: Design; ids: string[] } {
  const set = new Set(ids);
  const taken = new Set<string>();
  const copies: DesignObject[] = [];
  for (const o of design.objects) {
    if (!set.has(o.id)) continue;
    const id = nextId(design, o.type, taken);
    taken.add(id);
    copies.push({ ...translateObject(o, dx, dy), id });
  }
  if (copies.length === 0) return { design, ids: [] };
  return { design: { ...design, objects: [...design.objects, ...copies] }, ids: copies.map((c) => c.id) };
}

export type ArrangeMove = 'forward' | 'backward' | 'front' | 'back';

/**
 * Changes drawing order (later objects are drawn on top). Selected objects keep their order
 * among themselves; "forward" swaps each past its next unselected neighbour.
 */
export function arrange(design: Design, ids: readonly string[], move: ArrangeMove): Design {
  const set = new Set(ids);
  const objs = [...design.objects];
  if (move === 'front' || move === 'back') {
    const picked = objs.filter((o) => set.has(o.id));
    const rest = objs.filter((o) => !set.has(o.id));
    const next = move === 'front' ? [...rest, ...picked] : [...picked, ...rest];
    return sameOrder(objs, next) ? design : { ...design, objects: next };
  }
  if (move === 'forward') {
    for (let i = objs.length - 2; i >= 0; i--) {
      const a = objs[i] as DesignObject;
      const b = objs[i + 1] as DesignObject;
      if (set.has(a.id) && !set.has(b.id)) {
        objs[i] = b;
        objs[i + 1] = a;
      }
    }
  } else {
    for (let i = 1; i < objs.length; i++) {
      const a = objs[i - 1] as DesignObject;
      const b = objs[i] as DesignObject;
      if (set.has(b.id) && !set.has(a.id)) {
        objs[i - 1] = b;
        objs[i] = a;
      }
    }
  }
  return sameOrder(design.objects, objs) ? design : { ...design, objects: objs };
}

function sameOrder(a: readonly DesignObject[], b: readonly DesignObject[]): boolean {
  return a.length === b.length && a.every((o, i) => o === b[i]);
}

export function setEnclosure(design: Design, patch: Partial<Enclosure>): Design {
  const enclosure = { ...design.enclosure, ...patch };
  for (const [k, v] of Object.entries(patch)) {
    if (v === undefined) delete (enclosure as Record<string, unknown>)[k];
  }
  // A shallower enclosure brings the side view and lamps beyond its back to the back, in the same step.
  return keepWithinDepth({ ...design, enclosure });
}

function withProbes(design: Design, probes: ProbePoint[] | undefined): Design {
  if (!probes || probes.length === 0) {
    const { probes: _drop, ...rest } = design;
    return rest;
  }
  return { ...design, probes };
}

export function addProbe(
  design: Design,
  x: number,
  y: number,
  label?: string,
): { design: Design; id: string } {
  const id = nextId(design, 'probe');
  const probe: ProbePoint = label ? { id, x, y, label } : { id, x, y };
  return { design: withProbes(design, [...(design.probes ?? []), probe]), id };
}

export function updateProbe(design: Design, id: string, patch: Partial<Omit<ProbePoint, 'id'>>): Design {
  if (!design.probes?.some((p) => p.id === id)) return design;
  return withProbes(
    design,
    design.probes.map((p) => (p.id === id ? { ...p, ...patch } : p)),
  );
}

/** Sets or changes the photo backdrop (undefined removes it); the same placement returns the same design. */
export function setBackdrop(design: Design, backdrop: Backdrop | undefined): Design {
  if (backdrop === undefined) {
    if (design.backdrop === undefined) return design;
    const { backdrop: _drop, ...rest } = design;
    return rest;
  }
  const cur = design.backdrop;
  if (cur && (Object.keys(backdrop) as (keyof Backdrop)[]).every((k) => cur[k] === backdrop[k]))
    return design;
  return { ...design, backdrop };
}

export function isProbeId(design: Design, id: string): boolean {
  return Boolean(design.probes?.some((p) => p.id === id));
}
