/**
 * Which basking UV Index passes for a zone. Zones 3 and 4 bask in the open: the basking spot must reach
 * the zone's maximum range (Ferguson et al. 2010, Zoo Biology 29:317–334). Zones 1 and 2 are the
 * "shade method" zones: the animal spends most of its time in shade and meets only a low maximum where
 * it basks, so the basking spot passes from the middle of the zone's mean range (engine's choice: an
 * animal mostly in shade that reaches this much gets about its zone's mean) up to the top of the zone's
 * maximum range.
 */
import type { UvZone } from './zones';
import { UV_ZONES } from './zones';

export function isShadeZone(zone: UvZone): boolean {
  return zone <= 2;
}

export function baskingUviRange(zone: UvZone): [number, number] {
  const z = UV_ZONES[zone];
  if (!isShadeZone(zone)) return z.max;
  return [Math.round(((z.mean[0] + z.mean[1]) / 2) * 100) / 100, z.max[1]];
}

/**
 * The zone a sheet is judged by: an albino or hypomelanistic animal has little melanin to shield its
 * skin and eyes, so it is aimed one zone lower (zone 1 stays zone 1) — common practice, no published
 * source.
 */
export function targetZone(species: { uvZone: UvZone; lowMelanin?: boolean }): UvZone {
  return species.lowMelanin ? (Math.max(1, species.uvZone - 1) as UvZone) : species.uvZone;
}

export const LOW_MELANIN_CAUTION =
  'This sheet is for an albino or hypomelanistic morph: with little skin pigment it is aimed one UV zone lower. ' +
  'Watch for closed eyes or reddened skin, give plenty of shade, and ask a reptile-experienced vet (common practice, no published source).';
