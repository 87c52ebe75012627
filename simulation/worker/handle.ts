/**
 * One simulation request in, one response out. Pure apart from timing: the optional solver only caches
 * per-lamp fields between calls and never changes a result.
 */
import { speciesSheetSchema } from '../model/species';
import { firstIssue, parseDesign } from '../model/parse';
import { FieldSolver } from '../fields/solver';
import { assess, assessWithAgeing } from '../assess/assess';
import type { SimRequest, SimResponse } from './protocol';

const now = () => (typeof performance !== 'undefined' ? performance.now() : Date.now());

/**
 * Gives the solver the result buffers a request hands back. Called as the request arrives, before it is
 * queued: the buffers of a request that a newer one supersedes serve too.
 */
export function takeHandedBack(req: SimRequest, solver: FieldSolver): void {
  const buffers: unknown = req?.recycle;
  if (!Array.isArray(buffers)) return;
  for (const b of buffers) if (b instanceof ArrayBuffer) solver.recycle(b);
}

export function handleRequest(req: SimRequest, solver: FieldSolver = new FieldSolver()): SimResponse {
  const id = typeof req?.id === 'number' ? req.id : -1;
  try {
    if (req?.kind !== 'simulate') return { id, kind: 'error', message: 'kind: expected "simulate"' };
    const t0 = now();
    const parsed = parseDesign(req.design);
    if (!parsed.ok)
      return { id, kind: 'error', message: `design.${parsed.error.path}: ${parsed.error.message}` };
    const design = parsed.design;
    let species = undefined;
    if (req.species !== undefined) {
      const s = speciesSheetSchema.safeParse(req.species);
      if (!s.success) {
        const e = firstIssue(s.error);
        return { id, kind: 'error', message: `species.${e.path}: ${e.message}` };
      }
      species = s.data;
    }
    const addMonths = req.addMonths ?? 0;
    if (!(Number.isFinite(addMonths) && addMonths >= 0))
      return { id, kind: 'error', message: 'addMonths: expected a number ≥ 0' };
    const opts = { cellCm: req.cellCm, addMonths };
    const grid = solver.compute(design, opts);
    const probes = req.probes?.length ? solver.probe(design, req.probes, opts) : undefined;
    // Without a sheet the safety checks still run (reach, eyes, hot surfaces), so the studio can warn.
    const checked = species ? assessWithAgeing(design, species, opts) : undefined;
    const assessment = checked?.assessment ?? assess(design, undefined, opts);
    const until = checked?.monthsUntilUnmet;
    return {
      id,
      kind: 'result',
      nx: grid.nx,
      ny: grid.ny,
      cellCm: grid.cellCm,
      width: grid.width,
      height: grid.height,
      uvb: grid.uvb,
      uvi: grid.uvi,
      tempC: grid.tempC,
      ...(assessment ? { assessment } : {}),
      ...(until !== undefined ? { monthsUntilUnmet: until } : {}),
      ...(probes ? { probes } : {}),
      ms: now() - t0,
    };
  } catch (e) {
    // Only our own RangeErrors carry user-facing text (e.g. a cell size that makes too many cells).
    const message = e instanceof RangeError ? e.message : 'the simulation failed';
    return { id, kind: 'error', message };
  }
}
