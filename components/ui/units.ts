'use client';

import { useCallback, useSyncExternalStore } from 'react';
import { LENGTH_UNITS, TEMP_UNITS, type LengthUnit, type TempUnit } from '@/shared/units';

// The page's choice of units, kept per browser. Converting and formatting is shared/units.ts's, the one
// units module of both sides; this file only remembers which unit a person reads.

/**
 * A unit choice kept per browser (localStorage) and shared live by every component on the page and by
 * other tabs (the storage event). One store a key, so a toggle in the header updates every table.
 */
function storedChoice<T extends string>(key: string, values: readonly [T, T]) {
  const [fallback, other] = values;
  const listeners = new Set<() => void>();
  const subscribe = (fn: () => void) => {
    listeners.add(fn);
    window.addEventListener('storage', fn);
    return () => {
      listeners.delete(fn);
      window.removeEventListener('storage', fn);
    };
  };
  const read = (): T => (window.localStorage.getItem(key) === other ? other : fallback);
  return function useChoice(): [T, (value: T) => void] {
    const value = useSyncExternalStore(subscribe, read, () => fallback);
    const set = useCallback((v: T) => {
      window.localStorage.setItem(key, v);
      listeners.forEach((l) => l());
    }, []);
    return [value, set];
  };
}

/** Centimetres (default) or inches for every size on the page. */
export const useLengthUnit = storedChoice<LengthUnit>('baskwell.lengthUnit', LENGTH_UNITS);
/** °C (default) or °F for every temperature on the species, catalogue and guided-start pages. */
export const useTempUnit = storedChoice<TempUnit>('baskwell.tempUnit', TEMP_UNITS);
