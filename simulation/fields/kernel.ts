/**
 * The inner loop: one lamp's UVB and radiant irradiance at a receiver, with exact shadows.
 *
 * Seen from a receiver Q below the lamp line (y = y_L), a convex occluder hides one interval of that line:
 * its central projection from Q. A point P of the occluder projects to x = Q.x + (P.x − Q.x)·k with
 * k = h / (P.y − Q.y), h = y_L − Q.y. Only the part of the occluder inside the strip Q.y < y ≤ y_L can
 * block, so each occluder is clipped to that strip once per grid row; then, along the row, every
 * projected vertex is a linear function of Q.x: x = A + B·Q.x with A = P.x·k and B = 1 − k ≤ 0. The hidden
 * interval is [min, max] over the clipped vertices. For each occluder we also know, per row, the range
 * (qa, qb) of Q.x where its interval meets the lamp at all, so most cells skip most occluders.
 *
 * A tube is then integrated in closed form over its visible pieces (sources/tube.ts), each piece weighted
 * by the product of the transmissions of the barriers hiding it; a bulb is visible or not (times the
 * transmissions of the barriers in front of it) and inside its beam or not.
 *
 * Depth: a lamp may hang dz in front of or behind the section plane. Barriers span the whole depth, so a
 * ray is blocked exactly when its projection onto the section is, and the shadow intervals above hold
 * unchanged. Only the distances change: a bulb is r² = h² + dx² + dz² away, and a tube (parallel to the
 * plane) is a line at perpendicular distance d = √(h² + dz²), seen by the upward-facing receiver at the
 * cosine h/d (sources/tube.ts, tubePieceOffset).
 */
import type { Occluder } from '../geometry/occluders';
import { clipToStrip } from '../geometry/clip';
import { tubeG as G } from '../sources/tube';
import type { LampGeom } from './scene';

/** Occluder parts closer than this above the receiver are ignored (a receiver lying on a surface). */
const EPS_Y = 1e-6;
const MAX_CLIPPED = 12;
/**
 * Relative gap between neighbouring interval ends above which a tube's runs may be kept from one cell to
 * the next (evalSpan): far above rounding, so a piece's midpoint lies strictly inside it.
 */
const GAP = 1e-9;

/** Per-row precomputation for one lamp; reused across rows (no allocation once sized). */
export class RowData {
  h = 0;
  /** h² + dz²: the squared distance to the lamp line (a bulb: to the lamp, without dx). */
  d2 = 0;
  /** √d2, the perpendicular distance from the receiver to a tube's axis. */
  d = 0;
  /** A tube's closed-form factor: cosine h/d over 2d (1/(2h) in the plane). */
  scale = 0;
  /** A bulb's beam reaches |dx| ≤ half on this row; negative when it misses the section plane here. */
  half = 0;
  count = 0;
  /**
   * The barriers evalCell looks at (indices into the row's lists): all of them after prepareRow; a caller
   * sweeping a row in order narrows it to those whose range can contain the next cells.
   */
  act: Int32Array;
  nAct = 0;
  /**
   * Transmissions of barriers the caller already found to hide the whole lamp at the next cells (and left
   * out of act); 1 after prepareRow.
   */
  gu0 = 1;
  gi0 = 1;
  /**
   * The caller found every cell it asks for inside each act barrier's (qa, qb) and outside its (fa, fb)
   * (a row sweep's pieces), so evalSpan skips both tests; false after prepareRow.
   */
  inRange = false;
  occ: Int32Array;
  qa: Float64Array;
  qb: Float64Array;
  /**
   * Inside (fa, fb) the barrier surely hides the whole lamp (a tube: lo ≤ s1 and hi ≥ s2; a bulb: lo < x <
   * hi), with a margin inwards, so evalCell multiplies its transmissions without projecting its corners.
   * Empty (fa ≥ fb) when there is no such range.
   */
  fa: Float64Array;
  fb: Float64Array;
  vStart: Int32Array;
  vCount: Int32Array;
  A: Float64Array;
  B: Float64Array;
  /**
   * With inRange: the one corner whose projection is lowest (lv) and highest (hv) at every cell the caller
   * asks for, by a clear margin (pickCorners), or −1 when no corner is (then all are projected).
   */
  lv: Int32Array;
  hv: Int32Array;
  constructor(capacity: number) {
    const c = Math.max(1, capacity);
    this.act = new Int32Array(c);
    this.occ = new Int32Array(c);
    this.qa = new Float64Array(c);
    this.qb = new Float64Array(c);
    this.fa = new Float64Array(c);
    this.fb = new Float64Array(c);
    this.vStart = new Int32Array(c);
    this.vCount = new Int32Array(c);
    this.lv = new Int32Array(c);
    this.hv = new Int32Array(c);
    this.A = new Float64Array(c * MAX_CLIPPED);
    this.B = new Float64Array(c * MAX_CLIPPED);
  }
}

