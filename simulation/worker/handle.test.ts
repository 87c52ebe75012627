import { describe, expect, it } from 'vitest';
import { handleRequest, takeHandedBack } from './handle';
import { LatestRequestQueue } from './queue';
import { transferables, type SimRequest } from './protocol';
import { EXAMPLE_DESIGN } from '../testing/fixtures';
import { computeFields } from '../fields/grid';
import { FieldSolver } from '../fields/solver';

const species = {
  name: 'Test gecko',
  uvZone: 2 as const,
  baskingSurfaceC: [32, 35] as [number, number],
  coolEndC: [22, 26] as [number, number],
};

describe('handleRequest', () => {
  it('returns fields, probes, assessment and months as transferable buffers', () => {
    const req: SimRequest = {
      id: 7,
      kind: 'simulate',
      design: EXAMPLE_DESIGN,
      cellCm: 2,
      species,
      probes: [{ x: 40, y: 30 }],
    };
    const res = handleRequest(req);
    expect(res.kind).toBe('result');
    if (res.kind !== 'result') return;
    expect(res.id).toBe(7);
    expect([res.nx, res.ny, res.cellCm]).toEqual([60, 30, 2]);
    expect(res.uvb).toBeInstanceOf(Float32Array);
    expect(res.uvb).toEqual(computeFields(EXAMPLE_DESIGN, { cellCm: 2 }).uvb);
    expect(res.probes).toHaveLength(1);
    expect(res.assessment?.findings.length).toBeGreaterThan(5);
    expect(res.monthsUntilUnmet === null || typeof res.monthsUntilUnmet === 'number').toBe(true);
    expect(res.ms).toBeGreaterThanOrEqual(0);
    // Every field's buffer is handed over, each once (the three fields may share one buffer).
    const bufs = transferables(res);
    for (const a of [res.uvb, res.uvi, res.tempC]) expect(bufs).toContain(a.buffer);
    expect(new Set(bufs).size).toBe(bufs.length);
  });

  it('answers an invalid design or species with an error naming the field', () => {
    const bad = { ...EXAMPLE_DESIGN, enclosure: { ...EXAMPLE_DESIGN.enclosure, width: -1 } };
    expect(handleRequest({ id: 1, kind: 'simulate', design: bad })).toEqual({
      id: 1,
      kind: 'error',
      message: expect.stringMatching(/^design\.enclosure\.width: /),
    });
    const r = handleRequest({
      id: 2,
      kind: 'simulate',
      design: EXAMPLE_DESIGN,
      species: { ...species, uvZone: 5 as never },
    });
    expect(r).toMatchObject({ id: 2, kind: 'error', message: expect.stringMatching(/^species\.uvZone/) });
    expect(handleRequest({ id: 3, kind: 'simulate', design: EXAMPLE_DESIGN, cellCm: 0.001 })).toMatchObject({
      kind: 'error',
      message: expect.stringMatching(/larger cell/),
    });
  });

  it('gives the same result with a caching solver as without, also after a barrier moves', () => {
    const solver = new FieldSolver();
    const first = handleRequest({ id: 1, kind: 'simulate', design: EXAMPLE_DESIGN, cellCm: 1 }, solver);
    const moved = {
      ...EXAMPLE_DESIGN,
      objects: EXAMPLE_DESIGN.objects.map((o) =>
        o.id === 'b1' && o.type === 'perch' ? { ...o, y1: o.y1 + 7, x2: o.x2 + 5 } : o,
      ),
    };
    const second = handleRequest({ id: 2, kind: 'simulate', design: moved, cellCm: 1 }, solver);
    expect(solver.stats.partial).toBeGreaterThan(0);
    const fresh = computeFields(moved, { cellCm: 1 });
    expect(first.kind === 'result' && second.kind === 'result').toBe(true);
    if (second.kind !== 'result') return;
    expect(second.uvb).toEqual(fresh.uvb);
    expect(second.tempC).toEqual(fresh.tempC);
  });
});

describe('LatestRequestQueue', () => {
  it('answers a waiting request superseded when a newer one arrives', () => {
    const q = new LatestRequestQueue();
    const mk = (id: number): SimRequest => ({ id, kind: 'simulate', design: EXAMPLE_DESIGN });
    expect(q.push(mk(1))).toBeNull();
    expect(q.push(mk(2))).toEqual({ id: 1, kind: 'superseded' });
    expect(q.push(mk(3))).toEqual({ id: 2, kind: 'superseded' });
    expect(q.take()?.id).toBe(3);
    expect(q.take()).toBeNull();
    expect(q.push(mk(4))).toBeNull();
  });
});

describe('takeHandedBack', () => {
  it('gives a request’s buffers to the solver: the next result of their size is computed into one', () => {
    const solver = new FieldSolver();
    const req: SimRequest = { id: 1, kind: 'simulate', design: EXAMPLE_DESIGN, cellCm: 2 };
    const first = handleRequest(req, solver);
    if (first.kind !== 'result') throw new Error(first.kind);
    // As the page returns it: transferred, so the worker sees a new buffer object.
    const back = structuredClone(first.uvb.buffer as ArrayBuffer, {
      transfer: [first.uvb.buffer as ArrayBuffer],
    });
    takeHandedBack({ ...req, id: 2, recycle: [back, 'not a buffer' as never] }, solver);
    const second = handleRequest({ ...req, id: 2 }, solver);
    if (second.kind !== 'result') throw new Error(second.kind);
    expect(second.uvb.buffer).toBe(back);
    expect(second.uvb).toEqual(computeFields(EXAMPLE_DESIGN, { cellCm: 2 }).uvb);
  });
});
