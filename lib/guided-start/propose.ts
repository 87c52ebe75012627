import { ASSESSMENT_THRESHOLDS, assess, probe, UV_ZONES, type Assessment, type Design } from '@/simulation';
import type { SpeciesSheet as EngineSpeciesSheet } from '@/simulation';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import {
  baskingZone,
  buildDesign,
  lampsOnly,
  lampY,
  uvLampX,
  type Candidate,
  type EnclosureInput,
  type Lid,
  type Mount,
} from './layout';

/**
 * The guided start's search: every UV lamp of the catalogue (tubes with and without a reflector) ×
 * where it hangs × each heat lamp (or none) × perch heights, first scored cheaply by probing the fields
 * at the top of the perch, then the best few checked with the engine's full species assessment. The
 * design that passes the most (most important first) wins.
 */

export type ProposalInput = {
  species: EngineSpeciesSheet;
  enclosure: EnclosureInput;
  lid: Lid;
};

export type Proposal = {
  candidate: Candidate;
  design: Design;
  assessment: Assessment;
  /** Findings that are not a pass, most important first. */
  unmet: Assessment['findings'];
};

/** Perch heights are tried every this many cm. */
export const PERCH_STEP_CM = 2.5;
const LOWEST_PERCH_TOP_CM = 5;
/** How many of the cheaply scored candidates get a full assessment. */
const FULL_CHECKS = 10;

const LAMP_COST = 0.05;
const WATT_COST = 0.15;

/** Findings that decide whether a set-up works at all weigh more than the rest. */
const WEIGHT: Record<string, number> = {
  'basking-uvi': 4,
  'hot-spot': 4,
  'shared-basking': 4,
  'lamp-in-reach': 4,
  'uv-refuge': 2,
};
const STATUS_COST = { pass: 0, attention: 1, fail: 3 } as const;

const UV_TECHS = new Set(['t5', 't8', 'compact', 'mercury-vapour', 'metal-halide', 'led-uvb']);
const HEAT_ONLY = new Set(['halogen', 'incandescent', 'ceramic']);

/** How far out of [lo, hi] a value is, on a log scale (0 inside). */
function logOutside(v: number, lo: number, hi: number): number {
  const x = Math.max(v, 1e-3);
  if (x < lo) return Math.log(lo / x);
  if (x > hi) return Math.log(x / hi);
  return 0;
}

function linearOutside(v: number, lo: number, hi: number): number {
  return v < lo ? lo - v : v > hi ? v - hi : 0;
}

/** Cheap score of one perch height from the probed values (lower is better). */
export function quickScore(species: EngineSpeciesSheet, uvi: number, uvb: number, tempC: number): number {
  const z = UV_ZONES[species.uvZone];
  const [tlo, thi] = species.baskingSurfaceC;
  let s = 3 * logOutside(uvi, z.max[0], z.max[1]) + linearOutside(tempC, tlo, thi) / 3;
  // Prefer the middle of each range (geometric for UV), as a tie-breaker.
  s += 0.1 * Math.abs(Math.log(Math.max(uvi, 1e-3) / Math.sqrt(z.max[0] * z.max[1])));
  s += (0.1 * Math.abs(tempC - (tlo + thi) / 2)) / Math.max(1, thi - tlo);
  if (species.uvbTargetUw) s += 0.5 * logOutside(uvb, species.uvbTargetUw[0], species.uvbTargetUw[1]);
  return s;
}

export function assessmentCost(a: Assessment): number {
  return a.findings.reduce((sum, f) => sum + (WEIGHT[f.id] ?? 1) * STATUS_COST[f.status], 0);
}

function mountsFor(lid: Lid): Mount[] {
  // Glass passes no UVB (Duarte et al. 2009), so UV lamps over a glass lid are pointless.
  return lid === 'glass' ? ['inside'] : ['above', 'inside'];
}

