/**
 * Key figures of one variant, for the comparison table and the reports. Pure (engine only), so the
 * compare page computes them in the browser and the reports on the server, identically.
 *
 * The fields are highest right under a lamp, where no animal can be; figures about basking therefore
 * read the surfaces an animal can stand on — the engine's own reachable surfaces (floor, tops of
 * perches, ledges and hides), the same ones its species check reads.
 */
import { probe, reachableSurfaces, UV_REFUGE_UVI, type Design, type FieldGrid } from '@/simulation';

/** UV Index below which a place counts as UV-free shade: the engine's own refuge limit. */
export const UV_FREE_UVI = UV_REFUGE_UVI;

export type SurfacePoint = { x: number; y: number; surface: 'floor' | 'perch' | 'ledge' | 'hide' | 'screen' };

/** Sample points along every surface an animal can reach. */
export function surfacePoints(design: Design): SurfacePoint[] {
  return reachableSurfaces(design).map((s) => ({ x: s.x, y: s.y, surface: s.kind }));
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

export function keyFigures(design: Design, grid: FieldGrid, opts: { addMonths?: number } = {}): KeyFigures {
  const points = surfacePoints(design);
  const readings = probe(design, points, opts).map((r, i) => ({
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
