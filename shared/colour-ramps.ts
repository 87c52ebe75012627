// Colour scales for the field bands. Perceptually uniform, colour-blind-safe ramps
// (the viridis and inferno maps of matplotlib, van der Walt & Smith 2015, released CC0);
// the nine stops per ramp below are sampled from those published tables (values from memory,
// checked by eye against the reference images). Interpolation between stops is linear in sRGB,
// which keeps lightness monotone for these ramps.

export type Rgb = [number, number, number];

export type RampName = 'viridis' | 'inferno';

const RAMPS: Record<RampName, string[]> = {
  viridis: [
    '#440154',
    '#482878',
    '#3e4989',
    '#31688e',
    '#26828e',
    '#1f9e89',
    '#35b779',
    '#6ece58',
    '#fde725',
  ],
  inferno: [
    '#000004',
    '#1f0c48',
    '#550f6d',
    '#88226a',
    '#ba3655',
    '#e35933',
    '#f98c0a',
    '#f9c932',
    '#fcffa4',
  ],
};

// The darkest end of inferno is near-black and would hide the objects drawn over the bands.
const RAMP_START: Record<RampName, number> = { viridis: 0, inferno: 0.18 };

export function hexToRgb(hex: string): Rgb {
  const n = Number.parseInt(hex.slice(1), 16);
  return [(n >> 16) & 255, (n >> 8) & 255, n & 255];
}

export function rgbToHex([r, g, b]: Rgb): string {
  return `#${[r, g, b].map((v) => Math.round(v).toString(16).padStart(2, '0')).join('')}`;
}

/** Colour at t ∈ [0, 1] (clamped) along the ramp. */
export function rampColor(ramp: RampName, t: number): string {
  const stops = RAMPS[ramp];
  const start = RAMP_START[ramp];
  const u = start + (1 - start) * Math.min(1, Math.max(0, Number.isFinite(t) ? t : 0));
  const pos = u * (stops.length - 1);
  const i = Math.min(stops.length - 2, Math.floor(pos));
  const f = pos - i;
  const a = hexToRgb(stops[i] as string);
  const b = hexToRgb(stops[i + 1] as string);
  return rgbToHex([a[0] + (b[0] - a[0]) * f, a[1] + (b[1] - a[1]) * f, a[2] + (b[2] - a[2]) * f]);
}

/**
 * One colour per band between consecutive thresholds, sampled at each band's index so that
 * equal-looking steps mean equal steps of the threshold list (the UVI zones are not evenly spaced).
 */
export function bandColors(ramp: RampName, bandCount: number): string[] {
  if (bandCount <= 0) return [];
  // A field with a single band never rises above its first threshold (no UV lamp, or a room-warm
  // enclosure): it takes the ramp's lowest colour, so "nothing here" looks like the low end everywhere.
  if (bandCount === 1) return [rampColor(ramp, 0)];
  return Array.from({ length: bandCount }, (_, i) => rampColor(ramp, i / (bandCount - 1)));
}

/** Relative luminance (WCAG 2.x definition) to choose a legible label colour on a band. */
export function relativeLuminance(hex: string): number {
  const [r, g, b] = hexToRgb(hex).map((v) => {
    const c = v / 255;
    return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  }) as Rgb;
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

export function labelColorOn(hex: string): string {
  return relativeLuminance(hex) > 0.35 ? '#1c1f1a' : '#f5f6f4';
}