/** Highest allowed perch top under the lamps: out of reach of hot lamps, and of UV lamps for the eyes. */
function highestPerchTop(enc: EnclosureInput, lid: Lid, c: Omit<Candidate, 'perchTopCm'>): number {
  const { LAMP_REACH_CM, UV_EYE_CM } = ASSESSMENT_THRESHOLDS;
  const ys = [lampY(enc, lid, c.mount, c.uv.form) - UV_EYE_CM];
  if (c.heat) ys.push(lampY(enc, lid, c.mount, 'bulb') - LAMP_REACH_CM);
  // Over a lid the animal can still climb to the mesh: keep the basking spot well below it.
  return Math.min(enc.height - LAMP_REACH_CM, ...ys);
}

type Scored = { candidate: Candidate; quick: number };

function coarseSearch(input: ProposalInput, lampTypes: LampTypeDto[]): Scored[] {
  const { enclosure: enc, lid, species } = input;
  const uvTypes = lampTypes.filter((t) => UV_TECHS.has(t.tech) && t.uvbAt30 > 0);
  const heatTypes: (LampTypeDto | null)[] = [null, ...lampTypes.filter((t) => HEAT_ONLY.has(t.tech))];
  const zone = baskingZone(enc);
  const out: Scored[] = [];
  for (const uv of uvTypes) {
    for (const reflector of uv.form === 'tube' ? [false, true] : [false]) {
      for (const mount of mountsFor(lid)) {
        for (const heat of heatTypes) {
          const base = { uv, reflector, heat, mount };
          const design = lampsOnly(enc, lid, base);
          if (!design || uvLampX(enc, uv, heat !== null) === null) continue;
          const top = highestPerchTop(enc, lid, base);
          const heights: number[] = [];
          for (let h = LOWEST_PERCH_TOP_CM; h <= top + 1e-9; h += PERCH_STEP_CM) heights.push(h);
          if (heights.length === 0) continue;
          const points = heights.map((h) => ({ x: zone.x, y: h + 0.01 }));
          const values = probe(design, points, { cellCm: 2 });
          values.forEach((v, k) => {
            const perchTopCm = heights[k]!;
            // Fewer lamps and fewer watts are kinder to the animal, the air and the bill.
            const extra = (heat ? LAMP_COST : 0) + (WATT_COST * (uv.watts + (heat?.watts ?? 0))) / 100;
            out.push({
              candidate: { ...base, perchTopCm },
              quick: quickScore(species, v.uvi, v.uvb, v.tempC) + extra,
            });
          });
        }
      }
    }
  }
  return out.sort((a, b) => a.quick - b.quick);
}

/**
 * The best starting design for the species in this enclosure, or null when the catalogue has no UV lamp
 * that fits. The returned assessment is the engine's own; `unmet` says plainly what it could not meet.
 */
export function propose(input: ProposalInput, lampTypes: LampTypeDto[]): Proposal | null {
  const ranked = coarseSearch(input, lampTypes);
  let best: (Proposal & { cost: number; quick: number }) | null = null;
  for (const { candidate, quick } of ranked.slice(0, FULL_CHECKS)) {
    const design = buildDesign(input.enclosure, input.lid, candidate);
    if (!design) continue;
    const assessment = assess(design, input.species, { cellCm: 2 });
    const cost = assessmentCost(assessment);
    if (!best || cost < best.cost || (cost === best.cost && quick < best.quick)) {
      best = { candidate, design, assessment, unmet: [], cost, quick };
    }
    if (cost === 0) break;
  }
  if (!best) return null;
  const unmet = best.assessment.findings
    .filter((f) => f.status !== 'pass')
    .sort(
      (a, b) => (WEIGHT[b.id] ?? 1) * STATUS_COST[b.status] - (WEIGHT[a.id] ?? 1) * STATUS_COST[a.status],
    );
  return { candidate: best.candidate, design: best.design, assessment: best.assessment, unmet };
}
