/**
 * Field solver with a per-lamp cache. Each lamp's unaged UVB and radiant fields are kept; when the next
 * design differs only in some barriers, a lamp's cells are recomputed only where an old or new version of
 * a changed barrier could shade that lamp (its shadow interval meets the lamp on that row). Results are
 * identical to a full computation; `computeFields` uses one without a cache, which keeps nothing between
 * calls but scratch space.
 */
import type { Design } from '../model/schema';
import { lampUvbFactor } from '../model/resolve';
import type { Occluder } from '../geometry/occluders';
import { compileScene, type LampGeom, type Scene } from './scene';
import { fillLamp, refillChanged, RowTotals, sweepLampRow, Workspace } from './workspace';
import { buildSlideMap, fillSlide, SlideScratch, type SlideMap } from './slide';
import { probeScene, probeSceneByLamp, type LampSamples } from './probe';
import { airTempC, balanceAt, cellTempC, finishRow, HEAT_DEFAULTS } from './heat';
import { DEFAULT_CELL_CM, gridSize, type FieldGrid, type ProbeResult, type SimOptions } from './types';

interface LampEntry {
  key: string;
  occKeys: string[];
  occluders: Occluder[];
  /**
   * The lamp's own fields, in float32 like the results: half the memory a drag sums through on every step.
   * The one-off path rounds each lamp's values the same way before adding them, so both give the same bits.
   */
  uv: Float32Array;
  ir: Float32Array;
  /** A tube's line (slideLine): another tube on it differs from this one by a slide. */
  line: string | null;
}

function occluderKey(o: Occluder): string {
  return JSON.stringify([o.id, o.xs, o.ys, o.uvbT, o.irT]);
}

function lampKey(l: LampGeom, nx: number, ny: number, cell: number): string {
  const { ageMonths: _a, decay: _d, ...rest } = l.lamp;
  // dz too: moving the lamp or the section plane in depth changes its fields.
  return JSON.stringify([nx, ny, cell, l.dz, rest]);
}

/**
 * What a tube's kept intervals and plans (slide.ts) depend on besides the barriers and grid: its line's
 * height and distance from the section plane (the closed forms kept at the inner ends), its length (a
 * plan's bounds carry s2's over to s1) and which barriers it sees through (glass passes infrared by the
 * lamp's own figure). Null for a bulb.
 */
function slideLine(l: LampGeom): string | null {
  return l.tube ? JSON.stringify([l.y, l.dz, l.lamp.length, l.lamp.glassIrTransmission]) : null;
}

/**
 * How far past a slid tube's ends its kept intervals reach (a quarter of its length, at least this many
 * cells): a drag stays inside for a while, and a wider window means more intervals per cell on every step.
 */
const SLIDE_MARGIN_CELLS = 8;

export interface SolverStats {
  /** Lamps computed from scratch, partly, or taken from the cache in the last call. */
  full: number;
  /** Of the full ones, tubes filled from their kept intervals (slid along their line). */
  slid: number;
  /**
   * Closed forms at a slid tube's ends found where an earlier step left them (a slide by whole cells:
   * SlideMap.ends1, ends2); a count for tests.
   */
  endsReused: number;
  partial: number;
  cached: number;
  /** Lamp-cells evaluated in the last call. */
  cellsEvaluated: number;
}

/** Grid sizes kept besides the current one. */
const MAX_OTHER_GRIDS = 1;

/**
 * Result buffers kept for later calls (recycle): a drag hands back one per step, and the studio switches
 * between two grid sizes.
 */
const MAX_SPARE_RESULTS = 2;

/** Most barriers that may change for a partial recompute to be tried. */
const MAX_CHANGED_FOR_PARTIAL = 4;

export class FieldSolver {
  private entries = new Map<string, LampEntry>();
  /**
   * Caches of other grid sizes, most recent last: the studio switches to a coarser cell while dragging
   * and back when the drag ends, and each size keeps its own lamp fields and totals.
   */
  private otherGrids = new Map<string, { entries: Map<string, LampEntry>; totals: Totals | null }>();
  private gridKey = '';
  private ws = new Workspace();
  /** Cells recomputed by a partial update in this call. */
  private dirty: Uint8Array | null = null;
  /** Totals of the last call, reused for cells no lamp changed. */
  private totals: Totals | null = null;
  /** In this call: lamps filled into a gone lamp's buffer (key → the gone lamp's key), marking what changed. */
  private refilled = new Map<string, string>();
  /** In this call: a lamp was filled into a new buffer, so its cells are not marked. */
  private unmarked = false;
  /**
   * The hidden intervals of the last tube slid along its line (one at a time, so the memory is bounded by
   * one grid's intervals: SlideMap.bytes); dropped when a call changes a lamp without using it.
   */
  private slideMap: SlideMap | null = null;
  private slideUsed = false;
  private slideScratch = new SlideScratch();
  /** Buffers of results handed back by the caller (recycle), oldest first. */
  private spareResults: ArrayBuffer[] = [];
  readonly stats: SolverStats = { full: 0, slid: 0, endsReused: 0, partial: 0, cached: 0, cellsEvaluated: 0 };

