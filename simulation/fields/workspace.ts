/**
 * One lamp over the grid: a full fill, and a refill of only the cells a set of changed barriers can
 * affect. Scratch buffers live in a Workspace so the inner loops never allocate.
 */
import type { Occluder } from '../geometry/occluders';
import type { LampGeom } from './scene';
import { evalCell, prepareRow, RowData, Scratch } from './kernel';

export class Workspace {
  row = new RowData(1);
  row2 = new RowData(1);
  scratch = new Scratch(1);
  private capacity = 0;

  /** Make room for rows with up to n barriers. */
  ensure(n: number) {
    if (n <= this.capacity) return;
    this.capacity = Math.max(n, this.capacity * 2, 8);
    this.row = new RowData(this.capacity);
    this.row2 = new RowData(this.capacity);
    this.scratch = new Scratch(this.capacity);
  }
}

/** Fill a lamp's new-lamp UVB and radiant fields over the grid; returns the number of cells evaluated. */
export function fillLamp(
  ws: Workspace,
  lamp: LampGeom,
  occluders: Occluder[],
  uv: Float64Array,
  ir: Float64Array,
  nx: number,
  ny: number,
  cell: number,
): number {
  const row = ws.row;
  const s = ws.scratch;
  let evaluated = 0;
  for (let j = 0; j < ny; j++) {
    const qy = (j + 0.5) * cell;
    if (!prepareRow(lamp, occluders, qy, row, s)) continue;
    let i0 = 0;
    let i1 = nx - 1;
    if (!lamp.tube && Number.isFinite(lamp.beamTan) && lamp.irOut === 0) {
      // Only cells inside the bulb's beam can be lit (none on a row the beam passes in front of or behind).
      const half = row.half;
      if (half < 0) continue;
      i0 = Math.max(0, Math.floor((lamp.x - half) / cell - 0.5));
      i1 = Math.min(nx - 1, Math.ceil((lamp.x + half) / cell - 0.5));
    }
    const base = j * nx;
    for (let i = i0; i <= i1; i++) {
      evalCell(lamp, row, (i + 0.5) * cell, s);
      uv[base + i] = s.uv;
      ir[base + i] = s.ir;
    }
    evaluated += Math.max(0, i1 - i0 + 1);
  }
  return evaluated;
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
  uv: Float64Array,
  ir: Float64Array,
  dirty: Uint8Array,
  nx: number,
  ny: number,
  cell: number,
): number {
  const row = ws.row;
  const probeRow = ws.row2;
  const s = ws.scratch;
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
      for (let i = Math.max(a, next); i <= b; i++) {
        evalCell(lamp, row, (i + 0.5) * cell, s);
        uv[base + i] = s.uv;
        ir[base + i] = s.ir;
        dirty[base + i] = 1;
        evaluated++;
      }
      if (b + 1 > next) next = b + 1;
    }
  }
  return evaluated;
}
