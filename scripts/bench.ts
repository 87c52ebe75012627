/**
 * Benchmark of the field engine against the deliberately simple reference implementation
 * (simulation/testing/reference.ts: tubes cut into 2000 point elements, every ray tested against every
 * barrier), in one process.
 *
 *   npm run --silent bench
 *
 * Prints a table, then as its LAST line one JSON object for the demo-scale design. Times are medians.
 * The machine is shared, so both CPU time of this process (the compute cost) and wall-clock time are
 * measured; fullMs/moveMs/referenceMs are CPU milliseconds, the *WallMs fields wall-clock.
 * The reference is run on every 4th row and column (1 cell in 16) and its time scaled up to the whole grid;
 * maxRelError is measured on those cells.
 *
 * The arithmetic floor is timed in the same run: every lamp's closed form (the engine's own tube and
 * bulb formulas) at every cell, with no barriers, no heat and no allocation — what no engine computing
 * these fields cell by cell can go below. `fullOverFloor` is the full computation over that floor and
 * `moveOverFull` one lamp moved (0.5 cm steps, whole cells, on a warm solver, the others from the cache) over
 * a full computation, at the demo scale and at a 4× larger one (4× the cells, twice the lamps);
 * `moveOverFullSubCell` the same drag in 0.37 cm steps (fractions of a cell).
 *
 * Results are handed back to the engine as the product's callers hand them back: a drag step's result once
 * the next one is there (the studio returns the field it stopped showing to its worker), a full field's
 * once read (the server's first field of a studio page, traced into bands and dropped).
 */
import { loadavg } from 'node:os';
import { computeFields, FieldSolver, recycleFields, type Design, type FieldGrid } from '@/simulation';
import { maxRelativeError, referenceFields } from '../simulation/testing/reference';
import { benchDesign } from '../simulation/testing/fixtures';
import { floorFill, floorSetup } from '../simulation/testing/floor';

interface Timing {
  cpu: number;
  wall: number;
}

function time(fn: () => void): Timing {
  const c0 = process.cpuUsage();
  const w0 = performance.now();
  fn();
  const wall = performance.now() - w0;
  const c = process.cpuUsage(c0);
  return { cpu: (c.user + c.system) / 1000, wall };
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : (s[m - 1]! + s[m]!) / 2;
}

function medians(ts: Timing[]): Timing {
  return { cpu: median(ts.map((t) => t.cpu)), wall: median(ts.map((t) => t.wall)) };
}

/**
 * Calls made before timing anything: V8 compiles a hot function in tiers, and the demo's computation
 * reaches its optimized code only after about 40 calls (before it, each call takes a third longer, and
 * the compiler's own threads count in this process's CPU time). Every timed path gets the same warm-up.
 */
const WARM_UP = 60;

function benchFloor(design: Design, cellCm: number, runs: number): Timing {
  const { lamps, nx, ny, out } = floorSetup(design, cellCm);
  for (let k = 0; k < WARM_UP; k++) floorFill(lamps, nx, ny, cellCm, out);
  const ts: Timing[] = [];
  for (let k = 0; k < runs; k++) ts.push(time(() => floorFill(lamps, nx, ny, cellCm, out)));
  return medians(ts);
}

type LampObject = Extract<Design['objects'][number], { type: 'lamp' }>;

/**
 * A drag step: 0.5 cm, a whole cell at the demo's 0.5 cm and two at the larger field's 0.25 cm (as a drag
 * snapped to whole centimetres on the studio's 1 cm drag grid), and 0.37 cm, a fraction of a cell (a free
 * drag with Alt, or a snap that does not divide into cells): the engine reuses more of a whole-cell step.
 */
const WHOLE_STEP_CM = 0.5;
const SUB_CELL_STEP_CM = 0.37;

/** Sideways by d cm, or in depth by d cm. */
const sideways = (o: LampObject, d: number): LampObject => ({ ...o, x: o.x + d });
const inDepthBy = (o: LampObject, d: number): LampObject => ({ ...o, z: (o.z ?? 30) + d });

/**
 * One lamp moved in steps of stepCm (back and forth) on a warm solver: only that lamp is recomputed (the
 * others come from the cache), checked against a fresh computation at the end.
 */
function benchLampMove(
  design: Design,
  cellCm: number,
  runs: number,
  step: (o: LampObject, d: number) => LampObject = sideways,
  stepCm = WHOLE_STEP_CM,
  lampId = 't5-0',
): Timing {
  const opts = { cellCm };
  const solver = new FieldSolver();
  let current = design;
  let shown = solver.compute(current, opts);
  const times: Timing[] = [];
  // The first steps warm up the JIT (the full computations before compiled the one-off path only).
  for (let k = -WARM_UP; k < runs; k++) {
    const dx = (k + WARM_UP) % 20 < 10 ? stepCm : -stepCm;
    current = {
      ...current,
      objects: current.objects.map((o) => (o.type === 'lamp' && o.id === lampId ? step(o, dx) : o)),
    };
    const next = current;
    const t = time(() => {
      shown = replace(solver, shown, solver.compute(next, opts));
    });
    if (k >= 0) times.push(t);
    if (solver.stats.full !== 1) throw new Error('moving one lamp recomputed more than that lamp');
  }
  const a = solver.compute(current, opts);
  const b = computeFields(current, opts);
  for (let c = 0; c < a.uvb.length; c++) {
    if (a.uvb[c] !== b.uvb[c] || a.tempC[c] !== b.tempC[c])
      throw new Error('cached recompute after a lamp move differs from a full one');
  }
  return medians(times);
}

