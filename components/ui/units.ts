'use client';

import { useCallback, useSyncExternalStore } from 'react';
import type { TempUnit } from '@/shared/units';

/** Lengths are stored in centimetres; people may read them in inches. The choice is kept per browser. */
export type LengthUnit = 'cm' | 'in';
export type { TempUnit };
const CM_PER_IN = 2.54;

export function formatLength(cm: number, unit: LengthUnit): string {
  const v = unit === 'cm' ? cm : cm / CM_PER_IN;
  return `${Number(v.toFixed(unit === 'cm' ? 0 : 1))}`;
}

export function formatSize(w: number, h: number, d: number, unit: LengthUnit): string {
  return `${formatLength(w, unit)} × ${formatLength(h, unit)} × ${formatLength(d, unit)} ${unit}`;
}

export const toCm = (value: number, unit: LengthUnit) => (unit === 'cm' ? value : value * CM_PER_IN);
export const fromCm = (cm: number, unit: LengthUnit) => (unit === 'cm' ? cm : cm / CM_PER_IN);

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

export const LENGTH_UNITS = ['cm', 'in'] as const satisfies readonly [LengthUnit, LengthUnit];
export const TEMP_UNITS = ['C', 'F'] as const satisfies readonly [TempUnit, TempUnit];

/** Centimetres (default) or inches for every size on the page. */
export const useLengthUnit = storedChoice<LengthUnit>('baskwell.lengthUnit', LENGTH_UNITS);
/** °C (default) or °F for every temperature on the species, catalogue and guided-start pages. */
export const useTempUnit = storedChoice<TempUnit>('baskwell.tempUnit', TEMP_UNITS);
