/**
 * A tube slid along its own line (only x changes: the usual way a ceiling tube is adjusted).
 *
 * Seen from a receiver Q, a barrier hides an interval [lo, hi] of the lamp line that depends on Q, the
 * barrier and the line's height, not on where the tube lies on the line (kernel.ts). So the hidden
 * intervals of every cell are found once, over a window of the line around the tube, and kept; a slide
 * step inside that window clips them to the tube's new ends and takes the closed forms, with no corner
 * projected, no range tested and no row swept. Most cells do even less: their plan (fillSlide) keeps what
 * the last step found there, which holds until an interval end changes side of a tube end.
 * A slide by whole cells (a snapped drag on a grid whose cell divides the snap) needs few closed forms even
 * at the tube's ends: each cell's distance to an end is its neighbour's of a step before, so they are kept
 * per row by that distance (SlideMap.endTables) and found again, with the same bits.
 *
 * The bits are those of a fresh computation (workspace.ts, sweepRow and evalSpan): per cell, the barriers
 * hiding the whole tube are multiplied in ascending order, first those the row sweep finds by its range
 * (RowData fa, fb, with the sweep's own test) and then the others; the partly hiding pieces, in ascending
 * order too, are summed as evalSpan sums a cell evaluated alone (one piece: its own case; more: the inner
 * ends sorted, neighbouring pieces of equal share merged into runs, the closed form at the ends of runs
 * that pass anything). Stretches and kept runs in evalSpan give those same bits, so one arithmetic serves.
 */
import type { Occluder } from '../geometry/occluders';
import type { LampGeom } from './scene';
import { makeRuns, prepareRow, type Scratch } from './kernel';
import { tubeG as G } from '../sources/tube';
import type { Workspace } from './workspace';

/**
 * A tube's hidden intervals per cell over the window [w1, w2] of its line, for one set of barriers, grid,
 * tube length and distance from the section plane, and each cell's plan (fillSlide).
 */
export class SlideMap {
  /** Cell c's intervals are lo, hi, occ[start[c] .. start[c + 1]), by ascending barrier index. */
  start: Int32Array;
  lo: Float64Array;
  hi: Float64Array;
  occ: Int32Array;
  /**
   * Each cell's plan: what its last full evaluation found (the low 4 bits, FULL … RUNS) and its record in
   * the pool (the rest; 0: none). A plan holds while the tube's lower end lies strictly between the cell's
   * two bounds (bounds[2c], bounds[2c + 1]), which keep every interval end of the cell on the same side of
   * both tube ends, with a margin (fillSlide).
   */
  word: Int32Array;
  bounds: Float64Array;
  /**
   * Records: [room, gu, gi] (room: the record's size; gu, gi: the product of the barriers hiding the whole
   * tube), then for ONE the barrier and the closed forms at its piece's lower and upper ends, for RUNS
   * their count and each run's closed form at its end (the last run ends at s2: unused) and shares. A
   * cell whose record outgrows its slot takes a new one at the top; past POOL_PER_CELL entries a cell the
   * pool is emptied and every plan starts again.
   */
  pool: Float64Array;
  top = 1;
  /**
   * The closed forms at the tube's lower (ends1) and upper (ends2) end per cell row, kept from step to
   * step while the ends stay on one lattice (endTables): entry j·endLen + p − i + nx − 1 + endLow is the one
   * at cell i of row j with the end p whole cells from where it lay when the table was started (endRef1,
   * endRef2), NaN until a step needs it. Each depends only on p − i: the cell's distance to the end.
   */
  ends1 = new Float64Array(0);
  ends2 = new Float64Array(0);
  endRef1 = NaN;
  endRef2 = NaN;
  endLen = 0;
  endLow = 0;
  /** Where the tube's ends lay at the last fill (endTables). */
  lastS1 = NaN;
  lastS2 = NaN;
  constructor(
    public key: string,
    public w1: number,
    public w2: number,
    cells: number,
    capacity: number,
  ) {
    this.start = new Int32Array(cells + 1);
    this.lo = new Float64Array(capacity);
    this.hi = new Float64Array(capacity);
    this.occ = new Int32Array(capacity);
    this.word = new Int32Array(cells);
    this.bounds = new Float64Array(2 * cells);
    // Room for a few runs a cell: growing it later means new memory, which costs its first touch again.
    this.pool = new Float64Array(8 * cells + 1024);
  }

