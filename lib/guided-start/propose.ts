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
  lampPositions,
  lampsOnly,
  lampY,
  BULB_SPACING_CM,
  HEAT_RAISED_ABOVE_LID_CM,
  RAISED_ABOVE_LID_CM,
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
  /** At most this many UV lamps (default 2): a set-up with lamps already bought may have only one. */
  maxUvLamps?: number;
};

export type Proposal = {
  candidate: Candidate;
  design: Design;
  assessment: Assessment;
  /** Findings that are not a pass, most important first. */
  unmet: Assessment['findings'];
  /**
   * Unmet findings that could hurt the animal: a lamp within its reach, a UV lamp close to its eyes, a
   * surface hotter than its basking range, UV above its zone. A proposal with any of these is not a
   * design to build; the guided start says so instead of offering it.
   */
  harmful: Assessment['findings'];
};

/** Is this unmet finding one that could hurt the animal (rather than a shortfall to improve)? */
export function isHarmful(f: Assessment['findings'][number]): boolean {
  if (f.status === 'pass') return false;
  if (f.id === 'lamp-in-reach' || f.id === 'eye-safety' || f.id === 'hot-surface') return true;
  if (f.id === 'hot-spot') return (f.numbers.hotC ?? 0) > (f.numbers.targetHi ?? Infinity);
  if (f.id === 'basking-uvi') return (f.numbers.maxUvi ?? 0) > (f.numbers.zoneMaxHi ?? Infinity);
  return false;
}

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

/** A finding that could hurt the animal outweighs any shortfall: the search never trades safety away. */
const HARM_COST = 100;

export function assessmentCost(a: Assessment): number {
  return a.findings.reduce(
    (sum, f) => sum + (WEIGHT[f.id] ?? 1) * STATUS_COST[f.status] + (isHarmful(f) ? HARM_COST : 0),
    0,
  );
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
  if (c.heat) ys.push(lampY(enc, lid, c.mount, 'bulb', c.heatRaiseCm ?? c.raiseCm) - LAMP_REACH_CM);
  // Over a lid the animal can still climb to the mesh: keep the basking spot well below it.
  return Math.min(enc.height - LAMP_REACH_CM, ...ys);
}

type Scored = { candidate: Candidate; quick: number };

/** At most this many perch heights are probed per lamp set; tall enclosures are probed in coarser steps. */
const MAX_HEIGHTS = 24;

function perchHeights(top: number): number[] {
  const step =
    PERCH_STEP_CM * Math.max(1, Math.ceil((top - LOWEST_PERCH_TOP_CM) / (MAX_HEIGHTS * PERCH_STEP_CM)));
  const out: number[] = [];
  for (let h = LOWEST_PERCH_TOP_CM; h <= top + 1e-9; h += step) out.push(h);
  return out;
}

/** At most this many UV lamps, and this many heat lamps, side by side over the perch. */
const MAX_UV_LAMPS = 2;
const MAX_HEAT_LAMPS = 3;

/**
 * The lamp sets tried over the perch: each UV lamp alone or doubled, with none or up to three heat
 * lamps. A second lamp of a kind is only tried where the animal needs a basking spot long enough for it
 * (a lamp's pool covers roughly this much on its own — engine's choice, to keep the search small).
 */
const ONE_LAMP_COVERS_CM = 15;

/**
 * How far apart bulbs side by side are tried: the needed length shared among them, or wider, so pools
 * that would overlap into one too-hot spot join into a longer, gentler one.
 */
function spreads(
  uv: LampTypeDto,
  uvCount: number,
  heatCount: number,
  neededCm: number,
): (number | undefined)[] {
  const bulbs = heatCount + (uv.form === 'bulb' ? uvCount : 0);
  if (bulbs < 2) return [undefined];
  const base = Math.max(BULB_SPACING_CM, neededCm / bulbs);
  return [undefined, base + 10, base + 20];
}

type LampSet = Omit<Candidate, 'perchTopCm'>;

