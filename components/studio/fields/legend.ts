// Legend entries and band colours for a field: thresholds from the engine, colours from our ramps,
// labels in the user's units.
import { cToDisplay, formatNumber, type TempUnit } from '../geometry/units';
import type { FieldView } from '../state/session';
import { bandColors, type RampName } from './colorScale';

export const FIELD_RAMP: Record<FieldView, RampName> = { uvb: 'viridis', uvi: 'viridis', tempC: 'inferno' };

export const FIELD_TITLE: Record<FieldView, string> = {
  uvb: 'UVB irradiance',
  uvi: 'UV Index',
  tempC: 'Surface temperature',
};

export function fieldUnit(field: FieldView, temp: TempUnit): string {
  if (field === 'uvb') return 'µW/cm²';
  if (field === 'uvi') return 'UVI';
  return temp === 'C' ? '°C' : '°F';
}

export interface LegendEntry {
  lo: number;
  hi: number;
  color: string;
  label: string;
}

function fmt(field: FieldView, v: number, temp: TempUnit): string {
  if (field === 'tempC') return formatNumber(cToDisplay(v, temp), 0);
  if (field === 'uvi') return formatNumber(v, 1);
  return formatNumber(v, v < 10 ? 1 : 0);
}

/**
 * One entry per band, lowest first, matching the engine's contourBands: [t_k, t_k+1) for each pair of
 * thresholds and a last band from the top threshold up (to the field's maximum).
 */
export function legendFor(field: FieldView, thresholds: readonly number[], temp: TempUnit): LegendEntry[] {
  const n = thresholds.length;
  const colors = bandColors(FIELD_RAMP[field], n);
  const out: LegendEntry[] = [];
  for (let i = 0; i < n; i++) {
    const lo = thresholds[i] as number;
    const hi = i + 1 < n ? (thresholds[i + 1] as number) : Infinity;
    const label =
      hi === Infinity ? `≥ ${fmt(field, lo, temp)}` : `${fmt(field, lo, temp)} – ${fmt(field, hi, temp)}`;
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