  /** Whether a tube from s1 to s2 lies inside the window. */
  covers(s1: number, s2: number): boolean {
    return this.w1 <= s1 && s2 <= this.w2;
  }

  /** Bytes held by the typed arrays. */
  get bytes(): number {
    const arrays = [
      this.start,
      this.lo,
      this.hi,
      this.occ,
      this.word,
      this.bounds,
      this.pool,
      this.ends1,
      this.ends2,
    ];
    return arrays.reduce((sum, a) => sum + a.byteLength, 0);
  }

  /** The map emptied for another key and window (its memory kept); every cell is planned again. */
  reset(key: string, w1: number, w2: number): SlideMap {
    this.key = key;
    this.w1 = w1;
    this.w2 = w2;
    this.word.fill(FULL);
    this.top = 1;
    this.endRef1 = this.endRef2 = this.lastS1 = this.lastS2 = NaN;
    return this;
  }

  /**
   * Makes the end tables (ends1, ends2) ready for a tube from s1 to s2; false when the ends or the cell
   * are off the lattice (onLattice), and every closed form at an end is then worked out afresh. Tables
   * whose ends lie a fraction of a cell away are started again only when the tube has just slid by whole
   * cells: a free drag that lands on the lattice now and then does not pay for new tables each time.
   */
  endTables(s1: number, s2: number, nx: number, ny: number, cell: number): boolean {
    const last1 = this.lastS1;
    const last2 = this.lastS2;
    this.lastS1 = s1;
    this.lastS2 = s2;
    if (!(onLattice(s1) && onLattice(s2) && onLattice(cell))) return false;
    if (wholeSteps(this.endRef1, s1, cell) !== null && wholeSteps(this.endRef2, s2, cell) !== null)
      return true;
    if (!(onLattice(last1) && onLattice(last2))) return false;
    if (wholeSteps(last1, s1, cell) === null || wholeSteps(last2, s2, cell) === null) return false;
    // Room for an end anywhere in the window, on either side of where it lies now.
    this.endLow = Math.ceil((this.w2 - this.w1) / cell) + 1;
    this.endLen = nx + 2 * this.endLow + 1;
    const size = ny * this.endLen;
    if (this.ends1.length < size) {
      this.ends1 = new Float64Array(size);
      this.ends2 = new Float64Array(size);
    }
    this.ends1.fill(NaN);
    this.ends2.fill(NaN);
    this.endRef1 = s1;
    this.endRef2 = s2;
    return true;
  }

  /** A record of `size` entries for cell c (its old slot when that is large enough). */
  slot(c: number, size: number): number {
    const at = this.word[c]! >>> 4;
    if (at !== 0 && this.pool[at]! >= size) return at;
    if (this.top + size > POOL_PER_CELL * this.word.length) {
      this.word.fill(FULL);
      this.top = 1;
    }
    if (this.top + size > this.pool.length) {
      const pool = new Float64Array(Math.max(this.top + size, 2 * this.pool.length));
      pool.set(this.pool);
      this.pool = pool;
    }
    const p = this.top;
    this.top += size;
    this.pool[p] = size;
    return p;
  }
}

/** Binary places every length must fit in for a lattice (2⁻²⁴ cm), and the largest length (2²⁸ cm). */
const LATTICE = 2 ** 24;
const LATTICE_MAX = 2 ** 28;

