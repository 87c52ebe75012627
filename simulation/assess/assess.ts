/**
 * The species check: reachable surfaces are sampled (surfaces.ts), the fields are evaluated exactly at
 * the samples, and each finding compares the numbers with the species sheet. Every message is an
 * estimate to verify with a meter and thermometer.
 */
import type { Design } from '../model/schema';
import type { SpeciesSheet } from '../model/species';
import { lampUvbFactor } from '../model/resolve';
import { FieldSolver } from '../fields/solver';
import type { LampSamples } from '../fields/probe';
import { HEAT_DEFAULTS, surfaceTempC } from '../fields/heat';
import type { FieldGrid, SimOptions } from '../fields/types';
import type { Assessment, Finding, FindingStatus } from './types';
import { reachableSurfaces, type SurfaceSample } from './surfaces';
import { baskingStatus, maxReachableUvi, uvFindings } from './uvFindings';
import { heatFindings, heatLamps } from './heatFindings';
import { hotSurfaceFinding, safetyFindings } from './safetyFindings';
import { sharedBaskingFinding } from './sharedBasking';
import { depthFindings } from './depthFindings';
import { targetZone } from './basking-range';

const RANK: Record<FindingStatus, number> = { pass: 0, attention: 1, fail: 2 };

export function worst(statuses: FindingStatus[]): FindingStatus {
  return statuses.reduce<FindingStatus>((w, s) => (RANK[s] > RANK[w] ? s : w), 'pass');
}

interface Sampled {
  samples: SurfaceSample[];
  lamps: LampSamples;
}

function sample(design: Design, species?: SpeciesSheet): Sampled {
  // Without a sheet nobody has said whether the animal climbs: the mesh a climber would hang from is
  // sampled too, and judged apart (see the safety branch of assessSampled).
  const climbs = species ? species.climbs === true : true;
  const samples = reachableSurfaces(design, undefined, { climbs });
  return { samples, lamps: new FieldSolver().probeByLamp(design, samples) };
}

function combineUv(s: Sampled, addMonths: number): { uvb: Float64Array; uvi: Float64Array } {
  const n = s.samples.length;
  const uvb = new Float64Array(n);
  const uvi = new Float64Array(n);
  s.lamps.scene.lamps.forEach((lamp, k) => {
    const f = lampUvbFactor(lamp.lamp, addMonths);
    const r = lamp.lamp.uviPerUvb;
    const u = s.lamps.uv[k]!;
    for (let p = 0; p < n; p++) {
      uvb[p] = uvb[p]! + u[p]! * f;
      uvi[p] = uvi[p]! + u[p]! * f * r;
    }
  });
  return { uvb, uvi };
}

/**
 * Assess a design for a species. `opts.grid` is accepted so callers can pass fields they already have,
 * but surface values are always evaluated exactly at the surface samples. Without a species sheet only
 * the safety checks run (reach, eyes, and hot surfaces against a general limit), so a scratch design, a
 * share or a report without a species still warns of a lamp within reach.
 */
export function assess(
  design: Design,
  species: SpeciesSheet | undefined,
  opts: SimOptions & { grid?: FieldGrid } = {},
): Assessment {
  return assessSampled(design, sample(design, species), species, opts);
}

function assessSampled(
  design: Design,
  s: Sampled,
  species: SpeciesSheet | undefined,
  opts: SimOptions,
): Assessment {
  const { uvb, uvi } = combineUv(s, opts.addMonths ?? 0);
  const hc = opts.convection ?? HEAT_DEFAULTS.convection;
  const tempC = Array.from(s.lamps.ir, (q, p) =>
    surfaceTempC(HEAT_DEFAULTS.absorptance * q, s.lamps.air[p]!, HEAT_DEFAULTS.emissivity, hc),
  );
  const lamps = heatLamps(design);
  const roomC = s.lamps.scene.roomC;
  const findings: Finding[] = species
    ? [
        ...uvFindings(s.samples, uvi, uvb, species),
        ...heatFindings(s.samples, tempC, species, roomC, lamps),
        sharedBaskingFinding(s.samples, uvi, tempC, species),
        ...safetyFindings(design, s.samples, { climbs: species.climbs === true }),
        ...depthFindings(design),
      ]
    : safetyWithoutSheet(design, s.samples, tempC, roomC, lamps);
  return { findings, overall: worst(findings.map((f) => f.status)) };
}

/**
 * The safety checks with general limits. Nobody has said whether the animal climbs, so the surfaces
 * off the mesh are judged as for any animal, and the mesh a climber would hang from (the samples of
 * kind 'screen', only sampled for climbers) is checked too: what is a burn only for a climber is an
 * attention, never a pass.
 */
function safetyWithoutSheet(
  design: Design,
  samples: SurfaceSample[],
  tempC: number[],
  roomC: number,
  lamps: ReturnType<typeof heatLamps>,
): Finding[] {
  const off = samples.flatMap((p, k) => (p.kind === 'screen' ? [] : [k]));
  const mesh = samples.flatMap((p, k) => (p.kind === 'screen' ? [k] : []));
  const offSamples = off.map((k) => samples[k]!);
  return [
    ...safetyFindings(design, offSamples, { climbSamples: samples }),
    hotSurfaceFinding(
      offSamples,
      off.map((k) => tempC[k]!),
      roomC,
      lamps,
      mesh.length ? { samples: mesh.map((k) => samples[k]!), tempC: mesh.map((k) => tempC[k]!) } : undefined,
    ),
    ...depthFindings(design),
  ];
}

/**
 * First whole month (0..maxMonths, counted from the lamps' present ages) at which the basking UV check is
 * no longer a pass; null if it still passes at maxMonths.
 */
export function monthsUntilUnmet(design: Design, species: SpeciesSheet, maxMonths = 24): number | null {
  return monthsSampled(sample(design, species), species, maxMonths);
}

function monthsSampled(s: Sampled, species: SpeciesSheet, maxMonths: number): number | null {
  for (let m = 0; m <= maxMonths; m++) {
    const { uvi } = combineUv(s, m);
    if (baskingStatus(maxReachableUvi(uvi), targetZone(species)) !== 'pass') return m;
  }
  return null;
}

/** Both the assessment and monthsUntilUnmet, sampling the surfaces once (used by the worker). */
export function assessWithAgeing(
  design: Design,
  species: SpeciesSheet,
  opts: SimOptions = {},
  maxMonths = 24,
): { assessment: Assessment; monthsUntilUnmet: number | null } {
  const s = sample(design, species);
  return {
    assessment: assessSampled(design, s, species, opts),
    monthsUntilUnmet: monthsSampled(s, species, maxMonths),
  };
}