/** Scratch space for evaluation (no allocation in the inner loop). */
export class Scratch {
  cx = new Float64Array(MAX_CLIPPED);
  cy = new Float64Array(MAX_CLIPPED);
  tx = new Float64Array(MAX_CLIPPED);
  ty = new Float64Array(MAX_CLIPPED);
  lo: Float64Array;
  hi: Float64Array;
  /**
   * Each of a cell's partly hidden pieces: 4 × the row's barrier (RowData index) that hid it, plus 1 when its
   * lower end lies inside the tube and 2 when its upper end does.
   */
  pk: Int32Array;
  /**
   * A tube's visible runs (evalSpan): the interval end each run ends at (2·piece for a piece's lower
   * end, 2·piece + 1 for its upper end, −1 for the tube's end s2) and the shares of UVB and infrared it
   * passes. They describe the order of the ends, not their positions, so the next cell can use them again
   * while that order holds (kept for: each piece's key `kKey`, as pk, and the sorted inner ends `ord`).
   */
  rRef: Int32Array;
  rU: Float64Array;
  rI: Float64Array;
  ord: Int32Array;
  kKey: Int32Array;
  /** Output of evalCell. */
  uv = 0;
  ir = 0;
  /** evalCell's one-cell span. */
  oneUv = new Float64Array(1);
  oneIr = new Float64Array(1);
  constructor(capacity: number) {
    const c = Math.max(1, capacity);
    this.lo = new Float64Array(c);
    this.hi = new Float64Array(c);
    this.pk = new Int32Array(c);
    this.rRef = new Int32Array(2 * c + 2);
    this.rU = new Float64Array(2 * c + 2);
    this.rI = new Float64Array(2 * c + 2);
    this.ord = new Int32Array(2 * c + 2);
    this.kKey = new Int32Array(c);
  }
}

/** Sorts the first m entries in place, ascending (insertion sort: a few dozen at most, no allocation). */
export function sortPrefix(xs: Float64Array | Int32Array, m: number): void {
  for (let a = 1; a < m; a++) {
    const v = xs[a]!;
    let b = a - 1;
    while (b >= 0 && xs[b]! > v) {
      xs[b + 1] = xs[b]!;
      b--;
    }
    xs[b + 1] = v;
  }
}

