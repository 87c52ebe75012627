// Legend entries and band colours for a field: thresholds from the engine, colours from our ramps,
// labels in the user's units.
import { cToDisplay, formatNumber, type TempUnit } from '@/shared/units';
import type { FieldView } from '../state/session';
import { bandColors } from '@/shared/colour-ramps';
import { FIELD_RAMP } from '@/shared/field-scale';

export interface LegendEntry {
  lo: number;
  hi: number;
  color: string;
  label: string;
}

function display(field: FieldView, v: number, temp: TempUnit): number {
  return field === 'tempC' ? cToDisplay(v, temp) : v;
}

/** The field's usual decimals for a value (whole degrees, UVI to 0.1, small UVB to 0.1). */
function baseDecimals(field: FieldView, v: number): number {
  if (field === 'tempC') return 0;
  if (field === 'uvi') return 1;
  return v < 10 ? 1 : 0;
}

/**
 * Enough decimals that neighbouring thresholds never print alike: a weak heat lamp spreads only a
 * degree or two over many bands, and "25 – 25" would read as a broken legend.
 */
export function legendDecimals(field: FieldView, thresholds: readonly number[], temp: TempUnit): number {
  let decimals = 0;
  for (let i = 0; i < thresholds.length; i++) {
    const v = display(field, thresholds[i]!, temp);
    let d = baseDecimals(field, Math.abs(v));
    if (i > 0) {
      const prev = display(field, thresholds[i - 1]!, temp);
      while (d < 3 && formatNumber(prev, d) === formatNumber(v, d)) d++;
    }
    decimals = Math.max(decimals, d);
  }
  return decimals;
}

function fmt(field: FieldView, v: number, temp: TempUnit, decimals: number): string {
  const x = display(field, v, temp);
  return formatNumber(x, Math.max(decimals, baseDecimals(field, Math.abs(x))));
}

/**
 * One entry per band, lowest first, matching the engine's contourBands: [t_k, t_k+1) for each pair of
 * thresholds and a last band from the top threshold up (to the field's maximum).
 */
export function legendFor(field: FieldView, thresholds: readonly number[], temp: TempUnit): LegendEntry[] {
  const n = thresholds.length;
  const colors = bandColors(FIELD_RAMP[field], n);
  const decimals = legendDecimals(field, thresholds, temp);
  const out: LegendEntry[] = [];
  for (let i = 0; i < n; i++) {
    const lo = thresholds[i] as number;
    const hi = i + 1 < n ? (thresholds[i + 1] as number) : Infinity;
    const label =
      hi === Infinity
        ? `≥ ${fmt(field, lo, temp, decimals)}`
        : `${fmt(field, lo, temp, decimals)} – ${fmt(field, hi, temp, decimals)}`;
    out.push({ lo, hi, color: colors[i] as string, label });
  }
  return out;
}

/** Colour of the band that contains `v`. */
export function colorFor(legend: readonly LegendEntry[], v: number): string | undefined {
  for (let i = legend.length - 1; i >= 0; i--)
    if (v >= (legend[i] as LegendEntry).lo) return legend[i]!.color;
  return legend[0]?.color;
}
