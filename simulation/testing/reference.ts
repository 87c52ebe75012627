/**
 * A deliberately simple REFERENCE implementation of the light and heat fields, kept for tests and the
 * benchmark: every tube is cut into many point elements (midpoint rule), and every ray from a receiver to
 * an element (or to a bulb) is tested against every barrier, with no precomputation at all. It is slow on
 * purpose; with 2000 elements per tube it agrees with the closed form to well under 1 %.
 */
import type { Design } from '../model/schema';
import { lampUvbFactor } from '../model/resolve';
import { compileScene, type LampGeom } from '../fields/scene';
import type { Occluder } from '../geometry/occluders';
import { airTempC, HEAT_DEFAULTS, surfaceTempC } from '../fields/heat';
import { gridSize, type FieldGrid, type ProbeResult } from '../fields/types';

export interface ReferenceOptions {
  cellCm?: number;
  addMonths?: number;
  /** Elements per tube (default 2000). */
  samples?: number;
  /** Evaluate only every stride-th row and column (others stay NaN), to bound the cost in benchmarks. */
  stride?: number;
}

/** Does the segment P→Q pass through the convex polygon (with positive length), or cross the barrier segment? */
export function rayHits(px: number, py: number, qx: number, qy: number, o: Occluder): boolean {
  const dx = qx - px;
  const dy = qy - py;
  if (o.xs.length === 2) {
    const ax = o.xs[0]!;
    const ay = o.ys[0]!;
    const ex = o.xs[1]! - ax;
    const ey = o.ys[1]! - ay;
    const den = dx * ey - dy * ex;
    if (den === 0) return false;
    const t = ((ax - px) * ey - (ay - py) * ex) / den;
    const u = ((ax - px) * dy - (ay - py) * dx) / den;
    return t > 0 && t < 1 && u >= 0 && u <= 1;
  }
  // Cyrus–Beck clipping of the segment against a counter-clockwise convex polygon.
  let t0 = 0;
  let t1 = 1;
  const n = o.xs.length;
  for (let k = 0; k < n; k++) {
    const ax = o.xs[k]!;
    const ay = o.ys[k]!;
    const bx = o.xs[(k + 1) % n]!;
    const by = o.ys[(k + 1) % n]!;
    // Outward normal of a CCW edge.
    const nx = by - ay;
    const ny = -(bx - ax);
    const num = nx * (px - ax) + ny * (py - ay);
    const den = nx * dx + ny * dy;
    if (den === 0) {
      if (num > 0) return false;
      continue;
    }
    const t = -num / den;
    if (den < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 >= t1) return false;
  }
  return t1 - t0 > 1e-9;
}

function transmissions(lamp: LampGeom, occ: Occluder[], px: number, py: number, qx: number, qy: number) {
  let tu = 1;
  let ti = 1;
  for (let k = 0; k < occ.length; k++) {
    if (rayHits(qx, qy, px, py, occ[k]!)) {
      tu *= lamp.tUv[k]!;
      ti *= lamp.tIr[k]!;
    }
  }
  return [tu, ti] as const;
}

