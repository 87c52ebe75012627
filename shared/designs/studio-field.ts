/**
 * The field the studio shows when it opens, computed exactly as the studio computes it (the same cell
 * size, no ageing, the same thresholds and contour bands as its contour worker), so the server can send
 * it with the page and the studio can draw it before its own worker answers; when that answer arrives
 * its bands are the same and nothing on screen moves. Pure (engine only).
 */
import {
  computeFields,
  contourBands,
  defaultThresholds,
  parseDesign,
  physicsOf,
  recycleFields,
  type ContourBand,
  type Design,
  type FieldName,
} from '@/simulation';
import { cellSizeFor } from './studio-cell-size';
import { simplifyRing } from './svg-path';

export type StudioFirstField = {
  field: FieldName;
  cellCm: number;
  /** The legend's thresholds, lowest first (the engine's defaultThresholds of this field). */
  thresholds: number[];
  bands: ContourBand[];
};

/** The first field as a page sends it: with the opacity the viewer's studio draws fields at. */
export type StudioPicture = StudioFirstField & { opacity: number };

/**
 * Smaller to send: each ring simplified as the share page's picture is (a twentieth of a millimetre off
 * at most, a third of a pixel at the studio's fitted zoom) with coordinates to 0.01 cm.
 */
function compact(bands: ContourBand[]): ContourBand[] {
  const r = (v: number) => Math.round(v * 100) / 100;
  return bands.map((b) => ({
    ...b,
    polygons: b.polygons.map((poly) =>
      poly.map((ring) => simplifyRing(ring).map(([x, y]) => [r(x), r(y)] as [number, number])),
    ),
  }));
}

export function studioFirstField(design: Design, field: FieldName): StudioFirstField | null {
  // The worker parses what it is sent; parse the same way so defaults are filled alike.
  const parsed = parseDesign(physicsOf(design));
  if (!parsed.ok) return null;
  const d = parsed.design;
  const cellCm = cellSizeFor(d.enclosure.width, d.enclosure.height, false);
  const grid = computeFields(d, { cellCm, addMonths: 0 });
  const thresholds = defaultThresholds(field, grid);
  const bands = compact(contourBands(grid, field, thresholds));
  // Nothing reads the grid after its bands are traced: the next first field on this thread is computed
  // into its buffer.
  recycleFields(grid.uvb.buffer);
  return { field, cellCm, thresholds, bands };
}
