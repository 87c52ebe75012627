import { inv } from 'mathjs';
import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { aicc, mean, tQuantile975 } from './stats';

/**
 * Decay fit of one lamp's output over time.
 *
 * Input points are readings already normalised to one distance (30 cm, see normalise.ts), in one unit.
 * The fit works on the logarithm of the readings: a radiometer's error is roughly a fixed percentage of
 * the reading (meter makers quote accuracy as ± % of reading), so equal weights in log space are the
 * right least-squares weights, and an exponential becomes a straight line.
 *
 * Models, simplest first:
 *  - `exponential`  E(t) = E0·exp(−t/τ), by linear least squares on ln E. Standard errors come from the
 *    covariance s²(XᵀX)⁻¹; the band is the 95 % confidence band of the fitted curve (Student t).
 *  - `two-phase`    E(t) = E0·(f·exp(−t/τ1) + (1−f)·exp(−t/τ2)) (a fast burn-in drop, then slow wear),
 *    by Levenberg–Marquardt (the `ml-levenberg-marquardt` package); kept only with enough points and when the corrected AIC prefers it.
 *  - `default-scaled` E(t) = s·D(t): the technology's default curve D scaled to the readings — used with
 *    one reading, or when the readings show no decline yet. Always marked uncertain, no band.
 */

export type DecayPoint = { days: number; value: number };
export type DefaultDecay = (days: number) => number;

export type Certainty = 'none' | 'uncertain' | 'fitted';

type Common = { n: number; certainty: Certainty; note: string };
export type ExponentialFit = Common & {
  kind: 'exponential';
  e0: number;
  tauDays: number;
  /** Covariance of (ln E0, rate) with rate = −1/τ; null when there are no residual degrees of freedom. */
  cov: [[number, number], [number, number]] | null;
  dof: number;
  e0Se: number | null;
  tauSe: number | null;
  /** Root-mean-square residual in log space (≈ relative scatter of the readings about the curve). */
  rmsLog: number | null;
};
export type TwoPhaseFit = Common & {
  kind: 'two-phase';
  e0: number;
  f: number;
  tau1Days: number;
  tau2Days: number;
  /** Internal parameters [ln E0, logit f, ln τ1, ln τ2] and their covariance. */
  p: number[];
  cov: number[][];
  dof: number;
  rmsLog: number;
};
export type ScaledDefaultFit = Common & { kind: 'default-scaled'; scale: number };
export type NoFit = Common & { kind: 'none' };
export type DecayFit = ExponentialFit | TwoPhaseFit | ScaledDefaultFit | NoFit;

const LN_FLOOR = 1e-9;

export function fitDecay(points: readonly DecayPoint[], defaultDecay: DefaultDecay): DecayFit {
  const pts = points.filter((p) => Number.isFinite(p.days) && p.days >= 0 && p.value > 0);
  const n = pts.length;
  if (n === 0) return { kind: 'none', n: 0, certainty: 'none', note: 'No readings yet.' };
  if (n === 1) {
    return scaledDefault(
      pts,
      defaultDecay,
      'One reading: the technology’s usual curve, scaled to it. Uncertain.',
    );
  }
  const spanDays = Math.max(...pts.map((p) => p.days)) - Math.min(...pts.map((p) => p.days));
  if (spanDays < 1) {
    return scaledDefault(pts, defaultDecay, 'All readings on one day: the usual curve, scaled. Uncertain.');
  }
  const exp = fitExponential(pts);
  if (!exp || exp.tauDays <= 0 || !Number.isFinite(exp.tauDays)) {
    return scaledDefault(
      pts,
      defaultDecay,
      'The readings show no decline yet: the usual curve, scaled to them. Uncertain until a later reading.',
    );
  }
  if (n >= 7) {
    const two = fitTwoPhase(pts, exp);
    if (two) {
      const rssExp = (exp.rmsLog ?? 0) ** 2 * n;
      const rssTwo = two.rmsLog ** 2 * n;
      // Prefer the simpler curve unless the richer one is clearly better (ΔAICc > 2, Burnham & Anderson 2002).
      if (aicc(rssTwo, n, 4) < aicc(rssExp, n, 2) - 2) return two;
    }
  }
  return exp;
}