  /** A field of zeros the size of the grid, filling up the last group of three lamps (lampGroups). */
  private zeros = EMPTY;
  /** A run's sums between groups of three lamps (sumRow). */
  private partial = { pu: new Float64Array(0), pv: new Float64Array(0), pq: new Float64Array(0) };

  private zerosOf(cells: number): Float32Array {
    if (this.zeros.length !== cells) this.zeros = new Float32Array(cells);
    return this.zeros;
  }

  private runSums(nx: number) {
    if (this.partial.pu.length < nx)
      this.partial = { pu: new Float64Array(nx), pv: new Float64Array(nx), pq: new Float64Array(nx) };
    return this.partial;
  }

  /** Bytes held for the last tube slid along its line (0 when none is kept). */
  get slideBytes(): number {
    return this.slideMap?.bytes ?? 0;
  }

  /** @param cache keep per-lamp fields between calls (false: a one-off computation that allocates less). */
  constructor(private readonly cache = true) {}

  /**
   * Hands back the buffer of a result (`grid.uvb.buffer`) that nothing will read again: a later call of
   * the same grid size writes its result into it instead of allocating a new one. Allocating and first
   * touching a fresh grid-sized buffer on every call costs as much as a third of a small drag step. The
   * caller gives up the whole result: the three arrays share this buffer, and reading any of them after
   * a later call shows that call's values. A buffer of another size, or a detached one, is never used.
   */
  recycle(buffer: ArrayBufferLike): void {
    if (!(buffer instanceof ArrayBuffer) || buffer.byteLength === 0) return;
    if (this.spareResults.includes(buffer)) return;
    this.spareResults.push(buffer);
    if (this.spareResults.length > MAX_SPARE_RESULTS) this.spareResults.shift();
  }

  /**
   * The three result fields as views of one buffer: a handed-back one of this size if there is one, or a
   * single new allocation instead of three (three grid-sized buffers a call are freed and allocated again
   * on every drag step, and the allocator hands their pages back to the system and faults them in again
   * each time, which costs more than the copy). Every cell is written by the caller, so a handed-back
   * buffer needs no clearing.
   */
  private resultArrays(cells: number): [Float32Array, Float32Array, Float32Array] {
    const bytes = 3 * cells * Float32Array.BYTES_PER_ELEMENT;
    const k = this.spareResults.findIndex((b) => b.byteLength === bytes);
    const all = k >= 0 ? new Float32Array(this.spareResults.splice(k, 1)[0]!) : new Float32Array(3 * cells);
    return [all.subarray(0, cells), all.subarray(cells, 2 * cells), all.subarray(2 * cells)];
  }

