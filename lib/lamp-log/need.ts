import type { ReadingUnit } from '@/models/reading';
import { baskingUviRange, METER_CAVEAT, RULE_OF_THUMB_LABEL, shortWaveCaution } from '@/simulation';

/**
 * What the basking zone must reach for a species, in the unit of a lamp's readings.
 *
 * UV zones of Ferguson et al. 2010 (Zoo Biology 29:317–334): the engine's basking rule, so the lamp log
 * and the studio's basking check agree. Zones 3 and 4 must reach the lower end of the zone's "maximum"
 * UVI range (2.9 and 4.5); zones 1 and 2, kept by the shade method, pass from the middle of the zone's
 * mean range (0.35 and 0.85), so a zone-1 lamp giving UVI 0.5 at the basking spot is not yet due.
 * Below that, the spot no longer gives the species its need. The need is always this UV Index: for broadband
 * readings it is turned into µW/cm² through the keeper's own paired readings (UVI and µW/cm² meters side
 * by side) or else the lamp type's UVI-per-µW/cm² ratio. A sheet's own µW/cm² range is a shop's rule of
 * thumb: shown beside the need, never the threshold.
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
  /** The sheet's day length, hours (checked against the lamp's hours a day); null when not given. */
  photoperiodH?: { min: number; max: number } | null;
};

export type Need =
  | {
      ok: true;
      threshold: number;
      unit: ReadingUnit;
      label: string;
      /** Always the zone's UV Index: a µW/cm² threshold is derived from it, never taken from the sheet. */
      judgedBy: string;
      /**
       * The top of the zone's basking range in the same unit (UV Index, or µW/cm² through the same ratio):
       * more than this at the basking spot is more UV than the zone's animals meet (Ferguson et al. 2010).
       */
      ceiling: number;
      /** The zone's top as its UV Index, for words. */
      ceilingUvi: number;
      /** The sheet's own µW/cm² range, shown as a shop's rule of thumb beside the verdict; never the threshold. */
      ruleOfThumb: string | null;
      /** The meter caveat (µW/cm² readings) and the short-wave caution (a lamp far from sunlight's ratio). */
      cautions: string[];
    }
  | { ok: false; missing: string };

/** Where the UV Index per µW/cm² ratio comes from: the keeper's own paired readings, else the lamp type. */
export type Ratio = { value: number; from: 'paired readings' | 'lamp type'; pairs?: number };

type PairReading = { takenAt: Date | string; distanceCm: number; value: number; unit: ReadingUnit };

/** Readings in both units this close in time, at the same distance, count as a pair. */
const PAIR_WINDOW_MS = 60 * 60 * 1000;

/**
 * The keeper's own UV Index per µW/cm² for this lamp and meter pair: the median of UVI ÷ µW/cm² over
 * readings taken in both units within an hour at the same distance; null without such a pair.
 */
export function pairedRatio(readings: readonly PairReading[]): Ratio | null {
  const t = (r: PairReading) => new Date(r.takenAt).getTime();
  const uvb = readings.filter((r) => r.unit === 'uvb' && r.value > 0);
  const ratios: number[] = [];
  for (const u of readings.filter((r) => r.unit === 'uvi' && r.value > 0)) {
    const mate = uvb.find((b) => b.distanceCm === u.distanceCm && Math.abs(t(b) - t(u)) <= PAIR_WINDOW_MS);
    if (mate) ratios.push(u.value / mate.value);
  }
  if (ratios.length === 0) return null;
  ratios.sort((a, b) => a - b);
  const mid = Math.floor(ratios.length / 2);
  const value = ratios.length % 2 ? ratios[mid]! : (ratios[mid - 1]! + ratios[mid]!) / 2;
  return { value, from: 'paired readings', pairs: ratios.length };
}

export function baskingNeed(species: SpeciesNeed | null, unit: ReadingUnit, ratio: Ratio): Need {
  if (!species) return { ok: false, missing: 'a species sheet for this enclosure' };
  const zone = species.uvZone as 1 | 2 | 3 | 4;
  const zoneMin = ZONE_BASKING_MIN_UVI[zone];
  if (zoneMin === undefined) return { ok: false, missing: `a valid UV zone on the sheet “${species.name}”` };
  const ceilingUvi = baskingUviRange(zone)[1];
  const judgedBy = `UV Index ${zoneMin}, the basking need of UV zone ${zone} (Ferguson et al. 2010)`;
  const ruleOfThumb = species.uvbTargetUw
    ? `The sheet’s ${RULE_OF_THUMB_LABEL}, ${species.uvbTargetUw.min}–${species.uvbTargetUw.max} µW/cm², is shown for reference only: it does not decide, because lamps differ several-fold in UV Index per µW/cm².`
    : null;
  const shortWave = ratio.value > 0 ? shortWaveCaution(ratio.value, 'This lamp') : null;
  const cautions = shortWave ? [shortWave] : [];
  if (unit === 'uvi') {
    return {
      ok: true,
      threshold: zoneMin,
      ceiling: ceilingUvi,
      ceilingUvi,
      unit,
      label: `UVI ${zoneMin} (UV zone ${zone}, ${species.name})`,
      judgedBy,
      ruleOfThumb,
      cautions,
    };
  }
  if (!(ratio.value > 0)) {
    return {
      ok: false,
      missing:
        'a UVI-per-µW/cm² ratio for this lamp type, or readings with a UV Index meter beside the broadband ones',
    };
  }
  const t = zoneMin / ratio.value;
  const through =
    ratio.from === 'paired readings'
      ? `${round3(ratio.value)} UVI per µW/cm² from your ${ratio.pairs} paired reading${ratio.pairs === 1 ? '' : 's'}`
      : `this lamp type’s ${round3(ratio.value)} UVI per µW/cm²`;
  return {
    ok: true,
    threshold: t,
    ceiling: ceilingUvi / ratio.value,
    ceilingUvi,
    unit,
    label: `${round(t)} µW/cm² ≈ UVI ${zoneMin} (UV zone ${zone}, ${species.name}; through ${through})`,
    judgedBy,
    ruleOfThumb,
    cautions: [METER_CAVEAT, ...cautions],
  };
}

const round = (v: number) => (v >= 10 ? Math.round(v) : Math.round(v * 10) / 10);
const round3 = (v: number) => Math.round(v * 1000) / 1000;