/**
 * Whether v is a multiple of 2⁻²⁴ cm (whole centimetres, halves, quarters, 0.75 cm …) of moderate size.
 * The cells' centres (i + ½)·cell and every difference of two such lengths are then exact, so a cell's
 * distance to a tube end is the same double wherever the same real number: a tube slid by whole cells
 * finds, at each cell, the distance its neighbour that many cells back had before. Ends off the lattice (a
 * free drag's 0.37 cm, a tube length like 45.7 cm) round differently at each place.
 */
const onLattice = (v: number) => Number.isInteger(v * LATTICE) && Math.abs(v) < LATTICE_MAX;

/** How many whole cells from `from` to `to` (both on the lattice), exactly; null when not whole. */
function wholeSteps(from: number, to: number, cell: number): number | null {
  const k = Math.round((to - from) / cell);
  return to - from === k * cell ? k : null;
}

/** Most pool entries a cell (SlideMap.pool): room for every cell's plan and the slots left behind. */
const POOL_PER_CELL = 24;

/**
 * The intervals every barrier hides of the line y = lamp.y, seen from each cell, where they meet the
 * window (w1, w2): lo and hi exactly as evalSpan projects them (the lowest and highest corner of the
 * barrier clipped to the cell row's strip, by prepareRow's own straight lines). Built into `old`'s memory
 * when it has room (a drag that leaves the window), else into new memory sized by a first pass.
 */
export function buildSlideMap(
  ws: Workspace,
  old: SlideMap | null,
  key: string,
  lamp: LampGeom,
  occluders: Occluder[],
  w1: number,
  w2: number,
  nx: number,
  ny: number,
  cell: number,
): SlideMap {
  const row = ws.row;
  const s = ws.scratch;
  // prepareRow keeps the barriers whose interval can meet the window somewhere on the row.
  const win: LampGeom = { ...lamp, s1: w1, s2: w2 };
  const cells = nx * ny;
  // At most the cells inside each barrier's range (qa, qb), give or take one at each end.
  let most = 0;
  for (let j = 0; j < ny; j++) {
    if (!prepareRow(win, occluders, (j + 0.5) * cell, row, s)) continue;
    for (let c = 0; c < row.count; c++) {
      const i0 = Math.max(0, Math.floor(row.qa[c]! / cell - 1.5));
      const i1 = Math.min(nx - 1, Math.ceil(row.qb[c]! / cell + 0.5));
      if (i1 >= i0) most += i1 - i0 + 1;
    }
  }
  const map =
    old && old.word.length === cells && old.lo.length >= most
      ? old.reset(key, w1, w2)
      : new SlideMap(key, w1, w2, cells, most);
  const start = map.start;
  const mLo = map.lo;
  const mHi = map.hi;
  const mOcc = map.occ;
  let m = 0;
  for (let j = 0; j < ny; j++) {
    const base = j * nx;
    if (!prepareRow(win, occluders, (j + 0.5) * cell, row, s)) {
      for (let i = 0; i < nx; i++) start[base + i] = m;
      continue;
    }
    const n = row.count;
    const A = row.A;
    const B = row.B;
    for (let i = 0; i < nx; i++) {
      start[base + i] = m;
      const qx = (i + 0.5) * cell;
      for (let c = 0; c < n; c++) {
        if (qx <= row.qa[c]! || qx >= row.qb[c]!) continue;
        const v0 = row.vStart[c]!;
        const v1 = v0 + row.vCount[c]!;
        let lo = Infinity;
        let hi = -Infinity;
        for (let v = v0; v < v1; v++) {
          const x = A[v]! + B[v]! * qx;
          lo = Math.min(lo, x);
          hi = Math.max(hi, x);
        }
        if (!(lo < w2 && hi > w1)) continue;
        const k = row.occ[c]!;
        if (lo <= w1 && hi >= w2 && lamp.tUv[k] === 0 && lamp.tIr[k] === 0) {
          // An opaque barrier hides the whole window: the cell is dark wherever the tube lies in it, and
          // this interval alone says so (the others cannot change a product that is zero).
          m = start[base + i]!;
          mLo[m] = lo;
          mHi[m] = hi;
          mOcc[m] = k;
          m++;
          break;
        }
        mLo[m] = lo;
        mHi[m] = hi;
        mOcc[m] = k;
        m++;
      }
    }
  }
  start[cells] = m;
  return map;
}

