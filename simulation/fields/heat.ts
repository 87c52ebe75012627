/**
 * Surface temperature of a small dark matte surface in radiant heat, and the air around it.
 *
 * Steady state, no conduction into the substrate (a conservative, i.e. warm, estimate):
 *   q = h_c (Ts − Ta) + εσ (Ts⁴ − Ta⁴)     (kelvin)
 * with q = α·E_IR the absorbed radiant flux (Incropera, Fundamentals of Heat and Mass Transfer: surface
 * energy balance; natural convection h_c ≈ 5–10 W/m²K). The surroundings are taken to be at the local air
 * temperature. Solved by Newton's method, which converges monotonically from above because the
 * left-hand side is convex in Ts.
 */

import { DEFAULT_WALLS, WALLS, type WallMaterial } from '../model/walls';

export const STEFAN_BOLTZMANN = 5.670374419e-8; // W/m²K⁴ (CODATA 2018)
export const KELVIN = 273.15;

/** Defaults: a dark matte surface (α = ε = 0.95) in still air (h_c = 7 W/m²K, Incropera's natural-convection range 5–10). */
export const HEAT_DEFAULTS = { absorptance: 0.95, emissivity: 0.95, convection: 7 } as const;

export interface HeatParams {
  absorptance: number;
  emissivity: number;
  /** Convection coefficient h_c, W/m²K. */
  convection: number;
}

/** Surface temperature (°C) for absorbed flux q (W/m²) in air at airC (°C). */
export function surfaceTempC(q: number, airC: number, emissivity: number, hc: number): number {
  if (!(q > 0)) return airC;
  const b = balanceAt(airC, emissivity, hc);
  return solveBalance(q, b.ta, b.ta4, b.es, hc, b.a1, b.a11, b.a24, POINT_STEP_K) - KELVIN;
}

/**
 * Newton stops once a step is under this (kelvin). After a step s the error left is at most (1.5/T)·s²
 * (solveBalance): a point value (surfaceTempC) is exact to 1e-8 K; a grid cell (finishRow) to
 * 1.5/300 × 0.05² ≈ 1.3e-5 K — a few units in the last place of a float32 temperature near 30 °C (one unit
 * is 1.9e-6 K) — and it usually saves the second step (the first guess is within a few hundredths of a
 * kelvin at usual fluxes).
 */
const POINT_STEP_K = 1e-3;
export const ROW_STEP_K = 0.05;

/** A grid row's totals (RowTotals): UVB, UV Index and radiant irradiance (W/m²) per cell. */
export interface RowValues {
  u: Float64Array;
  v: Float64Array;
  q: Float64Array;
}

/** A grid's result fields, cell (i, j) at j·nx + i. */
export interface GridFields {
  uvb: Float32Array | Float64Array;
  uvi: Float32Array | Float64Array;
  tempC: Float32Array | Float64Array;
}

/**
 * Cells from..to−1 of a row at one air temperature into the grid fields at base + c, in one pass: UVB and
 * UV Index as summed, and surfaceTempC of the radiant irradiance (absorbed with `absorptance`). The
 * constants of the balance are worked out once for the row, and Newton stops at ROW_STEP_K.
 */
export function finishRow(
  row: RowValues,
  from: number,
  to: number,
  airC: number,
  absorptance: number,
  emissivity: number,
  hc: number,
  out: GridFields,
  base: number,
): void {
  const b = balanceAt(airC, emissivity, hc);
  const { u, v, q: e } = row;
  const { uvb, uvi, tempC } = out;
  for (let c = from; c < to; c++) {
    uvb[base + c] = u[c]!;
    uvi[base + c] = v[c]!;
    tempC[base + c] = cellTempC(absorptance * e[c]!, b, hc, airC);
  }
}

/** The constants of the surface balance at one air temperature (balanceAt), for cellTempC. */
export type Balance = ReturnType<typeof balanceAt>;

/**
 * finishRow's temperature (°C) of one grid cell absorbing q (W/m²), for callers that sum a cell's
 * irradiance and solve it in one pass; b from balanceAt at the row's air temperature airC.
 */