/**
 * First stage: which lamps and where — each UV lamp (with and without a reflector) at each mount, alone
 * or with one heat lamp of each type (over a climber's mesh lid, the heat lamp at each height of its own).
 */
function singleSets(lid: Lid, climbs: boolean, uvTypes: LampTypeDto[], heatTypes: LampTypeDto[]): LampSet[] {
  const out: LampSet[] = [];
  for (const uv of uvTypes) {
    for (const reflector of uv.form === 'tube' ? [false, true] : [false]) {
      for (const { mount, raiseCm } of mountsFor(lid, climbs)) {
        out.push({ uv, reflector, heat: null, uvCount: 1, heatCount: 0, mount, raiseCm });
        for (const heat of heatTypes) {
          // Over a climber's mesh lid the heat lamps may stand higher or lower than the UV lamps.
          const heatRaises = mount === 'raised' ? HEAT_RAISED_ABOVE_LID_CM : [raiseCm];
          for (const heatRaiseCm of heatRaises) {
            out.push({ uv, reflector, heat, uvCount: 1, heatCount: 1, mount, raiseCm, heatRaiseCm });
          }
        }
      }
    }
  }
  return out;
}

/**
 * Second stage, for the most promising lamp sets of the first: how many of each side by side and how
 * far apart, so a long animal gets a long enough basking spot.
 */
function multipliedSets(set: LampSet, neededCm: number, maxUvLamps: number): LampSet[] {
  const maxUv = Math.min(MAX_UV_LAMPS, maxUvLamps);
  const maxHeat = set.heat ? Math.min(MAX_HEAT_LAMPS, 1 + Math.floor(neededCm / ONE_LAMP_COVERS_CM)) : 0;
  const out: LampSet[] = [];
  for (let uvCount = 1; uvCount <= maxUv; uvCount++) {
    for (let heatCount = set.heat ? 1 : 0; heatCount <= maxHeat; heatCount++) {
      for (const spreadCm of spreads(set.uv, uvCount, heatCount, neededCm)) {
        if (uvCount === 1 && heatCount === (set.heat ? 1 : 0) && spreadCm === undefined) continue;
        out.push({ ...set, uvCount, heatCount, spreadCm });
      }
    }
  }
  return out;
}

/** How many of the first stage's lamp sets are multiplied out in the second. */
const MULTIPLIED_SETS = 16;