/** Scratch of a slide fill: a row's RowData index by barrier, and a cell's whole-hiding barriers left for later. */
export class SlideScratch {
  rowIndex = new Int32Array(0);
  later = new Int32Array(0);
  /** Closed forms the last fill took from the end tables (a count for tests; it never affects a value). */
  reused = 0;
  ensure(n: number) {
    if (this.rowIndex.length >= n) return;
    this.rowIndex = new Int32Array(n).fill(-1);
    this.later = new Int32Array(n);
  }
}

/** A cell's plan (SlideMap.word): evaluate it in full, or which arithmetic its kept outcome takes. */
const FULL = 0;
const HIDDEN = 1;
const OPEN = 2;
/** One partly hiding piece: + 1 when its lower end lies inside the tube, + 2 when its upper end does. */
const ONE = 4;
const RUNS = 8;

/** Whether a transmission is one a product can take in any order with the same bits (times 0 or 1 is exact). */
const trivial = (t: number) => t === 0 || t === 1;

/**
 * How far inside its exact bounds a plan's s1 must lie (relative to the magnitudes): the bounds for s2 are
 * carried over to s1 by the tube's length, and s2 − s1 differs from it by rounding only, far below this.
 */
const PLAN_MARGIN = 1e-9;

/**
 * Fill a tube's new-lamp UVB and radiant fields from its kept intervals (the map covers its ends), as
 * fillLamp would fill them, marking in `dirty` the cells whose stored values change. Returns the number of
 * cells evaluated.
 *
 * A cell's arithmetic depends on the tube's ends only through the side of s1 and of s2 each interval end
 * lies on (which barriers hide all of the tube, which part of it, which ends are inner and so in which
 * order they come) and through the closed forms at s1 and s2; the closed forms at the inner ends do not
 * move with the tube. So after evaluating a cell in full, its plan keeps the outcome — wholly hidden, open,
 * one piece, or runs — with the product of the barriers hiding the whole tube, the closed forms at the inner
 * ends and the range of s1 over which no interval end changes side. While the tube stays in that range, the
 * plan gives the cell's bits with the closed forms at s1 and s2 alone. The product is kept only when its
 * order cannot matter (at most two factors other than 0 and 1 in each band): the row sweep multiplies the
 * barriers it finds hiding the whole tube first, and which those are depends on the ends.
 */
