import type { ReadingUnit } from '@/models/reading';
import { UV_ZONES } from '@/simulation';

/**
 * What the basking zone must reach for a species, in the unit of a lamp's readings.
 *
 * UV zones of Ferguson et al. 2010 (Zoo Biology 29:317–334): the basking zone should reach the zone's
 * "maximum" UVI range, whose lower ends are 0.6, 1.1, 2.9 and 4.5 for zones 1–4 (the engine's table, so
 * the lamp log and the studio's basking check agree). Below that lower end, the spot no longer gives the
 * species its need. A sheet's own broadband target (µW/cm²) wins for
 * broadband readings; otherwise a UVI need is turned into µW/cm² with the lamp's UVI-per-µW/cm² ratio.
 */
export const ZONE_BASKING_MIN_UVI: Record<1 | 2 | 3 | 4, number> = {
  1: UV_ZONES[1].max[0],
  2: UV_ZONES[2].max[0],
  3: UV_ZONES[3].max[0],
  4: UV_ZONES[4].max[0],
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
