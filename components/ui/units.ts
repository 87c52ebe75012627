'use client';

import { useCallback, useSyncExternalStore } from 'react';

/** Lengths are stored in centimetres; people may read them in inches. The choice is kept per browser. */
export type LengthUnit = 'cm' | 'in';
const KEY = 'baskwell.lengthUnit';
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

const listeners = new Set<() => void>();
function subscribe(fn: () => void) {
  listeners.add(fn);
  window.addEventListener('storage', fn);
  return () => {
    listeners.delete(fn);
    window.removeEventListener('storage', fn);
  };
}
const read = (): LengthUnit => (window.localStorage.getItem(KEY) === 'in' ? 'in' : 'cm');

export function useLengthUnit(): [LengthUnit, (u: LengthUnit) => void] {
  const unit = useSyncExternalStore(subscribe, read, () => 'cm' as LengthUnit);
  const set = useCallback((u: LengthUnit) => {
    window.localStorage.setItem(KEY, u);
    listeners.forEach((l) => l());
  }, []);
  return [unit, set];
}