export function fillSlide(
  ws: Workspace,
  ss: SlideScratch,
  map: SlideMap,
  lamp: LampGeom,
  occluders: Occluder[],
  uv: Float32Array,
  ir: Float32Array,
  nx: number,
  ny: number,
  cell: number,
  dirty: Uint8Array,
): number {
  const row = ws.row;
  const s = ws.scratch;
  ss.ensure(occluders.length);
  let looked = 0;
  let fresh = 0;
  const rowIndex = ss.rowIndex;
  const s1 = lamp.s1;
  const s2 = lamp.s2;
  const uvI = lamp.uvI;
  const irI = lamp.irI;
  const tUv = lamp.tUv;
  const tIr = lamp.tIr;
  const word = map.word;
  const bounds = map.bounds;
  // A slide by whole cells finds most closed forms at the ends where an earlier step left them.
  const tables = map.endTables(s1, s2, nx, ny, cell);
  const ends1 = map.ends1;
  const ends2 = map.ends2;
  const p1 = tables ? wholeSteps(map.endRef1, s1, cell)! + nx - 1 + map.endLow : 0;
  const p2 = tables ? wholeSteps(map.endRef2, s2, cell)! + nx - 1 + map.endLow : 0;
  let evaluated = 0;
  for (let j = 0; j < ny; j++) {
    const base = j * nx;
    if (!prepareRow(lamp, occluders, (j + 0.5) * cell, row, s)) {
      for (let c = base; c < base + nx; c++) {
        const was = uv[c]!;
        const wasIr = ir[c]!;
        uv[c] = 0;
        ir[c] = 0;
        if (uv[c] !== was || ir[c] !== wasIr) dirty[c] = 1;
      }
      continue;
    }
    evaluated += nx;
    const n0 = row.count;
    for (let c = 0; c < n0; c++) rowIndex[row.occ[c]!] = c;
    const d = row.d;
    const scale = row.scale;
    const o1 = j * map.endLen + p1;
    const o2 = j * map.endLen + p2;
    for (let i = 0; i < nx; i++) {
      const ci = base + i;
      const qx = (i + 0.5) * cell;
      let u = 0;
      let r = 0;
      const w = word[ci]!;
      const plan = w & 15;
      if (plan !== FULL && bounds[2 * ci]! < s1 && s1 < bounds[2 * ci + 1]!) {
        // The plan holds: the outcome of the last full evaluation, with this step's closed forms.
        if (plan !== HIDDEN) {
          const pool = map.pool;
          const p = w >>> 4;
          let g1: number;
          let g2: number;
          if (tables) {
            looked += 2;
            g1 = ends1[o1 - i]!;
            if (g1 !== g1) {
              g1 = ends1[o1 - i] = G(s1 - qx, d);
              fresh++;
            }
            g2 = ends2[o2 - i]!;
            if (g2 !== g2) {
              g2 = ends2[o2 - i] = G(s2 - qx, d);
              fresh++;
            }
          } else {
            g1 = G(s1 - qx, d);
            g2 = G(s2 - qx, d);
          }
          if (plan === OPEN) {
            const f = (g2 - g1) * scale;
            u = uvI * f * pool[p + 1]!;
            r = irI * f * pool[p + 2]!;
          } else {
            if (plan === RUNS) sumRuns(pool, p + 4, pool[p + 3]!, g1, g2);
            else onePiece(plan & 3, pool[p + 4]!, pool[p + 5]!, pool[p + 3]!, g1, g2, tUv, tIr);
            u = uvI * sumOut.u * scale * pool[p + 1]!;
            r = irI * sumOut.i * scale * pool[p + 2]!;
          }
        }
      } else {
        // No plan, or it no longer holds: evaluate the cell in full and plan it again.
        planCell(ws, ss, map, lamp, ci, qx);
        u = sumOut.u;
        r = sumOut.i;
      }
      const was = uv[ci]!;
      const wasIr = ir[ci]!;
      uv[ci] = u;
      ir[ci] = r;
      if (uv[ci] !== was || ir[ci] !== wasIr) dirty[ci] = 1;
    }
    for (let c = 0; c < n0; c++) rowIndex[row.occ[c]!] = -1;
  }
  ss.reused = looked - fresh;
  return evaluated;
}

/**
 * Cell ci (at Q.x = qx) of the row prepared in ws.row, its barriers' row indices in ss.rowIndex, evaluated
 * in full from its kept intervals and planned again (fillSlide); its UVB and infrared are left in sumOut.
 */