  compute(design: Design, opts: SimOptions = {}): FieldGrid {
    if (!this.cache) return this.computeOnce(design, opts);
    const cell = opts.cellCm ?? DEFAULT_CELL_CM;
    const { width, height } = design.enclosure;
    const { nx, ny } = gridSize(width, height, cell);
    const scene = compileScene(design);
    const ws = this.ws;
    ws.ensure(scene.occluders.length);
    this.stats.full =
      this.stats.slid =
      this.stats.endsReused =
      this.stats.partial =
      this.stats.cached =
      this.stats.cellsEvaluated =
        0;
    this.slideUsed = false;
    const cells = nx * ny;
    this.switchGrid(JSON.stringify([nx, ny, cell]));
    if (!this.dirty || this.dirty.length !== cells) this.dirty = new Uint8Array(cells);
    else this.dirty.fill(0);

    const occKeys = scene.occluders.map(occluderKey);
    const next = new Map<string, LampEntry>();
    const hc = opts.convection ?? HEAT_DEFAULTS.convection;
    const used: LampEntry[] = [];
    const fu: number[] = [];
    const fi: number[] = [];
    const keys = scene.lamps.map((lamp) => lampKey(lamp, nx, ny, cell));
    // Fields of lamps that are gone (a moved lamp's old place): their buffers take a new lamp's fields,
    // so a drag allocates nothing per step.
    const spare: LampEntry[] = [];
    this.refilled.clear();
    this.unmarked = false;
    for (const [key, e] of this.entries) if (!keys.includes(key)) spare.push(e);
    for (let l = 0; l < scene.lamps.length; l++) {
      const lamp = scene.lamps[l]!;
      const key = keys[l]!;
      const entry = this.lampEntry(lamp, key, scene, occKeys, nx, ny, cell, spare);
      next.set(key, entry);
      used.push(entry);
      const f = lampUvbFactor(lamp.lamp, opts.addMonths ?? 0);
      fu.push(lamp.uvI > 0 ? f : 0);
      fi.push(lamp.uvI > 0 ? f * lamp.lamp.uviPerUvb : 0);
    }
    this.entries = next;
    if (this.stats.full > 0 && !this.slideUsed) this.slideMap = null;
    // Everything the totals depend on: the lamps' fields (by key) and the rest.
    const rest = JSON.stringify([fu, fi, scene.roomC, scene.airRiseK, height, hc, nx, ny, cell]);
    const sumKey = JSON.stringify(used.map((e) => e.key)) + rest;
    const last = this.totals;
    // A lamp filled into the buffer of the one it replaced (a dragged lamp's old place) marked the cells
    // it changed, so the totals need only those cells when everything else is as in the last call.
    const asBefore = this.unmarked
      ? null
      : JSON.stringify(used.map((e) => this.refilled.get(e.key) ?? e.key)) + rest;
    const incremental = last !== null && last.key === asBefore;
    // Every cell is written below when not incremental, so the last totals' buffers can be reused.
    const t = incremental
      ? { ...last, key: sumKey }
      : last && last.uvb.length === cells
        ? { ...last, key: sumKey }
        : newTotals(sumKey, cells);
    const air = new Float64Array(ny);
    for (let j = 0; j < ny; j++)
      air[j] = airTempC((j + 0.5) * cell, scene.height, scene.roomC, scene.airRiseK);
    // Totals are always summed lamp by lamp in scene order, so an incremental update is bit-identical
    // to a full one.
    const sums: RowSums = {
      groups: lampGroups(
        used.map((e) => e.uv),
        used.map((e) => e.ir),
        fu,
        fi,
        used.length % 3 === 0 && used.length > 0 ? EMPTY : this.zerosOf(cells),
      ),
      hc,
      out: t,
      ...this.runSums(nx),
    };
    if (incremental) {
      // The same sums, over the runs of changed cells of each row.
      const dirty = this.dirty;
      for (let j = 0; j < ny; j++) {
        const base = j * nx;
        let i = 0;
        while (i < nx) {
          if (dirty[base + i] === 0) {
            i++;
            continue;
          }
          const from = i;
          while (i < nx && dirty[base + i] !== 0) i++;
          sumRow(sums, base, from, i, air[j]!);
        }
      }
    } else {
      // The row's totals stay in the cache for the surface temperatures, and the results are written once.
      for (let j = 0; j < ny; j++) sumRow(sums, j * nx, 0, nx, air[j]!);
    }
    this.totals = t;
    // Copies: the caller owns its results (the worker hands their buffer to the page).
    const [uvb, uvi, tempC] = this.resultArrays(cells);
    uvb.set(t.uvb);
    uvi.set(t.uvi);
    tempC.set(t.tempC);
    return { nx, ny, cellCm: cell, width, height, uvb, uvi, tempC };
  }