function scaledDefault(pts: readonly DecayPoint[], d: DefaultDecay, note: string): ScaledDefaultFit {
  // Least squares in log space for the one parameter: the geometric mean of value / D(t).
  const logs = pts.map((p) => Math.log(p.value) - Math.log(Math.max(d(p.days), LN_FLOOR)));
  return { kind: 'default-scaled', n: pts.length, certainty: 'uncertain', scale: Math.exp(mean(logs)), note };
}

/** Ordinary least squares of ln E = a + b·t. */
export function fitExponential(pts: readonly DecayPoint[]): ExponentialFit | null {
  const n = pts.length;
  const ts = pts.map((p) => p.days);
  const ys = pts.map((p) => Math.log(p.value));
  const tm = mean(ts);
  const ym = mean(ys);
  let sxx = 0;
  let sxy = 0;
  for (let i = 0; i < n; i++) {
    sxx += ((ts[i] as number) - tm) ** 2;
    sxy += ((ts[i] as number) - tm) * ((ys[i] as number) - ym);
  }
  if (sxx <= 0) return null;
  const b = sxy / sxx;
  const a = ym - b * tm;
  const dof = n - 2;
  let rss = 0;
  for (let i = 0; i < n; i++) rss += ((ys[i] as number) - a - b * (ts[i] as number)) ** 2;
  const e0 = Math.exp(a);
  const tauDays = -1 / b;
  let cov: ExponentialFit['cov'] = null;
  let e0Se: number | null = null;
  let tauSe: number | null = null;
  if (dof > 0) {
    const s2 = rss / dof;
    // (XᵀX)⁻¹ for X = [1 t]: standard simple-regression formulas.
    const vb = s2 / sxx;
    const va = s2 * (1 / n + (tm * tm) / sxx);
    const cab = (-tm * s2) / sxx;
    cov = [
      [va, cab],
      [cab, vb],
    ];
    // Delta method: se(E0) = E0·se(a); τ = −1/b so se(τ) = se(b)/b².
    e0Se = e0 * Math.sqrt(va);
    tauSe = Math.sqrt(vb) / (b * b);
  }
  const certainty: Certainty = n >= 3 ? 'fitted' : 'uncertain';
  const note =
    n >= 3
      ? `Exponential fit to ${n} readings.`
      : 'Two readings: a curve through both, with no way to tell its error. Uncertain.';
  return {
    kind: 'exponential',
    n,
    certainty,
    note,
    e0,
    tauDays,
    cov,
    dof,
    e0Se,
    tauSe,
    rmsLog: n > 0 ? Math.sqrt(rss / n) : null,
  };
}

// ---- two-phase model, fitted by Levenberg–Marquardt (ml-levenberg-marquardt) --------------------------
// Unconstrained parameters p = [ln E0, logit f, ln τ1, ln τ2], so every step of the optimiser is a valid
// curve; the model is fitted in log space like the exponential (equal weights on ln E).

const sigmoid = (x: number) => 1 / (1 + Math.exp(-x));

function twoPhaseLog(p: readonly number[], t: number): number {
  const [lnE0 = 0, lf = 0, lt1 = 0, lt2 = 0] = p;
  const f = sigmoid(lf);
  const v = f * Math.exp(-t / Math.exp(lt1)) + (1 - f) * Math.exp(-t / Math.exp(lt2));
  return lnE0 + Math.log(Math.max(v, 1e-300));
}

/** ∂ ln E(t) / ∂p, analytically: used by the optimiser, the covariance and the band. */
function twoPhaseGradient(p: readonly number[], t: number): number[] {
  const [, lf = 0, lt1 = 0, lt2 = 0] = p;
  const f = sigmoid(lf);
  const tau1 = Math.exp(lt1);
  const tau2 = Math.exp(lt2);
  const a = Math.exp(-t / tau1);
  const b = Math.exp(-t / tau2);
  const v = Math.max(f * a + (1 - f) * b, 1e-300);
  return [1, (f * (1 - f) * (a - b)) / v, (f * a * (t / tau1)) / v, ((1 - f) * b * (t / tau2)) / v];
}

