import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { FieldSolver } from './solver';
import { computeFields } from './grid';
import { arbDesign, arbObject } from '../testing/arbitraries';
import type { Design, DesignObject } from '../model/schema';

describe('FieldSolver cache', () => {
  it('after barriers move, are added or removed, equals a fresh computation (property)', () => {
    const barrier = arbObject().filter((o) => o.type !== 'lamp');
    fc.assert(
      fc.property(arbDesign({ maxObjects: 10 }), barrier, fc.nat(20), (design, replacement, pick) => {
        const solver = new FieldSolver();
        const opts = { cellCm: 4 };
        solver.compute(design, opts);
        const barriers = design.objects.filter((o) => o.type !== 'lamp');
        // Replace one barrier with another shape (a move, resize or change), or add one if there is none.
        const target = barriers.length ? barriers[pick % barriers.length]! : null;
        const objects: DesignObject[] = target
          ? design.objects.map((o) => (o === target ? ({ ...replacement, id: o.id } as DesignObject) : o))
          : [...design.objects, { ...replacement, id: 'new' } as DesignObject];
        const next: Design = { ...design, objects };
        const cached = solver.compute(next, opts);
        const fresh = computeFields(next, opts);
        expect(cached.uvb).toEqual(fresh.uvb);
        expect(cached.uvi).toEqual(fresh.uvi);
        expect(cached.tempC).toEqual(fresh.tempC);
        // And removing it again.
        const back = solver.compute(design, opts);
        expect(back.uvb).toEqual(computeFields(design, opts).uvb);
      }),
      { numRuns: 40 },
    );
  });

  it('reuses lamps whose inputs did not change and recomputes only affected cells', () => {
    const solver = new FieldSolver();
    const d: Design = {
      format: 'baskwell.design',
      version: 2,
      enclosure: { width: 120, height: 60, depth: 60 },
      objects: [
        { type: 'lamp', id: 't', tech: 't5', form: 'tube', x: 40, y: 62, length: 55 },
        { type: 'perch', id: 'p', x1: 10, y1: 20, x2: 30, y2: 25, thickness: 3 },
      ],
    };
    solver.compute(d);
    expect(solver.stats.full).toBe(1);
    solver.compute({ ...d, notes: 'changed notes only' }, { addMonths: 6 });
    expect(solver.stats).toMatchObject({ full: 0, cached: 1, cellsEvaluated: 0 });
    const moved = { ...d, objects: [d.objects[0]!, { ...d.objects[1]!, x1: 12 } as DesignObject] };
    solver.compute(moved);
    expect(solver.stats.partial).toBe(1);
    expect(solver.stats.cellsEvaluated).toBeLessThan(240 * 120 * 0.5);
  });
});

describe('FieldSolver grid sizes', () => {
  it('keeps the cache of the previous cell size (coarse while dragging, fine at rest)', () => {
    const solver = new FieldSolver();
    const d: Design = {
      format: 'baskwell.design',
      version: 2,
      enclosure: { width: 60, height: 40, depth: 40 },
      objects: [
        { type: 'lamp', id: 't', tech: 't5', form: 'tube', x: 30, y: 42, length: 40 },
        { type: 'perch', id: 'p', x1: 10, y1: 20, x2: 30, y2: 25, thickness: 3 },
      ],
    };
    solver.compute(d, { cellCm: 0.5 });
    const moved = { ...d, objects: [d.objects[0]!, { ...d.objects[1]!, x1: 12 } as DesignObject] };
    solver.compute(moved, { cellCm: 2 });
    expect(solver.stats.full).toBe(1);
    const back = solver.compute(moved, { cellCm: 0.5 });
    expect(solver.stats.partial).toBe(1);
    expect(back.uvb).toEqual(computeFields(moved, { cellCm: 0.5 }).uvb);
    solver.compute(d, { cellCm: 2 });
    expect(solver.stats.partial).toBe(1);
  });
});
