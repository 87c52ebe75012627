// TEMPORARY stand-in for simulation/worker/entry.ts (fields and probes only, no assessment) so the
// studio runs before the engine's worker lands. Same queue rule: only the newest waiting request runs.
import { computeFields, probe } from '@/simulation';
import type { SimRequest, SimResponse } from './protocol';

const scope = self as unknown as {
  onmessage: ((e: MessageEvent<SimRequest>) => void) | null;
  postMessage: (m: SimResponse, opts?: { transfer: Transferable[] }) => void;
};
let pending: SimRequest | null = null;
let scheduled = false;

function run() {
  scheduled = false;
  const req = pending;
  pending = null;
  if (!req) return;
  const t0 = performance.now();
  try {
    const opts = { cellCm: req.cellCm, addMonths: req.addMonths };
    const g = computeFields(req.design, opts);
    const probes = req.probes?.length ? probe(req.design, req.probes, opts) : [];
    scope.postMessage(
      { id: req.id, kind: 'result', ...g, probes, ms: performance.now() - t0 },
      { transfer: [g.uvb.buffer, g.uvi.buffer, g.tempC.buffer] },
    );
  } catch (e) {
    scope.postMessage({ id: req.id, kind: 'error', message: e instanceof Error ? e.message : String(e) });
  }
}

scope.onmessage = (e) => {
  if (pending) scope.postMessage({ id: pending.id, kind: 'superseded' });
  pending = e.data;
  if (!scheduled) {
    scheduled = true;
    setTimeout(run, 0);
  }
};