function planCell(
  ws: Workspace,
  ss: SlideScratch,
  map: SlideMap,
  lamp: LampGeom,
  ci: number,
  qx: number,
): void {
  const row = ws.row;
  const s = ws.scratch;
  const { s1, s2, uvI, irI, tUv, tIr } = lamp;
  const { qa, qb, fa, fb, d, scale } = row;
  const { rowIndex, later } = ss;
  const sLo = s.lo;
  const sHi = s.hi;
  const pk = s.pk;
  const { start, lo: mLo, hi: mHi, occ: mOcc, word, bounds } = map;
  const len = s2 - s1;
  let u = 0;
  let r = 0;
  let gu = 1;
  let gi = 1;
  let nl = 0;
  let n = 0;
  // The open gaps between this cell's interval ends around s1 and s2 (NaN: an end lies on one).
  let a1 = -Infinity;
  let b1 = Infinity;
  let a2 = -Infinity;
  let b2 = Infinity;
  let oddU = 0;
  let oddI = 0;
  for (let t = start[ci]!, t1 = start[ci + 1]!; t < t1; t++) {
    const k = mOcc[t]!;
    const el = mLo[t]!;
    const eh = mHi[t]!;
    a1 = below(below(a1, el, s1), eh, s1);
    b1 = above(above(b1, el, s1), eh, s1);
    a2 = below(below(a2, el, s2), eh, s2);
    b2 = above(above(b2, el, s2), eh, s2);
    const c = rowIndex[k]!;
    // Not in the row's list: it meets the tube nowhere on this row.
    if (c < 0) continue;
    let lo = el;
    let hi = eh;
    if (lo < s1) lo = s1;
    if (hi > s2) hi = s2;
    if (!(hi > lo)) continue;
    const inner = (lo > s1 ? 1 : 0) | (hi < s2 ? 2 : 0);
    if (inner !== 0) {
      sLo[n] = lo;
      sHi[n] = hi;
      pk[n] = 4 * c + inner;
      n++;
      continue;
    }
    if (!trivial(tUv[k]!)) oddU++;
    if (!trivial(tIr[k]!)) oddI++;
    if (qx > qa[c]! && qx < qb[c]! && qx > fa[c]! && qx < fb[c]!) {
      // The row sweep multiplies this one in before evalSpan sees the cell.
      gu *= tUv[k]!;
      gi *= tIr[k]!;
    } else later[nl++] = k;
  }
  for (let a = 0; a < nl; a++) {
    gu *= tUv[later[a]!]!;
    gi *= tIr[later[a]!]!;
  }
  let next: number;
  let p = word[ci]! >>> 4;
  if (gu === 0 && gi === 0) {
    // evalSpan and the row sweep write zero once the product is zero.
    next = HIDDEN;
  } else if (n === 0) {
    const f = (G(s2 - qx, d) - G(s1 - qx, d)) * scale;
    u = uvI * f * gu;
    r = irI * f * gi;
    next = OPEN;
    p = map.slot(ci, 3);
  } else if (n === 1) {
    const inner = pk[0]! & 3;
    const ga = (inner & 1) !== 0 ? G(sLo[0]! - qx, d) : 0;
    const gb = (inner & 2) !== 0 ? G(sHi[0]! - qx, d) : 0;
    const k = row.occ[pk[0]! >> 2]!;
    onePiece(inner, ga, gb, k, G(s1 - qx, d), G(s2 - qx, d), tUv, tIr);
    u = uvI * sumOut.u * scale * gu;
    r = irI * sumOut.i * scale * gi;
    next = ONE + inner;
    p = map.slot(ci, 6);
    map.pool[p + 3] = k;
    map.pool[p + 4] = ga;
    map.pool[p + 5] = gb;
  } else {
    const nr = makeRuns(s, n, s1, s2, row.occ, tUv, tIr);
    p = map.slot(ci, 4 + 3 * nr);
    keepRuns(map.pool, p, nr, s, qx, d);
    sumRuns(map.pool, p + 4, nr, G(s1 - qx, d), G(s2 - qx, d));
    u = uvI * sumOut.u * scale * gu;
    r = irI * sumOut.i * scale * gi;
    next = RUNS;
  }
  if (next !== HIDDEN) {
    map.pool[p + 1] = gu;
    map.pool[p + 2] = gi;
  }
  // Both ends' bounds as bounds of s1 (s2 − s1 is the length up to rounding), inside by the margin.
  const lo1 = Math.max(a1, a2 - len);
  const hi1 = Math.min(b1, b2 - len);
  const m = PLAN_MARGIN * (1 + Math.abs(s1) + Math.abs(s2));
  bounds[2 * ci] = lo1 + m;
  bounds[2 * ci + 1] = hi1 - m;
  word[ci] = (oddU > 2 || oddI > 2 ? FULL : next) | (p << 4);
  sumOut.u = u;
  sumOut.i = r;
}

