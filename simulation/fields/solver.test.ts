import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { FieldSolver } from './solver';
import { computeFields } from './grid';
import { arbDesign, arbObject } from '../testing/arbitraries';
import { benchDesign } from '../testing/fixtures';
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

describe('FieldSolver lamp moves', () => {
  type Move = { pick: number; dx: number; dy: number; dz: number };
  const move = fc.record({
    pick: fc.nat(20),
    // Whole and fractional cells, sideways far enough to carry a lamp across a barrier's edge.
    dx: fc.integer({ min: -120, max: 120 }).map((v) => v / 4),
    dy: fc.integer({ min: -20, max: 20 }).map((v) => v / 4),
    dz: fc.integer({ min: -20, max: 20 }).map((v) => v / 4),
  });

  /** The design with one of its lamps moved (the first lamp when there is only one). */
  function moveLamp(d: Design, m: Move): { design: Design; moved: boolean } {
    const lamps = d.objects.filter((o) => o.type === 'lamp');
    if (lamps.length === 0 || (m.dx === 0 && m.dy === 0 && m.dz === 0)) return { design: d, moved: false };
    const target = lamps[m.pick % lamps.length]!;
    const objects = d.objects.map((o) =>
      o === target && o.type === 'lamp'
        ? { ...o, x: o.x + m.dx, y: o.y + m.dy, z: Math.min(45, Math.max(0, (o.z ?? 22.5) + m.dz)) }
        : o,
    );
    return { design: { ...d, objects }, moved: true };
  }

  it('recomputes only the moved lamp and equals a fresh computation after each of several moves (property)', () => {
    fc.assert(
      fc.property(
        arbDesign({ maxObjects: 10 }),
        fc.array(move, { minLength: 1, maxLength: 4 }),
        (design, moves) => {
          const solver = new FieldSolver();
          const opts = { cellCm: 4 };
          solver.compute(design, opts);
          let current = design;
          for (const m of moves) {
            const { design: next, moved } = moveLamp(current, m);
            const cached = solver.compute(next, opts);
            const lamps = next.objects.filter((o) => o.type === 'lamp').length;
            // A z clamped at the wall may leave the lamp where it was: then nothing is recomputed.
            if (moved) expect(solver.stats.full).toBeLessThanOrEqual(1);
            expect(solver.stats.full + solver.stats.cached).toBe(lamps);
            const fresh = computeFields(next, opts);
            expect(cached.uvb).toEqual(fresh.uvb);
            expect(cached.uvi).toEqual(fresh.uvi);
            expect(cached.tempC).toEqual(fresh.tempC);
            current = next;
          }
        },
      ),
      { numRuns: 40 },
    );
  });

  it('a bulb dragged across a perch: cells enter and leave its shadow, each step equal to a fresh computation', () => {
    const base: Design = {
      format: 'baskwell.design',
      version: 2,
      enclosure: { width: 120, height: 60, depth: 60 },
      objects: [
        {
          type: 'lamp',
          id: 'uv',
          tech: 'mercury-vapour',
          form: 'bulb',
          x: 10,
          y: 58,
          uvbAt30: 100,
          beamDeg: 160,
        },
        // A heat lamp without UVB stays put: the UVB at the cell below is the moving bulb's alone.
        { type: 'lamp', id: 'heat', tech: 'halogen', form: 'bulb', x: 100, y: 58, watts: 50, uvbAt30: 0 },
        { type: 'perch', id: 'p', x1: 50, y1: 30, x2: 70, y2: 30, thickness: 3 },
      ],
    };
    const solver = new FieldSolver();
    const opts = { cellCm: 1 };
    solver.compute(base, opts);
    // The floor cell (60.5, 2.5) straight below the perch's middle.
    const below = 2 * 120 + 60;
    const lit: boolean[] = [];
    for (const x of [5, 60, 115]) {
      const d: Design = {
        ...base,
        objects: base.objects.map((o) => (o.id === 'uv' && o.type === 'lamp' ? { ...o, x } : o)),
      };
      const cached = solver.compute(d, opts);
      expect(solver.stats).toMatchObject({ full: 1, cached: 1 });
      const fresh = computeFields(d, opts);
      expect(cached.uvb).toEqual(fresh.uvb);
      expect(cached.uvi).toEqual(fresh.uvi);
      expect(cached.tempC).toEqual(fresh.tempC);
      lit.push(cached.uvb[below]! > 0);
    }
    // Lit from the left, in the perch's shadow with the bulb above it, lit again from the right.
    expect(lit).toEqual([true, false, true]);
  });
});

