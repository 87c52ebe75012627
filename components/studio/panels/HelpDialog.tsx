'use client';
// Keyboard shortcuts, listed from the command registry (so the list is always complete and right).
import { useEffect, useRef } from 'react';
import { COMMANDS, isAvailable, type CommandGroup } from '../commands/registry';
import { displayShortcut } from '../commands/shortcuts';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { focusRing } from './CommandButton';

const ORDER: CommandGroup[] = [
  'Tools',
  'Edit',
  'Arrange',
  'Depth',
  'View',
  'Fields',
  'Photo',
  'Units',
  'Help',
];

export function HelpDialog() {
  const ctx = useCommandContext();
  const { store } = ctx;
  const open = useStudio(store, (s) => s.session.helpOpen);
  // Re-read when the studio learns its enclosure's photos (the Photo commands exist only then).
  useStudio(store, (s) => s.session.photos);
  const groups = ORDER.map((g) => ({
    g,
    commands: COMMANDS.filter((c) => c.group === g && isAvailable(c, ctx)),
  })).filter((x) => x.commands.length > 0);
  const ref = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = ref.current;
    if (!d) return;
    if (open && !d.open) d.showModal();
    if (!open && d.open) d.close();
  }, [open]);
  return (
    <dialog
      ref={ref}
      aria-labelledby="studio-help-title"
      // Escape closes a modal dialog at once but queues its close event, so a shortcut pressed just after
      // would still find help open and be dropped: the store hears of it from the cancel event, before the
      // dialog closes.
      onCancel={() => store.setSession({ helpOpen: false })}
      onClose={() => store.setSession({ helpOpen: false })}
      className="m-auto max-h-[85vh] w-[min(56rem,92vw)] overflow-y-auto rounded-lg border border-basalt-200 p-0 shadow-xl backdrop:bg-basalt-900/40"
      data-testid="help-dialog"
    >
      <div className="sticky top-0 flex items-center justify-between border-b border-basalt-200 bg-white px-5 py-3">
        <h2 id="studio-help-title" className="text-lead font-semibold text-basalt-900">
          Keyboard shortcuts
        </h2>
        <button
          type="button"
          onClick={() => store.setSession({ helpOpen: false })}
          className={`rounded-md px-2 py-1 text-sm text-basalt-700 hover:bg-basalt-100 ${focusRing}`}
        >
          Close
        </button>
      </div>
      <div className="grid gap-5 px-5 py-4 sm:grid-cols-2">
        {groups.map(({ g, commands }) => (
          <section key={g}>
            <h3 className="mb-1 text-sm font-semibold text-basalt-800">{g}</h3>
            <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm">
              {commands.map((c) => (
                <div key={c.id} className="contents">
                  <dt className="text-basalt-700">{c.label}</dt>
                  <dd className="text-right">
                    {c.shortcuts.map((s) => (
                      <kbd
                        key={s}
                        className="ml-1 rounded border border-basalt-300 bg-basalt-50 px-1.5 font-mono text-caption text-basalt-800"
                      >
                        {displayShortcut(s)}
                      </kbd>
                    ))}
                  </dd>
                </div>
              ))}
            </dl>
          </section>
        ))}
        <section className="sm:col-span-2">
          <h3 className="mb-1 text-sm font-semibold text-basalt-800">Pointer</h3>
          <ul className="list-disc pl-5 text-sm text-basalt-700">
            <li>Wheel or pinch to zoom; hold Space (or use the middle button) and drag to pan.</li>
            <li>Shift-click adds to the selection; drag on empty space to select with a box.</li>
            <li>Drag ends and corner handles to resize; the round handle rotates a perch, screen or pane.</li>
            <li>Hold Alt while dragging to place freely without snapping.</li>
            <li>Drag an object from the palette onto the canvas, or pick it and click where it goes.</li>
            {store.session.photos && (
              <li>
                While adjusting the photo, drag it to move it and drag its corners to line its enclosure up
                with the drawn one.
              </li>
            )}
          </ul>
        </section>
      </div>
    </dialog>
  );
}
