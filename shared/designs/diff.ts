/**
 * What differs between two design files: enclosure settings and objects added, removed, moved or
 * changed. Pure and structural (objects are matched by their `id`), so it runs on the server, in the
 * browser and in tests alike. It compares what the files say: a field left out on one side (the
 * engine's default applies) and written on the other is listed, with `undefined` for the left-out side.
 */

export type DiffableObject = { id: string; type: string } & Record<string, unknown>;
export type DiffableDesign = { enclosure: Record<string, unknown>; objects: readonly DiffableObject[] };

export type FieldChange = { field: string; a: unknown; b: unknown };

export type ObjectChange =
  | { kind: 'added'; id: string; type: string; object: DiffableObject }
  | { kind: 'removed'; id: string; type: string; object: DiffableObject }
  /** Only the position changed; `dx`/`dy` is how far (cm) its reference point moved. */
  | { kind: 'moved'; id: string; type: string; name?: string; dx: number; dy: number; changes: FieldChange[] }
  /** Some other property changed (it may also have moved: then dx/dy are non-zero). */
  | {
      kind: 'changed';
      id: string;
      type: string;
      name?: string;
      dx: number;
      dy: number;
      changes: FieldChange[];
    };

export type DesignDiff = {
  enclosure: FieldChange[];
  objects: ObjectChange[];
  counts: { added: number; removed: number; moved: number; changed: number; unchanged: number };
};

/** Fields that place an object; everything else (size, output, transmission…) is a property. */
const POSITION_FIELDS = new Set(['x', 'y', 'x1', 'y1', 'x2', 'y2']);

/** Floating-point noise from unit conversion or dragging is not a change worth listing. */
const EPS = 1e-6;

function sameValue(a: unknown, b: unknown): boolean {
  if (typeof a === 'number' && typeof b === 'number') return Math.abs(a - b) <= EPS;
  if (Array.isArray(a) && Array.isArray(b))
    return a.length === b.length && a.every((v, i) => sameValue(v, b[i]));
  if (a && b && typeof a === 'object' && typeof b === 'object') {
    return fieldChanges(a as Record<string, unknown>, b as Record<string, unknown>).length === 0;
  }
  return a === b;
}

/** Changed fields of two flat records, sorted by name so the table reads the same every time. */
export function fieldChanges(a: Record<string, unknown>, b: Record<string, unknown>): FieldChange[] {
  const keys = [...new Set([...Object.keys(a), ...Object.keys(b)])].sort();
  const out: FieldChange[] = [];
  for (const field of keys) {
    if (!sameValue(a[field], b[field])) out.push({ field, a: a[field], b: b[field] });
  }
  return out;
}

/** The point an object is placed by: (x, y) for boxes and lamps, the midpoint for segments. */
export function anchorOf(o: Record<string, unknown>): { x: number; y: number } | null {
  const n = (k: string) => (typeof o[k] === 'number' ? (o[k] as number) : null);
  const x = n('x');
  const y = n('y');
  if (x !== null && y !== null) return { x, y };
  const x1 = n('x1');
  const y1 = n('y1');
  const x2 = n('x2');
  const y2 = n('y2');
  if (x1 !== null && y1 !== null && x2 !== null && y2 !== null) return { x: (x1 + x2) / 2, y: (y1 + y2) / 2 };
  return null;
}

function offset(a: DiffableObject, b: DiffableObject): { dx: number; dy: number } {
  const pa = anchorOf(a);
  const pb = anchorOf(b);
  if (!pa || !pb) return { dx: 0, dy: 0 };
  const round = (v: number) => (Math.abs(v) <= EPS ? 0 : v);
  return { dx: round(pb.x - pa.x), dy: round(pb.y - pa.y) };
}

export function diffDesigns(a: DiffableDesign, b: DiffableDesign): DesignDiff {
  const byIdB = new Map(b.objects.map((o) => [o.id, o]));
  const idsA = new Set(a.objects.map((o) => o.id));
  const objects: ObjectChange[] = [];
  let unchanged = 0;

  for (const oa of a.objects) {
    const ob = byIdB.get(oa.id);
    // An id reused for a different kind of object is a different object.
    if (!ob || ob.type !== oa.type) {
      objects.push({ kind: 'removed', id: oa.id, type: oa.type, object: oa });
      continue;
    }
    const changes = fieldChanges(oa, ob);
    if (changes.length === 0) {
      unchanged += 1;
      continue;
    }
    const { dx, dy } = offset(oa, ob);
    const onlyPosition = changes.every((c) => POSITION_FIELDS.has(c.field));
    // The name shown is B's (a rename is listed among the changes).
    const name = typeof ob.name === 'string' ? ob.name : undefined;
    objects.push({
      kind: onlyPosition ? 'moved' : 'changed',
      id: oa.id,
      type: oa.type,
      name,
      dx,
      dy,
      changes,
    });
  }
  for (const ob of b.objects) {
    const oa = a.objects.find((o) => o.id === ob.id);
    if (!idsA.has(ob.id) || (oa && oa.type !== ob.type)) {
      objects.push({ kind: 'added', id: ob.id, type: ob.type, object: ob });
    }
  }

  const count = (k: ObjectChange['kind']) => objects.filter((o) => o.kind === k).length;
  return {
    enclosure: fieldChanges(a.enclosure, b.enclosure),
    objects,
    counts: {
      added: count('added'),
      removed: count('removed'),
      moved: count('moved'),
      changed: count('changed'),
      unchanged,
    },
  };
}

/** True when the two designs would simulate identically (same enclosure, same objects). */
export function isSameDesign(a: DiffableDesign, b: DiffableDesign): boolean {
  const d = diffDesigns(a, b);
  return d.enclosure.length === 0 && d.objects.length === 0;
}
