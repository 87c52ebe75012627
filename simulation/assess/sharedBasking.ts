/**
 * One basking spot: sun-basking reptiles bask for heat, so the UV they need must fall where they bask
 * (Baines et al. 2016, J. Zoo Aquar. Res. 4(1):42–63). A UV spot at room temperature at one end and a hot
 * spot without UV at the other passes the UV and heat checks one by one, yet the animal gets its UV only
 * while it is cold. This finding asks for one stretch of a single reachable surface where the species'
 * basking UV range and its basking surface temperature are both met, at least about as long as the
 * animal's body (BASKING_BODY_SHARE of the adult total length — common practice, no published source).
 */
import type { SpeciesSheet } from '../model/species';
import type { Finding, FindingStatus, Segment } from './types';
import { runsOf, type SurfaceSample } from './surfaces';
import { baskingUviRange, targetZone } from './basking-range';
import { UV_ZONES } from './zones';
import {
  BASKING_BODY_SHARE,
  BASKING_MIN_CM,
  ESTIMATE_TEMP,
  OVER_MAX_FAIL_FACTOR,
  TEMP_MARGIN_C,
} from './thresholds';
import { f0, range1 } from './format';

/** Length of the basking spot the species needs, cm. */
export function neededBaskingCm(species: Pick<SpeciesSheet, 'adultLengthCm'>): number {
  return species.adultLengthCm
    ? Math.max(BASKING_MIN_CM, BASKING_BODY_SHARE * species.adultLengthCm)
    : BASKING_MIN_CM;
}

/** Longest run of consecutive selected samples along one surface, cm. */
export function longestRun(samples: SurfaceSample[], selected: (k: number) => boolean): number {
  let best = 0;
  let cur = 0;
  let prev: SurfaceSample | null = null;
  samples.forEach((s, k) => {
    if (!selected(k)) {
      cur = 0;
      prev = null;
      return;
    }
    const p: SurfaceSample | null = prev;
    const joined =
      p !== null &&
      p.surfaceId === s.surfaceId &&
      Math.abs(p.piece.x2 - s.piece.x1) < 1e-9 &&
      Math.abs(p.piece.y2 - s.piece.y1) < 1e-9;
    cur = joined ? cur + s.length : s.length;
    best = Math.max(best, cur);
    prev = s;
  });
  return best;
}

/** Length-weighted middle (x, cm) of a set of segments; null when they have no length. */
export function centreX(segs: Segment[]): number | null {
  let sum = 0;
  let len = 0;
  for (const s of segs) {
    const l = Math.hypot(s.x2 - s.x1, s.y2 - s.y1);
    sum += ((s.x1 + s.x2) / 2) * l;
    len += l;
  }
  return len > 0 ? sum / len : null;
}

export function sharedBaskingFinding(
  samples: SurfaceSample[],
  uvi: ArrayLike<number>,
  tempC: ArrayLike<number>,
  species: SpeciesSheet,
): Finding {
  const [ulo, uhi] = baskingUviRange(targetZone(species));
  const [tlo, thi] = species.baskingSurfaceC;
  const z = UV_ZONES[targetZone(species)];
  const uvOk = (k: number) => uvi[k]! >= ulo && uvi[k]! <= uhi;
  const heatOk = (k: number) => tempC[k]! >= tlo && tempC[k]! <= thi;
  const both = (k: number) => uvOk(k) && heatOk(k);
  // Near misses: within the zone's mean-to-over-the-top band and a few degrees of the range.
  const uvNear = (k: number) =>
    uvi[k]! >= Math.min(ulo, z.mean[1]) * 0.75 && uvi[k]! <= uhi * OVER_MAX_FAIL_FACTOR;
  // Warm enough, possibly too hot: the engine's beams have sharp edges, so a pool that is too hot can
  // jump past the range; that is the hot-spot finding's problem, not a split between UV and heat.
  const warm = (k: number) => tempC[k]! >= tlo - TEMP_MARGIN_C;
  const near = (k: number) => uvNear(k) && warm(k);

  const needed = neededBaskingCm(species);
  const overlap = longestRun(samples, both);
  const nearRun = longestRun(samples, near);
  const uvSegs = runsOf(samples, uvOk);
  const heatSegs = runsOf(samples, heatOk);
  const bothSegs = runsOf(samples, both);
  // Half a sample of slack: a run is measured in whole samples.
  const enough = overlap + 0.5 >= needed;
  const status: FindingStatus = enough ? 'pass' : overlap > 0 || nearRun > 0 ? 'attention' : 'fail';
  const body = species.adultLengthCm
    ? `about ${f0(needed)} cm — roughly the body of a ${f0(species.adultLengthCm)} cm ${species.name}`
    : `at least ${f0(needed)} cm (the sheet gives no adult length)`;
  const need = `UV Index ${range1([ulo, uhi])} and ${range1([tlo, thi])} °C on one stretch of surface, ${body}`;
  let message: string;
  if (status === 'pass') {
    message = `The basking spot has UV and heat together: about ${f0(overlap)} cm of one surface gets UV Index ${range1([ulo, uhi])} and ${range1([tlo, thi])} °C; ${species.name} needs ${body}.`;
  } else if (overlap > 0) {
    message = `UV and heat meet on only about ${f0(overlap)} cm of one surface; ${species.name} needs ${need}. Widen the basking spot: a wider-beam heat lamp, a second lamp, or lamps further up so their pools spread.`;
  } else if (nearRun > 0) {
    message = `UV and heat fall on the same spot, but not both within range there (the species needs ${need}): see the basking UV and temperature findings.`;
  } else {
    const ux = centreX(uvSegs);
    const hx = centreX(heatSegs);
    const apart =
      ux !== null && hx !== null
        ? ` The UV spot (around ${f0(ux)} cm from the left) and the hot spot (around ${f0(hx)} cm) are about ${f0(Math.abs(ux - hx))} cm apart.`
        : ux === null
          ? ' No reachable surface gets the basking UV range.'
          : ' No reachable surface gets the basking temperature.';
    message =
      `The animal cannot get its UV and its heat in the same place: no surface gets both ${range1([ulo, uhi])} UV Index and ${range1([tlo, thi])} °C.${apart}` +
      ' Reptiles that bask for heat stay where it is warm, so put the UV lamp and the heat lamp over the same basking surface (Baines et al. 2016).';
  }
  return {
    id: 'shared-basking',
    status,
    title: 'UV and heat on one basking spot',
    message: `${message} ${ESTIMATE_TEMP.replace('a thermometer', 'a UV Index meter and a thermometer')}`,
    numbers: {
      overlapCm: overlap,
      neededCm: needed,
      uvSpotCm: longestRun(samples, uvOk),
      heatSpotCm: longestRun(samples, heatOk),
      uviLo: ulo,
      uviHi: uhi,
      targetLo: tlo,
      targetHi: thi,
    },
    where: bothSegs.length
      ? { kind: 'segments', segments: bothSegs }
      : uvSegs.length || heatSegs.length
        ? { kind: 'segments', segments: [...uvSegs, ...heatSegs] }
        : undefined,
    basking: { uv: uvSegs, heat: heatSegs, both: bothSegs },
  };
}