  /**
   * One-off computation, a row at a time: every lamp's row is evaluated and added to the row's totals in
   * scene order — the same operations per cell as the cached path, so the same bits — and the row's
   * surface temperatures follow while its totals are still in the cache. Nothing grid-sized is kept or
   * allocated besides the results.
   */
  private computeOnce(design: Design, opts: SimOptions): FieldGrid {
    const cell = opts.cellCm ?? DEFAULT_CELL_CM;
    const { width, height } = design.enclosure;
    const { nx, ny } = gridSize(width, height, cell);
    const scene = compileScene(design);
    const ws = this.ws;
    ws.ensure(scene.occluders.length);
    ws.ensureRow(nx);
    const lamps = scene.lamps;
    const n = lamps.length;
    this.stats.full = n;
    this.stats.slid = this.stats.endsReused = 0;
    this.stats.partial = this.stats.cached = this.stats.cellsEvaluated = 0;
    const cells = nx * ny;
    const hc = opts.convection ?? HEAT_DEFAULTS.convection;
    const { absorptance, emissivity } = HEAT_DEFAULTS;
    const fu = new Float64Array(n);
    const fi = new Float64Array(n);
    for (let k = 0; k < n; k++) {
      const lamp = lamps[k]!;
      const f = lampUvbFactor(lamp.lamp, opts.addMonths ?? 0);
      fu[k] = lamp.uvI > 0 ? f : 0;
      fi[k] = lamp.uvI > 0 ? f * lamp.lamp.uviPerUvb : 0;
    }
    const [uvbOut, uviOut, tempOut] = this.resultArrays(cells);
    const out = { uvb: uvbOut, uvi: uviOut, tempC: tempOut };
    const into = onceRow;
    let evaluated = 0;
    // Each lamp's sweep adds its values into the row's totals as it evaluates them, in scene order.
    for (let j = 0; j < ny; j++) {
      into.clear(nx);
      ws.into = into;
      try {
        for (let k = 0; k < n; k++) {
          into.a = fu[k]!;
          into.b = fi[k]!;
          evaluated += sweepLampRow(ws, lamps[k]!, scene.occluders, j, nx, cell);
        }
      } finally {
        ws.into = null;
      }
      const air = airTempC((j + 0.5) * cell, scene.height, scene.roomC, scene.airRiseK);
      finishRow(into, 0, nx, air, absorptance, emissivity, hc, out, j * nx);
    }
    this.stats.cellsEvaluated = evaluated;
    return { nx, ny, cellCm: cell, width, height, uvb: uvbOut, uvi: uviOut, tempC: tempOut };
  }

  private switchGrid(key: string) {
    if (key === this.gridKey) return;
    const saved = this.otherGrids.get(key);
    this.otherGrids.delete(key);
    if (this.gridKey) {
      this.otherGrids.set(this.gridKey, { entries: this.entries, totals: this.totals });
      while (this.otherGrids.size > MAX_OTHER_GRIDS)
        this.otherGrids.delete(this.otherGrids.keys().next().value!);
    }
    this.entries = saved?.entries ?? new Map();
    this.totals = saved?.totals ?? null;
    this.gridKey = key;
  }

  private lampEntry(
    lamp: LampGeom,
    key: string,
    scene: Scene,
    occKeys: string[],
    nx: number,
    ny: number,
    cell: number,
    spare: LampEntry[],
  ): LampEntry {
    const old = this.entries.get(key);
    if (old) {
      const changed = diffOccluders(old, scene.occluders, occKeys);
      if (changed && changed.length === 0) {
        this.stats.cached++;
        return { ...old, occKeys, occluders: scene.occluders };
      }
      if (changed && changed.length <= MAX_CHANGED_FOR_PARTIAL) {
        this.stats.partial++;
        this.stats.cellsEvaluated += refillChanged(
          this.ws,
          lamp,
          scene.occluders,
          changed,
          old.uv,
          old.ir,
          this.dirty!,
          nx,
          ny,
          cell,
        );
        return { key, occKeys, occluders: scene.occluders, uv: old.uv, ir: old.ir, line: old.line };
      }
    }
    this.stats.full++;
    const reused = spare.pop();
    const fits = reused !== undefined && reused.uv.length === nx * ny;
    // fillLamp writes every cell, so a reused buffer needs no clearing; it marks the cells it changes.
    const uv = fits ? reused.uv : new Float32Array(nx * ny);
    const ir = fits ? reused.ir : new Float32Array(nx * ny);
    if (fits) this.refilled.set(key, reused.key);
    else this.unmarked = true;
    const line = slideLine(lamp);
    const map =
      fits && line !== null ? this.slideMapFor(lamp, line, reused.line, scene, occKeys, nx, ny, cell) : null;
    if (map) {
      this.stats.slid++;
      this.slideUsed = true;
    }
    const { ws, dirty } = this;
    this.stats.cellsEvaluated += map
      ? fillSlide(ws, this.slideScratch, map, lamp, scene.occluders, uv, ir, nx, ny, cell, dirty!)
      : fillLamp(ws, lamp, scene.occluders, uv, ir, nx, ny, cell, fits ? dirty! : undefined);
    if (map) this.stats.endsReused += this.slideScratch.reused;
    return { key, occKeys, occluders: scene.occluders, uv, ir, line };
  }

