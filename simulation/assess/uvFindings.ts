/**
 * UV findings: the basking surface against the species' UV zone (Ferguson et al. 2010, Zoo Biology
 * 29:317–334), a UV-free refuge, and the gradient between them (Baines et al. 2016, J. Zoo Aquar. Res.
 * 4:42: captive animals need a gradient from the basking zone down to zero in shade).
 *
 * Definitions used here:
 * - basking surface: the reachable surface whose UVI is at least 80 % of the highest reachable UVI;
 * - its maximum UVI is checked against the zone's maximum range; its mean is reported;
 * - the mean over all reachable surfaces stands in for the zone's mean exposure (an animal wandering
 *   everywhere), and may not exceed the zone's mean range;
 * - UV-free refuge: reachable surface under UVI 0.1 (see zones.ts).
 */
import type { SpeciesSheet } from '../model/species';
import type { Finding, FindingStatus } from './types';
import type { SurfaceSample } from './surfaces';
import { runsOf } from './surfaces';
import { UV_REFUGE_UVI, UV_ZONES } from './zones';
import { baskingUviRange, isShadeZone, LOW_MELANIN_CAUTION, targetZone } from './basking-range';
import { BASKING_BAND, ESTIMATE_UV, NO_UV_UVI, OVER_MAX_FAIL_FACTOR, REFUGE_MIN_SHARE } from './thresholds';
import { f0, f1, range1 } from './format';
import { METER_CAVEAT, RULE_OF_THUMB_LABEL } from './uvTargets';

interface Stats {
  max: number;
  basking: number[];
  baskingMean: number;
  reachableMean: number;
  total: number;
}

function stats(samples: SurfaceSample[], uvi: ArrayLike<number>): Stats {
  let max = 0;
  let total = 0;
  let sum = 0;
  samples.forEach((s, k) => {
    max = Math.max(max, uvi[k]!);
    total += s.length;
    sum += uvi[k]! * s.length;
  });
  const basking: number[] = [];
  let bl = 0;
  let bs = 0;
  if (max > 0) {
    samples.forEach((s, k) => {
      if (uvi[k]! >= BASKING_BAND * max) {
        basking.push(k);
        bl += s.length;
        bs += uvi[k]! * s.length;
      }
    });
  }
  return {
    max,
    basking,
    baskingMean: bl > 0 ? bs / bl : 0,
    reachableMean: total > 0 ? sum / total : 0,
    total,
  };
}

/** Status of the basking UV check alone (also used month by month for ageing). */
export function baskingStatus(maxUvi: number, zone: SpeciesSheet['uvZone']): FindingStatus {
  const [lo, hi] = baskingUviRange(zone);
  if (maxUvi < NO_UV_UVI) return 'fail';
  if (maxUvi >= lo && maxUvi <= hi) return 'pass';
  if (maxUvi > hi * OVER_MAX_FAIL_FACTOR) return 'fail';
  if (maxUvi < lo && (maxUvi < UV_ZONES[zone].mean[0] || maxUvi < 0.5 * lo)) return 'fail';
  return 'attention';
}

export function maxReachableUvi(uvi: ArrayLike<number>): number {
  let m = 0;
  for (let k = 0; k < uvi.length; k++) m = Math.max(m, uvi[k]!);
  return m;
}