/** The studio's hand-back: the result it showed goes back to the solver once the next one is there. */
function replace(solver: FieldSolver, shown: FieldGrid, next: FieldGrid): FieldGrid {
  solver.recycle(shown.uvb.buffer);
  return next;
}

/** A full field read and dropped, its buffer handed back (as the studio's first field on the server). */
function fullField(design: Design, opts: { cellCm: number }) {
  recycleFields(computeFields(design, opts).uvb.buffer);
}

/** The design with one perch shifted by dx (a drag step). */
function movePerch(d: Design, id: string, dx: number): Design {
  return {
    ...d,
    objects: d.objects.map((o) =>
      o.id === id && o.type === 'perch' ? { ...o, x1: o.x1 + dx, x2: o.x2 + dx } : o,
    ),
  };
}

/** The design with its lamps spread over the depth (back, front, back) and the side view off the middle. */
function inDepth(d: Design): Design {
  const zs = [50, 10, 45];
  let k = 0;
  return {
    ...d,
    enclosure: { ...d.enclosure, sectionZ: 25 },
    objects: d.objects.map((o) => (o.type === 'lamp' ? { ...o, z: zs[k++ % zs.length]! } : o)),
  };
}

interface Row {
  name: string;
  cells: number;
  lamps: number;
  occluders: number;
  /** Edges of the barriers' outlines (a segment counts one). */
  edges: number;
  full: Timing;
  floor: Timing;
  lampMove: Timing;
  /** The same lamp dragged by a fraction of a cell a step. */
  lampMoveSub: Timing;
  move: Timing;
  reference: Timing;
  speedup: number;
  maxRelError: number;
}

function benchOne(name: string, design: Design, cellCm: number, runs: number, stride: number): Row {
  const opts = { cellCm };
  // Warm up the JIT.
  for (let k = 0; k < WARM_UP; k++) fullField(design, opts);
  const full: Timing[] = [];
  for (let k = 0; k < runs; k++) full.push(time(() => fullField(design, opts)));

  const solver = new FieldSolver();
  let shown = solver.compute(design, opts);
  const move: Timing[] = [];
  let current = design;
  for (let k = -WARM_UP; k < runs; k++) {
    // Drag a branch back and forth in 0.5 cm steps; each step recomputes only what the move affects.
    current = movePerch(current, 'branch1', (k + WARM_UP) % 20 < 10 ? 0.5 : -0.5);
    const next = current;
    const t = time(() => {
      shown = replace(solver, shown, solver.compute(next, opts));
    });
    if (k >= 0) move.push(t);
  }
  // Honesty check: the cached result after the drag equals a fresh computation.
  const a = solver.compute(current, opts);
  const b = computeFields(current, opts);
  for (let c = 0; c < a.uvb.length; c++) {
    if (a.uvb[c] !== b.uvb[c] || a.tempC[c] !== b.tempC[c])
      throw new Error('cached recompute differs from a full one');
  }

  const grid = computeFields(design, opts);
  let ref = referenceFields(design, { cellCm, stride: 1e9 }); // placeholder, replaced below
  const refTime = time(() => {
    ref = referenceFields(design, { cellCm, stride });
  });
  const evaluated = Math.ceil(grid.nx / stride) * Math.ceil(grid.ny / stride);
  const scaleUp = (grid.nx * grid.ny) / evaluated;
  const reference = { cpu: refTime.cpu * scaleUp, wall: refTime.wall * scaleUp };
  const fullM = medians(full);
  const { edges } = floorSetup(design, cellCm);
  return {
    name,
    cells: grid.nx * grid.ny,
    lamps: design.objects.filter((o) => o.type === 'lamp').length,
    occluders: design.objects.filter((o) => o.type !== 'lamp').length,
    edges,
    full: fullM,
    floor: benchFloor(design, cellCm, runs),
    lampMove: benchLampMove(design, cellCm, runs),
    lampMoveSub: benchLampMove(design, cellCm, runs, sideways, SUB_CELL_STEP_CM),
    move: medians(move),
    reference,
    speedup: reference.cpu / fullM.cpu,
    maxRelError: maxRelativeError(grid, ref, design.enclosure.roomTempC ?? 24),
  };
}

function pad(s: string, n: number) {
  return s.length >= n ? s : ' '.repeat(n - s.length) + s;
}