/** Prepare row data for receivers at height qy; returns false when the lamp cannot light this row. */
export function prepareRow(
  lamp: LampGeom,
  occluders: readonly Occluder[],
  qy: number,
  row: RowData,
  s: Scratch,
  only?: ReadonlySet<number>,
): boolean {
  const h = lamp.y - qy;
  row.h = h;
  row.count = 0;
  row.nAct = 0;
  row.gu0 = 1;
  row.gi0 = 1;
  row.inRange = false;
  if (!(h > 0)) return false;
  // In the plane (dz = 0) these are exactly the two-dimensional values, so such designs keep their bits.
  const dz2 = lamp.dz2;
  row.d2 = h * h + dz2;
  row.d = dz2 === 0 ? h : Math.sqrt(row.d2);
  row.scale = dz2 === 0 ? 1 / (2 * h) : h / (2 * row.d2);
  const reach = h * lamp.beamTan;
  row.half = dz2 === 0 ? reach : reach >= Math.abs(lamp.dz) ? Math.sqrt(reach * reach - dz2) : -1;
  const ylo = qy + EPS_Y;
  const yhi = lamp.y;
  const s1 = lamp.s1;
  const s2 = lamp.s2;
  let vOff = 0;
  for (let k = 0; k < occluders.length; k++) {
    if (only && !only.has(k)) continue;
    const o = occluders[k]!;
    if (o.ymax < ylo || o.ymin > yhi) continue;
    if (lamp.tUv[k] === 1 && lamp.tIr[k] === 1) continue;
    const n = clipToStrip(o.xs, o.ys, ylo, yhi, s.cx, s.cy, s.tx, s.ty);
    if (n === 0) continue;
    let qa = Infinity;
    let qb = -Infinity;
    // The whole lamp is hidden where lo ≤ s1 (Q.x ≥ min over corners of (s1 − a)/b) and hi ≥ s2
    // (Q.x ≤ max of (s2 − a)/b); for a bulb (s1 = s2) these are the strict bounds of qa and qb's range.
    let fa = Infinity;
    let fb = -Infinity;
    const c = row.count;
    for (let v = 0; v < n; v++) {
      const kk = h / (s.cy[v]! - qy);
      const a = s.cx[v]! * kk;
      const b = 1 - kk;
      row.A[vOff + v] = a;
      row.B[vOff + v] = b;
      // The interval reaches past s1 for Q.x < (s1 − a)/b and starts before s2 for Q.x > (s2 − a)/b (b < 0).
      if (b < -1e-15) {
        const ub = (s1 - a) / b;
        const la = (s2 - a) / b;
        if (ub > qb) qb = ub;
        if (la < qa) qa = la;
        if (ub < fa) fa = ub;
        if (la > fb) fb = la;
      } else {
        // Vertex on the lamp line: it projects onto itself wherever Q is.
        if (a >= s1) qb = Infinity;
        if (a <= s2) qa = -Infinity;
        // Strict, so a bulb's strict test agrees (equality is left to the exact test).
        if (a < s1) fa = -Infinity;
        if (a > s2) fb = Infinity;
      }
    }
    if (!(qb >= qa)) continue;
    // A small margin keeps the skip test conservative against rounding.
    const margin = 1e-9 * (1 + Math.abs(qa) + Math.abs(qb));
    row.occ[c] = k;
    row.qa[c] = qa - margin;
    row.qb[c] = qb + margin;
    // Rounding of the exact test in evalCell is far below this margin, so inside it agrees.
    const fMargin = 1e-9 * (1 + (fa > -Infinity ? Math.abs(fa) : 0) + (fb < Infinity ? Math.abs(fb) : 0));
    row.fa[c] = fa + fMargin;
    row.fb[c] = fb - fMargin;
    row.vStart[c] = vOff;
    row.vCount[c] = n;
    row.act[c] = c;
    row.count = c + 1;
    vOff += n;
  }
  row.nAct = row.count;
  return true;
}

/**
 * Evaluate a lamp at receiver x = qx on a prepared row. Writes s.uv (same unit as uvbAt30, new lamp)
 * and s.ir (W/m²).
 */
export function evalCell(lamp: LampGeom, row: RowData, qx: number, s: Scratch): void {
  // One cell of evalSpan at (0 + 1)·qx, which is qx exactly.
  evalSpan(lamp, row, 0, 1, qx, 1, s.oneUv, s.oneIr, s);
  s.uv = s.oneUv[0]!;
  s.ir = s.oneIr[0]!;
}

/**
 * Evaluate a lamp at the receivers x = (i + off)·cell, i = from..to−1, of a prepared row into uv[i] and
 * ir[i] (same units as evalCell). The loop over cells is inside, so what the row and lamp give is read
 * once per span rather than once per cell.
 */
