/**
 * The one colour scale system for the fields: each field's title, unit and colour ramp, and a scale shared
 * by everything drawn side by side (the compare page, the share page, the PNG and PDF reports), so equal
 * colours always mean equal values. The studio's legend (components/studio/fields/legend.ts) draws its
 * bands with the same titles and ramps. Pure; runs anywhere.
 */
import { scaleLinear } from 'd3-scale';
import { bandColors, type RampName } from '@/shared/colour-ramps';
import type { TempUnit } from '@/shared/units';
import { UVI_THRESHOLDS, type FieldGrid, type FieldName } from '@/simulation';

/** Perceptually uniform ramps: one for the UV fields, a warm one for temperature. */
export const FIELD_RAMP: Record<FieldName, RampName> = { uvb: 'viridis', uvi: 'viridis', tempC: 'inferno' };

export const FIELD_TITLE: Record<FieldName, string> = {
  uvb: 'UVB irradiance',
  uvi: 'UV Index',
  tempC: 'Surface temperature',
};

/** The unit printed after a field's values ("2.6 UVI", "31 °C"). */
export function fieldUnit(field: FieldName, temp: TempUnit = 'C'): string {
  if (field === 'uvb') return 'µW/cm²';
  if (field === 'uvi') return 'UVI';
  return temp === 'C' ? '°C' : '°F';
}

/** "UVB irradiance (µW/cm²)", "Surface temperature (°F)", "UV Index" (its title already names it). */
export function fieldHeading(field: FieldName, temp: TempUnit = 'C'): string {
  return field === 'uvi' ? FIELD_TITLE[field] : `${FIELD_TITLE[field]} (${fieldUnit(field, temp)})`;
}

export type FieldScale = {
  field: FieldName;
  /** Lower edge of each band; the last band is open-ended (value ≥ its edge). */
  thresholds: number[];
  colors: string[];
  /** The field's title ("UV Index"). */
  label: string;
  /** Its title with the unit of its values, for a key or a heading ("UVB irradiance (µW/cm²)"). */
  heading: string;
};

/**
 * UV Index band edges: the engine's — the UV-free limit, then the zone boundaries of Ferguson et al. 2010
 * (Zoo Biology 29:317–334) — so a band's colour says which zone a spot is in, as in the studio.
 */
export const UVI_EDGES = UVI_THRESHOLDS;

/**
 * Right under a lamp the fields run far higher than anywhere an animal can be; a scale stretched to
 * that peak would paint everything else one colour. The scale therefore spans up to this quantile of
 * the cells, and the top band is open-ended.
 */
const TOP_QUANTILE = 0.98;

/** Smallest range a temperature or UVB scale spans (°C, µW/cm²): a presentation choice, not physics. */
const MIN_SPAN: Record<Exclude<FieldName, 'uvi'>, number> = { tempC: 10, uvb: 10 };

function quantile(values: Float32Array[], q: number): { lo: number; hi: number } {
  let n = 0;
  for (const v of values) n += v.length;
  if (n === 0) return { lo: 0, hi: 1 };
  const all = new Float32Array(n);
  let k = 0;
  for (const v of values) {
    all.set(v, k);
    k += v.length;
  }
  all.sort();
  return { lo: all[0]!, hi: all[Math.min(n - 1, Math.floor(q * (n - 1)))]! };
}

/**
 * The shared scale of `field` over every grid given. `top`, when given, is where the scale ends (the
 * hottest reachable surface, say): everything hotter shares the open-ended top band, which then reads
 * plainly as "hotter than anywhere an animal can sit".
 */
export function sharedScale(field: FieldName, grids: FieldGrid[], opts: { top?: number } = {}): FieldScale {
  let thresholds: number[];
  if (field === 'uvi') {
    thresholds = UVI_EDGES;
  } else {
    const f = field;
    const { lo, hi } = quantile(
      grids.map((g) => g[field]),
      TOP_QUANTILE,
    );
    const end = opts.top !== undefined && Number.isFinite(opts.top) ? Math.min(hi, opts.top) : hi;
    const from = field === 'uvb' ? 0 : Math.floor(lo);
    // A nearly flat field (no heat lamp yet) would otherwise get bands a tenth of a degree apart.
    const top = Math.max(end, from + MIN_SPAN[f]);
    thresholds = scaleLinear().domain([from, top]).ticks(8);
    const step = (thresholds[1] ?? top) - (thresholds[0] ?? from) || 1;
    // The lowest band starts at the lowest value; a sliver of a band below the first tick is merged into it.
    if (thresholds.length === 0) thresholds = [from];
    else if (thresholds[0]! > from) {
      if (thresholds[0]! - from < step / 2) thresholds[0] = from;
      else thresholds.unshift(from);
    }
  }
  return {
    field,
    thresholds,
    colors: bandColors(FIELD_RAMP[field], thresholds.length),
    label: FIELD_TITLE[field],
    heading: fieldHeading(field),
  };
}

/** Index of the band a value falls in. */
export function bandOf(scale: FieldScale, value: number): number {
  const t = scale.thresholds;
  let k = 0;
  while (k + 1 < t.length && value >= t[k + 1]!) k++;
  return k;
}

/** "2.6–3.5", "≥ 9.5" — the legend text of band k. */
export function bandLabel(scale: FieldScale, k: number): string {
  const fmt = (v: number) => (Math.abs(v) >= 100 ? v.toFixed(0) : Number(v.toPrecision(3)).toString());
  const lo = scale.thresholds[k]!;
  const hi = scale.thresholds[k + 1];
  return hi === undefined ? `≥ ${fmt(lo)}` : `${fmt(lo)}–${fmt(hi)}`;
}