function runLm(p0: number[], pts: readonly DecayPoint[]): { p: number[]; rss: number } {
  let fitted: { parameterValues: number[] };
  try {
    fitted = lmFrom(p0, pts);
  } catch {
    // A start that wanders where exp() overflows leaves the package a non-finite normal matrix, and its
    // Cholesky step throws ("Matrix is not symmetric"). That start found nothing: the other starts, or
    // the exponential, decide; a throw here would stop every outlook of the organisation being stored.
    return { p: p0, rss: Number.POSITIVE_INFINITY };
  }
  const p = [...fitted.parameterValues];
  const rss = pts.reduce((s, q) => s + (Math.log(q.value) - twoPhaseLog(p, q.days)) ** 2, 0);
  return { p, rss };
}

function lmFrom(p0: number[], pts: readonly DecayPoint[]) {
  return levenbergMarquardt(
    { x: pts.map((q) => q.days), y: pts.map((q) => Math.log(q.value)) },
    (p) => (t) => twoPhaseLog(p, t),
    {
      initialValues: p0,
      jacobianFunction: (p) => (t) => twoPhaseGradient(p, t),
      // The package stops once the sum of squares is below `errorTolerance` (0.01 by default): a few
      // readings with a percent of meter scatter are already below that, so ask for a true minimum.
      errorTolerance: 1e-14,
      maxIterations: 300,
      damping: 1e-3,
    },
  );
}

function fitTwoPhase(pts: readonly DecayPoint[], exp: ExponentialFit): TwoPhaseFit | null {
  const n = pts.length;
  const tMax = Math.max(...pts.map((q) => q.days));
  let best: { p: number[]; rss: number } | null = null;
  // A few starts: the fast phase lasting a few days to a few weeks, the slow one around the exponential's τ.
  for (const fast of [0.03, 0.1, 0.3]) {
    for (const fFast of [0.15, 0.35]) {
      const start = [
        Math.log(exp.e0 * 1.1),
        Math.log(fFast / (1 - fFast)),
        Math.log(Math.max(1, fast * tMax)),
        Math.log(Math.max(exp.tauDays * 1.5, tMax)),
      ];
      const res = runLm(start, pts);
      if (Number.isFinite(res.rss) && (!best || res.rss < best.rss)) best = res;
    }
  }
  if (!best) return null;
  let p = best.p;
  // Keep phase 1 the fast one (the model is symmetric under swapping the phases).
  if ((p[2] as number) > (p[3] as number))
    p = [p[0] as number, -(p[1] as number), p[3] as number, p[2] as number];
  const J = pts.map((q) => twoPhaseGradient(p, q.days));
  const JtJ = p.map((_, a) =>
    p.map((__, b) => J.reduce((s, row) => s + (row[a] as number) * (row[b] as number), 0)),
  );
  let cov: number[][];
  try {
    const s2 = best.rss / (n - 4);
    cov = (inv(JtJ) as number[][]).map((row) => row.map((v) => v * s2));
  } catch {
    return null;
  }
  if (!cov.every((row) => row.every(Number.isFinite))) return null;
  const f = sigmoid(p[1] as number);
  const tau1Days = Math.exp(p[2] as number);
  const tau2Days = Math.exp(p[3] as number);
  // A phase faster than a day, or one not visibly separate from the other, is not supported by the data.
  if (tau1Days < 1 || tau2Days / tau1Days < 2 || f < 0.01 || f > 0.99) return null;
  return {
    kind: 'two-phase',
    n,
    certainty: 'fitted',
    note: `Two-phase fit (a fast early drop, then slow wear) to ${n} readings.`,
    e0: Math.exp(p[0] as number),
    f,
    tau1Days,
    tau2Days,
    p,
    cov,
    dof: n - 4,
    rmsLog: Math.sqrt(best.rss / n),
  };
}