function coarseSearch(input: ProposalInput, lampTypes: LampTypeDto[]): Scored[] {
  const { enclosure: enc, lid, species } = input;
  const uvTypes = lampTypes.filter((t) => UV_TECHS.has(t.tech) && t.uvbAt30 > 0);
  const heatTypes = lampTypes.filter((t) => HEAT_ONLY.has(t.tech));
  const needed = neededBaskingCm(species);
  const zone = baskingZone(enc, needed);
  // The shared basking spot must hold across its whole length: score its middle and both ends.
  const half = Math.max(0, Math.min(needed, zone.width) / 2 - 1);
  const xs = [zone.x - half, zone.x - half / 2, zone.x, zone.x + half / 2, zone.x + half];
  const climbsMesh = species.climbs === true && lid === 'mesh';
  const [, uhi] = baskingUviRange(targetZone(species));
  const score = (base: LampSet, out: Scored[]): number => {
    let best = Infinity;
    const design = lampsOnly(enc, lid, base, needed);
    const at = lampPositions(enc, base, needed);
    if (!design || !at) return best;
    const top = highestPerchTop(enc, lid, base);
    const heights = perchHeights(top);
    if (heights.length === 0) return best;
    const points = heights.flatMap((h) => xs.map((x) => ({ x, y: h + 0.01 })));
    // A climber reaches the underside of the mesh lid: it must not be over the top under any lamp.
    const lidXs = climbsMesh ? [...at.uv, ...at.heat] : [];
    points.push(...lidXs.map((x) => ({ x, y: enc.height - 0.01 })));
    const values = probe(design, points, { cellCm: 2 });
    let lidPenalty = 0;
    for (let i = 0; i < lidXs.length; i++) {
      const v = values[values.length - lidXs.length + i]!;
      lidPenalty = Math.max(
        lidPenalty,
        3 * Math.log(Math.max(1, v.uvi / uhi)) + Math.max(0, v.tempC - species.baskingSurfaceC[1]) / 3,
      );
    }
    const n = { uv: base.uvCount ?? 1, heat: base.heat ? (base.heatCount ?? 1) : 0 };
    // Fewer lamps and fewer watts are kinder to the animal, the air and the bill.
    const extra =
      LAMP_COST * (n.uv - 1 + n.heat) +
      (WATT_COST * (n.uv * base.uv.watts + n.heat * (base.heat?.watts ?? 0))) / 100;
    heights.forEach((perchTopCm, k) => {
      const spread = xs.map((_, i) => {
        const p = values[k * xs.length + i]!;
        return quickScore(species, p.uvi, p.uvb, p.tempC);
      });
      const quick = Math.max(...spread) + lidPenalty + extra;
      best = Math.min(best, quick);
      out.push({ candidate: { ...base, perchTopCm }, quick });
    });
    return best;
  };
  const out: Scored[] = [];
  const first = singleSets(lid, species.climbs === true, uvTypes, heatTypes)
    .map((set) => ({ set, best: score(set, out) }))
    .filter((r) => Number.isFinite(r.best))
    .sort((a, b) => a.best - b.best);
  for (const { set } of first.slice(0, MULTIPLIED_SETS)) {
    for (const more of multipliedSets(set, needed, input.maxUvLamps ?? MAX_UV_LAMPS)) score(more, out);
  }
  return out.sort((a, b) => a.quick - b.quick);
}

/** The best cheaply scored candidates, at most a few of each lamp set, so the full checks see variety. */
function diverse(ranked: Scored[]): Scored[] {
  const PER_SET = 4;
  const seen = new Map<string, number>();
  const out: Scored[] = [];
  for (const r of ranked) {
    const c = r.candidate;
    const key = [
      c.uv.id,
      c.reflector,
      c.uvCount,
      c.heat?.id,
      c.heatCount,
      c.mount,
      c.raiseCm,
      c.heatRaiseCm,
    ].join();
    const n = seen.get(key) ?? 0;
    if (n >= PER_SET) continue;
    seen.set(key, n + 1);
    out.push(r);
    if (out.length >= FULL_CHECKS) break;
  }
  return out;
}

/**
 * The best starting design for the species in this enclosure, or null when the catalogue has no UV lamp
 * that fits. The returned assessment is the engine's own; `unmet` says plainly what it could not meet.
 */
export function propose(input: ProposalInput, lampTypes: LampTypeDto[]): Proposal | null {
  const ranked = coarseSearch(input, lampTypes);
  let best: (Proposal & { cost: number; quick: number }) | null = null;
  for (const { candidate, quick } of diverse(ranked)) {
    const design = buildDesign(input.enclosure, input.lid, candidate, neededBaskingCm(input.species));
    if (!design) continue;
    const assessment = assess(design, input.species, { cellCm: 2 });
    const cost = assessmentCost(assessment);
    if (!best || cost < best.cost || (cost === best.cost && quick < best.quick)) {
      best = { candidate, design, assessment, unmet: [], harmful: [], cost, quick };
    }
    if (cost === 0) break;
  }
  if (!best) return null;
  const unmet = best.assessment.findings
    .filter((f) => f.status !== 'pass')
    .sort(
      (a, b) => (WEIGHT[b.id] ?? 1) * STATUS_COST[b.status] - (WEIGHT[a.id] ?? 1) * STATUS_COST[a.status],
    );
  return {
    candidate: best.candidate,
    design: best.design,
    assessment: best.assessment,
    unmet,
    harmful: unmet.filter(isHarmful),
  };
}