/** The highest of a and an interval end e below s (NaN once an end lies on s: no open gap holds it). */
const below = (a: number, e: number, s: number) => (e < s ? Math.max(a, e) : e > s ? a : NaN);
/** The lowest of b and an interval end e above s. */
const above = (b: number, e: number, s: number) => (e > s ? Math.min(b, e) : b);

/** What onePiece and sumRuns leave: the UVB and infrared sums before the scale and the whole-tube product. */
const sumOut = { u: 0, i: 0 };

/**
 * evalSpan's arithmetic for one partly hiding piece of barrier k whose lower (inner & 1) or upper (inner &
 * 2) end lies inside the tube, with the closed forms ga and gb at those ends.
 */
function onePiece(
  inner: number,
  ga: number,
  gb: number,
  k: number,
  g1: number,
  g2: number,
  tUv: Float64Array,
  tIr: Float64Array,
): void {
  const tU = tUv[k]!;
  const tI = tIr[k]!;
  let open: number;
  let hidden = 0;
  if (tU === 0 && tI === 0 && inner !== 3) {
    // An opaque piece at one end of the tube: only the open part counts.
    open = inner === 1 ? ga - g1 + 0 : 0 + (g2 - gb);
  } else {
    const gLo = (inner & 1) !== 0 ? ga : g1;
    const gHi = (inner & 2) !== 0 ? gb : g2;
    open = gLo - g1 + (g2 - gHi);
    hidden = gHi - gLo;
  }
  sumOut.u = open + tU * hidden;
  sumOut.i = open + tI * hidden;
}

/**
 * Keeps nr runs (Scratch.rRef, rU, rI; the pieces' inner ends in Scratch.lo, hi) in the record at p: their
 * count, then each run's closed form at its end and its shares.
 */
function keepRuns(pool: Float64Array, p: number, nr: number, s: Scratch, qx: number, d: number): void {
  pool[p + 3] = nr;
  for (let a = 0; a < nr; a++) {
    const r = s.rRef[a]!;
    const e = p + 4 + 3 * a;
    pool[e] = r < 0 ? 0 : G(((r & 1) === 0 ? s.lo[r >> 1]! : s.hi[r >> 1]!) - qx, d);
    pool[e + 1] = s.rU[a]!;
    pool[e + 2] = s.rI[a]!;
  }
}

/**
 * evalSpan's run sum over nr runs kept from p on (keepRuns): the closed form at each run's end is the
 * kept one (the last run's end, s2, is this step's), and a run that passes anything adds its share of the
 * difference between the closed forms at its ends (evalSpan takes the one at a run's start from the run
 * before when it evaluated it there: the same value).
 */
function sumRuns(pool: Float64Array, p: number, nr: number, g1: number, g2: number): void {
  const last = p + 3 * (nr - 1);
  let sumU = 0;
  let sumI = 0;
  for (let e = p; e <= last; e += 3) {
    const pu = pool[e + 1]!;
    const pi = pool[e + 2]!;
    if (pu !== 0 || pi !== 0) {
      const ga = e === p ? g1 : pool[e - 3]!;
      const gb = e === last ? g2 : pool[e]!;
      sumU += pu * (gb - ga);
      sumI += pi * (gb - ga);
    }
  }
  sumOut.u = sumU;
  sumOut.i = sumI;
}
