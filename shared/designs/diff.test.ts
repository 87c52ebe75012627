import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { anchorOf, diffDesigns, isSameDesign, type DiffableDesign, type DiffableObject } from './diff';

const lamp = (over: Partial<DiffableObject> = {}): DiffableObject => ({
  type: 'lamp',
  id: 'uv1',
  tech: 't5',
  form: 'tube',
  x: 40,
  y: 62,
  length: 55,
  uvbAt30: 60,
  ...over,
});
const perch: DiffableObject = { type: 'perch', id: 'b1', x1: 20, y1: 20, x2: 70, y2: 38, thickness: 4 };
const lid: DiffableObject = {
  type: 'screen',
  id: 'lid',
  x1: 0,
  y1: 60,
  x2: 120,
  y2: 60,
  uvbTransmission: 0.6,
};
const base: DiffableDesign = {
  enclosure: { width: 120, height: 60, depth: 60, roomTempC: 24 },
  objects: [lamp(), lid, perch],
};

describe('diffDesigns', () => {
  it('finds nothing between a design and itself', () => {
    const d = diffDesigns(base, structuredClone(base));
    expect(d.objects).toEqual([]);
    expect(d.enclosure).toEqual([]);
    expect(d.counts).toEqual({ added: 0, removed: 0, moved: 0, changed: 0, unchanged: 3 });
    expect(isSameDesign(base, base)).toBe(true);
  });

  it('reports a lamp lowered by 10 cm as moved, with the offset', () => {
    const b = { ...base, objects: [lamp({ y: 52 }), lid, perch] };
    const d = diffDesigns(base, b);
    expect(d.objects).toEqual([
      { kind: 'moved', id: 'uv1', type: 'lamp', dx: 0, dy: -10, changes: [{ field: 'y', a: 62, b: 52 }] },
    ]);
    expect(d.counts.moved).toBe(1);
  });

  it('names a moved or changed object by its name in B', () => {
    const b = { ...base, objects: [lamp({ y: 52, name: 'UVB tube' }), lid, perch] };
    expect(diffDesigns(base, b).objects[0]).toMatchObject({ kind: 'changed', name: 'UVB tube' });
  });

  it('measures a segment move by its midpoint', () => {
    const moved = { ...perch, x1: 30, x2: 80 };
    const d = diffDesigns(base, { ...base, objects: [lamp(), lid, moved] });
    expect(d.objects[0]).toMatchObject({ kind: 'moved', id: 'b1', dx: 10, dy: 0 });
  });

  it('reports a property change as changed, listing every changed field', () => {
    const b = { ...base, objects: [lamp({ uvbAt30: 40, x: 50 }), lid, perch] };
    const d = diffDesigns(base, b);
    expect(d.objects).toEqual([
      {
        kind: 'changed',
        id: 'uv1',
        type: 'lamp',
        dx: 10,
        dy: 0,
        changes: [
          { field: 'uvbAt30', a: 60, b: 40 },
          { field: 'x', a: 40, b: 50 },
        ],
      },
    ]);
  });

  it('lists added and removed objects', () => {
    const ledge: DiffableObject = { type: 'ledge', id: 'r1', x: 75, y: 0, width: 30, height: 18 };
    const d = diffDesigns(base, { ...base, objects: [lamp(), ledge, lid] });
    expect(d.objects.map((o) => [o.kind, o.id])).toEqual([
      ['removed', 'b1'],
      ['added', 'r1'],
    ]);
    expect(d.counts).toMatchObject({ added: 1, removed: 1, unchanged: 2 });
  });

  it('treats an id reused for another kind of object as removed plus added', () => {
    const other: DiffableObject = { type: 'hide', id: 'b1', x: 5, y: 0, width: 25, height: 14 };
    const d = diffDesigns(base, { ...base, objects: [lamp(), lid, other] });
    expect(d.objects.map((o) => [o.kind, o.type])).toEqual([
      ['removed', 'perch'],
      ['added', 'hide'],
    ]);
  });

  it('reports an optional field that appears or disappears', () => {
    const d = diffDesigns(base, { ...base, objects: [lamp({ reflectorGain: 2 }), lid, perch] });
    expect(d.objects[0]).toMatchObject({
      kind: 'changed',
      changes: [{ field: 'reflectorGain', a: undefined, b: 2 }],
    });
  });

  it('ignores floating-point noise', () => {
    const d = diffDesigns(base, { ...base, objects: [lamp({ x: 40 + 1e-9 }), lid, perch] });
    expect(d.objects).toEqual([]);
  });

  it('reports enclosure changes', () => {
    const d = diffDesigns(base, { ...base, enclosure: { ...base.enclosure, roomTempC: 22 } });
    expect(d.enclosure).toEqual([{ field: 'roomTempC', a: 24, b: 22 }]);
    expect(isSameDesign(base, { ...base, enclosure: { ...base.enclosure, roomTempC: 22 } })).toBe(false);
  });

  it('does not care about object order', () => {
    const d = diffDesigns(base, { ...base, objects: [perch, lamp(), lid] });
    expect(d.objects).toEqual([]);
  });

  // Property: every object of A is accounted for exactly once (unchanged, moved, changed or removed),
  // and every object of B exactly once (unchanged, moved, changed or added).
  it('accounts for every object exactly once', () => {
    const obj = fc.record({
      id: fc.constantFrom('a', 'b', 'c', 'd', 'e', 'f'),
      type: fc.constantFrom('lamp', 'perch'),
      x: fc.integer({ min: 0, max: 3 }),
      y: fc.integer({ min: 0, max: 3 }),
      w: fc.integer({ min: 1, max: 2 }),
    });
    const uniq = (xs: DiffableObject[]) => xs.filter((o, i) => xs.findIndex((p) => p.id === o.id) === i);
    const design = fc.array(obj, { maxLength: 6 }).map((xs) => ({ enclosure: {}, objects: uniq(xs) }));
    fc.assert(
      fc.property(design, design, (a, b) => {
        const d = diffDesigns(a, b);
        const c = d.counts;
        expect(c.unchanged + c.moved + c.changed + c.removed).toBe(a.objects.length);
        expect(c.unchanged + c.moved + c.changed + c.added).toBe(b.objects.length);
        const back = diffDesigns(b, a).counts;
        expect([back.added, back.removed, back.moved, back.changed]).toEqual([
          c.removed,
          c.added,
          c.moved,
          c.changed,
        ]);
      }),
    );
  });
});

describe('anchorOf', () => {
  it('uses x/y, else the segment midpoint, else nothing', () => {
    expect(anchorOf({ x: 1, y: 2 })).toEqual({ x: 1, y: 2 });
    expect(anchorOf({ x1: 0, y1: 0, x2: 10, y2: 4 })).toEqual({ x: 5, y: 2 });
    expect(anchorOf({})).toBeNull();
  });
});
