'use client';
// Tool palette: pick a tool (click or its key), or drag an object kind onto the canvas. A column of
// named tools on wide screens; a compact bar of icons above the canvas on tablets and phones, where a
// view-only studio leaves out the tools that add objects.
import { memo, type ReactNode } from 'react';
import { command, isEnabled, runCommand } from '../commands/registry';
import { PALETTE_DRAG_TYPE } from '../canvas/StudioCanvas';
import { isPlaceTool, type Tool } from '../state/session';
import { displayShortcut } from '../commands/shortcuts';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { focusRing } from './CommandButton';
import { Icon, type IconName } from './icons';
import { OBJECT_KINDS, OBJECT_TYPES } from '@/shared/object-kinds';
import { studioKindOf } from '../object-kinds';

/** A tool's button: its icon by name, or an object kind's own glyph from its studio record. */
type PaletteTool = { tool: Tool; hint: string } & ({ icon: IconName } | { glyph: ReactNode });

const GROUPS: { label: string; tools: PaletteTool[] }[] = [
  {
    label: 'Work',
    tools: [
      {
        tool: 'select',
        icon: 'select',
        hint: 'Select, move and resize; drag on empty space to select several',
      },
      { tool: 'pan', icon: 'pan', hint: 'Drag to move the view (or hold Space)' },
    ],
  },
  {
    label: 'Objects',
    // One button a kind of object: its icon from its studio record, its hint from its shared record.
    tools: OBJECT_TYPES.map((t) => ({
      tool: t,
      glyph: studioKindOf(t).icon,
      hint: OBJECT_KINDS[t].tool.hint,
    })),
  },
  {
    label: 'Measure',
    tools: [
      { tool: 'probe', icon: 'probe', hint: 'Read UVB, UV Index and temperature; click to pin a probe' },
      { tool: 'ruler', icon: 'ruler', hint: 'Drag to measure a distance' },
    ],
  },
];

export const Palette = memo(function Palette() {
  const ctx = useCommandContext();
  const tool = useStudio(ctx.store, (s) => s.session.tool);
  // Placing tools are switched off when the studio turns view-only (a refused save).
  const readOnly = useStudio(ctx.store, (s) => s.readOnly);
  return (
    <nav
      aria-label="Tools"
      data-testid="palette"
      className="flex w-full shrink-0 items-center gap-1 overflow-x-auto border-b border-basalt-200 bg-white px-1 py-0.5 lg:w-[8.5rem] lg:flex-col lg:items-stretch lg:gap-3 lg:overflow-x-hidden lg:overflow-y-auto lg:border-r lg:border-b-0 lg:p-2"
    >
      {GROUPS.map((g) => (
        <div
          key={g.label}
          role="group"
          aria-label={g.label}
          className={`shrink-0 ${readOnly && g.label === 'Objects' ? 'hidden lg:block' : ''} border-l border-basalt-200 pl-1 first:border-l-0 first:pl-0 lg:border-l-0 lg:pl-0`}
        >
          <p className="sr-only px-1 pb-1 text-caption font-medium uppercase tracking-wide text-basalt-500 lg:not-sr-only">
            {g.label}
          </p>
          <ul className="flex gap-0.5 lg:flex-col">
            {g.tools.map((t) => {
              const c = command(`tool.${t.tool}`);
              const key = c.shortcuts[0] ? displayShortcut(c.shortcuts[0]) : '';
              const active = tool === t.tool;
              const enabled = isEnabled(c, ctx);
              const draggable = enabled && isPlaceTool(t.tool);
              return (
                <li key={t.tool}>
                  <button
                    type="button"
                    aria-pressed={active}
                    title={`${t.hint}${draggable ? '. Drag onto the canvas, or pick and click there; Enter places it in the middle.' : ''}`}
                    data-testid={`tool-${t.tool}`}
                    draggable={draggable}
                    disabled={!enabled}
                    onDragStart={(e) => {
                      e.dataTransfer.setData(PALETTE_DRAG_TYPE, t.tool);
                      e.dataTransfer.effectAllowed = 'copy';
                    }}
                    onClick={() => {
                      runCommand(c, ctx);
                      // Continue on the canvas: click there, or press Enter to place in the middle.
                      document
                        .querySelector<HTMLElement>('[data-testid=studio-canvas]')
                        ?.focus({ preventScroll: true });
                    }}
                    className={`flex h-11 w-11 items-center justify-center gap-2 rounded-md text-left text-sm lg:h-auto lg:w-full lg:justify-start lg:px-2 lg:py-1.5 ${
                      active ? 'bg-moss-100 text-moss-900' : 'text-basalt-800 hover:bg-basalt-100'
                    } disabled:cursor-not-allowed disabled:opacity-40 ${focusRing}`}
                  >
                    {'icon' in t ? (
                      <Icon name={t.icon} className="h-5 w-5 shrink-0" />
                    ) : (
                      <Icon glyph={t.glyph} className="h-5 w-5 shrink-0" />
                    )}
                    <span className="sr-only flex-1 truncate lg:not-sr-only">
                      {c.label.replace(' (mesh)', '')}
                    </span>
                    <kbd className="hidden rounded border border-basalt-200 px-1 font-mono text-[0.7rem] text-basalt-500 lg:inline">
                      {key}
                    </kbd>
                  </button>
                </li>
              );
            })}
          </ul>
        </div>
      ))}
    </nav>
  );
});
