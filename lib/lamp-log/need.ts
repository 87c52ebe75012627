import type { ReadingUnit } from '@/models/reading';
import { baskingUviRange } from '@/simulation';

/**
 * What the basking zone must reach for a species, in the unit of a lamp's readings.
 *
 * UV zones of Ferguson et al. 2010 (Zoo Biology 29:317–334): the engine's basking rule, so the lamp log
 * and the studio's basking check agree. Zones 3 and 4 must reach the lower end of the zone's "maximum"
 * UVI range (2.9 and 4.5); zones 1 and 2, kept by the shade method, pass from the middle of the zone's
 * mean range (0.35 and 0.85), so a zone-1 lamp giving UVI 0.5 at the basking spot is not yet due.
 * Below that, the spot no longer gives the species its need. A sheet's own broadband target (µW/cm²) wins for
 * broadband readings; otherwise a UVI need is turned into µW/cm² with the lamp's UVI-per-µW/cm² ratio.
 */
export const ZONE_BASKING_MIN_UVI: Record<1 | 2 | 3 | 4, number> = {
  1: baskingUviRange(1)[0],
  2: baskingUviRange(2)[0],
  3: baskingUviRange(3)[0],
  4: baskingUviRange(4)[0],
};

export type SpeciesNeed = {
  name: string;
  uvZone: number;
  uvbTargetUw: { min: number; max: number } | null;
};

export type Need =
  { ok: true; threshold: number; unit: ReadingUnit; label: string } | { ok: false; missing: string };

export function baskingNeed(species: SpeciesNeed | null, unit: ReadingUnit, uviPerUvb: number): Need {
  if (!species) return { ok: false, missing: 'a species sheet for this enclosure' };
  const zone = species.uvZone as 1 | 2 | 3 | 4;
  const zoneMin = ZONE_BASKING_MIN_UVI[zone];
  if (zoneMin === undefined) return { ok: false, missing: `a valid UV zone on the sheet “${species.name}”` };
  if (unit === 'uvi') {
    return { ok: true, threshold: zoneMin, unit, label: `UVI ${zoneMin} (UV zone ${zone}, ${species.name})` };
  }
  if (species.uvbTargetUw) {
    const t = species.uvbTargetUw.min;
    return { ok: true, threshold: t, unit, label: `${t} µW/cm² (the sheet’s target for ${species.name})` };
  }
  if (!(uviPerUvb > 0)) {
    return {
      ok: false,
      missing: 'a UVI-per-µW/cm² ratio for this lamp type, or a µW/cm² target on the sheet',
    };
  }
  const t = zoneMin / uviPerUvb;
  return {
    ok: true,
    threshold: t,
    unit,
    label: `${round(t)} µW/cm² ≈ UVI ${zoneMin} (UV zone ${zone}, ${species.name}; converted with ${uviPerUvb} UVI per µW/cm²)`,
  };
}

const round = (v: number) => (v >= 10 ? Math.round(v) : Math.round(v * 10) / 10);
