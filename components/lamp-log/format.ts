/** Display helpers of the lamp log (no React, usable on server and client). */
import type { Status } from '@/lib/lamp-log/status';
import { MONTH_NAMES } from '@/shared/days';

export { formatDay, readableDays } from '@/shared/days';

export type ReadingUnit = 'uvb' | 'uvi';

export const UNIT_LABEL: Record<ReadingUnit, string> = { uvb: 'µW/cm²', uvi: 'UVI' };
export const UNIT_NAME: Record<ReadingUnit, string> = { uvb: 'UVB (µW/cm²)', uvi: 'UV Index' };

export function formatValue(v: number | null | undefined, unit: ReadingUnit | null): string {
  if (v === null || v === undefined || !Number.isFinite(v)) return '—';
  // As precise as a meter shows: a typed 24.5 reads back as 24.5, not 25.
  const digits = unit === 'uvi' ? (v < 10 ? 2 : 1) : v < 100 ? 1 : 0;
  const text = String(Number(v.toFixed(digits)));
  return `${text}${unit ? ` ${UNIT_LABEL[unit]}` : ''}`;
}

export function formatAge(days: number): string {
  if (days < 60) return `${days} day${days === 1 ? '' : 's'}`;
  const months = days / (365.25 / 12);
  if (months < 24) return `${months.toFixed(1)} months`;
  return `${(months / 12).toFixed(1)} years`;
}

export function formatMonthYear(d: Date): string {
  return `${MONTH_NAMES[d.getUTCMonth()]} ${d.getUTCFullYear()}`;
}

export const STATUS_STYLE: Record<Status, string> = {
  replace: 'bg-ember-100 text-ember-800 ring-ember-300',
  'test-soon': 'bg-sand-100 text-sand-900 ring-sand-300',
  fine: 'bg-moss-100 text-moss-800 ring-moss-300',
  'heat-only': 'bg-basalt-100 text-basalt-700 ring-basalt-300',
  retired: 'bg-basalt-100 text-basalt-500 ring-basalt-200',
};

/**
 * How to anchor an axis label centred at `x` so it stays inside [min, max]: a label about
 * `halfWidth` wide each side of its tick would be cut off at an edge of the drawing, so there it is
 * aligned to the tick's inner side instead of centred on it.
 */
export function tickLabelAnchor(x: number, min: number, max: number, halfWidth: number) {
  if (x + halfWidth > max) return 'end';
  if (x - halfWidth < min) return 'start';
  return 'middle';
}
