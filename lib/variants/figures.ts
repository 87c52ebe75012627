/**
 * Key figures of one variant, for the comparison table and the reports. Pure (engine only), so the
 * compare page computes them in the browser and the reports on the server, identically.
 *
 * The fields are highest right under a lamp, where no animal can be; figures about basking therefore
 * read the surfaces an animal can stand on: the floor, the tops of ledges and hides, and the top of
 * each perch — probed a few millimetres above the surface, as a thermometer or meter would be held.
 */
import { probe, UV_REFUGE_UVI, type Design, type FieldGrid, type ProbeResult } from '@/simulation';

/** Distance between sampled points along a surface, cm. */
const STEP_CM = 1;
/** Height above a surface at which it is read, cm. */
const ABOVE_CM = 0.3;

/** UV Index below which a place counts as UV-free shade: the engine's own refuge limit. */
export const UV_FREE_UVI = UV_REFUGE_UVI;

export type SurfacePoint = { x: number; y: number; surface: string };

type Box = { x: number; y: number; width: number; height: number };
const inside = (b: Box, x: number, y: number) =>
  x > b.x && x < b.x + b.width && y > b.y && y < b.y + b.height;

/** Points along every upward-facing surface inside the enclosure, not buried in a ledge. */
export function surfacePoints(design: Design): SurfacePoint[] {
  const { width, height } = design.enclosure;
  const ledges = design.objects.filter((o) => o.type === 'ledge');
  const out: SurfacePoint[] = [];
  const add = (x: number, y: number, surface: string) => {
    if (x < 0 || x > width || y < 0 || y > height) return;
    if (ledges.some((l) => inside(l, x, y))) return;
    out.push({ x, y, surface });
  };
  const along = (x1: number, x2: number, y: (x: number) => number, surface: string) => {
    const lo = Math.max(0, Math.min(x1, x2));
    const hi = Math.min(width, Math.max(x1, x2));
    const n = Math.max(1, Math.round((hi - lo) / STEP_CM));
    for (let k = 0; k <= n; k++) {
      const x = lo + ((hi - lo) * k) / n;
      add(x, y(x), surface);
    }
  };
  along(0, width, () => ABOVE_CM, 'floor');
  for (const o of design.objects) {
    if (o.type === 'ledge' || o.type === 'hide') {
      along(o.x, o.x + o.width, () => o.y + o.height + ABOVE_CM, o.type === 'ledge' ? 'ledge' : 'hide');
    } else if (o.type === 'perch') {
      if (Math.abs(o.x2 - o.x1) < 1e-6) continue; // upright: no top to stand on
      const slope = (o.y2 - o.y1) / (o.x2 - o.x1);
      // The top edge of a thick segment lies half its thickness above the centre line, measured along the normal.
      const lift = (o.thickness / 2) * Math.sqrt(1 + slope * slope) + ABOVE_CM;
      along(o.x1, o.x2, (x) => o.y1 + slope * (x - o.x1) + lift, 'perch');
    }
  }
  return out;
}

export type KeyFigures = {
  /** Highest UV Index on a reachable surface (the basking spot's UV). */
  baskingUviMax: number;
  /** Highest UVB on a reachable surface, µW/cm². */
  baskingUvbMax: number;
  /** Highest surface temperature on a reachable surface (the hot spot), °C. */
  hotSpotC: number;
  /** Lowest surface temperature on the floor (the cool end), °C. */
  coolEndC: number;
  /** Cross-section area below UV_FREE_UVI, cm², and its share of the whole cross-section. */
  uvFreeAreaCm2: number;
  uvFreeShare: number;
  /** Where the hot spot and the UV maximum are. */
  hotSpotAt: { x: number; y: number } | null;
  baskingUviAt: { x: number; y: number } | null;
};

export const KEY_FIGURE_LABELS: Record<
  keyof Omit<KeyFigures, 'hotSpotAt' | 'baskingUviAt'>,
  [string, string]
> = {
  baskingUviMax: ['Basking UV Index (highest on a surface)', ''],
  baskingUvbMax: ['Basking UVB (highest on a surface)', 'µW/cm²'],
  hotSpotC: ['Hot spot (warmest surface)', '°C'],
  coolEndC: ['Cool end (coolest floor)', '°C'],
  uvFreeAreaCm2: [`UV-free area (UV Index below ${UV_FREE_UVI})`, 'cm²'],
  uvFreeShare: ['UV-free share of the cross-section', '%'],
};

export function keyFigures(design: Design, grid: FieldGrid, opts: { addMonths?: number } = {}): KeyFigures {
  const points = surfacePoints(design);
  const readings: (ProbeResult & { surface: string })[] = probe(design, points, opts).map((r, i) => ({
    ...r,
    surface: points[i]!.surface,
  }));
  let uviMax = -Infinity;
  let uvbMax = -Infinity;
  let hot = -Infinity;
  let cool = Infinity;
  let hotAt: KeyFigures['hotSpotAt'] = null;
  let uviAt: KeyFigures['baskingUviAt'] = null;
  for (const r of readings) {
    if (r.uvi > uviMax) [uviMax, uviAt] = [r.uvi, { x: r.x, y: r.y }];
    uvbMax = Math.max(uvbMax, r.uvb);
    if (r.tempC > hot) [hot, hotAt] = [r.tempC, { x: r.x, y: r.y }];
    if (r.surface === 'floor') cool = Math.min(cool, r.tempC);
  }
  const cellArea = grid.cellCm * grid.cellCm;
  let free = 0;
  for (let k = 0; k < grid.uvi.length; k++) if (grid.uvi[k]! < UV_FREE_UVI) free++;
  const fin = (v: number) => (Number.isFinite(v) ? v : 0);
  return {
    baskingUviMax: fin(uviMax),
    baskingUvbMax: fin(uvbMax),
    hotSpotC: fin(hot),
    coolEndC: fin(cool),
    uvFreeAreaCm2: free * cellArea,
    uvFreeShare: grid.uvi.length ? (free / grid.uvi.length) * 100 : 0,
    hotSpotAt: hotAt,
    baskingUviAt: uviAt,
  };
}

/** The hot spot as a marker, only when there is one to speak of (a flat field has no hot spot). */
export function hotSpotMarker(f: KeyFigures): { x: number; y: number; label: string }[] {
  return f.hotSpotAt && f.hotSpotC - f.coolEndC > 0.5 ? [{ ...f.hotSpotAt, label: 'Hot spot' }] : [];
}
