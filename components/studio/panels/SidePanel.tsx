'use client';
// The side panels: ageing preview, depth strip, then tabs for the inspector, the fields and the species
// check. A right-hand column on wide screens; a sheet under the canvas on tablets and phones.
import { useId, type KeyboardEvent } from 'react';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import type { LegendEntry } from '../fields/legend';
import type { SimView } from '../fields/simTypes';
import type { SideTab } from '../state/session';
import type { StudioSpecies } from '../state/types';
import { AGEING_HORIZON_MONTHS, AssessmentPanel, StatusBadge } from './AssessmentPanel';
import { DepthStrip } from './DepthStrip';
import { focusRing } from './CommandButton';
import { FieldsPanel } from './FieldsPanel';
import { Inspector } from './Inspector';
import { useMediaQuery, WIDE_QUERY } from '../hooks/useMediaQuery';

const TABS: { id: SideTab; label: string }[] = [
  { id: 'inspect', label: 'Inspect' },
  { id: 'fields', label: 'Fields' },
  { id: 'assess', label: 'Check' },
];

function Ageing() {
  const { store } = useCommandContext();
  const months = useStudio(store, (s) => s.session.addMonths);
  const id = useId();
  return (
    <div className="border-b border-basalt-200 bg-basalt-50 px-3 py-2">
      <label
        htmlFor={id}
        className="flex items-center justify-between text-caption font-medium text-basalt-800"
      >
        <span>
          Ageing preview: lamps {months === 0 ? 'as set' : `+${months} month${months === 1 ? '' : 's'}`}
        </span>
        {months > 0 && (
          <button
            type="button"
            className={`rounded px-1 text-sky-700 underline ${focusRing}`}
            onClick={() => store.setSession({ addMonths: 0 })}
          >
            Reset
          </button>
        )}
      </label>
      <input
        id={id}
        data-testid="ageing-slider"
        type="range"
        min={0}
        max={AGEING_HORIZON_MONTHS}
        step={1}
        value={months}
        aria-valuetext={`${months} months in use`}
        onChange={(e) => store.setSession({ addMonths: Number(e.target.value) })}
        className={`w-full accent-sand-600 ${focusRing}`}
      />
      <div className="flex justify-between text-[0.7rem] text-basalt-500" aria-hidden="true">
        <span>0</span>
        <span>6</span>
        <span>12</span>
        <span>18</span>
        <span>24 months</span>
      </div>
    </div>
  );
}

export function SidePanel({
  sim,
  legend,
  species,
}: {
  sim: SimView;
  legend: LegendEntry[];
  species: StudioSpecies[];
}) {
  const { store } = useCommandContext();
  const tab = useStudio(store, (s) => s.session.tab);
  const readOnly = useStudio(store, (s) => s.readOnly);
  const base = useId();
  const onKey = (e: KeyboardEvent<HTMLDivElement>) => {
    // Arrow keys move between tabs (WAI-ARIA tabs pattern).
    const i = TABS.findIndex((t) => t.id === tab);
    let next = -1;
    if (e.key === 'ArrowRight') next = (i + 1) % TABS.length;
    if (e.key === 'ArrowLeft') next = (i + TABS.length - 1) % TABS.length;
    if (next < 0) return;
    e.preventDefault();
    e.stopPropagation();
    store.setSession({ tab: TABS[next]!.id });
    document.getElementById(`${base}-tab-${TABS[next]!.id}`)?.focus();
  };
  const open = useStudio(store, (s) => s.session.panelOpen);
  const wide = useMediaQuery(WIDE_QUERY);
  const contentId = `${base}-sheet`;
  return (
    <aside
      aria-label="Properties, fields and species check"
      data-testid="side-panel"
      data-open={open}
      className={`flex w-full shrink-0 flex-col border-t border-basalt-200 bg-white lg:h-auto lg:w-[22rem] lg:border-t-0 lg:border-l ${
        open ? 'h-[min(45dvh,26rem)]' : ''
      }`}
    >
      {/* Wide screens: a column beside the canvas. Narrow ones: a sheet under the canvas whose tab row
          stays visible and opens it, so the canvas keeps the screen until a panel is asked for; there the
          open tab comes first and the ageing preview and top view follow it. */}
      <div className="flex border-b border-basalt-200 lg:order-1">
        <div role="tablist" aria-label="Panels" className="flex flex-1" onKeyDown={onKey}>
          {TABS.map((t) => (
            <button
              key={t.id}
              id={`${base}-tab-${t.id}`}
              role="tab"
              type="button"
              aria-selected={tab === t.id}
              aria-controls={`${base}-panel-${t.id}`}
              tabIndex={tab === t.id ? 0 : -1}
              data-testid={`tab-${t.id}`}
              onClick={() =>
                store.setSession({ tab: t.id, panelOpen: tab === t.id ? !store.session.panelOpen : true })
              }
              className={`flex min-h-11 flex-1 items-center justify-center gap-1.5 border-b-2 px-2 py-2 text-sm font-medium lg:min-h-0 ${
                tab === t.id && (open || wide)
                  ? 'border-moss-600 text-basalt-900'
                  : 'border-transparent text-basalt-600 hover:text-basalt-900'
              } ${focusRing}`}
            >
              {t.label}
              {t.id === 'assess' && sim.assessment && <StatusBadge status={sim.assessment.overall} />}
            </button>
          ))}
        </div>
        <button
          type="button"
          aria-expanded={open}
          aria-controls={contentId}
          data-testid="sheet-toggle"
          onClick={() => store.setSession({ panelOpen: !open })}
          className={`flex min-h-11 w-11 items-center justify-center text-basalt-700 hover:bg-basalt-100 lg:hidden ${focusRing}`}
        >
          <span className="sr-only">{open ? 'Hide the panel' : 'Show the panel'}</span>
          <span
            aria-hidden="true"
            className={`inline-block transition-transform ${open ? '' : 'rotate-180'}`}
          >
            ▾
          </span>
        </button>
      </div>
      <div
        id={contentId}
        className={`min-h-0 flex-1 flex-col overflow-y-auto lg:contents ${open ? 'flex' : 'hidden'}`}
      >
        <Ageing />
        <DepthStrip />
        <div
          role="tabpanel"
          id={`${base}-panel-${tab}`}
          aria-labelledby={`${base}-tab-${tab}`}
          className="order-first lg:order-2 lg:min-h-0 lg:flex-1 lg:overflow-y-auto"
          tabIndex={-1}
        >
          {tab === 'inspect' && (
            <fieldset disabled={readOnly} className="min-w-0">
              <legend className="sr-only">Properties{readOnly ? ' (view only)' : ''}</legend>
              <Inspector />
            </fieldset>
          )}
          {tab === 'fields' && <FieldsPanel sim={sim} legend={legend} />}
          {tab === 'assess' && <AssessmentPanel sim={sim} species={species} />}
        </div>
      </div>
    </aside>
  );
}
