/**
 * One lamp over the grid: a full fill, and a refill of only the cells a set of changed barriers can
 * affect. Scratch buffers live in a Workspace so the inner loops never allocate.
 */
import type { Occluder } from '../geometry/occluders';
import type { LampGeom } from './scene';
import { evalSpan, prepareRow, RowData, Scratch, sortPrefix } from './kernel';
import { tubeG } from '../sources/tube';

/**
 * Row totals a sweep adds its lamp into straight away (Workspace.into): UVB × a, UVB × b (UV Index) and
 * the radiant irradiance, each lamp value rounded to float32 first, as the cached path stores it.
 */
export class RowTotals {
  u = new Float64Array(1);
  v = new Float64Array(1);
  q = new Float64Array(1);
  a = 0;
  b = 0;

  /** Make room for rows of nx cells and set them to zero. */
  clear(nx: number) {
    if (this.u.length < nx) {
      this.u = new Float64Array(nx);
      this.v = new Float64Array(nx);
      this.q = new Float64Array(nx);
      return;
    }
    this.u.fill(0, 0, nx);
    this.v.fill(0, 0, nx);
    this.q.fill(0, 0, nx);
  }
}

export class Workspace {
  /**
   * When set, a row sweep adds its lamp's values into these totals instead of writing ws.rowUv and rowIr
   * (the one-off path: one pass over a row per lamp, nothing written twice).
   */
  into: RowTotals | null = null;
  row = new RowData(1);
  row2 = new RowData(1);
  scratch = new Scratch(1);
  /** Where a row sweep is cut (sweepRow), and its barriers in range and hiding the whole lamp, as bits. */
  cuts = new Int32Array(4);
  inMask = new Int32Array(1);
  wholeMask = new Int32Array(1);
  /** One row's values, filled by sweepRow. */
  rowUv = new Float64Array(1);
  rowIr = new Float64Array(1);
  /** The cells sweepLampRow evaluated. */
  i0 = 0;
  i1 = -1;
  private capacity = 0;

  /** Make room for rows of nx cells. */
  ensureRow(nx: number) {
    if (this.rowUv.length >= nx) return;
    this.rowUv = new Float64Array(nx);
    this.rowIr = new Float64Array(nx);
  }

  /** Make room for rows with up to n barriers. */
  ensure(n: number) {
    if (n <= this.capacity) return;
    this.capacity = Math.max(n, this.capacity * 2, 8);
    this.row = new RowData(this.capacity);
    this.row2 = new RowData(this.capacity);
    this.scratch = new Scratch(this.capacity);
    this.cuts = new Int32Array(4 * this.capacity);
    this.inMask = new Int32Array((this.capacity + 31) >> 5);
    this.wholeMask = new Int32Array((this.capacity + 31) >> 5);
  }
}

/**
 * Fill a lamp's new-lamp UVB and radiant fields over the whole grid (zero where it cannot reach, so a
 * reused buffer needs no clearing first); returns the number of cells evaluated. With `dirty`, the cells
 * whose stored values change are marked there (the buffer held another lamp's fields, or this lamp's
 * before it moved).
 */
export function fillLamp(
  ws: Workspace,
  lamp: LampGeom,
  occluders: Occluder[],
  uv: Float32Array | Float64Array,
  ir: Float32Array | Float64Array,
  nx: number,
  ny: number,
  cell: number,
  dirty?: Uint8Array,
): number {
  ws.ensureRow(nx);
  let evaluated = 0;
  for (let j = 0; j < ny; j++) {
    const base = j * nx;
    const count = sweepLampRow(ws, lamp, occluders, j, nx, cell);
    evaluated += count;
    const i0 = count === 0 ? nx : ws.i0;
    const i1 = count === 0 ? nx - 1 : ws.i1;
    const ru = ws.rowUv;
    const ri = ws.rowIr;
    if (dirty) {
      for (let i = 0; i < nx; i++) {
        const inside = i >= i0 && i <= i1;
        const u = inside ? ru[i]! : 0;
        const r = inside ? ri[i]! : 0;
        const c = base + i;
        const was = uv[c]!;
        const wasIr = ir[c]!;
        uv[c] = u;
        ir[c] = r;
        if (uv[c] !== was || ir[c] !== wasIr) dirty[c] = 1;
      }
      continue;
    }
    uv.fill(0, base, base + i0);
    ir.fill(0, base, base + i0);
    for (let i = i0; i <= i1; i++) {
      uv[base + i] = ru[i]!;
      ir[base + i] = ri[i]!;
    }
    uv.fill(0, base + i1 + 1, base + nx);
    ir.fill(0, base + i1 + 1, base + nx);
  }
  return evaluated;
}

