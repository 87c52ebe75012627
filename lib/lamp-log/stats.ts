/**
 * Small statistics helpers for the decay fit. Kept apart so the fit file reads as the method only.
 */

/**
 * Two-sided 95 % quantile of Student's t distribution (t_0.975) by degrees of freedom.
 * Values from the standard t table (e.g. NIST/SEMATECH e-Handbook of Statistical Methods, §1.3.6.7.2).
 * Beyond 30 degrees of freedom the normal value 1.96 is used (the table's ∞ row), which is
 * slightly narrow below ~60 dof; conservative enough for a meter log.
 */
const T975 = [
  12.706, 4.303, 3.182, 2.776, 2.571, 2.447, 2.365, 2.306, 2.262, 2.228, 2.201, 2.179, 2.16, 2.145, 2.131,
  2.12, 2.11, 2.101, 2.093, 2.086, 2.08, 2.074, 2.069, 2.064, 2.06, 2.056, 2.052, 2.048, 2.045, 2.042,
];

export function tQuantile975(dof: number): number {
  if (!Number.isFinite(dof) || dof < 1) return Number.POSITIVE_INFINITY;
  const k = Math.floor(dof);
  return k <= T975.length ? (T975[k - 1] as number) : 1.96;
}

/** Corrected Akaike information criterion for a least-squares fit (Hurvich & Tsai 1989). */
export function aicc(rss: number, n: number, k: number): number {
  if (n - k - 1 <= 0) return Number.POSITIVE_INFINITY;
  const r = Math.max(rss, 1e-300);
  return n * Math.log(r / n) + 2 * k + (2 * k * (k + 1)) / (n - k - 1);
}

export function mean(xs: readonly number[]): number {
  return xs.reduce((s, x) => s + x, 0) / xs.length;
}

/** A deterministic pseudo-random generator (mulberry32) for reproducible test data. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