describe('FieldSolver sums', () => {
  /** Cells whose bits differ (Object.is) between two fields of the same size. */
  function differing(a: Float32Array, b: Float32Array): number {
    let n = 0;
    for (let i = 0; i < a.length; i++) if (!Object.is(a[i], b[i])) n++;
    return n;
  }

  it('adds six lamps in scene order, whole and over a drag step: the bits of a fresh computation', () => {
    // Six lamps' float64 sums rounded to float32: adding them in another order changes some cells' bits.
    const design = benchDesign(2, 1);
    const opts = { cellCm: 1 };
    const solver = new FieldSolver();
    let now = design;
    for (let step = 0; step < 4; step++) {
      const got = solver.compute(now, opts);
      const fresh = computeFields(now, opts);
      expect(differing(got.uvb, fresh.uvb)).toBe(0);
      expect(differing(got.uvi, fresh.uvi)).toBe(0);
      expect(differing(got.tempC, fresh.tempC)).toBe(0);
      now = {
        ...now,
        objects: now.objects.map((o) => (o.id === 't5-0' && o.type === 'lamp' ? { ...o, x: o.x + 1 } : o)),
      };
    }
  });
  it('sums any number of lamps three at a time, the last three filled up with zeros: the bits of a fresh computation', () => {
    // 0–8 lamps: no lamp, a group of three padded by one or two empty fields, and two or three groups
    // carried over in doubles between them. The first and the last lamp are dragged in turn.
    const all = benchDesign(3, 1).objects;
    const lamps = all.filter((o) => o.type === 'lamp');
    const barriers = all.filter((o) => o.type !== 'lamp');
    const opts = { cellCm: 1.5 };
    for (let n = 0; n <= lamps.length - 1; n++) {
      let now: Design = { ...benchDesign(), objects: [...lamps.slice(0, n), ...barriers] };
      const solver = new FieldSolver();
      for (let step = 0; step < 5; step++) {
        const got = solver.compute(now, opts);
        if (step > 0 && n > 0) expect(solver.stats).toMatchObject({ full: 1, cached: n - 1 });
        const fresh = computeFields(now, opts);
        expect([n, differing(got.uvb, fresh.uvb)]).toEqual([n, 0]);
        expect([n, differing(got.uvi, fresh.uvi)]).toEqual([n, 0]);
        expect([n, differing(got.tempC, fresh.tempC)]).toEqual([n, 0]);
        const id = step % 2 ? lamps[n - 1]?.id : lamps[0]?.id;
        now = {
          ...now,
          objects: now.objects.map((o) => (o.id === id && o.type === 'lamp' ? { ...o, x: o.x + 1.5 } : o)),
        };
      }
    }
  });
});

describe('FieldSolver recycled results', () => {
  const opts = { cellCm: 1 };
  /** The design with lamp t5-0 moved sideways by dx. */
  const slid = (d: Design, dx: number): Design => ({
    ...d,
    objects: d.objects.map((o) => (o.id === 't5-0' && o.type === 'lamp' ? { ...o, x: o.x + dx } : o)),
  });
  /** A whole result's values, copied. */
  const copy = (g: { uvb: Float32Array; uvi: Float32Array; tempC: Float32Array }) => [
    g.uvb.slice(),
    g.uvi.slice(),
    g.tempC.slice(),
  ];

  it('a drag writing into handed-back buffers gives the bits of fresh results, on both paths', () => {
    const reusing = new FieldSolver();
    const fresh = new FieldSolver();
    let now = benchDesign();
    let before = reusing.compute(now, opts);
    let handedBack: ArrayBufferLike | null = null;
    fresh.compute(now, opts);
    for (let step = 0; step < 6; step++) {
      now = slid(now, step % 2 ? -0.5 : 1);
      const got = reusing.compute(now, opts);
      if (handedBack) expect(got.uvb.buffer).toBe(handedBack);
      expect(copy(got)).toEqual(copy(fresh.compute(now, opts)));
      // The one before is no longer read: spoil it, so that a cell the next call left unwritten shows.
      new Float32Array(before.uvb.buffer).fill(NaN);
      handedBack = before.uvb.buffer;
      reusing.recycle(handedBack);
      before = got;
    }
    expect(reusing.stats.full).toBe(1);
    const once = new FieldSolver(false);
    const first = once.compute(now, opts);
    new Float32Array(first.uvb.buffer).fill(NaN);
    once.recycle(first.uvb.buffer);
    const again = once.compute(now, opts);
    expect(again.uvb.buffer).toBe(first.uvb.buffer);
    expect(copy(again)).toEqual(copy(fresh.compute(now, opts)));
  });

  it('uses a handed-back buffer only for a result of its size, and never a detached one', () => {
    const solver = new FieldSolver();
    const design = benchDesign();
    const coarse = solver.compute(design, { cellCm: 2 });
    solver.recycle(coarse.uvb.buffer);
    const detached = solver.compute(design, opts).uvb.buffer as ArrayBuffer;
    structuredClone(detached, { transfer: [detached] });
    expect(detached.byteLength).toBe(0);
    solver.recycle(detached);
    const fine = solver.compute(slid(design, 1), opts);
    expect(fine.uvb.buffer).not.toBe(coarse.uvb.buffer);
    expect(fine.uvb.length).toBe(fine.nx * fine.ny);
    expect(copy(fine)).toEqual(copy(computeFields(slid(design, 1), opts)));
    // The coarse buffer is still there for the next coarse call.
    expect(solver.compute(design, { cellCm: 2 }).uvb.buffer).toBe(coarse.uvb.buffer);
  });

  it('never writes into a result the caller still holds', () => {
    const solver = new FieldSolver();
    let now = benchDesign();
    const held = solver.compute(now, opts);
    const values = copy(held);
    let last = held;
    for (let step = 0; step < 5; step++) {
      now = slid(now, 1);
      const next = solver.compute(now, opts);
      expect(next.uvb.buffer).not.toBe(held.uvb.buffer);
      expect(next.uvb.buffer).not.toBe(last.uvb.buffer);
      // The results after the held one are handed back once the next is there, as the studio does.
      if (last !== held) solver.recycle(last.uvb.buffer);
      last = next;
    }
    expect(copy(held)).toEqual(values);
    // A buffer handed back twice is kept once: two later results never share it.
    solver.recycle(last.uvb.buffer);
    solver.recycle(last.uvb.buffer);
    const a = solver.compute(slid(now, 1), opts);
    const b = solver.compute(slid(now, 2), opts);
    expect(a.uvb.buffer).not.toBe(b.uvb.buffer);
    const once = new FieldSolver(false);
    const kept = once.compute(now, opts);
    const keptValues = copy(kept);
    once.compute(slid(now, 3), opts);
    once.compute(benchDesign(), opts);
    expect(copy(kept)).toEqual(keptValues);
  });
});
