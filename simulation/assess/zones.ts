/**
 * UV zones (Ferguson et al. 2010, Zoo Biology 29:317–334): the mean UV Index an animal of the zone is
 * exposed to, and the maximum it seeks out when basking.
 */
export type UvZone = 1 | 2 | 3 | 4;

export interface ZoneRange {
  mean: [number, number];
  max: [number, number];
  label: string;
}

export const UV_ZONES: Record<UvZone, ZoneRange> = {
  1: { mean: [0, 0.7], max: [0.6, 1.4], label: 'zone 1 (crepuscular or shade dweller)' },
  2: { mean: [0.7, 1.0], max: [1.1, 3.0], label: 'zone 2 (partial sun, occasional basker)' },
  3: { mean: [1.0, 2.6], max: [2.9, 7.4], label: 'zone 3 (open or partial sun basker)' },
  4: { mean: [2.6, 3.5], max: [4.5, 9.5], label: 'zone 4 (mid-day sun basker)' },
};

/**
 * Below this UV Index a surface counts as UV-free shade: 0.1 is the resolution of common handheld UV Index
 * meters, so a keeper cannot tell it from zero, and it is well under a seventh of the zone 1 mean range
 * (common practice, no published source).
 */
export const UV_REFUGE_UVI = 0.1;

/** Which zones' basking (max) ranges contain this UV Index. */
export function zonesForMaxUvi(uvi: number): UvZone[] {
  return ([1, 2, 3, 4] as UvZone[]).filter((z) => uvi >= UV_ZONES[z].max[0] && uvi <= UV_ZONES[z].max[1]);
}

/** Which zones' mean ranges contain this UV Index. */
export function zonesForMeanUvi(uvi: number): UvZone[] {
  return ([1, 2, 3, 4] as UvZone[]).filter((z) => uvi >= UV_ZONES[z].mean[0] && uvi <= UV_ZONES[z].mean[1]);
}