  /**
   * The kept intervals for a tube on `line`, when it replaces one on the same line (a slide): the last
   * ones if they are for this line, barriers and grid and reach past its ends, or new ones around it.
   * Null when the tube did not slide.
   */
  private slideMapFor(
    lamp: LampGeom,
    line: string,
    was: string | null,
    scene: Scene,
    occKeys: string[],
    nx: number,
    ny: number,
    cell: number,
  ): SlideMap | null {
    const key = JSON.stringify([line, nx, ny, cell, occKeys]);
    const kept = this.slideMap;
    if (kept && kept.key === key && kept.covers(lamp.s1, lamp.s2)) return kept;
    if (was !== line) return null;
    const margin = Math.max(0.25 * (lamp.s2 - lamp.s1), SLIDE_MARGIN_CELLS * cell);
    this.slideMap = buildSlideMap(
      this.ws,
      kept,
      key,
      lamp,
      scene.occluders,
      lamp.s1 - margin,
      lamp.s2 + margin,
      nx,
      ny,
      cell,
    );
    return this.slideMap;
  }

  /** See probe.ts. */
  probeByLamp(design: Design, points: { x: number; y: number }[]): LampSamples {
    return probeSceneByLamp(this.ws, compileScene(design), points);
  }

  /** Values at exact points (no interpolation). */
  probe(design: Design, points: { x: number; y: number }[], opts: SimOptions = {}): ProbeResult[] {
    return probeScene(this.ws, compileScene(design), points, opts);
  }
}

/** Barriers in `old` but not `now`, and in `now` but not `old` (by content); null if they cannot be matched. */
function diffOccluders(old: LampEntry, now: Occluder[], nowKeys: string[]): Occluder[] | null {
  const oldCount = new Map<string, number>();
  old.occKeys.forEach((k) => oldCount.set(k, (oldCount.get(k) ?? 0) + 1));
  const changed: Occluder[] = [];
  const nowCount = new Map<string, number>();
  nowKeys.forEach((k, idx) => {
    nowCount.set(k, (nowCount.get(k) ?? 0) + 1);
    if ((nowCount.get(k) ?? 0) > (oldCount.get(k) ?? 0)) changed.push(now[idx]!);
  });
  const seen = new Map<string, number>();
  old.occKeys.forEach((k, idx) => {
    seen.set(k, (seen.get(k) ?? 0) + 1);
    if ((seen.get(k) ?? 0) > (nowCount.get(k) ?? 0)) changed.push(old.occluders[idx]!);
  });
  return changed;
}

/**
 * Three lamps' fields and factors held in locals: a loop over an array of lamps per cell reloads each
 * lamp's buffer and its bounds for every cell, which cost more than the adding itself (a demo drag step's
 * sums took about twice as long as with the three lamps written out).
 */
interface LampGroup {
  u0: Float32Array;
  u1: Float32Array;
  u2: Float32Array;
  i0: Float32Array;
  i1: Float32Array;
  i2: Float32Array;
  f0: number;
  f1: number;
  f2: number;
  g0: number;
  g1: number;
  g2: number;
}

/**
 * The lamps in scene order in groups of three, the last group filled up with a field of zeros (factor 0):
 * adding +0 leaves every sum as it was (a sum that starts at +0 is never −0), so the padding keeps the bits.
 */
function lampGroups(lu: Float32Array[], li: Float32Array[], fu: number[], fi: number[], zeros: Float32Array) {
  const groups: LampGroup[] = [];
  // No lamps: one group of zeros, every sum 0 as the loop over no lamps leaves it.
  for (let k = 0; k < Math.max(lu.length, 1); k += 3) {
    const at = (a: Float32Array[], m: number) => (k + m < lu.length ? a[k + m]! : zeros);
    const f = (a: number[], m: number) => (k + m < lu.length ? a[k + m]! : 0);
    groups.push({
      u0: at(lu, 0),
      u1: at(lu, 1),
      u2: at(lu, 2),
      i0: at(li, 0),
      i1: at(li, 1),
      i2: at(li, 2),
      f0: f(fu, 0),
      f1: f(fu, 1),
      f2: f(fu, 2),
      g0: f(fi, 0),
      g1: f(fi, 1),
      g2: f(fi, 2),
    });
  }
  return groups;
}

/** What sumRow adds up and where it writes. */
interface RowSums {
  groups: LampGroup[];
  hc: number;
  out: Totals;
  /** A run's sums so far, between groups (more than three lamps), at least a row long. */
  pu: Float64Array;
  pv: Float64Array;
  pq: Float64Array;
}

