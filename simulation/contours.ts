/**
 * Filled contour bands of a field, in design coordinates (cm, y up), built with d3-contour.
 *
 * d3-contour returns, per threshold t, the region where the field is ≥ t, with the value of cell (i, j)
 * sitting at grid point (i + 0.5, j + 0.5) — exactly our cell centres once scaled by cellCm, and with
 * rows counted from the bottom, y already points up. A band [lo, hi) is the region ≥ lo minus the region
 * ≥ hi. The rings of both never cross, so a point lies in the band exactly when an odd number of the
 * combined rings encloses it; each ring at even nesting depth becomes an outer ring (counter-clockwise)
 * and each ring at odd depth a hole (clockwise) of its parent. The bands are therefore disjoint
 * MultiPolygons that can be filled with either the non-zero or the even-odd rule.
 */
import { contours } from 'd3-contour';
import { scaleLinear } from 'd3-scale';
import type { FieldGrid, FieldName } from './fields/types';
import { UV_REFUGE_UVI } from './assess/zones';

export interface ContourBand {
  lo: number;
  hi: number;
  /** MultiPolygon: polygons → rings (first outer, then holes) → [x, y] points in cm. */
  polygons: [number, number][][][];
}

type Ring = [number, number][];

/** UV Index thresholds: the UV-free limit and the boundaries of the Ferguson zones (Ferguson et al. 2010). */
export const UVI_THRESHOLDS = [0, UV_REFUGE_UVI, 0.7, 1.0, 2.6, 3.5, 7.4, 9.5];

/** A high quantile of the field, so a few cells right under a lamp do not flatten the scale. */
function robustMax(values: Float32Array, q = 0.995): number {
  const step = Math.max(1, Math.floor(values.length / 20000));
  const sample: number[] = [];
  for (let k = 0; k < values.length; k += step) sample.push(values[k]!);
  sample.sort((a, b) => a - b);
  return sample[Math.min(sample.length - 1, Math.floor(q * sample.length))] ?? 0;
}

function range(values: Float32Array): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (let k = 0; k < values.length; k++) {
    const v = values[k]!;
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  return [lo, hi];
}

/** Default thresholds: d3-scale "nice" ticks (UVB from 0; temperature over its range); UVI uses the zone boundaries. */
export function defaultThresholds(field: FieldName, grid: FieldGrid): number[] {
  const values = grid[field];
  const [min, max] = range(values);
  if (field === 'uvi') {
    const t = UVI_THRESHOLDS.filter((v) => v <= max);
    return t.length ? t : [0];
  }
  const top = robustMax(values);
  const lo = field === 'uvb' ? 0 : Math.floor(min);
  if (!(top > lo)) return [lo];
  return scaleLinear().domain([lo, top]).nice().ticks(8);
}

function signedArea(r: Ring): number {
  let a = 0;
  for (let k = 0, n = r.length; k < n; k++) {
    const p = r[k]!;
    const q = r[(k + 1) % n]!;
    a += p[0] * q[1] - q[0] * p[1];
  }
  return a / 2;
}

function onSegment(px: number, py: number, a: [number, number], b: [number, number]): boolean {
  const cross = (b[0] - a[0]) * (py - a[1]) - (b[1] - a[1]) * (px - a[0]);
  if (Math.abs(cross) > 1e-9) return false;
  return (
    px >= Math.min(a[0], b[0]) - 1e-9 &&
    px <= Math.max(a[0], b[0]) + 1e-9 &&
    py >= Math.min(a[1], b[1]) - 1e-9 &&
    py <= Math.max(a[1], b[1]) + 1e-9
  );
}

/** 1 inside, 0 outside, -1 on the boundary. */
function pointInRing(px: number, py: number, r: Ring): number {
  let inside = false;
  for (let k = 0, n = r.length, m = n - 1; k < n; m = k++) {
    const a = r[k]!;
    const b = r[m]!;
    if (onSegment(px, py, a, b)) return -1;
    if (a[1] > py !== b[1] > py && px < ((b[0] - a[0]) * (py - a[1])) / (b[1] - a[1]) + a[0])
      inside = !inside;
  }
  return inside ? 1 : 0;
}

