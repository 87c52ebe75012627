'use client';
// Bottom bar: autosave state, pointer position, zoom and the engine's round-trip time.
import type { PointerInfo } from '../canvas/StudioCanvas';
import type { SaveState } from '../persistence/autosave';
import type { SimView } from '../fields/simTypes';
import type { Atom } from '../state/atom';
import { formatLength } from '@/shared/units';
import { useAtom, useCommandContext, useStudio } from '../hooks/useStudio';
import { focusRing } from './CommandButton';

export function saveLabel(
  s: SaveState,
  where: 'server' | 'browser' = 'server',
): { text: string; tone: 'ok' | 'busy' | 'warn' | 'bad' } {
  switch (s.kind) {
    case 'saved':
      if (where === 'browser') return { text: 'Saved in this browser only', tone: 'ok' };
      return { text: s.at ? 'All changes saved' : 'Saved', tone: 'ok' };
    case 'pending':
      return { text: 'Unsaved changes…', tone: 'busy' };
    case 'saving':
      return { text: 'Saving…', tone: 'busy' };
    case 'offline':
      return { text: 'Offline — changes kept on this device, retrying', tone: 'warn' };
    case 'conflict':
      return { text: 'Conflict — someone else saved this design', tone: 'bad' };
    case 'error':
      return { text: `Not saved: ${s.message}`, tone: 'bad' };
    case 'refused':
      return {
        text:
          s.reason === 'signed-out'
            ? 'Signed out — not saved; changes kept on this device'
            : 'Not saved: you can no longer change this design; changes kept on this device',
        tone: 'bad',
      };
  }
}

const TONE = {
  ok: 'bg-moss-500',
  busy: 'bg-sky-500',
  warn: 'bg-sand-500',
  bad: 'bg-ember-600',
};

function Cursor({ pointer }: { pointer: Atom<PointerInfo | null> }) {
  const { store } = useCommandContext();
  const unit = useStudio(store, (s) => s.session.lengthUnit);
  const p = useAtom(pointer);
  return (
    <span className="hidden w-56 tabular-nums md:inline" data-testid="cursor-position">
      {p ? `x ${formatLength(p.design.x, unit)} · y ${formatLength(p.design.y, unit)}` : 'x – · y –'}
    </span>
  );
}

export function StatusBar({
  save,
  onSaveNow,
  pointer,
  sim,
  savedWhere = 'server',
}: {
  save: SaveState;
  savedWhere?: 'server' | 'browser';
  onSaveNow: () => void;
  pointer: Atom<PointerInfo | null>;
  sim: SimView;
}) {
  const { store } = useCommandContext();
  const zoom = useStudio(store, (s) => s.session.camera.zoom);
  const l = saveLabel(save, savedWhere);
  return (
    <footer className="flex h-8 shrink-0 items-center gap-2 overflow-hidden border-t whitespace-nowrap sm:gap-4 border-basalt-200 bg-white px-3 text-caption text-basalt-700">
      <span
        role="status"
        aria-live="polite"
        className="flex items-center gap-1.5"
        data-testid="save-state"
        data-state={save.kind}
      >
        <span className={`inline-block h-2 w-2 rounded-full ${TONE[l.tone]}`} aria-hidden="true" />
        {l.text}
      </span>
      {(save.kind === 'offline' || save.kind === 'error' || save.kind === 'pending') && (
        <button
          type="button"
          onClick={onSaveNow}
          className={`rounded px-1.5 text-sky-700 underline ${focusRing}`}
        >
          Save now
        </button>
      )}
      <span className="flex-1" />
      <Cursor pointer={pointer} />
      <span className="hidden tabular-nums md:inline">Zoom {Math.round(zoom * 20)}%</span>
      <span
        className="tabular-nums"
        data-testid="worker-ms"
        title="Time from a change to its computed fields"
      >
        {sim.status === 'error'
          ? 'Engine error'
          : sim.roundTripMs === null
            ? 'Engine starting…'
            : `Fields ${Math.round(sim.roundTripMs)} ms${sim.status === 'computing' ? ' …' : ''}`}
      </span>
      <span className="hidden text-basalt-500 lg:inline">
        All figures are estimates — verify with a meter and thermometer.
      </span>
      {/* A narrow screen has no room for the sentence, but the warning stays: the figures are estimates. */}
      <span
        className="text-basalt-500 lg:hidden"
        title="All figures are estimates — verify with a meter and thermometer."
      >
        Estimates: verify
      </span>
    </footer>
  );
}