function main() {
  const rows = [
    benchOne('demo 120×60 cm @0.5', benchDesign(), 0.5, 41, 4),
    benchOne('4× cells (@0.25 cm)', benchDesign(), 0.25, 21, 8),
    benchOne('4× lamps', benchDesign(4, 1), 0.5, 21, 8),
    benchOne('4× occluders', benchDesign(1, 4), 0.5, 21, 8),
    benchOne('demo, lamps in depth', inDepth(benchDesign()), 0.5, 21, 8),
    benchOne('4× larger (2× lamps @0.25)', benchDesign(2, 1), 0.25, 21, 8),
  ];
  const lampMove = benchLampMove(inDepth(benchDesign()), 0.5, 41, inDepthBy);
  const head = [
    'variant',
    'cells',
    'lamps',
    'occl',
    'full ms',
    'move ms',
    'floor ms',
    'full/floor',
    'lamp mv ms',
    'mv/full',
    'sub mv/full',
    'ref ms',
    'full wall',
    'move wall',
    'speedup',
    'max rel err',
  ];
  const widths = [26, 7, 6, 5, 8, 8, 9, 10, 10, 8, 11, 9, 10, 10, 8, 12];
  console.log(head.map((h, k) => (k === 0 ? h.padEnd(widths[k]!) : pad(h, widths[k]!))).join(' '));
  for (const r of rows) {
    const cols = [
      r.name.padEnd(widths[0]!),
      String(r.cells),
      String(r.lamps),
      String(r.occluders),
      r.full.cpu.toFixed(2),
      r.move.cpu.toFixed(2),
      r.floor.cpu.toFixed(2),
      (r.full.cpu / r.floor.cpu).toFixed(2),
      r.lampMove.cpu.toFixed(2),
      (r.lampMove.cpu / r.full.cpu).toFixed(2),
      (r.lampMoveSub.cpu / r.full.cpu).toFixed(2),
      r.reference.cpu.toFixed(0),
      r.full.wall.toFixed(2),
      r.move.wall.toFixed(2),
      r.speedup.toFixed(0),
      (r.maxRelError * 100).toFixed(3) + ' %',
    ];
    console.log(cols.map((c, k) => (k === 0 ? c : pad(c, widths[k]!))).join(' '));
  }
  console.log(
    `One of the demo's 3 lamps moved in depth (0.5 cm steps, the other 2 from the cache): ` +
      `${lampMove.cpu.toFixed(2)} ms CPU, ${lampMove.wall.toFixed(2)} ms wall-clock (medians).`,
  );
  const load = loadavg()[0]!;
  console.log(
    `CPU ms of this process (medians); wall-clock alongside. Load average ${load.toFixed(1)} on this machine. ` +
      'Reference time scaled up from a 1-in-16 (demo) or 1-in-64 (scaled variants) cell sample.',
  );
  console.log(
    'floor: every lamp\'s closed form at every cell, no barriers, no heat, no allocation; "move" drags a ' +
      `perch, "lamp mv" drags one lamp (the others from the cache) in ${WHOLE_STEP_CM} cm steps (whole cells), ` +
      `"sub mv" in ${SUB_CELL_STEP_CM} cm steps (fractions of a cell).`,
  );
  const d = rows[0]!;
  const large = rows.at(-1)!;
  const r2 = (v: number) => Math.round(v * 100) / 100;
  console.log(
    JSON.stringify({
      cells: d.cells,
      lamps: d.lamps,
      occluders: d.occluders,
      fullMs: r2(d.full.cpu),
      moveMs: r2(d.move.cpu),
      referenceMs: Math.round(d.reference.cpu),
      speedup: Math.round(d.speedup),
      maxRelError: Number(d.maxRelError.toPrecision(3)),
      fullWallMs: r2(d.full.wall),
      moveWallMs: r2(d.move.wall),
      floorMs: r2(d.floor.cpu),
      fullOverFloor: r2(d.full.cpu / d.floor.cpu),
      lampMoveMs: r2(d.lampMove.cpu),
      // CPU above wall time is work on the process's other threads (the collector's) during the step.
      lampMoveWallMs: r2(d.lampMove.wall),
      moveOverFull: r2(d.lampMove.cpu / d.full.cpu),
      // The same drag by a fraction of a cell a step (a free drag).
      lampMoveSubCellMs: r2(d.lampMoveSub.cpu),
      moveOverFullSubCell: r2(d.lampMoveSub.cpu / d.full.cpu),
      large: {
        cells: large.cells,
        lamps: large.lamps,
        edges: large.edges,
        fullMs: r2(large.full.cpu),
        floorMs: r2(large.floor.cpu),
        fullOverFloor: r2(large.full.cpu / large.floor.cpu),
        lampMoveMs: r2(large.lampMove.cpu),
        lampMoveWallMs: r2(large.lampMove.wall),
        moveOverFull: r2(large.lampMove.cpu / large.full.cpu),
        lampMoveSubCellMs: r2(large.lampMoveSub.cpu),
        moveOverFullSubCell: r2(large.lampMoveSub.cpu / large.full.cpu),
        maxRelError: Number(large.maxRelError.toPrecision(3)),
      },
      loadAvg: r2(load),
    }),
  );
}

main();
