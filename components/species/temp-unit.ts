'use client';

import { useCallback, useSyncExternalStore } from 'react';
import type { TempUnit } from '@/components/studio/geometry/units';

/** °C or °F for every temperature on the species and catalogue pages; kept per browser. */
const KEY = 'baskwell.tempUnit';

const listeners = new Set<() => void>();
function subscribe(fn: () => void) {
  listeners.add(fn);
  window.addEventListener('storage', fn);
  return () => {
    listeners.delete(fn);
    window.removeEventListener('storage', fn);
  };
}
const read = (): TempUnit => (window.localStorage.getItem(KEY) === 'F' ? 'F' : 'C');

export function useTempUnit(): [TempUnit, (u: TempUnit) => void] {
  const unit = useSyncExternalStore(subscribe, read, () => 'C' as TempUnit);
  const set = useCallback((u: TempUnit) => {
    window.localStorage.setItem(KEY, u);
    listeners.forEach((l) => l());
  }, []);
  return [unit, set];
}
