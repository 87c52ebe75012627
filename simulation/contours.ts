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

/**
 * A high quantile of the field, so the cells right under a lamp (where the fields rise steeply) do not
 * flatten the scale: the 90th percentile for UVB and the 95th for temperature. Higher values fall in the
 * last band.
 */
const SCALE_QUANTILE = { uvb: 0.9, tempC: 0.95 } as const;

function robustMax(values: Float32Array, q: number): number {
  // A strided sample of at most ~4096 cells is plenty for a scale; typed-array sort is numeric and fast.
  const step = Math.max(1, Math.floor(values.length / 4096));
  const sample = new Float32Array(Math.ceil(values.length / step));
  for (let k = 0, m = 0; k < values.length; k += step) sample[m++] = values[k]!;
  sample.sort();
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
  const top = robustMax(values, SCALE_QUANTILE[field]);
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

function pointInRing(px: number, py: number, r: Ring): boolean {
  let inside = false;
  for (let k = 0, n = r.length, m = n - 1; k < n; m = k++) {
    const a = r[k]!;
    const b = r[m]!;
    if (a[1] > py !== b[1] > py && px < ((b[0] - a[0]) * (py - a[1])) / (b[1] - a[1]) + a[0])
      inside = !inside;
  }
  return inside;
}

interface RingInfo {
  ring: Ring;
  area: number;
  /** A vertex off the grid border, or null for a ring that runs all round the border. */
  probe: [number, number] | null;
  box: [number, number, number, number];
}

/**
 * Turn rings from nested regions into disjoint polygons by nesting parity. Rings of different thresholds
 * never cross and meet only along the grid border, and a vertex off the border lies on exactly one ring,
 * so one such vertex decides containment.
 */
function ringsToPolygons(input: Ring[], maxX: number, maxY: number): [number, number][][][] {
  const eps = 1e-9 * Math.max(1, maxX, maxY);
  const onBorder = (p: [number, number]) =>
    p[0] <= eps || p[1] <= eps || p[0] >= maxX - eps || p[1] >= maxY - eps;
  const all: RingInfo[] = input.map((ring) => {
    let x0 = Infinity;
    let y0 = Infinity;
    let x1 = -Infinity;
    let y1 = -Infinity;
    let probe: [number, number] | null = null;
    for (const p of ring) {
      if (p[0] < x0) x0 = p[0];
      if (p[0] > x1) x1 = p[0];
      if (p[1] < y0) y0 = p[1];
      if (p[1] > y1) y1 = p[1];
      if (!probe && !onBorder(p)) probe = p;
    }
    return { ring, area: signedArea(ring), probe, box: [x0, y0, x1, y1] };
  });
  // Rings running all round the border are the same outline: pairs cancel in parity.
  const border = all.filter((r) => r.probe === null);
  const rings = all.filter((r) => r.probe !== null);
  if (border.length % 2 === 1) rings.unshift(border[0]!);
  const n = rings.length;
  const parents: number[][] = rings.map(() => []);
  for (let a = 0; a < n; a++) {
    const ra = rings[a]!;
    for (let b = 0; b < n; b++) {
      if (a === b) continue;
      const rb = rings[b]!;
      if (rb.probe === null) {
        parents[a]!.push(b);
        continue;
      }
      if (ra.probe === null || Math.abs(ra.area) > Math.abs(rb.area)) continue;
      const [ax0, ay0, ax1, ay1] = ra.box;
      const [bx0, by0, bx1, by1] = rb.box;
      if (ax0 < bx0 - eps || ay0 < by0 - eps || ax1 > bx1 + eps || ay1 > by1 + eps) continue;
      if (pointInRing(ra.probe[0], ra.probe[1], rb.ring)) parents[a]!.push(b);
    }
  }
  const polys = new Map<number, [number, number][][]>();
  const orient = (r: RingInfo, ccw: boolean): Ring => (r.area > 0 === ccw ? r.ring : [...r.ring].reverse());
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
  // d3-contour only indexes the values, so the typed array is passed as it is.
  const regions = gen(values as unknown as number[]);
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
    const polygons = ringsToPolygons(rings, Math.min(width, nx * cellCm), Math.min(height, ny * cellCm));
    if (polygons.length) bands.push({ lo, hi, polygons });
  }
  return bands;
}
