'use client';
// Runs the engine in a Web Worker and keeps the latest answer. Every change of the design, the
// ageing preview or the species posts a request; the worker answers "superseded" for requests a
// newer one replaced before they started, so only the latest is ever computed and shown.
import { useEffect, useRef, useState } from 'react';
import { physicsOf, samePhysics, type SimRequest, type SimResponse } from '@/simulation';
import type { StudioStore } from '../state/store';
import { recordRoundTrip, studioProbe } from '../testing/probe';
import type { Design, StudioSpecies } from '../state/types';
import { cellSizeFor } from '@/shared/designs/studio-cell-size';
import { markFieldComputed, takeEngineWorker } from './early';
import type { Reading } from './sample';
import { EMPTY_SIM, type SimView } from './simTypes';
import { ShownFields } from './handBack';

interface Sent {
  at: number;
  probeIds: string[];
}

function speciesSheet(s: StudioSpecies | undefined): SimRequest['species'] {
  if (!s) return undefined;
  // The engine's sheet is strict: send only its own fields.
  const { id: _id, ...sheet } = s;
  return sheet;
}

export function useSimulation(store: StudioStore, species: StudioSpecies[]): SimView {
  const [view, setView] = useState<SimView>(EMPTY_SIM);
  const speciesRef = useRef(species);
  useEffect(() => {
    speciesRef.current = species;
  }, [species]);
  // Fields the page stopped showing go back to the worker with the next request (handBack.ts).
  const [shown] = useState(() => new ShownFields());
  useEffect(() => {
    shown.committed(view.grid);
  }, [shown, view.grid]);

  useEffect(() => {
    let worker: Worker;
    try {
      worker = takeEngineWorker();
    } catch (e) {
      setView((v) => ({ ...v, status: 'error', error: `The field engine could not start (${String(e)}).` }));
      return;
    }
    const probe = studioProbe();
    if (probe) probe.camera = () => store.session.camera;
    let seq = 0;
    let applied = 0;
    const sent = new Map<number, Sent>();
    let last: { design: Design; addMonths: number; speciesId: string | null; dragging: boolean } | null =
      null;

    const post = () => {
      const { history, session } = store.getState();
      const design = history.present;
      const dragging = history.gestureBase !== null;
      // The photo backdrop and the notes are not physics: changing only them (a drag of the photo
      // included) asks the engine nothing new.
      if (
        last &&
        samePhysics(last.design, design) &&
        last.addMonths === session.addMonths &&
        last.speciesId === session.speciesId &&
        (last.dragging === dragging || dragging)
      ) {
        return;
      }
      last = { design, addMonths: session.addMonths, speciesId: session.speciesId, dragging };
      const id = ++seq;
      const probes = design.probes ?? [];
      const req: SimRequest = {
        id,
        kind: 'simulate',
        design: physicsOf(design),
        cellCm: cellSizeFor(design.enclosure.width, design.enclosure.height, dragging),
        addMonths: session.addMonths,
        species: speciesSheet(speciesRef.current.find((s) => s.id === session.speciesId)),
        probes: probes.map((p) => ({ x: p.x, y: p.y })),
      };
      const recycle = shown.take();
      if (recycle.length) req.recycle = recycle;
      sent.set(id, { at: performance.now(), probeIds: probes.map((p) => p.id) });
      worker.postMessage(req, recycle);
      setView((v) => (v.status === 'computing' ? v : { ...v, status: 'computing' }));
    };

    worker.onmessage = (e: MessageEvent<SimResponse>) => {
      const msg = e.data;
      const info = sent.get(msg.id);
      sent.delete(msg.id);
      if (msg.kind === 'superseded' || msg.id < applied) return;
      applied = msg.id;
      const busy = msg.id < seq;
      if (msg.kind === 'error') {
        setView((v) => ({ ...v, status: 'error', error: msg.message }));
        return;
      }
      markFieldComputed();
      const roundTripMs = info ? performance.now() - info.at : null;
      if (probe && roundTripMs !== null) recordRoundTrip(probe, roundTripMs, msg.ms);
      const probeReadings = new Map<string, Reading>();
      msg.probes?.forEach((r, i) => {
        const pid = info?.probeIds[i];
        if (pid) probeReadings.set(pid, { uvb: r.uvb, uvi: r.uvi, tempC: r.tempC });
      });
      setView({
        grid: {
          nx: msg.nx,
          ny: msg.ny,
          cellCm: msg.cellCm,
          width: msg.width,
          height: msg.height,
          uvb: msg.uvb,
          uvi: msg.uvi,
          tempC: msg.tempC,
        },
        assessment: msg.assessment ?? null,
        monthsUntilUnmet: msg.assessment ? msg.monthsUntilUnmet : undefined,
        probeReadings,
        roundTripMs,
        status: busy ? 'computing' : 'ready',
        error: null,
      });
    };
    worker.onerror = (e) => {
      setView((v) => ({ ...v, status: 'error', error: e.message || 'The field engine stopped.' }));
    };

    post();
    const unsubscribe = store.subscribe(post);
    return () => {
      unsubscribe();
      worker.terminate();
    };
  }, [store, shown]);

  return view;
}
