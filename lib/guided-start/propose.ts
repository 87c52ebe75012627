import {
  ASSESSMENT_THRESHOLDS,
  assess,
  baskingUviRange,
  neededBaskingCm,
  probe,
  targetZone,
  type Assessment,
  type Design,
} from '@/simulation';
import type { SpeciesSheet as EngineSpeciesSheet } from '@/simulation';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import {
  baskingZone,
  buildDesign,
  lampsOnly,
  lampY,
  RAISED_ABOVE_LID_CM,
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
const FULL_CHECKS = 40;

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
  const [ulo, uhi] = baskingUviRange(targetZone(species));
  const [tlo, thi] = species.baskingSurfaceC;
  let s = 3 * logOutside(uvi, ulo, uhi) + linearOutside(tempC, tlo, thi) / 3;
  // Prefer the middle of each range (geometric for UV), as a tie-breaker.
  s += 0.1 * Math.abs(Math.log(Math.max(uvi, 1e-3) / Math.sqrt(ulo * uhi)));
  s += (0.1 * Math.abs(tempC - (tlo + thi) / 2)) / Math.max(1, thi - tlo);
  if (species.uvbTargetUw) s += 0.5 * logOutside(uvb, species.uvbTargetUw[0], species.uvbTargetUw[1]);
  return s;
}

export function assessmentCost(a: Assessment): number {
  return a.findings.reduce((sum, f) => sum + (WEIGHT[f.id] ?? 1) * STATUS_COST[f.status], 0);
}

function mountsFor(lid: Lid, climbs: boolean): { mount: Mount; raiseCm?: number }[] {
  // Glass passes no UVB (Duarte et al. 2009), so UV lamps over a glass lid are pointless.
  if (lid === 'glass') return [{ mount: 'inside' }];
  // A climber hangs from a mesh lid: lamps on it or under it are within its reach, so they stand on a
  // frame above it, high enough that the mesh underside stays within the species' ranges.
  if (lid === 'mesh' && climbs) return RAISED_ABOVE_LID_CM.map((raiseCm) => ({ mount: 'raised', raiseCm }));
  return [{ mount: 'above' }, { mount: 'inside' }];
}

/** Highest allowed perch top under the lamps: out of reach of hot lamps, and of UV lamps for the eyes. */
function highestPerchTop(enc: EnclosureInput, lid: Lid, c: Omit<Candidate, 'perchTopCm'>): number {
  const { LAMP_REACH_CM, UV_EYE_CM } = ASSESSMENT_THRESHOLDS;
  const ys = [lampY(enc, lid, c.mount, c.uv.form, c.raiseCm) - UV_EYE_CM];
  if (c.heat) ys.push(lampY(enc, lid, c.mount, 'bulb', c.raiseCm) - LAMP_REACH_CM);
  // Over a lid the animal can still climb to the mesh: keep the basking spot well below it.
  return Math.min(enc.height - LAMP_REACH_CM, ...ys);
}

type Scored = { candidate: Candidate; quick: number };

function coarseSearch(input: ProposalInput, lampTypes: LampTypeDto[]): Scored[] {
  const { enclosure: enc, lid, species } = input;
  const uvTypes = lampTypes.filter((t) => UV_TECHS.has(t.tech) && t.uvbAt30 > 0);
  const heatTypes: (LampTypeDto | null)[] = [null, ...lampTypes.filter((t) => HEAT_ONLY.has(t.tech))];
  const needed = neededBaskingCm(species);
  const zone = baskingZone(enc, needed);
  // The shared basking spot must hold across its whole length: score its middle and both ends.
  const half = Math.max(0, Math.min(needed, zone.width) / 2 - 1);
  const xs = [zone.x - half, zone.x, zone.x + half];
  const climbsMesh = species.climbs === true && lid === 'mesh';
  const [, uhi] = baskingUviRange(targetZone(species));
  const out: Scored[] = [];
  for (const uv of uvTypes) {
    for (const reflector of uv.form === 'tube' ? [false, true] : [false]) {
      for (const { mount, raiseCm } of mountsFor(lid, species.climbs === true)) {
        for (const heat of heatTypes) {
          const base = { uv, reflector, heat, mount, raiseCm };
          const design = lampsOnly(enc, lid, base, needed);
          if (!design || uvLampX(enc, uv, heat !== null, needed) === null) continue;
          const top = highestPerchTop(enc, lid, base);
          const heights: number[] = [];
          for (let h = LOWEST_PERCH_TOP_CM; h <= top + 1e-9; h += PERCH_STEP_CM) heights.push(h);
          if (heights.length === 0) continue;
          const points = heights.flatMap((h) => xs.map((x) => ({ x, y: h + 0.01 })));
          // A climber reaches the underside of the mesh lid: it must not be over the top there.
          if (climbsMesh) points.push({ x: zone.x, y: enc.height - 0.01 });
          const values = probe(design, points, { cellCm: 2 });
          const lidPenalty = climbsMesh
            ? (() => {
                const v = values[values.length - 1]!;
                return (
                  3 * Math.log(Math.max(1, v.uvi / uhi)) +
                  Math.max(0, v.tempC - species.baskingSurfaceC[1]) / 3
                );
              })()
            : 0;
          heights.forEach((perchTopCm, k) => {
            const spread = xs.map((_, i) => {
              const p = values[k * xs.length + i]!;
              return quickScore(species, p.uvi, p.uvb, p.tempC);
            });
            // Fewer lamps and fewer watts are kinder to the animal, the air and the bill.
            const extra = (heat ? LAMP_COST : 0) + (WATT_COST * (uv.watts + (heat?.watts ?? 0))) / 100;
            out.push({
              candidate: { ...base, perchTopCm },
              quick: Math.max(...spread) + lidPenalty + extra,
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
    const design = buildDesign(input.enclosure, input.lid, candidate, neededBaskingCm(input.species));
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
