'use client';
// Contour bands of the shown field for the canvas, and the matching legend.
import { useMemo } from 'react';
import { contourBands, defaultThresholds } from '@/simulation';
import type { FieldGrid } from '@/simulation/fields/types';
import type { ColouredBand } from '../canvas/FieldBands';
import type { TempUnit } from '../geometry/units';
import type { FieldView } from '../state/session';
import { legendFor, type LegendEntry } from './legend';

export function useBands(
  grid: FieldGrid | null,
  field: FieldView,
  temp: TempUnit,
  visible: boolean,
): { bands: ColouredBand[]; legend: LegendEntry[] } {
  const thresholds = useMemo(() => (grid ? defaultThresholds(field, grid) : []), [grid, field]);
  const legend = useMemo(() => legendFor(field, thresholds, temp), [field, thresholds, temp]);
  const bands = useMemo(() => {
    if (!grid || !visible || thresholds.length === 0) return [];
    const raw = contourBands(grid, field, thresholds);
    return raw.map((b) => {
      // Match each band to its legend entry by its lower edge.
      const k = thresholds.findIndex((t) => Math.abs(t - b.lo) < 1e-9);
      return {
        color: legend[Math.max(0, Math.min(legend.length - 1, k))]?.color ?? '#000',
        polygons: b.polygons,
      };
    });
  }, [grid, field, thresholds, legend, visible]);
  return { bands, legend };
}
