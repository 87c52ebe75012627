'use client';
// The top bar: where you are, edit and arrange commands, zoom, snapping, units and help.
import { memo } from 'react';
import Link from '@/components/ui/Link';
import { command, runCommand } from '../commands/registry';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { CommandButton, focusRing } from './CommandButton';
import { Icon } from './icons';

function Divider() {
  return <span className="mx-1 h-5 w-px bg-basalt-200" aria-hidden="true" />;
}

export const Toolbar = memo(function Toolbar({
  title,
  backHref,
  backLabel,
}: {
  title: string;
  backHref?: string;
  backLabel?: string;
}) {
  const { store } = useCommandContext();
  const zoom = useStudio(store, (s) => s.session.camera.zoom);
  const lengthUnit = useStudio(store, (s) => s.session.lengthUnit);
  const tempUnit = useStudio(store, (s) => s.session.tempUnit);
  return (
    <div
      role="toolbar"
      aria-label="Studio commands"
      className="flex min-h-12 flex-wrap items-center gap-1 border-b border-basalt-200 bg-white px-2 py-1"
    >
      {backHref && (
        <Link
          href={backHref}
          className={`inline-flex h-8 items-center gap-1 rounded-md px-2 text-sm text-basalt-700 hover:bg-basalt-100 ${focusRing}`}
        >
          <Icon name="back" className="h-4 w-4" />
          {backLabel ?? 'Back'}
        </Link>
      )}
      <h1
        className="mr-2 max-w-xs truncate px-1 text-base font-semibold text-basalt-900 2xl:max-w-lg"
        title={title}
      >
        {title}
      </h1>
      <Divider />
      <CommandButton id="edit.undo" icon="undo" />
      <CommandButton id="edit.redo" icon="redo" />
      <Divider />
      <CommandButton id="edit.duplicate" icon="duplicate" />
      <CommandButton id="edit.delete" icon="delete" />
      <CommandButton id="arrange.forward" icon="forward" />
      <CommandButton id="arrange.backward" icon="backward" />
      <Divider />
      <CommandButton id="view.zoomOut" icon="zoomOut" />
      <span
        className="w-12 text-center text-sm tabular-nums text-basalt-700"
        aria-live="off"
        data-testid="zoom-level"
      >
        {Math.round(zoom * 20)}%
      </span>
      <CommandButton id="view.zoomIn" icon="zoomIn" />
      <CommandButton id="view.fit" icon="fit" />
      <Divider />
      <CommandButton id="view.snapGrid" icon="grid" />
      <CommandButton id="view.snapSurfaces" icon="magnet" />
      <Divider />
      <UnitSwitch
        label="Length unit"
        commandId="units.length"
        options={[
          ['cm', 'cm'],
          ['in', 'in'],
        ]}
        value={lengthUnit}
      />
      <UnitSwitch
        label="Temperature unit"
        commandId="units.temp"
        options={[
          ['C', '°C'],
          ['F', '°F'],
        ]}
        value={tempUnit}
      />
      <span className="flex-1" />
      <CommandButton id="help.shortcuts" icon="help" />
    </div>
  );
});

/** A two-way unit switch; either half switches to its unit. */
function UnitSwitch({
  label,
  commandId,
  options,
  value,
}: {
  label: string;
  commandId: string;
  options: [string, string][];
  value: string;
}) {
  const ctx = useCommandContext();
  return (
    <div
      role="group"
      aria-label={label}
      className="inline-flex overflow-hidden rounded-md border border-basalt-200"
    >
      {options.map(([v, text]) => (
        <button
          key={v}
          type="button"
          aria-pressed={value === v}
          data-testid={`unit-${v}`}
          onClick={() => {
            if (value !== v) runCommand(command(commandId), ctx);
          }}
          className={`h-7 px-2 text-sm ${value === v ? 'bg-basalt-800 text-white' : 'bg-white text-basalt-700 hover:bg-basalt-100'} ${focusRing}`}
        >
          {text}
        </button>
      ))}
    </div>
  );
}