/**
 * Evaluates row j of a lamp into ws.rowUv and ws.rowIr, or adds it into ws.into (cells ws.i0..ws.i1; the
 * rest of the row gets nothing from this lamp) and returns the number of cells evaluated, 0 when the lamp cannot light the row.
 * The caller makes room for nx cells (ws.ensureRow).
 */
export function sweepLampRow(
  ws: Workspace,
  lamp: LampGeom,
  occluders: Occluder[],
  j: number,
  nx: number,
  cell: number,
): number {
  const row = ws.row;
  const qy = (j + 0.5) * cell;
  if (!prepareRow(lamp, occluders, qy, row, ws.scratch)) return 0;
  let i0 = 0;
  let i1 = nx - 1;
  if (!lamp.tube && Number.isFinite(lamp.beamTan) && lamp.irOut === 0) {
    // Only cells inside the bulb's beam can be lit (none on a row the beam passes in front of or behind).
    const half = row.half;
    if (half < 0) return 0;
    i0 = Math.max(0, Math.floor((lamp.x - half) / cell - 0.5));
    i1 = Math.min(nx - 1, Math.ceil((lamp.x + half) / cell - 0.5));
  }
  if (i1 < i0) return 0;
  sweepRow(ws, lamp, row, i0, i1, cell);
  ws.i0 = i0;
  ws.i1 = i1;
  return i1 - i0 + 1;
}

/**
 * Evaluates cells i0..i1 of a prepared row in order into ws.rowUv and ws.rowIr. Each barrier's range of
 * Q.x is turned into the range of cells inside it, and so is its range where it surely hides the whole
 * lamp, both found with evalCell's own tests (a rounded guess, corrected cell by cell at its ends). The row
 * is cut where any of these ranges starts or ends; in each piece the barriers hiding the whole lamp are
 * multiplied in once (in barrier order, so a cell's product does not depend on where the row was cut) and
 * evalSpan looks only at the others whose ranges cover the piece, without testing those ranges again per
 * cell. A cell's arithmetic depends only on the cell, never on the cuts: a partial refill gives the same
 * bits as a full one.
 */
