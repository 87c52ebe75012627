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
 * Along a row sweep's piece, where a tube is partly hidden, which corner of each barrier projects lowest and
 * highest, on which side of the tube's ends those lie and in which order the inner ends come change only
 * where two of these straight lines cross; stretchEnd finds how far a cell's structure surely holds, and the
 * cells of that stretch take only their closed forms (oneStretch, runsStretch), with the bits of each cell
 * evaluated alone.
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
  /**
   * A stretch's lowest and highest corner of each barrier (stretchEnd; by RowData index), and its runs'
   * ends as corners (runsStretch).
   */
  sLv: Int32Array;
  sHv: Int32Array;
  /** The last cell of the row up to which a barrier's sLv, sHv and their sides hold (−1: not known). */
  sUntil: Int32Array;
  rV: Int32Array;
  /** Cells evaluated in stretches so far (a count for tests; it never affects a value). */
  stretched = 0;
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
    this.sLv = new Int32Array(c);
    this.sHv = new Int32Array(c);
    this.sUntil = new Int32Array(c);
    this.rV = new Int32Array(2 * c + 2);
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
  // What stretches found on the last row (stretchEnd) says nothing about this one.
  s.sUntil.fill(-1);
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
  // A tube in a row sweep's piece: every projected end is a straight line along a stretch where the same
  // corner stays lowest (highest), so a cell's structure (which barriers hide which ends, in which order)
  // holds over stretches that stretchEnd finds, and those take a lighter loop.
  // (Q.x > 0 keeps a stretch's margins linear in Q.x: stretchEnd.)
  const stretchy = tube && inRange && to - from > 1 && (from + off) * cell > 0;
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
      const k = occ[pk[0]! >> 2]!;
      const tU = tUv[k]!;
      const tI = tIr[k]!;
      let open: number;
      let hidden = 0;
      if (tU === 0 && tI === 0 && (lo === s1 || hi === s2)) {
        // An opaque piece at one end of the tube: only the open part counts, and its far end is the tube's
        // other end (the same bits as below, where g2 − g2 or g1 − g1 adds +0 and the hidden part 0).
        open = hi === s2 ? G(lo - qx, d) - G(s1 - qx, d) + 0 : 0 + (G(s2 - qx, d) - G(hi - qx, d));
      } else {
        const g1 = G(s1 - qx, d);
        const g2 = G(s2 - qx, d);
        const gLo = lo > s1 ? G(lo - qx, d) : g1;
        const gHi = hi < s2 ? G(hi - qx, d) : g2;
        open = gLo - g1 + (g2 - gHi);
        hidden = gHi - gLo;
      }
      uv[i] = uvI * (open + tU * hidden) * scale * gu;
      ir[i] = irI * (open + tI * hidden) * scale * gi;
      if (stretchy) {
        const e = stretchEnd(lamp, row, s, i, to, cell, off, 1, 0);
        if (e > i) {
          oneStretch(lamp, row, s, pk[0]!, gu, gi, i + 1, e + 1, cell, off, uv, ir);
          i = e;
        }
      }
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
    // Clear runs: the cells after this one that keep the same structure take only the run ends' closed forms.
    if (stretchy && kN === n) {
      const e = stretchEnd(lamp, row, s, i, to, cell, off, n, kM);
      if (e > i) {
        runsStretch(lamp, row, s, nr, gu, gi, i + 1, e + 1, cell, off, uv, ir);
        i = e;
      }
    }
  }
}

/**
 * The visible runs of a tube's n ≥ 2 partly hidden pieces at one cell (s.lo, s.hi; s.pk: 4 × the row's
 * barrier index, into occ, plus the inner-end bits), as evalSpan makes them where it cannot keep the last
 * cell's: the pieces' inner ends sorted by position, the pieces between them weighted by the transmissions
 * of the intervals covering their midpoints, neighbours of the same share merged. Leaves the runs in
 * s.rRef (each run's end: 2·piece for a piece's lower end, 2·piece + 1 for its upper end, −1 for s2), s.rU
 * and s.rI; returns their number. For the slide fill (slide.ts): evalSpan keeps its own copy written out,
 * with what it needs besides (each piece's key, whether the gaps are clear), because calling a routine
 * there made the demo's full field 2-3 % slower (separate processes, old and new alternately, five each).
 */
