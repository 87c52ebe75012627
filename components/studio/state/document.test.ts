import { describe, expect, it } from 'vitest';
import { designSchema } from '@/simulation';
import {
  addObject,
  addProbe,
  arrange,
  duplicateObjects,
  moveObjects,
  nextId,
  removeObjects,
  setEnclosure,
  updateObject,
  updateProbe,
} from './document';
import { exampleDesign } from '../examples/exampleDesign';

const ids = (d: { objects: { id: string }[] }) => d.objects.map((o) => o.id);

describe('document edits', () => {
  it('keeps the example valid against the engine schema', () => {
    expect(designSchema.safeParse(exampleDesign()).success).toBe(true);
  });

  it('generates unused ids', () => {
    const d = exampleDesign();
    expect(nextId(d, 'perch')).toBe('perch-1');
    const d2 = addObject(d, { type: 'perch', id: 'perch-1', x1: 0, y1: 0, x2: 1, y2: 1, thickness: 2 });
    expect(nextId(d2, 'perch')).toBe('perch-2');
  });

  it('updates and clears fields; unchanged edits keep the reference', () => {
    const d = exampleDesign();
    const u = updateObject(d, 'uv1', { uvbAt30: 80 });
    expect(u.objects[0]).toMatchObject({ uvbAt30: 80 });
    const cleared = updateObject(u, 'uv1', { reflectorGain: undefined });
    expect('reflectorGain' in (cleared.objects[0] as object)).toBe(false);
    expect(designSchema.safeParse(cleared).success).toBe(true);
    expect(updateObject(d, 'missing', { x: 1 } as never)).toBe(d);
    expect(moveObjects(d, ['b1'], 0, 0)).toBe(d);
  });

  it('moves several objects and their probes by the same delta', () => {
    const { design, id } = addProbe(exampleDesign(), 10, 10);
    const m = moveObjects(design, ['b1', 'h1', id], 3, 4);
    expect(m.objects.find((o) => o.id === 'b1')).toMatchObject({ x1: 23, y1: 24 });
    expect(m.objects.find((o) => o.id === 'h1')).toMatchObject({ x: 8, y: 4 });
    expect(m.probes?.[0]).toMatchObject({ x: 13, y: 14 });
  });

  it('removes objects and probes, dropping an empty probes list', () => {
    const { design, id } = addProbe(exampleDesign(), 10, 10);
    const r = removeObjects(design, ['b1', id]);
    expect(ids(r)).not.toContain('b1');
    expect(r.probes).toBeUndefined();
    expect(designSchema.safeParse(r).success).toBe(true);
  });

  it('duplicates with fresh ids and an offset', () => {
    const { design, ids: added } = duplicateObjects(exampleDesign(), ['b1', 'h1']);
    expect(added).toEqual(['perch-1', 'hide-1']);
    expect(design.objects.find((o) => o.id === 'perch-1')).toMatchObject({ x1: 25, y1: 25 });
    expect(designSchema.safeParse(design).success).toBe(true);
  });

  it('arranges drawing order', () => {
    const d = exampleDesign(); // uv1 heat1 lid b1 r1 h1 p1 side
    expect(ids(arrange(d, ['b1'], 'front')).at(-1)).toBe('b1');
    expect(ids(arrange(d, ['b1'], 'back'))[0]).toBe('b1');
    expect(ids(arrange(d, ['b1'], 'forward')).indexOf('b1')).toBe(4);
    expect(ids(arrange(d, ['b1'], 'backward')).indexOf('b1')).toBe(2);
    expect(arrange(d, ['side'], 'front')).toBe(d);
    expect(arrange(d, ['uv1'], 'backward')).toBe(d);
  });

  it('edits the enclosure and probes', () => {
    const d = setEnclosure(exampleDesign(), { width: 90, roomTempC: undefined });
    expect(d.enclosure).toEqual({ width: 90, height: 60, depth: 60 });
    const { design, id } = addProbe(d, 1, 2, 'basking spot');
    expect(updateProbe(design, id, { x: 5 }).probes?.[0]).toEqual({ id, x: 5, y: 2, label: 'basking spot' });
  });
});