function sweepRow(ws: Workspace, lamp: LampGeom, row: RowData, i0: number, i1: number, cell: number) {
  const s = ws.scratch;
  const ru = ws.rowUv;
  const ri = ws.rowIr;
  const into = ws.into;
  const n = row.count;
  // Where a barrier's range starts or ends, and its range where it hides the whole lamp: events at cells,
  // pos·w + 2·barrier + (0: range, 1: whole), sorted by cell. Each toggles the barrier's bit in a mask.
  const w = 2 * n;
  const ev = ws.cuts;
  let m = 0;
  for (let c = 0; c < n; c++) {
    // The cells with qa < Q.x < qb, by the test evalSpan makes, so inside a piece every barrier left for
    // it has the cell in range and does not hide the whole lamp there (RowData.inRange).
    const f = firstAbove(row.qa[c]!, cell, i0, i1);
    const l = lastBelow(row.qb[c]!, cell, f, i1);
    if (f > l) continue;
    ev[m++] = f * w + 2 * c;
    ev[m++] = (l + 1) * w + 2 * c;
    // The cells with fa < Q.x < fb, by the same test.
    const fa = row.fa[c]!;
    const fb = row.fb[c]!;
    if (!(fa < fb)) continue;
    const g0 = firstAbove(fa, cell, f, l);
    const g1 = lastBelow(fb, cell, g0, l);
    if (g0 <= g1) {
      ev[m++] = g0 * w + 2 * c + 1;
      ev[m++] = (g1 + 1) * w + 2 * c + 1;
    }
  }
  sortPrefix(ev, m);
  // Barriers in range (inMask) and hiding the whole lamp (wholeMask), 32 to a word, by RowData index.
  const words = (n + 31) >> 5;
  const inMask = ws.inMask;
  const wholeMask = ws.wholeMask;
  inMask.fill(0, 0, words);
  wholeMask.fill(0, 0, words);
  const act = row.act;
  const occ = row.occ;
  const tUv = lamp.tUv;
  const tIr = lamp.tIr;
  let e = 0;
  for (let from = i0; from <= i1;) {
    for (; e < m; e++) {
      const x = ev[e]!;
      const pos = (x / w) | 0;
      if (pos > from) break;
      const r = x - pos * w;
      const bit = 1 << ((r >> 1) & 31);
      if ((r & 1) === 0) inMask[r >> 6] = inMask[r >> 6]! ^ bit;
      else wholeMask[r >> 6] = wholeMask[r >> 6]! ^ bit;
    }
    const to = e < m ? Math.min((ev[e]! / w) | 0, i1 + 1) : i1 + 1;
    const piece = from;
    from = to;
    // Barriers in ascending order, as evalCell takes them, so a cell's product does not depend on the cuts.
    let na = 0;
    let gu = 1;
    let gi = 1;
    for (let k = 0; k < words; k++) {
      const whole = wholeMask[k]!;
      let bits = whole;
      while (bits !== 0) {
        const low = bits & -bits;
        const o = occ[32 * k + 31 - Math.clz32(low)]!;
        gu *= tUv[o]!;
        gi *= tIr[o]!;
        bits ^= low;
      }
      bits = inMask[k]! & ~whole;
      while (bits !== 0) {
        const low = bits & -bits;
        act[na++] = 32 * k + 31 - Math.clz32(low);
        bits ^= low;
      }
    }
    evalPiece(ws, lamp, row, piece, to, cell, na, gu, gi, ru, ri, into, s);
  }
  row.inRange = false;
  row.nAct = n;
  row.gu0 = 1;
  row.gi0 = 1;
  for (let c = 0; c < n; c++) act[c] = c;
}

/**
 * Cells from..to−1 of a row sweep's piece, where the na barriers in row.act (ascending) have every cell in
 * range and hide part of the lamp at most, and those hiding all of it pass gu (UVB) and gi (infrared).
 */
function evalPiece(
  ws: Workspace,
  lamp: LampGeom,
  row: RowData,
  from: number,
  to: number,
  cell: number,
  na: number,
  gu: number,
  gi: number,
  ru: Float64Array,
  ri: Float64Array,
  into: RowTotals | null,
  s: Scratch,
) {
  const act = row.act;
  if (gu === 0 && gi === 0) {
    // Fully hidden: what evalCell returns once its product reaches zero (a loop: most pieces are a few
    // cells, shorter than a fill call's own cost). Totals get nothing (adding zero changes no bit).
    if (into) return;
    for (let i = from; i < to; i++) {
      ru[i] = 0;
      ri[i] = 0;
    }
    return;
  }
  if (na === 0) {
    // No barrier hides part of the lamp here: the closed form straight, as evalCell would compute it.
    openRun(lamp, row, from, to, cell, gu, gi, ru, ri, into);
    return;
  }
  // A tube's stretches (kernel.ts, stretchEnd) find the lowest and highest corners where they start and
  // keep them as long as they hold, which costs less than picking them for the whole piece beforehand.
  if (lamp.tube) {
    for (let t = 0; t < na; t++) {
      row.lv[act[t]!] = -1;
      row.hv[act[t]!] = -1;
    }
  } else for (let t = 0; t < na; t++) pickCorners(row, act[t]!, from, to, cell);
  row.nAct = na;
  row.gu0 = gu;
  row.gi0 = gi;
  row.inRange = true;
  evalSpan(lamp, row, from, to, cell, 0.5, ru, ri, s);
  if (into) addSpan(into, ru, ri, from, to);
}

/** Cells a piece must have before its corners are picked (pickCorners): below it the picking costs more. */
const PICK_MIN_CELLS = 3;

/**
 * For cells from..to−1, the barrier c's corner whose projection is lowest at every one of them (RowData.lv)
 * and the one highest (hv), or −1. A projection is linear in Q.x, so a corner below every other by more
 * than the margin at the first and the last cell is so at every cell between, and the margin (1e-9 of the
 * magnitudes, which are linear in Q.x ≥ 0 too) is far above the rounding of A + B·Q.x: the min and max
 * over all corners are then exactly that corner's values, bit for bit.
 */