/** Is ring a inside ring b? Uses the first vertex of a not on b's boundary; rings never cross. */
function ringInside(a: Ring, aArea: number, b: Ring, bArea: number): boolean {
  for (const p of a) {
    const s = pointInRing(p[0], p[1], b);
    if (s >= 0) return s === 1;
  }
  // Every vertex of a lies on b: the same outline (handled by the caller) or a ring running along b.
  return Math.abs(aArea) < Math.abs(bArea);
}

/** Turn rings from nested regions into disjoint polygons by nesting parity. */
function ringsToPolygons(input: Ring[]): [number, number][][][] {
  // Identical outlines cancel in parity (e.g. both regions cover the whole grid).
  const keyed = new Map<string, Ring[]>();
  for (const r of input) {
    const key = JSON.stringify([...r.slice(0, -1)].sort((p, q) => p[0] - q[0] || p[1] - q[1]));
    const list = keyed.get(key) ?? [];
    list.push(r);
    keyed.set(key, list);
  }
  const rings: Ring[] = [];
  for (const list of keyed.values()) if (list.length % 2 === 1) rings.push(list[0]!);
  const areas = rings.map(signedArea);
  const n = rings.length;
  const parents: number[][] = rings.map(() => []);
  for (let a = 0; a < n; a++) {
    for (let b = 0; b < n; b++) {
      if (
        a !== b &&
        Math.abs(areas[a]!) <= Math.abs(areas[b]!) &&
        ringInside(rings[a]!, areas[a]!, rings[b]!, areas[b]!)
      ) {
        parents[a]!.push(b);
      }
    }
  }
  const polys = new Map<number, [number, number][][]>();
  const orient = (r: Ring, ccw: boolean): Ring => (signedArea(r) > 0 === ccw ? r : [...r].reverse());
  for (let a = 0; a < n; a++) {
    if (parents[a]!.length % 2 === 0) polys.set(a, [orient(rings[a]!, true)]);
  }
  for (let a = 0; a < n; a++) {
    const depth = parents[a]!.length;
    if (depth % 2 === 0) continue;
    // Immediate parent: the containing ring with depth − 1.
    const parent = parents[a]!.find((b) => parents[b]!.length === depth - 1);
    if (parent === undefined) continue;
    polys.get(parent)?.push(orient(rings[a]!, false));
  }
  return [...polys.values()];
}

/** Filled bands [t_k, t_k+1) of a field, plus [t_last, max]; bands with no area are left out. */
export function contourBands(grid: FieldGrid, field: FieldName, thresholds?: number[]): ContourBand[] {
  const values = grid[field];
  const t = [...new Set(thresholds ?? defaultThresholds(field, grid))]
    .filter(Number.isFinite)
    .sort((a, b) => a - b);
  if (t.length === 0) return [];
  const [, max] = range(values);
  const { nx, ny, cellCm, width, height } = grid;
  const gen = contours().size([nx, ny]).thresholds(t);
  const regions = gen(Array.from(values));
  const scale = (r: [number, number][]): Ring =>
    r.map(([x, y]) => [Math.min(width, x * cellCm), Math.min(height, y * cellCm)] as [number, number]);
  const ringsOf = (k: number): Ring[] =>
    (regions[k]?.coordinates ?? []).flatMap((poly) => poly.map((r) => scale(r as [number, number][])));
  const bands: ContourBand[] = [];
  for (let k = 0; k < t.length; k++) {
    const lo = t[k]!;
    const hi = k + 1 < t.length ? t[k + 1]! : Math.max(max, lo);
    const rings = k + 1 < t.length ? [...ringsOf(k), ...ringsOf(k + 1)] : ringsOf(k);
    if (rings.length === 0) continue;
    const polygons = ringsToPolygons(rings);
    if (polygons.length) bands.push({ lo, hi, polygons });
  }
  return bands;
}
