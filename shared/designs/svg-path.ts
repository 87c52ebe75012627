/**
 * SVG path data for contour bands, made small: the engine's rings carry a point at every cell edge they
 * cross (long straight runs along walls and the lid, gentle curves at half-centimetre steps), and the
 * share page sends its picture twice (HTML and the React payload). Points that lie within `tolerance`
 * of the line through their neighbours are dropped (Douglas–Peucker) and coordinates are rounded to
 * a hundredth of a centimetre: far below a pixel at any size the page is drawn.
 */
type Point = [number, number];

/** Largest deviation allowed, in cm: a tenth of the smallest cell the engine uses (0.5 cm). */
export const PATH_TOLERANCE_CM = 0.05;

function distanceToLine(p: Point, a: Point, b: Point): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len = Math.hypot(dx, dy);
  if (len === 0) return Math.hypot(p[0] - a[0], p[1] - a[1]);
  return Math.abs(dy * p[0] - dx * p[1] + b[0] * a[1] - b[1] * a[0]) / len;
}

/** The points of an open polyline that Douglas–Peucker keeps (first and last always). */
export function simplifyLine(points: readonly Point[], tolerance = PATH_TOLERANCE_CM): Point[] {
  if (points.length <= 2) return [...points];
  const keep = new Uint8Array(points.length);
  keep[0] = 1;
  keep[points.length - 1] = 1;
  // An explicit stack: rings of many thousand points would overflow a recursive version.
  const stack: [number, number][] = [[0, points.length - 1]];
  while (stack.length) {
    const [from, to] = stack.pop()!;
    let far = -1;
    let farthest = tolerance;
    for (let i = from + 1; i < to; i++) {
      const d = distanceToLine(points[i]!, points[from]!, points[to]!);
      if (d > farthest) [far, farthest] = [i, d];
    }
    if (far >= 0) {
      keep[far] = 1;
      stack.push([from, far], [far, to]);
    }
  }
  return points.filter((_, i) => keep[i] === 1);
}

const num = (v: number) => String(Math.round(v * 100) / 100);

/** The points of a closed ring that Douglas–Peucker keeps (without the repeated closing point). */
export function simplifyRing(ring: readonly Point[], tolerance = PATH_TOLERANCE_CM): Point[] {
  if (ring.length === 0) return [];
  // Closed rings repeat their first point at the end; split at the point farthest from the start so
  // both halves are open polylines that Douglas–Peucker handles well.
  let split = 0;
  let best = -1;
  for (let i = 1; i < ring.length; i++) {
    const d = Math.hypot(ring[i]![0] - ring[0]![0], ring[i]![1] - ring[0]![1]);
    if (d > best) [split, best] = [i, d];
  }
  const first = simplifyLine(ring.slice(0, split + 1), tolerance);
  const second = simplifyLine([...ring.slice(split), ring[0]!], tolerance);
  return [...first, ...second.slice(1, -1)];
}

/** One closed ring as `M…L…Z`, simplified. */
export function ringPath(ring: readonly Point[], tolerance = PATH_TOLERANCE_CM): string {
  if (ring.length === 0) return '';
  const points = simplifyRing(ring, tolerance);
  return `M${points.map((p) => `${num(p[0])},${num(p[1])}`).join('L')}Z`;
}

/** A band's polygons (outer rings and holes) as one path, for `fill-rule: evenodd`. */
export function bandPath(polygons: readonly (readonly (readonly Point[])[])[], tolerance?: number): string {
  return polygons.map((poly) => poly.map((ring) => ringPath(ring, tolerance)).join('')).join('');
}