export function pickCorners(row: RowData, c: number, from: number, to: number, cell: number) {
  row.lv[c] = -1;
  row.hv[c] = -1;
  if (to - from < PICK_MIN_CELLS) return;
  const qf = (from + 0.5) * cell;
  const qt = (to - 1 + 0.5) * cell;
  const A = row.A;
  const B = row.B;
  const v0 = row.vStart[c]!;
  const v1 = v0 + row.vCount[c]!;
  let lo = v0;
  let hi = v0;
  for (let v = v0 + 1; v < v1; v++) {
    const x = A[v]! + B[v]! * qf;
    if (x < A[lo]! + B[lo]! * qf) lo = v;
    if (x > A[hi]! + B[hi]! * qf) hi = v;
  }
  if (clearlyExtreme(A, B, v0, v1, lo, qf, qt, 1)) row.lv[c] = lo;
  if (clearlyExtreme(A, B, v0, v1, hi, qf, qt, -1)) row.hv[c] = hi;
}

/** Whether every corner but m projects above m (sign 1) or below it (−1) by the margin at qf and at qt. */
function clearlyExtreme(
  A: Float64Array,
  B: Float64Array,
  v0: number,
  v1: number,
  m: number,
  qf: number,
  qt: number,
  sign: number,
): boolean {
  const am = A[m]!;
  const bm = B[m]!;
  for (let v = v0; v < v1; v++) {
    if (v === m) continue;
    const a = A[v]!;
    const b = B[v]!;
    const magF = Math.abs(a) + Math.abs(b * qf) + Math.abs(am) + Math.abs(bm * qf);
    const magT = Math.abs(a) + Math.abs(b * qt) + Math.abs(am) + Math.abs(bm * qt);
    if (!(sign * (a + b * qf - (am + bm * qf)) > 1e-9 * (1 + magF))) return false;
    if (!(sign * (a + b * qt - (am + bm * qt)) > 1e-9 * (1 + magT))) return false;
  }
  return true;
}

/**
 * The first cell i of from..to with (i + 0.5)·cell > x (to + 1 when none): a rounded guess, then corrected
 * with that very test.
 */
function firstAbove(x: number, cell: number, from: number, to: number): number {
  const a = Math.floor(x / cell - 0.5);
  let i = a < from ? from : a > to + 1 ? to + 1 : a;
  while (i > from && (i - 0.5) * cell > x) i--;
  while (i <= to && !((i + 0.5) * cell > x)) i++;
  return i;
}

/** The last cell i of from..to with (i + 0.5)·cell < x (from − 1 when none), as firstAbove. */
function lastBelow(x: number, cell: number, from: number, to: number): number {
  const b = Math.ceil(x / cell - 0.5);
  let i = b > to ? to : b < from - 1 ? from - 1 : b;
  while (i < to && (i + 1.5) * cell < x) i++;
  while (i >= from && !((i + 0.5) * cell < x)) i--;
  return i;
}

/** Adds cells from..to−1 of a lamp's row values into the totals (RowTotals: rounded as stored). */
function addSpan(into: RowTotals, ru: Float64Array, ri: Float64Array, from: number, to: number) {
  const { u, v, q, a, b } = into;
  for (let i = from; i < to; i++) {
    const val = Math.fround(ru[i]!);
    u[i] = u[i]! + val * a;
    v[i] = v[i]! + val * b;
    q[i] = q[i]! + Math.fround(ri[i]!);
  }
}

/**
 * Cells from..to−1 of a row where no barrier hides part of the lamp and those hiding all of it pass gu
 * (UVB) and gi (infrared): evalCell's arithmetic with no active barrier, in one tight loop per lamp form
 * (the same operations in the same order, so the same bits), written to ru and ri or added into `into`
 * as addSpan would add them.
 */