/** One lamp at one receiver: [uv (new lamp), ir W/m²]. */
export function referenceLampAt(
  lamp: LampGeom,
  occ: Occluder[],
  qx: number,
  qy: number,
  samples: number,
): [number, number] {
  const h = lamp.y - qy;
  if (!(h > 0)) return [0, 0];
  // The lamp hangs dz in front of or behind the receiver's plane; barriers span the whole depth, so a ray
  // is blocked when its projection onto the section is.
  const dz = lamp.dz;
  if (!lamp.tube) {
    const dx = qx - lamp.x;
    const inBeam = Math.hypot(dx, dz) <= h * lamp.beamTan;
    if (!inBeam && lamp.irOut === 0) return [0, 0];
    const r2 = h * h + dx * dx + dz * dz;
    const f = h / (r2 * Math.sqrt(r2));
    const [tu, ti] = transmissions(lamp, occ, lamp.x, lamp.y, qx, qy);
    return inBeam ? [lamp.uvI * f * tu, lamp.irI * f * ti] : [0, lamp.irOut * f * ti];
  }
  const len = lamp.s2 - lamp.s1;
  const ds = len / samples;
  // Normalise the sampled tube on its own: uvbAt30 (× gain) 30 cm below the centre, unshaded.
  let norm = 0;
  let sumU = 0;
  let sumI = 0;
  for (let k = 0; k < samples; k++) {
    const s = lamp.s1 + (k + 0.5) * ds;
    const uc = s - (lamp.s1 + lamp.s2) / 2;
    norm += (900 / ((900 + uc * uc) * (900 + uc * uc))) * ds;
    const u = s - qx;
    const r2 = h * h + dz * dz + u * u;
    // Element cosine √(h² + dz²)/r (a diffuse line source), receiver cosine h/r, inverse square.
    const f = ((h * Math.sqrt(h * h + dz * dz)) / (r2 * r2)) * ds;
    const [tu, ti] = transmissions(lamp, occ, s, lamp.y, qx, qy);
    sumU += f * tu;
    sumI += f * ti;
  }
  const e30 = lamp.lamp.uvbAt30 * lamp.lamp.reflectorGain;
  return [(e30 / norm) * sumU, lamp.irI * sumI];
}

export function referenceProbe(
  design: Design,
  points: { x: number; y: number }[],
  opts: ReferenceOptions = {},
): ProbeResult[] {
  const scene = compileScene(design);
  const samples = opts.samples ?? 2000;
  return points.map(({ x, y }) => {
    let uvb = 0;
    let uvi = 0;
    let ir = 0;
    for (const lamp of scene.lamps) {
      const [u, i] = referenceLampAt(lamp, scene.occluders, x, y, samples);
      const f = lampUvbFactor(lamp.lamp, opts.addMonths ?? 0);
      uvb += u * f;
      uvi += u * f * lamp.lamp.uviPerUvb;
      ir += i;
    }
    const air = airTempC(y, scene.height, scene.roomC, scene.airRiseK);
    const tempC = surfaceTempC(
      HEAT_DEFAULTS.absorptance * ir,
      air,
      HEAT_DEFAULTS.emissivity,
      HEAT_DEFAULTS.convection,
    );
    return { x, y, uvb, uvi, tempC };
  });
}

export function referenceFields(design: Design, opts: ReferenceOptions = {}): FieldGrid {
  const cell = opts.cellCm ?? 0.5;
  const stride = opts.stride ?? 1;
  const { width, height } = design.enclosure;
  const { nx, ny } = gridSize(width, height, cell);
  const uvb = new Float32Array(nx * ny).fill(NaN);
  const uvi = new Float32Array(nx * ny).fill(NaN);
  const tempC = new Float32Array(nx * ny).fill(NaN);
  for (let j = 0; j < ny; j += stride) {
    for (let i = 0; i < nx; i += stride) {
      const p = referenceProbe(design, [{ x: (i + 0.5) * cell, y: (j + 0.5) * cell }], opts)[0]!;
      const c = j * nx + i;
      uvb[c] = p.uvb;
      uvi[c] = p.uvi;
      tempC[c] = p.tempC;
    }
  }
  return { nx, ny, cellCm: cell, width, height, uvb, uvi, tempC };
}

/**
 * Largest relative difference between two grids over the cells the reference evaluated whose reference
 * value is at least 1 % of that field's maximum. Temperatures are compared as rises above the room.
 */
export function maxRelativeError(engine: FieldGrid, ref: FieldGrid, roomC: number): number {
  let worst = 0;
  const fields: [Float32Array, Float32Array, number][] = [
    [engine.uvb, ref.uvb, 0],
    [engine.uvi, ref.uvi, 0],
    [engine.tempC, ref.tempC, roomC],
  ];
  for (const [a, b, base] of fields) {
    let max = 0;
    for (let c = 0; c < b.length; c++) if (b[c]! - base > max) max = b[c]! - base;
    if (!(max > 0)) continue;
    for (let c = 0; c < b.length; c++) {
      const rv = b[c]! - base;
      if (!(rv >= 0.01 * max)) continue;
      const err = Math.abs(a[c]! - base - rv) / rv;
      if (err > worst) worst = err;
    }
  }
  return worst;
}