export function cellTempC(q: number, b: Balance, hc: number, airC: number): number {
  return q > 0 ? solveBalance(q, b.ta, b.ta4, b.es, hc, b.a1, b.a11, b.a24, ROW_STEP_K) - KELVIN : airC;
}

export function balanceAt(airC: number, emissivity: number, hc: number) {
  const ta = airC + KELVIN;
  const es = emissivity * STEFAN_BOLTZMANN;
  const ta2 = ta * ta;
  const a1 = hc + 4 * es * ta2 * ta;
  // a2 = 6·εσ·Ta², the quadratic term of the balance around Ta; a24 = 4·a2.
  return { ta, ta4: ta2 * ta2, es, a1, a11: a1 * a1, a24: 24 * es * ta2 };
}

/** The balance's root in kelvin for q > 0 (constants from balanceAt). */
function solveBalance(
  q: number,
  ta: number,
  ta4: number,
  es: number,
  hc: number,
  a1: number,
  a11: number,
  a24: number,
  stepK: number,
): number {
  // First guess: the root of the balance cut after its quadratic term in x = Ts − Ta,
  // a2·x² + a1·x = q. The terms left out (4εσTa·x³ + εσx⁴) are positive for x > 0, so the guess lies
  // above the root and Newton decreases monotonically from it (the balance is convex); it is already
  // within a few hundredths of a kelvin at usual fluxes, one or two steps fewer than starting from the
  // linear guess q/a1. Newton's error after a step of size s is at most f''/(2f')·s² ≤ (1.5/T)·s²
  // (f' ≥ 4εσT³, f'' = 12εσT²): below 1e-8 K once a step is under 1e-3 K (see POINT_STEP_K).
  let t = ta + (2 * q) / (a1 + Math.sqrt(a11 + a24 * q));
  for (let k = 0; k < 30; k++) {
    const t3 = t * t * t;
    const f = hc * (t - ta) + es * (t3 * t - ta4) - q;
    const step = f / (hc + 4 * es * t3);
    t -= step;
    if (Math.abs(step) < stepK) break;
  }
  return t;
}

/**
 * Air temperature model (this engine's own simple assumption, to be checked with a thermometer):
 * lamp heat that enters the enclosure leaves through its walls, so the warmest air, under the lid, is
 * ΔT_top = P_in / (U · A) above the room, with A the area of all six faces and U the walls' overall
 * coefficient (model/walls.ts: glass 5 W/m²K, wood and PVC 2.5, mesh 15 — from memory). The air is at room temperature in the lower half
 * and warms linearly through the upper half to ΔT_top at the top. Lamps inside the enclosure count in full;
 * lamps outside (on the lid) count at half their power, since much of their heat escapes above the lid
 * (from memory). With no lamps every cell reads the room temperature exactly.
 */
export const AIR_MODEL = { wallU: WALLS[DEFAULT_WALLS].uWm2K, outsideShare: 0.5, maxRiseK: 30 } as const;

export function topAirRiseK(
  lamps: { watts: number; y: number }[],
  enclosure: { width: number; height: number; depth: number; walls?: WallMaterial },
): number {
  let p = 0;
  for (const l of lamps) p += l.watts * (l.y <= enclosure.height ? 1 : AIR_MODEL.outsideShare);
  if (!(p > 0)) return 0;
  const { width: w, height: h, depth: d } = enclosure;
  const areaM2 = (2 * (w * h + w * d + h * d)) / 1e4;
  const u = WALLS[enclosure.walls ?? DEFAULT_WALLS].uWm2K;
  return Math.min(AIR_MODEL.maxRiseK, p / (u * areaM2));
}

/** Air temperature (°C) at height y in an enclosure of height H. */
export function airTempC(y: number, height: number, roomC: number, riseK: number): number {
  if (riseK === 0) return roomC;
  const s = (y - height / 2) / (height / 2);
  return roomC + riseK * Math.min(1, Math.max(0, s));
}