export function makeRuns(
  s: Scratch,
  n: number,
  s1: number,
  s2: number,
  occ: Int32Array,
  tUv: Float64Array,
  tIr: Float64Array,
): number {
  const sLo = s.lo;
  const sHi = s.hi;
  const pk = s.pk;
  const ord = s.ord;
  const rRef = s.rRef;
  const rU = s.rU;
  const rI = s.rI;
  let m = 0;
  for (let c = 0; c < n; c++) {
    const key = pk[c]!;
    if ((key & 1) !== 0) ord[m++] = 2 * c;
    if ((key & 2) !== 0) ord[m++] = 2 * c + 1;
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
  let nr = 0;
  let x0 = s1;
  for (let a = 0; a <= m; a++) {
    const r = a < m ? ord[a]! : -1;
    const x1 = r < 0 ? s2 : (r & 1) === 0 ? sLo[r >> 1]! : sHi[r >> 1]!;
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
  return nr;
}

/**
 * Margin of a stretch's conditions (stretchEnd), relative to the magnitudes of the two lines compared: 5·GAP
 * where a condition is checked, so at least 4·GAP at every cell of the stretch.
 */
const STRETCH_MARGIN = 5 * GAP;
/** More cells than a row has: no limit (finite, so that keeps multiplies it safely). */
const FAR = 1 << 30;

/**
 * At most k: how many cells after the one at qx two lines x = ap + bp·Q.x and x = aq + bq·Q.x keep the side
 * they are on at qx, apart by more than STRETCH_MARGIN·(1 + |ap| + |aq| + (|bp| + |bq|)·Q.x) (−1: not even
 * at qx). Q.x > 0, so that margin is linear in Q.x like the gap: the gap minus the margin is a straight
 * line, positive at qx and at the returned cell, hence at every cell between. Rounding (below 1e-15 of the
 * magnitudes) is far under the margin.
 */
function keeps(ap: number, bp: number, aq: number, bq: number, qx: number, cell: number, k: number): number {
  let f = aq - ap + (bq - bp) * qx;
  let db = bq - bp;
  if (f < 0) {
    f = -f;
    db = -db;
  }
  const sb = Math.abs(bp) + Math.abs(bq);
  const g = f - STRETCH_MARGIN * (1 + Math.abs(ap) + Math.abs(aq) + sb * qx);
  if (!(g > 0)) return -1;
  // What the gap above the margin loses per cell; most pairs still hold k cells on (no division then).
  const drop = (STRETCH_MARGIN * sb - db) * cell;
  if (drop * k < g) return k;
  return Math.floor(g / drop);
}

/**
 * The last cell e (i ≤ e < to) up to which a tube's structure at cell i holds (i when none after it is
 * sure): every act barrier keeps its lowest and highest corner, those keep their side of s1 and s2, and the
 * pieces' m inner ends (s.ord) keep their order, each pair of lines apart by the margin of `keeps` (at
 * least 4·GAP of their magnitudes). Every cell of the stretch then makes the same comparisons as cell i —
 * the same pieces, each end in the same place of the order with clear gaps — so evalSpan cell by cell
 * would use there the very runs (or one-piece case) of cell i. The corners are left in s.sLv and s.sHv.
 */
function stretchEnd(
  lamp: LampGeom,
  row: RowData,
  s: Scratch,
  i: number,
  to: number,
  cell: number,
  off: number,
  n: number,
  m: number,
): number {
  const A = row.A;
  const B = row.B;
  const s1 = lamp.s1;
  const s2 = lamp.s2;
  const sl = s.sLv;
  const sh = s.sHv;
  const qx = (i + off) * cell;
  const su = s.sUntil;
  let k = to - 1 - i;
  for (let t = 0; t < row.nAct; t++) {
    const c = row.act[t]!;
    // A barrier's corners and sides, found for an earlier stretch of this row, hold up to su[c].
    if (su[c]! >= i) {
      if (su[c]! - i < k) k = su[c]! - i;
      continue;
    }
    let vl = row.lv[c]!;
    let vh = row.hv[c]!;
    // Corners picked for the piece are its extremes only there; what is found from the row's straight
    // lines alone holds past the piece too (the next span of the row uses it).
    let kb = vl >= 0 && vh >= 0 ? to - 1 - i : FAR;
    if (vl < 0 || vh < 0) {
      // No corner picked for the whole piece: the lowest and highest here, which every other corner stays
      // above (below).
      const v0 = row.vStart[c]!;
      const v1 = v0 + row.vCount[c]!;
      vl = v0;
      vh = v0;
      let xl = A[v0]! + B[v0]! * qx;
      let xh = xl;
      for (let v = v0 + 1; v < v1; v++) {
        const x = A[v]! + B[v]! * qx;
        if (x < xl) {
          xl = x;
          vl = v;
        }
        if (x > xh) {
          xh = x;
          vh = v;
        }
      }
      for (let v = v0; v < v1; v++) {
        if (v !== vl) kb = keeps(A[vl]!, B[vl]!, A[v]!, B[v]!, qx, cell, kb);
        if (v !== vh) kb = keeps(A[v]!, B[v]!, A[vh]!, B[vh]!, qx, cell, kb);
      }
    }
    sl[c] = vl;
    sh[c] = vh;
    // The sides of s1 and s2 the lowest and highest ends are on (the highest is never below the lowest).
    const al = A[vl]!;
    const bl = B[vl]!;
    const ah = A[vh]!;
    const bh = B[vh]!;
    kb = keeps(al, bl, s1, 0, qx, cell, kb);
    if (al + bl * qx > s1) kb = keeps(al, bl, s2, 0, qx, cell, kb);
    else kb = keeps(ah, bh, s1, 0, qx, cell, kb);
    kb = keeps(ah, bh, s2, 0, qx, cell, kb);
    su[c] = kb < 0 ? -1 : i + kb;
    if (kb <= 0) return i;
    if (kb < k) k = kb;
  }
  if (n === 1) {
    // One piece with both ends inside: they stay apart.
    const b = s.pk[0]! >> 2;
    if ((s.pk[0]! & 3) === 3) k = keeps(A[sl[b]!]!, B[sl[b]!]!, A[sh[b]!]!, B[sh[b]!]!, qx, cell, k);
  } else {
    // Neighbouring inner ends keep their order (the first and last against s1 and s2 are sides above).
    for (let a = 1; a < m; a++) {
      const p = endCorner(s, s.ord[a - 1]!);
      const q = endCorner(s, s.ord[a]!);
      k = keeps(A[p]!, B[p]!, A[q]!, B[q]!, qx, cell, k);
    }
  }
  return k > 0 ? i + k : i;
}

/** The corner (Scratch.sLv, sHv) an interval end of s.ord refers to (2·piece: lower, 2·piece + 1: upper). */
function endCorner(s: Scratch, r: number): number {
  const b = s.pk[r >> 1]! >> 2;
  return (r & 1) === 0 ? s.sLv[b]! : s.sHv[b]!;
}

/**
 * Cells from..to−1 of a stretch (stretchEnd) with one partly hiding piece of key `key` (Scratch.pk): the
 * arithmetic of evalSpan's one-piece case, with the piece's inner ends projected from their corners.
 */
function oneStretch(
  lamp: LampGeom,
  row: RowData,
  s: Scratch,
  key: number,
  gu: number,
  gi: number,
  from: number,
  to: number,
  cell: number,
  off: number,
  uv: Float64Array,
  ir: Float64Array,
) {
  const s1 = lamp.s1;
  const s2 = lamp.s2;
  const d = row.d;
  const scale = row.scale;
  const uvI = lamp.uvI;
  const irI = lamp.irI;
  const b = key >> 2;
  const k = row.occ[b]!;
  const tU = lamp.tUv[k]!;
  const tI = lamp.tIr[k]!;
  const inLo = (key & 1) !== 0;
  const inHi = (key & 2) !== 0;
  s.stretched += to - from;
  const aL = row.A[s.sLv[b]!]!;
  const bL = row.B[s.sLv[b]!]!;
  const aH = row.A[s.sHv[b]!]!;
  const bH = row.B[s.sHv[b]!]!;
  if (tU === 0 && tI === 0 && !(inLo && inHi)) {
    // An opaque piece at one end of the tube, as in evalSpan.
    for (let i = from; i < to; i++) {
      const qx = (i + off) * cell;
      const open = inLo
        ? G(aL + bL * qx - qx, d) - G(s1 - qx, d) + 0
        : 0 + (G(s2 - qx, d) - G(aH + bH * qx - qx, d));
      uv[i] = uvI * (open + tU * 0) * scale * gu;
      ir[i] = irI * (open + tI * 0) * scale * gi;
    }
    return;
  }
  for (let i = from; i < to; i++) {
    const qx = (i + off) * cell;
    const g1 = G(s1 - qx, d);
    const g2 = G(s2 - qx, d);
    const gLo = inLo ? G(aL + bL * qx - qx, d) : g1;
    const gHi = inHi ? G(aH + bH * qx - qx, d) : g2;
    const open = gLo - g1 + (g2 - gHi);
    const hidden = gHi - gLo;
    uv[i] = uvI * (open + tU * hidden) * scale * gu;
    ir[i] = irI * (open + tI * hidden) * scale * gi;
  }
}

/**
 * Cells from..to−1 of a stretch (stretchEnd) whose nr runs are in s.rRef, rU, rI: the arithmetic of
 * evalSpan's run sum, with each run's end projected from its corner. The sum is written out here and in
 * evalSpan rather than shared: one routine for both (each caller storing the run ends first) made the demo
 * field about 7 % slower, measured in separate processes, old and new alternately.
 */
function runsStretch(
  lamp: LampGeom,
  row: RowData,
  s: Scratch,
  nr: number,
  gu: number,
  gi: number,
  from: number,
  to: number,
  cell: number,
  off: number,
  uv: Float64Array,
  ir: Float64Array,
) {
  const s1 = lamp.s1;
  const s2 = lamp.s2;
  const d = row.d;
  const scale = row.scale;
  const uvI = lamp.uvI;
  const irI = lamp.irI;
  const A = row.A;
  const B = row.B;
  s.stretched += to - from;
  const rv = s.rV;
  const rU = s.rU;
  const rI = s.rI;
  for (let a = 0; a < nr; a++) {
    const r = s.rRef[a]!;
    rv[a] = r < 0 ? -1 : endCorner(s, r);
  }
  for (let i = from; i < to; i++) {
    const qx = (i + off) * cell;
    let sumU = 0;
    let sumI = 0;
    let x0 = s1;
    let gAt = NaN;
    let g0 = 0;
    for (let a = 0; a < nr; a++) {
      const v = rv[a]!;
      const x1 = v < 0 ? s2 : A[v]! + B[v]! * qx;
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