/**
 * The two-phase model refitted to other points from a known solution (one Levenberg–Marquardt run, no
 * model choice): the population curve's lamp-resampling band refits the curve it chose this way.
 */
export function refitTwoPhase(pts: readonly DecayPoint[], from: TwoPhaseFit): TwoPhaseFit | null {
  const res = runLm([...from.p], pts);
  if (!Number.isFinite(res.rss)) return null;
  return {
    ...from,
    n: pts.length,
    p: res.p,
    e0: Math.exp(res.p[0] as number),
    rmsLog: Math.sqrt(res.rss / pts.length),
  };
}

// ---- using a fit ------------------------------------------------------------------------------------

/** The fitted output at `days` since first use (same unit and distance as the points). */
export function predict(fit: DecayFit, days: number, defaultDecay: DefaultDecay): number | null {
  switch (fit.kind) {
    case 'none':
      return null;
    case 'default-scaled':
      return fit.scale * defaultDecay(days);
    case 'exponential':
      return fit.e0 * Math.exp(-days / fit.tauDays);
    case 'two-phase':
      return Math.exp(twoPhaseLog(fit.p, days));
  }
}

/**
 * 95 % confidence band of the fitted curve at `days` (the curve's uncertainty, not a single new reading's),
 * or null when the fit has no error estimate.
 */
export function band(fit: DecayFit, days: number): [number, number] | null {
  if (fit.kind === 'exponential' && fit.cov) {
    const [[va, cab], [, vb]] = fit.cov;
    const rate = -1 / fit.tauDays;
    const ln = Math.log(fit.e0) + rate * days;
    const sd = Math.sqrt(Math.max(0, va + 2 * days * cab + days * days * vb));
    const q = tQuantile975(fit.dof);
    return [Math.exp(ln - q * sd), Math.exp(ln + q * sd)];
  }
  if (fit.kind === 'two-phase') {
    const g = twoPhaseGradient(fit.p, days);
    let v = 0;
    for (let a = 0; a < g.length; a++)
      for (let b = 0; b < g.length; b++)
        v += (g[a] as number) * (fit.cov[a]![b] as number) * (g[b] as number);
    const ln = twoPhaseLog(fit.p, days);
    const q = tQuantile975(fit.dof);
    const sd = Math.sqrt(Math.max(0, v));
    return [Math.exp(ln - q * sd), Math.exp(ln + q * sd)];
  }
  return null;
}

/**
 * First day (searching forward from `fromDays`, up to `maxDays`) on which `curve` falls below `threshold`,
 * or null if it stays above. Curves here only fall, but a bisection on a coarse scan is safe either way.
 */
export function firstDayBelow(
  curve: (days: number) => number | null,
  threshold: number,
  fromDays: number,
  maxDays: number,
): number | null {
  const step = 7;
  let prev = fromDays;
  const v0 = curve(fromDays);
  if (v0 === null) return null;
  if (v0 < threshold) return fromDays;
  for (let t = fromDays + step; t <= maxDays + step; t += step) {
    const tt = Math.min(t, maxDays);
    const v = curve(tt);
    if (v === null) return null;
    if (v < threshold) {
      let lo = prev;
      let hi = tt;
      while (hi - lo > 0.5) {
        const mid = (lo + hi) / 2;
        if ((curve(mid) ?? Infinity) < threshold) hi = mid;
        else lo = mid;
      }
      return Math.ceil(hi);
    }
    prev = tt;
    if (tt >= maxDays) break;
  }
  return null;
}

/** Points of the curve and its band for a chart, from day `from` to day `to`. */
export function sampleCurve(
  fit: DecayFit,
  defaultDecay: DefaultDecay,
  from: number,
  to: number,
  count = 60,
): { days: number; value: number; lo: number | null; hi: number | null }[] {
  if (fit.kind === 'none' || to <= from) return [];
  const out = [];
  for (let i = 0; i <= count; i++) {
    const days = from + ((to - from) * i) / count;
    const value = predict(fit, days, defaultDecay) as number;
    const b = band(fit, days);
    out.push({ days, value, lo: b ? b[0] : null, hi: b ? b[1] : null });
  }
  return out;
}