export function uvFindings(
  samples: SurfaceSample[],
  uvi: ArrayLike<number>,
  uvb: ArrayLike<number>,
  species: SpeciesSheet,
): Finding[] {
  const zone = targetZone(species);
  const z = UV_ZONES[zone];
  const st = stats(samples, uvi);
  const out: Finding[] = [];
  const status = baskingStatus(st.max, zone);
  const uvStatus = status;
  const range = baskingUviRange(zone);
  const shade = isShadeZone(zone);
  const morph = species.lowMelanin ? ` ${LOW_MELANIN_CAUTION}` : '';
  const baskingSegs = runsOf(samples, (k) => st.max > 0 && uvi[k]! >= BASKING_BAND * st.max);
  let message: string;
  if (st.max < NO_UV_UVI) {
    message = `No useful UVB reaches any surface the animal can get to (highest UVI ${f1(st.max)}). ${species.name} is a ${z.label} species and needs a basking UVI of ${range1(range)}.`;
  } else {
    const verdict =
      status === 'pass'
        ? `within the ${range1(range)} range for ${z.label}`
        : st.max > range[1]
          ? `above the ${range1(range)} range for ${z.label} — raise the lamp, add mesh or choose a lower-output lamp`
          : `below the ${range1(range)} range for ${z.label} — lower the lamp, add a reflector, remove mesh in the way or choose a stronger lamp`;
    const method = shade
      ? ` ${z.label} animals spend most of the day in shade and meet only a low maximum where they bask (the shade method of Ferguson et al. 2010), so the basking spot passes from UVI ${f1(range[0])}, the middle of the zone's mean range.`
      : '';
    message = `The basking spot reaches about UVI ${f1(st.max)} (mean ${f1(st.baskingMean)} across the basking surface), ${verdict}.${method}`;
  }
  // The sheet's µW/cm² range, when it has one, is reported beside this finding but never decides it.
  const judged = species.uvbTargetUw
    ? ` Judged by UV Index (the zone's range), not by the sheet's µW/cm² ${RULE_OF_THUMB_LABEL}.`
    : '';
  out.push({
    id: 'basking-uvi',
    status,
    title: 'UV at the basking spot',
    message: `${message}${judged}${morph} ${ESTIMATE_UV}`,
    numbers: {
      maxUvi: st.max,
      meanUvi: st.baskingMean,
      zone,
      zoneMaxLo: range[0],
      zoneMaxHi: range[1],
      zoneMeanLo: z.mean[0],
      zoneMeanHi: z.mean[1],
    },
    where: baskingSegs.length ? { kind: 'segments', segments: baskingSegs } : undefined,
  });

  if (species.uvbTargetUw) {
    let maxUvb = 0;
    for (const k of st.basking) maxUvb = Math.max(maxUvb, uvb[k]!);
    const [lo, hi] = species.uvbTargetUw;
    const inside = maxUvb >= lo && maxUvb <= hi;
    // A rule of thumb never overrides the UV Index verdict: outside its range it only asks for attention
    // when the UV Index check does not pass either; with a passing UV Index it says so and passes.
    const status: FindingStatus = inside || uvStatus === 'pass' ? 'pass' : 'attention';
    const where = inside
      ? 'within it'
      : uvStatus === 'pass'
        ? `outside it, but the UV Index at the basking spot is within the zone's range, and the UV Index decides: lamps differ several-fold in UV Index per µW/cm²`
        : 'outside it; the UV Index finding above says what to change';
    out.push({
      id: 'basking-uvb',
      status,
      title: `UVB at the basking spot (${RULE_OF_THUMB_LABEL})`,
      message: `The basking spot gets about ${f0(maxUvb)} µW/cm² of broadband UVB; the sheet's ${RULE_OF_THUMB_LABEL} is ${f0(lo)}–${f0(hi)} µW/cm², and the estimate is ${where}. ${METER_CAVEAT} ${ESTIMATE_UV.replace('UV Index meter', 'UVB meter')}`,
      numbers: { maxUvb, targetLo: lo, targetHi: hi },
      where: baskingSegs.length ? { kind: 'segments', segments: baskingSegs } : undefined,
    });
  }

  // Refuge.
  let refugeLen = 0;
  let hideRefuge = false;
  samples.forEach((s, k) => {
    if (uvi[k]! < UV_REFUGE_UVI) {
      refugeLen += s.length;
      if (s.inHide) hideRefuge = true;
    }
  });
  const share = st.total > 0 ? refugeLen / st.total : 0;
  const refugeStatus: FindingStatus =
    refugeLen === 0 ? 'fail' : share >= REFUGE_MIN_SHARE || hideRefuge ? 'pass' : 'attention';
  const refugeSegs = runsOf(samples, (k) => uvi[k]! < UV_REFUGE_UVI);
  out.push({
    id: 'uv-refuge',
    status: refugeStatus,
    title: 'Shade without UV',
    message:
      (refugeLen === 0
        ? `There is no reachable spot below UVI ${UV_REFUGE_UVI}: the animal cannot get out of the UV. Add a hide, a ledge to shelter under or dense planting.`
        : `About ${f0(refugeLen)} cm of reachable surface (${f0(share * 100)} %) is below UVI ${UV_REFUGE_UVI}${hideRefuge ? ', including the inside of a hide' : ''}${refugeStatus === 'attention' ? ` — a small refuge; aim for at least ${f0(REFUGE_MIN_SHARE * 100)} % or a hide` : ''}.`) +
      ` ${ESTIMATE_UV}`,
    numbers: { refugeCm: refugeLen, refugeShare: share, thresholdUvi: UV_REFUGE_UVI },
    where: refugeSegs.length ? { kind: 'segments', segments: refugeSegs } : undefined,
  });

  // Gradient.
  const hasMiddle = samples.some((_, k) => uvi[k]! >= UV_REFUGE_UVI && uvi[k]! < BASKING_BAND * st.max);
  let gStatus: FindingStatus;
  let gMsg: string;
  if (st.max < NO_UV_UVI || refugeLen === 0) {
    gStatus = 'fail';
    gMsg =
      st.max < NO_UV_UVI
        ? 'There is no UV gradient because no useful UV reaches the surfaces.'
        : `The UV does not fall to zero anywhere the animal can go, so it cannot choose its exposure (reachable average UVI ${f1(st.reachableMean)}).`;
  } else if (st.reachableMean > z.mean[1]) {
    gStatus = 'attention';
    gMsg = `UV falls from about ${f1(st.max)} at the basking spot to zero in shade, but the average over all reachable surfaces, UVI ${f1(st.reachableMean)}, is above the ${range1(z.mean)} mean range for ${z.label}: give more shade.`;
  } else {
    gStatus = 'pass';
    gMsg = `UV falls from about ${f1(st.max)} at the basking spot to zero in shade${hasMiddle ? ' through intermediate levels' : ''}; the average over all reachable surfaces is UVI ${f1(st.reachableMean)} (${z.label} mean range ${range1(z.mean)}).`;
  }
  out.push({
    id: 'uv-gradient',
    status: gStatus,
    title: 'UV gradient from basking spot to shade',
    message: `${gMsg} ${ESTIMATE_UV}`,
    numbers: {
      maxUvi: st.max,
      reachableMeanUvi: st.reachableMean,
      zoneMeanLo: z.mean[0],
      zoneMeanHi: z.mean[1],
    },
  });
  return out;
}
