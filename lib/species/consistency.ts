import {
  baskingUviRange,
  isShadeZone,
  LAMP_TECH_IDS,
  LAMP_TECHS,
  lowerLabel,
  UV_ZONES,
  type UvZone,
} from '@/simulation';
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

/**
 * The UV Index range a zone's basking spot is judged by (the species check and the lamp log use the
 * same one): the zone's maximum range for zones 3–4, the shade method for zones 1–2 (Ferguson et al.
 * 2010, Zoo Biology 29:317–334).
 */
export function zoneBaskingUvi(uvZone: UvZone): Range {
  const [min, max] = baskingUviRange(uvZone);
  return { min, max };
}

/** One line of the derived µW/cm² hint: the lamp technologies that share a UV Index per µW/cm². */
export type DerivedBroadband = { ratio: number; techs: string[]; range: Range };

/**
 * What a zone's basking UV Index reads on a broadband UVB meter, per UV lamp technology's typical
 * spectrum (the engine's UV Index per µW/cm², from memory), grouped by ratio. A derived figure only:
 * the ratio depends on the lamp and what a meter reads on the meter, so the UV Index stays the target.
 * Rounded inwards to 5 µW/cm², like broadbandForZone.
 */
export function derivedBroadband(uvZone: UvZone): DerivedBroadband[] {
  const { min, max } = zoneBaskingUvi(uvZone);
  const byRatio = new Map<number, string[]>();
  for (const tech of LAMP_TECH_IDS) {
    const t = LAMP_TECHS[tech];
    if (!(t.uvbAt30 > 0 && t.uviPerUvb > 0)) continue;
    byRatio.set(t.uviPerUvb, [...(byRatio.get(t.uviPerUvb) ?? []), t.label]);
  }
  return [...byRatio]
    .sort((a, b) => a[0] - b[0])
    .map(([ratio, techs]) => ({
      ratio,
      techs,
      range: { min: Math.ceil(min / ratio / 5) * 5, max: Math.floor(max / ratio / 5) * 5 },
    }));
}

const orList = (xs: string[]) =>
  xs.length < 2 ? xs.join('') : `${xs.slice(0, -1).join(', ')} or ${xs.at(-1)}`;
const n1 = (v: number) => (Math.round(v * 100) / 100).toString();

/** The species form's and sheet's words for a zone: the UV Index target, then the derived µW/cm² hint. */
export function zoneTargetText(uvZone: UvZone): { target: string; derived: string } {
  const { min, max } = zoneBaskingUvi(uvZone);
  const shade = isShadeZone(uvZone)
    ? ' (a shade-method zone: the animal mostly keeps to shade and meets this only where it basks)'
    : '';
  const lines = derivedBroadband(uvZone).map(
    (d) =>
      `about ${d.range.min}–${d.range.max} µW/cm² under a ${orList(d.techs.map(lowerLabel))} (${d.ratio} UV Index per µW/cm²)`,
  );
  return {
    target: `UV Index ${n1(min)}–${n1(max)} at the basking spot${shade}. The species check and the lamp log judge by this.`,
    derived:
      `On a broadband UVB meter that is ${lines.join('; ')} — derived from typical spectra (from memory), so it depends ` +
      'on the lamp and the meter; a lamp with short-wave UVB reaches the same UV Index at far fewer µW/cm². ' +
      'A UV Index meter reads the target directly.',
  };
}
