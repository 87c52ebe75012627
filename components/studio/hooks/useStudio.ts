'use client';
import { createContext, useContext, useSyncExternalStore } from 'react';
import type { Atom } from '../state/atom';
import type { StudioState, StudioStore } from '../state/store';
import type { CommandContext } from '../commands/registry';

export const StudioContext = createContext<CommandContext | null>(null);

export function useCommandContext(): CommandContext {
  const ctx = useContext(StudioContext);
  if (!ctx) throw new Error('Studio components must be inside <StudioContext>');
  return ctx;
}

/** Subscribes to part of the studio state; the selector must return stable references. */
export function useStudio<T>(store: StudioStore, selector: (s: StudioState) => T): T {
  return useSyncExternalStore(
    store.subscribe,
    () => selector(store.getState()),
    () => selector(store.getState()),
  );
}

export function useAtom<T>(atom: Atom<T>): T {
  return useSyncExternalStore(atom.subscribe, atom.get, atom.get);
}
