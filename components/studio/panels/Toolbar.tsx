'use client';
// The top bar: where you are, edit and arrange commands, zoom, snapping, units and help.
import { memo } from 'react';
import Link from '@/components/ui/Link';
import { UnitButtons, type UnitQuantity } from '@/components/ui/UnitToggle';
import { command, runCommand } from '../commands/registry';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { CommandButton, focusRing } from './CommandButton';
import { Icon } from './icons';

/** The toolbar's unit switches: each flips its quantity's unit through the same command as its shortcut. */
const UNIT_SWITCHES: [UnitQuantity, string][] = [
  ['length', 'units.length'],
  ['temperature', 'units.temp'],
];

function Divider() {
  return <span className="mx-1 h-5 w-px shrink-0 bg-basalt-200" aria-hidden="true" />;
}

export const Toolbar = memo(function Toolbar({
  title,
  backHref,
  backLabel,
  editSwitch,
}: {
  title: string;
  backHref?: string;
  backLabel?: string;
  /** Phones open a design for viewing; this switch turns editing on and off. */
  editSwitch?: { on: boolean; onChange: (on: boolean) => void };
}) {
  const ctx = useCommandContext();
  const { store } = ctx;
  const zoom = useStudio(store, (s) => s.session.camera.zoom);
  const lengthUnit = useStudio(store, (s) => s.session.lengthUnit);
  const tempUnit = useStudio(store, (s) => s.session.tempUnit);
  return (
    <div
      role="toolbar"
      aria-label="Studio commands"
      className="flex min-h-12 shrink-0 items-center gap-1 border-b border-basalt-200 bg-white px-2 py-1"
    >
      {backHref && (
        <Link
          href={backHref}
          className={`inline-flex h-8 items-center gap-1 rounded-md px-2 text-sm text-basalt-700 hover:bg-basalt-100 ${focusRing}`}
        >
          <Icon name="back" className="h-4 w-4" />
          <span className="sr-only sm:not-sr-only">{backLabel ?? 'Back'}</span>
        </Link>
      )}
      <h1
        className="mr-1 max-w-[7rem] shrink-0 truncate px-1 text-base font-semibold text-basalt-900 sm:mr-2 sm:max-w-xs 2xl:max-w-lg"
        title={title}
      >
        {title}
      </h1>
      {editSwitch && <EditSwitch {...editSwitch} />}
      {/* Where you are and Edit stay put; on a narrow screen the commands scroll sideways beside them. */}
      <div className="flex min-w-0 flex-1 items-center gap-1 overflow-x-auto [&>*]:shrink-0 lg:flex-wrap lg:overflow-x-visible">
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
        {UNIT_SWITCHES.map(([quantity, commandId]) => (
          <UnitButtons
            key={quantity}
            look="toolbar"
            quantity={quantity}
            value={quantity === 'length' ? lengthUnit : tempUnit}
            onChange={() => runCommand(command(commandId), ctx)}
          />
        ))}
        <span className="flex-1" />
        <CommandButton id="help.shortcuts" icon="help" />
      </div>
    </div>
  );
});

/** Editing on or off: off, the design can be looked at, probed and checked but not changed by a stray touch. */
function EditSwitch({ on, onChange }: { on: boolean; onChange: (on: boolean) => void }) {
  return (
    <button
      type="button"
      role="switch"
      aria-checked={on}
      data-testid="edit-switch"
      onClick={() => onChange(!on)}
      className={`inline-flex h-9 shrink-0 items-center gap-2 rounded-full border px-2 text-sm font-medium ${
        on ? 'border-moss-600 bg-moss-50 text-moss-900' : 'border-basalt-300 bg-white text-basalt-800'
      } ${focusRing}`}
    >
      <span
        aria-hidden="true"
        className={`relative inline-block h-5 w-9 rounded-full transition-colors ${on ? 'bg-moss-600' : 'bg-basalt-300'}`}
      >
        <span
          className={`absolute top-0.5 h-4 w-4 rounded-full bg-white shadow transition-[left] ${on ? 'left-[1.125rem]' : 'left-0.5'}`}
        />
      </span>
      Edit
    </button>
  );
}

/** A two-way unit switch; either half switches to its unit. */
