import { LAMP_TECHS } from '@/simulation';
import { UV_ZONES, type UvZone } from '@/simulation/assess/zones';
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