function openRun(
  lamp: LampGeom,
  row: RowData,
  from: number,
  to: number,
  cell: number,
  gu: number,
  gi: number,
  ru: Float64Array,
  ri: Float64Array,
  into: RowTotals | null,
) {
  const uvI = lamp.uvI;
  const irI = lamp.irI;
  if (lamp.tube) {
    const d = row.d;
    const scale = row.scale;
    const s1 = lamp.s1;
    const s2 = lamp.s2;
    if (into) {
      const { u, v, q, a, b } = into;
      for (let i = from; i < to; i++) {
        const qx = (i + 0.5) * cell;
        const f = (tubeG(s2 - qx, d) - tubeG(s1 - qx, d)) * scale;
        const val = Math.fround(uvI * f * gu);
        u[i] = u[i]! + val * a;
        v[i] = v[i]! + val * b;
        q[i] = q[i]! + Math.fround(irI * f * gi);
      }
      return;
    }
    for (let i = from; i < to; i++) {
      const qx = (i + 0.5) * cell;
      const f = (tubeG(s2 - qx, d) - tubeG(s1 - qx, d)) * scale;
      ru[i] = uvI * f * gu;
      ri[i] = irI * f * gi;
    }
    return;
  }
  const x = lamp.x;
  const half = row.half;
  const d2 = row.d2;
  const h = row.h;
  const irOut = lamp.irOut;
  for (let i = from; i < to; i++) {
    const qx = (i + 0.5) * cell;
    const inBeam = Math.abs(qx - x) <= half;
    if (!inBeam && irOut === 0) {
      ru[i] = 0;
      ri[i] = 0;
      continue;
    }
    const dx = qx - x;
    const r2 = d2 + dx * dx;
    const f = h / (r2 * Math.sqrt(r2));
    ru[i] = inBeam ? uvI * f * gu : 0;
    ri[i] = (inBeam ? irI : irOut) * f * gi;
  }
  if (into) addSpan(into, ru, ri, from, to);
}

/** The lamp with transmissions for another list of barriers. */
export function withTransmissions(lamp: LampGeom, occluders: Occluder[]): LampGeom {
  const tUv = new Float64Array(occluders.length);
  const tIr = new Float64Array(occluders.length);
  occluders.forEach((o, k) => {
    tUv[k] = o.uvbT;
    tIr[k] = o.irT ?? lamp.lamp.glassIrTransmission;
  });
  return { ...lamp, tUv, tIr };
}

/**
 * Recompute only the cells where a changed barrier (old or new version) can shade this lamp: on each row,
 * the union of the ranges where a changed barrier's shadow interval meets the lamp. Marks them in `dirty`
 * and returns the number of cells evaluated.
 */
export function refillChanged(
  ws: Workspace,
  lamp: LampGeom,
  occluders: Occluder[],
  changed: Occluder[],
  uv: Float32Array | Float64Array,
  ir: Float32Array | Float64Array,
  dirty: Uint8Array,
  nx: number,
  ny: number,
  cell: number,
): number {
  const row = ws.row;
  const probeRow = ws.row2;
  const s = ws.scratch;
  ws.ensureRow(nx);
  const changedLamp = withTransmissions(lamp, changed);
  let evaluated = 0;
  for (let j = 0; j < ny; j++) {
    const qy = (j + 0.5) * cell;
    if (!prepareRow(changedLamp, changed, qy, probeRow, s)) continue;
    if (probeRow.count === 0) continue;
    prepareRow(lamp, occluders, qy, row, s);
    const base = j * nx;
    // Union of the affected ranges (old and new positions of a dragged barrier overlap).
    const ranges: [number, number][] = [];
    for (let c = 0; c < probeRow.count; c++) {
      const i0 = Math.max(0, Math.floor(probeRow.qa[c]! / cell - 0.5));
      const i1 = Math.min(nx - 1, Math.ceil(probeRow.qb[c]! / cell - 0.5));
      if (i1 >= i0) ranges.push([i0, i1]);
    }
    ranges.sort((a, b) => a[0] - b[0]);
    let next = 0;
    for (const [a, b] of ranges) {
      const from = Math.max(a, next);
      if (from <= b) {
        sweepRow(ws, lamp, row, from, b, cell);
        const ru = ws.rowUv;
        const ri = ws.rowIr;
        for (let i = from; i <= b; i++) {
          uv[base + i] = ru[i]!;
          ir[base + i] = ri[i]!;
          dirty[base + i] = 1;
        }
        evaluated += b - from + 1;
      }
      if (b + 1 > next) next = b + 1;
    }
  }
  return evaluated;
}
