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
 */
import { loadavg } from 'node:os';
import { computeFields, FieldSolver, type Design } from '@/simulation';
import { maxRelativeError, referenceFields } from '../simulation/testing/reference';
import { benchDesign } from '../simulation/testing/fixtures';

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

/**
 * One lamp moved in depth, step by step, on a warm solver: only that lamp is recomputed (the others come
 * from the cache), checked against a fresh computation at the end.
 */
function benchLampDepthMove(design: Design, cellCm: number, runs: number): Timing {
  const opts = { cellCm };
  const solver = new FieldSolver();
  let current = design;
  solver.compute(current, opts);
  const times: Timing[] = [];
  for (let k = 0; k < runs; k++) {
    const dz = k % 20 < 10 ? 0.5 : -0.5;
    current = {
      ...current,
      objects: current.objects.map((o) =>
        o.type === 'lamp' && o.id === 't5-0' ? { ...o, z: (o.z ?? 30) + dz } : o,
      ),
    };
    const next = current;
    times.push(time(() => solver.compute(next, opts)));
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

interface Row {
  name: string;
  cells: number;
  lamps: number;
  occluders: number;
  full: Timing;
  move: Timing;
  reference: Timing;
  speedup: number;
  maxRelError: number;
}

function benchOne(name: string, design: Design, cellCm: number, runs: number, stride: number): Row {
  const opts = { cellCm };
  // Warm up the JIT.
  for (let k = 0; k < 5; k++) computeFields(design, opts);
  const full: Timing[] = [];
  for (let k = 0; k < runs; k++) full.push(time(() => computeFields(design, opts)));

  const solver = new FieldSolver();
  solver.compute(design, opts);
  const move: Timing[] = [];
  let current = design;
  for (let k = 0; k < runs; k++) {
    // Drag a branch back and forth in 0.5 cm steps; each step recomputes only what the move affects.
    current = movePerch(current, 'branch1', k % 20 < 10 ? 0.5 : -0.5);
    const next = current;
    move.push(time(() => solver.compute(next, opts)));
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
  return {
    name,
    cells: grid.nx * grid.ny,
    lamps: design.objects.filter((o) => o.type === 'lamp').length,
    occluders: design.objects.filter((o) => o.type !== 'lamp').length,
    full: fullM,
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
  ];
  const lampMove = benchLampDepthMove(inDepth(benchDesign()), 0.5, 41);
  const head = [
    'variant',
    'cells',
    'lamps',
    'occl',
    'full ms',
    'move ms',
    'ref ms',
    'full wall',
    'move wall',
    'speedup',
    'max rel err',
  ];
  const widths = [22, 7, 6, 5, 8, 8, 9, 10, 10, 8, 12];
  console.log(head.map((h, k) => (k === 0 ? h.padEnd(widths[k]!) : pad(h, widths[k]!))).join(' '));
  for (const r of rows) {
    const cols = [
      r.name.padEnd(widths[0]!),
      String(r.cells),
      String(r.lamps),
      String(r.occluders),
      r.full.cpu.toFixed(2),
      r.move.cpu.toFixed(2),
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
  const d = rows[0]!;
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
      loadAvg: r2(load),
    }),
  );
}

main();
