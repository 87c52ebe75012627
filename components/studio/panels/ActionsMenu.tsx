'use client';
// The actions of the thing under a long press (touch) or a right click (mouse): what a keyboard reaches
// through the toolbar and shortcuts, within a thumb's reach. Commands come from the one registry, so
// labels and enabled states match the toolbar's.
import { useEffect, useRef, type KeyboardEvent } from 'react';
import { command, isEnabled, runCommand } from '../commands/registry';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import type { SideTab } from '../state/session';
import { focusRing } from './CommandButton';

const OBJECT_COMMANDS = ['edit.duplicate', 'edit.delete', 'arrange.forward', 'arrange.backward'];
const MENU_WIDTH_PX = 208;
const ITEM_HEIGHT_PX = 44;

/** Where the menu goes: at the press, pulled inside the canvas when it would spill over an edge. */
export function menuPosition(
  at: { x: number; y: number },
  viewport: { width: number; height: number },
  items: number,
): { left: number; top: number } {
  const height = items * ITEM_HEIGHT_PX + 8;
  return {
    left: Math.max(4, Math.min(at.x, viewport.width - MENU_WIDTH_PX - 4)),
    top: Math.max(4, Math.min(at.y, viewport.height - height - 4)),
  };
}

/** `viewOnlyNote`: said above an object's actions in a view-only studio (how to change it, if one can). */
export function ActionsMenu({ viewOnlyNote }: { viewOnlyNote: string }) {
  const ctx = useCommandContext();
  const { store } = ctx;
  const menu = useStudio(store, (s) => s.session.actionsMenu);
  const viewport = useStudio(store, (s) => s.session.viewport);
  const readOnly = useStudio(store, (s) => s.readOnly);
  const ref = useRef<HTMLDivElement>(null);

  useEffect(() => {
    if (!menu) return;
    ref.current?.querySelector<HTMLButtonElement>('[role=menuitem]:not(:disabled)')?.focus();
    // A press anywhere outside closes it (after the press that opened it has ended).
    const onDown = (e: PointerEvent) => {
      if (!ref.current?.contains(e.target as Node)) store.setSession({ actionsMenu: null });
    };
    window.addEventListener('pointerdown', onDown, true);
    return () => window.removeEventListener('pointerdown', onDown, true);
  }, [menu, store]);

  if (!menu) return null;
  const close = () => {
    store.setSession({ actionsMenu: null });
    document.querySelector<HTMLElement>('[data-testid=studio-canvas]')?.focus({ preventScroll: true });
  };
  const openPanel = (tab: SideTab) => store.setSession({ tab, panelOpen: true, actionsMenu: null });
  const items: { key: string; label: string; enabled: boolean; run: () => void }[] = [];
  if (menu.objectId) {
    items.push({ key: 'inspect', label: 'Properties', enabled: true, run: () => openPanel('inspect') });
    for (const id of OBJECT_COMMANDS) {
      const c = command(id);
      items.push({
        key: id,
        label: c.label,
        enabled: isEnabled(c, ctx),
        run: () => {
          runCommand(c, ctx);
          close();
        },
      });
    }
  }
  items.push({ key: 'check', label: 'Species check', enabled: true, run: () => openPanel('assess') });
  const fit = command('view.fit');
  items.push({
    key: fit.id,
    label: fit.label,
    enabled: true,
    run: () => {
      runCommand(fit, ctx);
      close();
    },
  });
  const pos = menuPosition(menu.at, viewport, items.length + (menu.objectId && readOnly ? 1 : 0));

  const onKey = (e: KeyboardEvent<HTMLDivElement>) => {
    // The menu takes its keys before the studio's shortcuts do.
    e.stopPropagation();
    const buttons = [
      ...(ref.current?.querySelectorAll<HTMLButtonElement>('[role=menuitem]:not(:disabled)') ?? []),
    ];
    const i = buttons.indexOf(document.activeElement as HTMLButtonElement);
    if (e.key === 'Escape') {
      e.preventDefault();
      close();
    } else if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
      e.preventDefault();
      const n = buttons.length;
      buttons[(i + (e.key === 'ArrowDown' ? 1 : n - 1) + n) % n]?.focus();
    } else if (e.key === 'Tab') {
      close();
    }
  };

  return (
    <div
      ref={ref}
      role="menu"
      aria-label={menu.objectId ? 'Actions for the selection' : 'Actions'}
      data-testid="actions-menu"
      onKeyDown={onKey}
      className="absolute z-20 flex flex-col rounded-lg border border-basalt-200 bg-white py-1 shadow-lg"
      style={{ left: pos.left, top: pos.top, width: MENU_WIDTH_PX }}
    >
      {menu.objectId && readOnly && (
        <p className="px-3 py-1.5 text-caption text-basalt-600">{viewOnlyNote}</p>
      )}
      {items.map((it) => (
        <button
          key={it.key}
          type="button"
          role="menuitem"
          disabled={!it.enabled}
          onClick={it.run}
          className={`min-h-11 px-3 text-left text-sm text-basalt-900 hover:bg-basalt-100 disabled:text-basalt-400 ${focusRing}`}
        >
          {it.label}
        </button>
      ))}
    </div>
  );
}