export function evalSpan(
  lamp: LampGeom,
  row: RowData,
  from: number,
  to: number,
  cell: number,
  off: number,
  uv: Float64Array,
  ir: Float64Array,
  s: Scratch,
): void {
  const h = row.h;
  if (!(h > 0)) {
    uv.fill(0, from, to);
    ir.fill(0, from, to);
    return;
  }
  const tube = lamp.tube;
  const s1 = lamp.s1;
  const s2 = lamp.s2;
  const lx = lamp.x;
  const half = row.half;
  const irOut = lamp.irOut;
  const uvI = lamp.uvI;
  const irI = lamp.irI;
  const d2 = row.d2;
  // The line's own distance d replaces h in the antiderivative; the cosine h/d is in the scale.
  const d = row.d;
  const scale = row.scale;
  const gu0 = row.gu0;
  const gi0 = row.gi0;
  const inRange = row.inRange;
  const nAct = row.nAct;
  const A = row.A;
  const B = row.B;
  const act = row.act;
  const qa = row.qa;
  const qb = row.qb;
  const fa = row.fa;
  const fb = row.fb;
  const occ = row.occ;
  const vStart = row.vStart;
  const vCount = row.vCount;
  const lv = row.lv;
  const hv = row.hv;
  const tUv = lamp.tUv;
  const tIr = lamp.tIr;
  const sLo = s.lo;
  const sHi = s.hi;
  const pk = s.pk;
  const rRef = s.rRef;
  const rU = s.rU;
  const rI = s.rI;
  const ord = s.ord;
  const kKey = s.kKey;
  // The runs in rRef, rU, rI were made for kN pieces with kM inner ends in ord (kN < 0: none kept).
  let kN = -1;
  let kM = 0;
  let nr = 0;
  cells: for (let i = from; i < to; i++) {
    const qx = (i + off) * cell;
    uv[i] = 0;
    ir[i] = 0;
    let inBeam = true;
    if (!tube) {
      inBeam = Math.abs(qx - lx) <= half;
      // Outside a bulb's beam only the spread part of its heat arrives.
      if (!inBeam && irOut === 0) continue;
    }
    let gu = gu0;
    let gi = gi0;
    let n = 0;
    for (let t = 0; t < nAct; t++) {
      const c = act[t]!;
      const k = occ[c]!;
      if (!inRange) {
        if (qx <= qa[c]! || qx >= qb[c]!) continue;
        if (qx > fa[c]! && qx < fb[c]!) {
          gu *= tUv[k]!;
          gi *= tIr[k]!;
          if (gu === 0 && gi === 0) continue cells;
          continue;
        }
      }
      let lo = Infinity;
      let hi = -Infinity;
      const vl = inRange ? lv[c]! : -1;
      const vh = inRange ? hv[c]! : -1;
      if (vl >= 0 && vh >= 0) {
        // Every other corner projects clearly above (below) these ones here: the same min and max.
        lo = A[vl]! + B[vl]! * qx;
        hi = A[vh]! + B[vh]! * qx;
      } else {
        const v0 = vStart[c]!;
        const v1 = v0 + vCount[c]!;
        // Math.min and max compile without branches: which corner is lowest changes along the row.
        for (let v = v0; v < v1; v++) {
          const x = A[v]! + B[v]! * qx;
          lo = Math.min(lo, x);
          hi = Math.max(hi, x);
        }
      }
      if (!tube) {
        if (lo < s1 && s1 < hi) {
          gu *= tUv[k]!;
          gi *= tIr[k]!;
        }
      } else {
        if (lo < s1) lo = s1;
        if (hi > s2) hi = s2;
        if (!(hi > lo)) continue;
        const inner = (lo > s1 ? 1 : 0) | (hi < s2 ? 2 : 0);
        if (inner === 0) {
          gu *= tUv[k]!;
          gi *= tIr[k]!;
        } else {
          sLo[n] = lo;
          sHi[n] = hi;
          pk[n] = 4 * c + inner;
          n++;
        }
      }
      if (gu === 0 && gi === 0) continue cells;
    }
    if (!tube) {
      const dx = qx - lx;
      const r2 = d2 + dx * dx;
      const f = h / (r2 * Math.sqrt(r2));
      uv[i] = inBeam ? uvI * f * gu : 0;
      ir[i] = (inBeam ? irI : irOut) * f * gi;
      continue;
    }
    if (n === 0) {
      const f = (G(s2 - qx, d) - G(s1 - qx, d)) * scale;
      uv[i] = uvI * f * gu;
      ir[i] = irI * f * gi;
      continue;
    }
    if (n === 1) {
      // The most common partial shadow: one hidden piece [lo, hi] inside [s1, s2], whose ends may be the
      // tube's own (then their G is the tube end's).
      const lo = sLo[0]!;
      const hi = sHi[0]!;
      const g1 = G(s1 - qx, d);
      const g2 = G(s2 - qx, d);
      const gLo = lo > s1 ? G(lo - qx, d) : g1;
      const gHi = hi < s2 ? G(hi - qx, d) : g2;
      const open = gLo - g1 + (g2 - gHi);
      const hidden = gHi - gLo;
      const k = occ[pk[0]! >> 2]!;
      uv[i] = uvI * (open + tUv[k]! * hidden) * scale * gu;
      ir[i] = irI * (open + tIr[k]! * hidden) * scale * gi;
      continue;
    }
    // Sweep the visible pieces between the tube ends and the interval ends. Every interval lies within
    // [s1, s2] (clipped above), so only its inner ends are breakpoints and only those need sorting (a
    // penumbra usually reaches past one end of the tube). Neighbouring pieces passing the same share are
    // merged into runs, and G is evaluated only at the ends of runs that pass anything: behind overlapping
    // opaque barriers most breakpoints need no closed form at all.
    //
    // From one cell to the next the same barriers usually hide the same ends in the same order, and then
    // the runs are the same: they are kept and used again while the pieces come from the same barriers,
    // the same ends lie inside the tube and the inner ends keep their order with clear gaps (GAP: every
    // piece's midpoint then lies strictly inside it, so which intervals cover it follows from the order
    // alone, and the runs are exactly those the sweep below would make). Only positions are new per cell.
    let same = n === kN;
    for (let c = 0; same && c < n; c++) if (pk[c] !== kKey[c]) same = false;
    if (same) {
      let x0 = s1;
      for (let a = 0; a < kM; a++) {
        const r = ord[a]!;
        const x1 = (r & 1) === 0 ? sLo[r >> 1]! : sHi[r >> 1]!;
        if (!(x1 - x0 > GAP * (1 + Math.abs(x1)))) {
          same = false;
          break;
        }
        x0 = x1;
      }
      if (same && !(s2 - x0 > GAP * (1 + Math.abs(s2)))) same = false;
    }
    if (!same) {
      let m = 0;
      for (let c = 0; c < n; c++) {
        const key = pk[c]!;
        if ((key & 1) !== 0) ord[m++] = 2 * c;
        if ((key & 2) !== 0) ord[m++] = 2 * c + 1;
        kKey[c] = key;
      }
      // Insertion sort of the ends by position (two to eight as a rule).
      for (let a = 1; a < m; a++) {
        const r = ord[a]!;
        const v = (r & 1) === 0 ? sLo[r >> 1]! : sHi[r >> 1]!;
        let b = a - 1;
        while (b >= 0) {
          const q = ord[b]!;
          if (!(((q & 1) === 0 ? sLo[q >> 1]! : sHi[q >> 1]!) > v)) break;
          ord[b + 1] = q;
          b--;
        }
        ord[b + 1] = r;
      }
      nr = 0;
      let clear = true;
      let x0 = s1;
      for (let a = 0; a <= m; a++) {
        const r = a < m ? ord[a]! : -1;
        const x1 = r < 0 ? s2 : (r & 1) === 0 ? sLo[r >> 1]! : sHi[r >> 1]!;
        if (!(x1 - x0 > GAP * (1 + Math.abs(x1)))) clear = false;
        if (!(x1 > x0)) continue;
        const mid = 0.5 * (x0 + x1);
        let pu = 1;
        let pi = 1;
        for (let c = 0; c < n; c++) {
          if (sLo[c]! <= mid && mid <= sHi[c]!) {
            const k = occ[pk[c]! >> 2]!;
            pu *= tUv[k]!;
            pi *= tIr[k]!;
          }
        }
        if (nr > 0 && rU[nr - 1] === pu && rI[nr - 1] === pi) {
          rRef[nr - 1] = r;
        } else {
          rRef[nr] = r;
          rU[nr] = pu;
          rI[nr] = pi;
          nr++;
        }
        x0 = x1;
      }
      kN = clear ? n : -1;
      kM = m;
    }
    let sumU = 0;
    let sumI = 0;
    // A run starts where the one before it ends (the first at s1); G at the last end evaluated, if any.
    let x0 = s1;
    let gAt = NaN;
    let g0 = 0;
    for (let a = 0; a < nr; a++) {
      const r = rRef[a]!;
      const x1 = r < 0 ? s2 : (r & 1) === 0 ? sLo[r >> 1]! : sHi[r >> 1]!;
      const pu = rU[a]!;
      const pi = rI[a]!;
      if (pu !== 0 || pi !== 0) {
        const ga = x0 === gAt ? g0 : G(x0 - qx, d);
        const gb = G(x1 - qx, d);
        sumU += pu * (gb - ga);
        sumI += pi * (gb - ga);
        gAt = x1;
        g0 = gb;
      }
      x0 = x1;
    }
    uv[i] = uvI * sumU * scale * gu;
    ir[i] = irI * sumI * scale * gi;
  }
}
