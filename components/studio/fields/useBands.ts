'use client';
// Contour bands of the shown field for the canvas, and the matching legend. The bands are traced in
// a worker of their own (contourWorker.ts) so the main thread stays free while the user drags.
import { useEffect, useMemo, useRef, useState } from 'react';
import type { ContourBand, FieldGrid } from '@/simulation';
import type { ColouredBand } from '../canvas/FieldBands';
import type { TempUnit } from '@/shared/units';
import type { FieldView } from '../state/session';
import { contourRequest, type ContourResponse } from './contourProtocol';
import { takeContourWorker } from './early';
import { legendFor, type LegendEntry } from './legend';

export interface Traced {
  field: FieldView;
  thresholds: number[];
  bands: ContourBand[];
}

export function useBands(
  grid: FieldGrid | null,
  field: FieldView,
  temp: TempUnit,
  visible: boolean,
  /** Bands to show until the first tracing arrives (the page's picture of the same field). */
  initial: Traced | null = null,
): { bands: ColouredBand[]; legend: LegendEntry[]; error: string | null } {
  const [traced, setTraced] = useState<Traced | null>(initial);
  const [error, setError] = useState<string | null>(null);
  const worker = useRef<Worker | null>(null);
  const seq = useRef(0);

  useEffect(() => {
    const w = takeContourWorker();
    let applied = 0;
    w.onmessage = (e: MessageEvent<ContourResponse>) => {
      const m = e.data;
      if (m.kind === 'superseded' || m.id < applied) return;
      applied = m.id;
      if (m.kind === 'error') setError(m.message);
      else {
        setError(null);
        setTraced({ field: m.field, thresholds: m.thresholds, bands: m.bands });
      }
    };
    w.onerror = (e) => setError(e.message || 'Contour tracing stopped.');
    worker.current = w;
    return () => {
      w.terminate();
      worker.current = null;
    };
  }, []);

  useEffect(() => {
    const w = worker.current;
    if (!grid || !w) return;
    const req = contourRequest(++seq.current, field, grid);
    w.postMessage(req, [req.values.buffer]);
  }, [grid, field]);

  const current = traced && traced.field === field ? traced : null;
  const legend = useMemo(
    () => (current ? legendFor(field, current.thresholds, temp) : []),
    [current, field, temp],
  );
  const bands = useMemo(() => {
    if (!current || !visible) return [];
    return current.bands.map((b) => {
      // Each band starts at one of the thresholds; its legend entry has the same lower edge.
      const k = current.thresholds.findIndex((t) => Math.abs(t - b.lo) < 1e-9);
      return { color: legend[Math.max(0, k)]?.color ?? '#000', polygons: b.polygons };
    });
  }, [current, legend, visible]);
  return { bands, legend, error };
}