/**
 * The totals and surface temperatures of cells from..to−1 of the row starting at cell `base`: each cell's
 * lamp values are added in scene order, so every cell gets the same sums in the same order whichever cells
 * are summed together (an incremental update is bit-identical to a full one), and its temperature follows
 * at once, as finishRow would work it out. A drag step sums only the cells the moved lamp changed, in a
 * few short runs per row. With more than three lamps the run is summed a group at a time, its sums so far
 * kept in doubles, which holds them exactly as the one loop over the lamps would.
 */
function sumRow(s: RowSums, base: number, from: number, to: number, airC: number) {
  const { groups, pu, pv, pq } = s;
  const last = groups.length - 1;
  for (let g = 0; g < last; g++) addGroup(groups[g]!, g > 0, pu, pv, pq, base + from, base + to);
  finishGroup(s, groups[last]!, last > 0, base + from, base + to, airC);
}

/**
 * A cell's sum so far (s) with three lamps' values times their factors, left to right as the loop over the
 * lamps adds: ((s + a·f0) + b·f1) + d·f2. The radiant sums pass factors of 1 (x·1 is x, bit for bit).
 */
function add3(s: number, a: number, b: number, d: number, f0: number, f1: number, f2: number): number {
  return s + a * f0 + b * f1 + d * f2;
}

/** Sums so far of cells c0..c1−1 into pu, pv, pq (from c0 on), after those of the groups before (carry). */
function addGroup(
  l: LampGroup,
  carry: boolean,
  pu: Float64Array,
  pv: Float64Array,
  pq: Float64Array,
  c0: number,
  c1: number,
) {
  const { u0, u1, u2, i0, i1, i2, f0, f1, f2, g0, g1, g2 } = l;
  for (let c = c0; c < c1; c++) {
    const x = c - c0;
    pu[x] = add3(carry ? pu[x]! : 0, u0[c]!, u1[c]!, u2[c]!, f0, f1, f2);
    pv[x] = add3(carry ? pv[x]! : 0, u0[c]!, u1[c]!, u2[c]!, g0, g1, g2);
    pq[x] = add3(carry ? pq[x]! : 0, i0[c]!, i1[c]!, i2[c]!, 1, 1, 1);
  }
}

/**
 * The last group's values added to the sums so far (carry) or to 0, the totals written, and the surface
 * temperatures of the radiant sums (left in pq).
 */
function finishGroup(s: RowSums, l: LampGroup, carry: boolean, c0: number, c1: number, airC: number) {
  const { hc, pu, pv, pq } = s;
  const { uvb, uvi, tempC } = s.out;
  const { u0, u1, u2, i0, i1, i2, f0, f1, f2, g0, g1, g2 } = l;
  const { absorptance, emissivity } = HEAT_DEFAULTS;
  const bal = balanceAt(airC, emissivity, hc);
  // Starting at 0 when nothing is carried, as a sum into a cleared total starts (it keeps the bits of a −0
  // term alike).
  for (let c = c0; c < c1; c++) {
    const x = c - c0;
    uvb[c] = add3(carry ? pu[x]! : 0, u0[c]!, u1[c]!, u2[c]!, f0, f1, f2);
    uvi[c] = add3(carry ? pv[x]! : 0, u0[c]!, u1[c]!, u2[c]!, g0, g1, g2);
    pq[x] = add3(carry ? pq[x]! : 0, i0[c]!, i1[c]!, i2[c]!, 1, 1, 1);
  }
  // The temperatures in a loop of their own: with the loads and adds out of the way the square roots and
  // divisions of successive cells overlap (a run's sums and temperatures about 20 % faster than in one loop).
  for (let c = c0; c < c1; c++) tempC[c] = cellTempC(absorptance * pq[c - c0]!, bal, hc, airC);
}

const EMPTY = new Float32Array(0);

/** The results of the last call, already in the float32 they are handed out in. */
interface Totals {
  key: string;
  uvb: Float32Array;
  uvi: Float32Array;
  tempC: Float32Array;
}

function newTotals(key: string, cells: number): Totals {
  return { key, uvb: new Float32Array(cells), uvi: new Float32Array(cells), tempC: new Float32Array(cells) };
}

/**
 * The one-off path's row totals, kept between calls (the computation is synchronous, so one set per thread
 * serves every call): a full field then allocates only its results.
 */
const onceRow = new RowTotals();
