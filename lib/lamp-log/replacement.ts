// A replacement judged where the animal basks: the lamp type's new output brought to the basking spot.
import type { ReadingUnit } from '@/models/reading';
import type { LampFacts } from './outlook';

/** The catalogue's new lamp of this type at 30 cm, in the readings' unit. */
export function newOutputAt30(
  type: Pick<LampFacts['type'], 'uvbAt30' | 'uviPerUvb'>,
  unit: ReadingUnit,
): number {
  return unit === 'uvb' ? type.uvbAt30 : type.uvbAt30 * type.uviPerUvb;
}

/**
 * What a new lamp of the same type would give at the basking spot (the catalogue's new output
 * at 30 cm brought to the spot the way today's reading was): a replacement that still falls short of the
 * need does not help the animal by itself, and one above the top of the zone's range is more UV than the
 * zone's animals meet (UV zones of Ferguson et al. 2010), so the keeper or customer is told before
 * fitting it. Shared by the counter's verdict and the lamp log's outlook.
 */
export function newLampAtSpot(
  b: { valueNow: number; threshold: number; ceiling: number; ceilingUvi: number; distanceCm: number },
  nowAt30: number,
  newAt30: number,
  unit: ReadingUnit,
): { tooWeak: boolean; reason: string | null } {
  if (!(nowAt30 > 0) || !(newAt30 > 0)) return { tooWeak: false, reason: null };
  const value = newAt30 * (b.valueNow / nowAt30);
  const at = `at the basking spot (${Math.round(b.distanceCm * 10) / 10} cm from the lamp)`;
  if (value < b.threshold) {
    return {
      tooWeak: true,
      reason: `A new lamp of this type would give about ${formatUv(value, unit)} ${at}: still below the need. Bring the basking spot closer to the lamp (never so close that the animal can reach the lamp), or choose a stronger lamp type, and measure UV and temperature again before the animal uses it.`,
    };
  }
  if (value > b.ceiling) {
    return {
      tooWeak: false,
      reason: `A new lamp of this type would give about ${formatUv(value, unit)} ${at}, above the top of the zone’s basking range (UVI ${b.ceilingUvi}${unit === 'uvb' ? `, about ${formatUv(b.ceiling, unit)}` : ''}): fit the new lamp farther from the basking spot, or lower the spot, and measure before the animal uses it.`,
    };
  }
  return { tooWeak: false, reason: null };
}

const round = (v: number) => (v >= 10 ? Math.round(v) : Math.round(v * 10) / 10);

/** A UV figure as the counter and the lamp log's reasons write it: "113 µW/cm²", "UVI 4.5". */
export const formatUv = (v: number, unit: ReadingUnit) =>
  unit === 'uvb' ? `${round(v)} µW/cm²` : `UVI ${round(v)}`;
