'use client';
// One keyboard listener for the whole studio, dispatching through the command registry.
import { useEffect } from 'react';
import { commandForKey, runCommand, type CommandContext } from '../commands/registry';

function inFormControl(t: EventTarget | null): boolean {
  if (!t || typeof (t as HTMLElement).tagName !== 'string') return false;
  const el = t as HTMLElement;
  const tag = el.tagName.toLowerCase();
  return tag === 'input' || tag === 'select' || tag === 'textarea' || el.isContentEditable;
}

export function useShortcuts(ctx: CommandContext) {
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.defaultPrevented || e.isComposing) return;
      const c = commandForKey(e);
      if (!c) return;
      // Form fields keep their own keys (typing, arrows in sliders, undo inside a text box).
      if (inFormControl(e.target) && !c.allowInInputs) return;
      const target = e.target as HTMLElement | null;
      // Buttons and links keep Enter and Space.
      if ((e.key === 'Enter' || e.key === ' ') && target && /^(button|a|summary)$/i.test(target.tagName))
        return;
      if (ctx.store.session.helpOpen && c.id !== 'help.shortcuts') return;
      // Browser shortcuts we take over (Ctrl+S, Ctrl+D, Ctrl+A) must not reach the browser.
      e.preventDefault();
      runCommand(c, ctx);
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [ctx]);
}
