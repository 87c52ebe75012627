/**
 * One place that turns designs into what the compare page, the share page and the reports show: the
 * fields, key figures, a scale shared by every design shown together, and contour bands on that scale.
 * Pure (engine only), so browser and server draw the same thing.
 */
import {
  computeFields,
  reportCellCm,
  contourBands,
  type ContourBand,
  type Design,
  type FieldGrid,
  type FieldName,
} from '@/simulation';
import { keyFigures, type KeyFigures } from './figures';
import { sharedScale, type FieldScale } from '@/shared/field-scale';

export type Simulated = { design: Design; grid: FieldGrid; figures: KeyFigures; months: number };

/** Cells of about half a centimetre, coarser for big enclosures: the grid the design work bound counts. */
export function cellFor(design: Design): number {
  return reportCellCm(design.enclosure);
}

export function simulate(design: Design, months = 0): Simulated {
  const opts = { cellCm: cellFor(design), addMonths: months };
  const grid = computeFields(design, opts);
  return { design, grid, figures: keyFigures(design, grid, { addMonths: months }), months };
}

/**
 * The scale for designs shown together. Temperature and UVB end at the warmest (strongest) reachable
 * surface of any of them; hotter air right under a lamp shares the top band.
 */
export function scaleFor(field: FieldName, sims: Simulated[]): FieldScale {
  const top =
    field === 'tempC'
      ? Math.max(...sims.map((s) => s.figures.hotSpotC))
      : field === 'uvb'
        ? Math.max(...sims.map((s) => s.figures.baskingUvbMax))
        : undefined;
  return sharedScale(
    field,
    sims.map((s) => s.grid),
    { top },
  );
}

export function bandsFor(sim: Simulated, scale: FieldScale): ContourBand[] {
  return contourBands(sim.grid, scale.field, scale.thresholds);
}
