/**
 * Clip a convex polygon (or a segment, 2 vertices) to the horizontal strip ylo ≤ y ≤ yhi.
 * Writes the clipped vertices to outX/outY and returns their count (0 when nothing is left).
 * Allocation-free: the scratch arrays are owned by the caller.
 */
export function clipToStrip(
  xs: readonly number[],
  ys: readonly number[],
  ylo: number,
  yhi: number,
  outX: Float64Array,
  outY: Float64Array,
  tmpX: Float64Array,
  tmpY: Float64Array,
): number {
  const n = xs.length;
  if (n === 2) return clipSegment(xs[0]!, ys[0]!, xs[1]!, ys[1]!, ylo, yhi, outX, outY);
  // Sutherland–Hodgman, first against y >= ylo into tmp, then against y <= yhi into out.
  let m = 0;
  for (let k = 0; k < n; k++) {
    const ax = xs[k]!;
    const ay = ys[k]!;
    const bx = xs[(k + 1) % n]!;
    const by = ys[(k + 1) % n]!;
    const ain = ay >= ylo;
    const bin = by >= ylo;
    if (ain) {
      tmpX[m] = ax;
      tmpY[m] = ay;
      m++;
    }
    if (ain !== bin) {
      const t = (ylo - ay) / (by - ay);
      tmpX[m] = ax + t * (bx - ax);
      tmpY[m] = ylo;
      m++;
    }
  }
  let c = 0;
  for (let k = 0; k < m; k++) {
    const ax = tmpX[k]!;
    const ay = tmpY[k]!;
    const bx = tmpX[(k + 1) % m]!;
    const by = tmpY[(k + 1) % m]!;
    const ain = ay <= yhi;
    const bin = by <= yhi;
    if (ain) {
      outX[c] = ax;
      outY[c] = ay;
      c++;
    }
    if (ain !== bin) {
      const t = (yhi - ay) / (by - ay);
      outX[c] = ax + t * (bx - ax);
      outY[c] = yhi;
      c++;
    }
  }
  return c;
}

function clipSegment(
  x1: number,
  y1: number,
  x2: number,
  y2: number,
  ylo: number,
  yhi: number,
  outX: Float64Array,
  outY: Float64Array,
): number {
  let t0 = 0;
  let t1 = 1;
  const dy = y2 - y1;
  if (dy === 0) {
    if (y1 < ylo || y1 > yhi) return 0;
  } else {
    let ta = (ylo - y1) / dy;
    let tb = (yhi - y1) / dy;
    if (ta > tb) {
      const s = ta;
      ta = tb;
      tb = s;
    }
    if (ta > t0) t0 = ta;
    if (tb < t1) t1 = tb;
    if (t0 > t1) return 0;
  }
  const dx = x2 - x1;
  outX[0] = x1 + t0 * dx;
  outY[0] = y1 + t0 * dy;
  outX[1] = x1 + t1 * dx;
  outY[1] = y1 + t1 * dy;
  return 2;
}
