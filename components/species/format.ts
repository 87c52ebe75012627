import { cToDisplay, formatNumber, type TempUnit } from '@/shared/units';
import type { Range } from '@/lib/species/schema';

/** "40–45 °C" / "104–113 °F"; a single value when both ends agree. */
export function formatTempRange(r: Range, unit: TempUnit): string {
  const lo = formatNumber(cToDisplay(r.min, unit), unit === 'C' ? 1 : 0);
  const hi = formatNumber(cToDisplay(r.max, unit), unit === 'C' ? 1 : 0);
  return `${lo === hi ? lo : `${lo}–${hi}`} °${unit}`;
}

export function formatTempValue(c: number, unit: TempUnit): string {
  return `${formatNumber(cToDisplay(c, unit), unit === 'C' ? 1 : 0)} °${unit}`;
}

export function formatRange(r: Range | null, unit: string, decimals = 1): string {
  if (!r) return '—';
  const lo = formatNumber(r.min, decimals);
  const hi = formatNumber(r.max, decimals);
  return `${lo === hi ? lo : `${lo}–${hi}`} ${unit}`;
}

/** Whether any source of a sheet is a recollection rather than a checked citation. */
export function hasUnverifiedFigures(sources: { citation: string; confidence: string }[]): boolean {
  if (sources.length === 0) return true;
  return sources.some((s) => /from memory|no published source|verify/i.test(`${s.citation} ${s.confidence}`));
}

/** "mid-day sun basker" from the engine's "zone 4 (mid-day sun basker)". */
export function zoneHabit(label: string): string {
  return label.replace(/^zone \d\s*/, '').replace(/^\((.*)\)$/, '$1');
}
