import { LAMP_TECHS, UV_ZONES, type UvZone } from '@/simulation';
import type { Range } from './schema';

/**
 * Whether a sheet's broadband target (µW/cm²) and its UV zone can both hold at the basking spot for a
 * lamp with the given UV Index per µW/cm² (by default the engine's fluorescent ratio). They often cannot:
 * broadband rules of thumb and UV Index zones come from different meters and spectra. Returns the UV
 * Index range the target stands for and whether it overlaps the zone's basking (max) range.
 */
export function targetAgainstZone(
  uvZone: number,
  target: Range,
  uviPerUvb: number = LAMP_TECHS.t5.uviPerUvb,
): { uvi: Range; zoneMax: Range; overlaps: boolean; ratio: number } {
  const zone = UV_ZONES[uvZone as UvZone] ?? UV_ZONES[1];
  const uvi = { min: target.min * uviPerUvb, max: target.max * uviPerUvb };
  const zoneMax = { min: zone.max[0], max: zone.max[1] };
  return { uvi, zoneMax, overlaps: uvi.max >= zoneMax.min && uvi.min <= zoneMax.max, ratio: uviPerUvb };
}

/**
 * The broadband reading (µW/cm²) that stands for a UV zone's basking range (Ferguson et al. 2010, Zoo
 * Biology 29:317–334: the maximum UV Index at the basking spot) under a lamp with the given UV Index per
 * µW/cm² — by default the engine's fluorescent ratio. Rounded inwards to 5 µW/cm², so the range stays
 * inside the zone. Only a hint for keepers with a broadband meter: the ratio depends on the lamp's
 * spectrum (and what a meter reads, on the meter), so the zone stays the target.
 */
export function broadbandForZone(uvZone: UvZone, uviPerUvb: number = LAMP_TECHS.t5.uviPerUvb): Range {
  const zone = UV_ZONES[uvZone];
  return {
    min: Math.ceil(zone.max[0] / uviPerUvb / 5) * 5,
    max: Math.floor(zone.max[1] / uviPerUvb / 5) * 5,
  };
}

export function targetWarning(uvZone: number, target: Range | null): string | null {
  if (!target) return null;
  const c = targetAgainstZone(uvZone, target);
  if (c.overlaps) return null;
  const f = (v: number) => (Math.round(v * 10) / 10).toString();
  return (
    `With a typical fluorescent spectrum (${c.ratio} UV Index per µW/cm²), ${f(target.min)}–${f(target.max)} µW/cm² is ` +
    `about UV Index ${f(c.uvi.min)}–${f(c.uvi.max)}, outside zone ${uvZone}'s basking range of ${f(c.zoneMax.min)}–${f(c.zoneMax.max)}. ` +
    'One lamp cannot meet both: the zone (UV Index) is the primary target; what a broadband meter reads depends on the meter.'
  );
}
