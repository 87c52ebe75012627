'use client';
// A button bound to a command of the registry: its label, shortcut, enabled and pressed state
// all come from the registry, so the toolbar, palette and keyboard never disagree.
import { command, isEnabled, runCommand } from '../commands/registry';
import { displayShortcut } from '../commands/shortcuts';
import { useCommandContext, useStudio } from '../hooks/useStudio';
import { Icon, type IconName } from './icons';

export function useCommand(id: string) {
  const ctx = useCommandContext();
  const c = command(id);
  // Re-render only when this command's enabled/checked state changes (not on every drag step).
  useStudio(ctx.store, () => `${isEnabled(c, ctx)}|${c.checked ? c.checked(ctx) : ''}`);
  const shortcut = c.shortcuts[0] ? displayShortcut(c.shortcuts[0]) : '';
  return {
    c,
    enabled: isEnabled(c, ctx),
    checked: c.checked ? c.checked(ctx) : undefined,
    shortcut,
    run: () => runCommand(c, ctx),
  };
}

export const focusRing =
  'focus-visible:outline focus-visible:outline-2 focus-visible:outline-offset-2 focus-visible:outline-sky-600';

export function CommandButton({
  id,
  icon,
  showLabel = false,
  className = '',
}: {
  id: string;
  icon?: IconName;
  showLabel?: boolean;
  className?: string;
}) {
  const { c, enabled, checked, shortcut, run } = useCommand(id);
  const title = shortcut ? `${c.label} (${shortcut})` : c.label;
  return (
    <button
      type="button"
      onClick={run}
      disabled={!enabled}
      aria-pressed={checked}
      aria-label={showLabel ? undefined : c.label}
      aria-keyshortcuts={c.shortcuts[0]?.replace('Mod', 'Control')}
      title={title}
      data-command={c.id}
      className={`inline-flex h-8 items-center gap-1.5 rounded-md px-2 text-sm text-basalt-800 hover:bg-basalt-100 disabled:cursor-not-allowed disabled:opacity-40 aria-pressed:bg-sky-100 aria-pressed:text-sky-800 ${focusRing} ${className}`}
    >
      {icon && <Icon name={icon} />}
      {showLabel && <span>{c.label}</span>}
    </button>
  );
}
