/**
 * Safety cautions: a lamp within the animal's reach (burns), and an unshielded UV lamp close to where the
 * animal sits (eyes). "Within reach" is a straight line in the section from a reachable surface to the
 * lamp, not crossed by a screen or glass pane, shorter than the stated distance.
 */
import type { Design } from '../model/schema';
import { resolveLamp } from '../model/resolve';
import type { LampTech } from '../model/techs';
import { controlAdvice } from '../model/control';
import { tooHotAdvice } from './heatFindings';
import type { Finding } from './types';
import { reachableSurfaces, runsOf, type SurfaceSample } from './surfaces';
import { ESTIMATE_TEMP, GENERAL_HOT_SURFACE_C, LAMP_REACH_CM, UV_EYE_CM } from './thresholds';
import { f0, f1, surfaceC } from './format';
import { shortWaveCaution } from './uvTargets';

type Pt = { x: number; y: number };

function closestOnSegment(p: Pt, a: Pt, b: Pt): Pt {
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const l2 = dx * dx + dy * dy;
  const t = l2 > 0 ? Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / l2)) : 0;
  return { x: a.x + t * dx, y: a.y + t * dy };
}

function segmentsCross(p: Pt, q: Pt, a: Pt, b: Pt): boolean {
  const d1x = q.x - p.x;
  const d1y = q.y - p.y;
  const d2x = b.x - a.x;
  const d2y = b.y - a.y;
  const den = d1x * d2y - d1y * d2x;
  if (den === 0) return false;
  const t = ((a.x - p.x) * d2y - (a.y - p.y) * d2x) / den;
  const u = ((a.x - p.x) * d1y - (a.y - p.y) * d1x) / den;
  return t >= 0 && t <= 1 && u >= 0 && u <= 1;
}

interface Near {
  id: string;
  distance: number;
  heat: boolean;
  uv: boolean;
}

/**
 * Nearest unguarded distance from each lamp to the reachable surfaces. Glass always guards; mesh guards
 * only an animal that does not climb — a climber holds on to the mesh, and a lamp resting on it or
 * inside a wire guard is as close as the mesh is (common practice, no published source).
 */
export function unguardedDistances(
  design: Design,
  samples: SurfaceSample[],
  opts: { climbs?: boolean } = {},
): Near[] {
  const barriers = design.objects.filter(
    (o): o is Extract<Design['objects'][number], { type: 'glass' | 'screen' }> =>
      o.type === 'glass' || (o.type === 'screen' && !opts.climbs),
  );
  const out: Near[] = [];
  for (const o of design.objects) {
    if (o.type !== 'lamp') continue;
    const l = resolveLamp(o);
    const a = { x: l.x - l.length / 2, y: l.y };
    const b = { x: l.x + l.length / 2, y: l.y };
    let best = Infinity;
    for (const s of samples) {
      const c = closestOnSegment(s, a, b);
      const d = Math.hypot(c.x - s.x, c.y - s.y);
      if (d >= best) continue;
      const guarded = barriers.some((g) => segmentsCross(s, c, { x: g.x1, y: g.y1 }, { x: g.x2, y: g.y2 }));
      if (!guarded) best = d;
    }
    out.push({ id: l.id, distance: best, heat: l.watts * l.radiantFraction > 0, uv: l.uvbAt30 > 0 });
  }
  return out;
}

const HEAT_TECHS_NOTE = 'Heat and UV lamps can burn an animal that touches them or sits right under them.';
const DISTANCE_NOTE = 'Distances are estimates from the drawing: check them in the real enclosure.';

/**
 * `opts.climbs` is the sheet's word. Without a sheet (`climbSamples` given: the surfaces a climber would
 * reach) nobody has said whether the animal climbs, so a lamp that is out of reach only because mesh is
 * between is not a pass: it is an attention that names the lamp, since for a climber it is a burn.
 */
export function safetyFindings(
  design: Design,
  samples: SurfaceSample[],
  opts: { climbs?: boolean; climbSamples?: SurfaceSample[] } = {},
): Finding[] {
  const near = unguardedDistances(design, samples, opts);
  const ifClimbs = opts.climbSamples ? unguardedDistances(design, opts.climbSamples, { climbs: true }) : [];
  const guard = opts.climbs
    ? 'glass guard (mesh is no guard for a climber: it holds on to the mesh)'
    : 'mesh or glass guard';
  const reach = near.filter((n) => n.distance < LAMP_REACH_CM);
  const hotLamps = reach.filter(
    (n) => n.heat && design.objects.some((o) => o.id === n.id && o.type === 'lamp' && o.form === 'bulb'),
  );
  const closest = Math.min(Infinity, ...reach.map((n) => n.distance));
  const reachIfClimbs = ifClimbs.filter(
    (n) => n.distance < LAMP_REACH_CM && !reach.some((r) => r.id === n.id),
  );
  const ifClimbsOnly = reach.length === 0 && reachIfClimbs.length > 0;
  const cc = Math.min(Infinity, ...reachIfClimbs.map((n) => n.distance));
  const out: Finding[] = [
    ifClimbsOnly
      ? {
          id: 'lamp-in-reach',
          status: 'attention',
          title: 'Lamps out of reach',
          message: `${reachIfClimbs.map((n) => n.id).join(', ')} ${reachIfClimbs.length === 1 ? 'is' : 'are'} within ${LAMP_REACH_CM} cm (about ${f0(cc)} cm) of mesh an animal could hang from. Mesh guards an animal that stays off it, but a climber holds on to it: for a climbing species that is a burn. Choose the species sheet, or raise the lamp at least ${LAMP_REACH_CM} cm above any mesh the animal can climb (common practice, no published source). ${DISTANCE_NOTE}`,
          numbers: { reachCm: LAMP_REACH_CM, closestCm: cc, lamps: reachIfClimbs.length },
          ifClimbs: true,
          where: { kind: 'object', objectIds: reachIfClimbs.map((n) => n.id) },
        }
      : {
          id: 'lamp-in-reach',
          status: reach.length === 0 ? 'pass' : hotLamps.length ? 'fail' : 'attention',
          title: 'Lamps out of reach',
          message:
            reach.length === 0
              ? `No lamp is within ${LAMP_REACH_CM} cm of a surface the animal can reach without a ${guard} between (common practice, no published source). Climbing animals reach further than you think. ${DISTANCE_NOTE}`
              : `${reach.map((n) => n.id).join(', ')} ${reach.length === 1 ? 'is' : 'are'} within ${LAMP_REACH_CM} cm (closest about ${f0(closest)} cm) of a reachable surface with no ${guard} between. ${HEAT_TECHS_NOTE} ${opts.climbs ? `Raise the lamp at least ${LAMP_REACH_CM} cm above any mesh the animal can climb, or give the guard room so the lamp stays ${LAMP_REACH_CM} cm from its outside` : 'Fit a lamp guard or move the lamp out of reach'} (common practice, no published source). ${DISTANCE_NOTE}`,
          numbers: {
            reachCm: LAMP_REACH_CM,
            ...(Number.isFinite(closest) ? { closestCm: closest } : {}),
            lamps: reach.length,
          },
          where: reach.length ? { kind: 'object', objectIds: reach.map((n) => n.id) } : undefined,
        },
  ];
  out.push(...eyeFindings(near, ifClimbs));
  out.push(...shortWaveFindings(design));
  return out;
}

/** UV near the eyes; `ifClimbs` (no sheet) adds the lamps a climber on the mesh would be near. */
function eyeFindings(near: Near[], ifClimbs: Near[]): Finding[] {
  const eye = near.filter((n) => n.uv && n.distance < UV_EYE_CM);
  const climbEye = ifClimbs.filter((n) => n.uv && n.distance < UV_EYE_CM && !eye.some((e) => e.id === n.id));
  if (eye.length === 0 && climbEye.length > 0) {
    const c = Math.min(...climbEye.map((n) => n.distance));
    return [
      {
        id: 'eye-safety',
        status: 'attention',
        title: 'UV and the eyes',
        message: `The UV lamp ${climbEye.map((n) => n.id).join(', ')} is within ${UV_EYE_CM} cm (about ${f0(c)} cm) of mesh an animal could hang from. A climber's eyes there get UV far above its zone, and strong UV close up can hurt the eyes: choose the species sheet, or mount the lamp higher (common practice, no published source). ${DISTANCE_NOTE}`,
        numbers: { eyeCm: UV_EYE_CM, closestCm: c, lamps: climbEye.length },
        ifClimbs: true,
        where: { kind: 'object', objectIds: climbEye.map((n) => n.id) },
      },
    ];
  }
  const out: Finding[] = [];
  const eyeClosest = Math.min(Infinity, ...eye.map((n) => n.distance));
  out.push({
    id: 'eye-safety',
    status: eye.length ? 'attention' : 'pass',
    title: 'UV and the eyes',
    message: eye.length
      ? `The UV lamp ${eye.map((n) => n.id).join(', ')} is within ${UV_EYE_CM} cm (about ${f0(eyeClosest)} cm) of a spot the animal can reach, with nothing in between. Strong UV close up can hurt the eyes of animals and people: mount UV lamps overhead, out of the line of sight, and never look into them (common practice, no published source). ${DISTANCE_NOTE}`
      : `No UV lamp is closer than ${UV_EYE_CM} cm to a reachable spot without a barrier. Mount UV lamps overhead and never look into them; a vet can advise if an animal keeps its eyes closed under the lamp (common practice, no published source). ${DISTANCE_NOTE}`,
    numbers: {
      eyeCm: UV_EYE_CM,
      ...(Number.isFinite(eyeClosest) ? { closestCm: eyeClosest } : {}),
      lamps: eye.length,
    },
    where: eye.length ? { kind: 'object', objectIds: eye.map((n) => n.id) } : undefined,
  });
  return out;
}

/** A caution when a UV lamp's UV Index per µW/cm² is far from sunlight's (no finding when none is). */
function shortWaveFindings(design: Design): Finding[] {
  const texts: string[] = [];
  const ids: string[] = [];
  let ratio = 0;
  for (const o of design.objects) {
    if (o.type !== 'lamp') continue;
    const l = resolveLamp(o);
    const text = l.uvbAt30 > 0 ? shortWaveCaution(l.uviPerUvb, o.name ?? o.id) : null;
    if (!text) continue;
    texts.push(text);
    ids.push(o.id);
    ratio = Math.max(ratio, l.uviPerUvb);
  }
  if (ids.length === 0) return [];
  return [
    {
      id: 'short-wave-uvb',
      status: 'attention',
      title: 'Short-wave UVB',
      message: texts.join(' '),
      numbers: { uviPerUvb: ratio },
      where: { kind: 'object', objectIds: ids },
    },
  ];
}

/**
 * Without a species sheet there is no basking range to judge the hottest surface by, so it is held to a
 * general limit for burns instead (GENERAL_HOT_SURFACE_C).
 */
export function hotSurfaceFinding(
  samples: SurfaceSample[],
  tempC: ArrayLike<number>,
  roomC: number,
  lamps: { tech: LampTech; name: string }[],
  /** The mesh a climber would hang from, judged apart: too hot there is an attention. */
  mesh?: { samples: SurfaceSample[]; tempC: ArrayLike<number> },
): Finding {
  let hot = samples.length ? -Infinity : roomC;
  samples.forEach((_, k) => {
    hot = Math.max(hot, tempC[k]!);
  });
  const bad = hot > GENERAL_HOT_SURFACE_C;
  const segs = runsOf(samples, (k) => tempC[k]! > GENERAL_HOT_SURFACE_C);
  let meshHot = -Infinity;
  mesh?.samples.forEach((_, k) => {
    meshHot = Math.max(meshHot, mesh.tempC[k]!);
  });
  if (!bad && mesh && meshHot > GENERAL_HOT_SURFACE_C) {
    const meshSegs = runsOf(mesh.samples, (k) => mesh.tempC[k]! > GENERAL_HOT_SURFACE_C);
    return {
      id: 'hot-surface',
      status: 'attention',
      title: 'Surfaces too hot to touch',
      message: `Mesh an animal could hang from gets ${surfaceC(meshHot)} °C under a lamp, above the ${f0(GENERAL_HOT_SURFACE_C)} °C general limit for burns (from memory); the surfaces off the mesh stay under it (hottest about ${f1(hot)} °C). For a climbing species that is a burn: ${tooHotAdvice(lamps)}.${lamps.length ? ` ${controlAdvice(lamps)}` : ''} Choose the species sheet for the full check. ${ESTIMATE_TEMP}`,
      numbers: { hotC: hot, meshHotC: meshHot, limitC: GENERAL_HOT_SURFACE_C },
      ifClimbs: true,
      where: meshSegs.length ? { kind: 'segments', segments: meshSegs } : undefined,
    };
  }
  return {
    id: 'hot-surface',
    status: bad ? 'fail' : 'pass',
    title: 'Surfaces too hot to touch',
    message: bad
      ? `A surface the animal can reach gets ${surfaceC(hot)} °C, above the ${f0(GENERAL_HOT_SURFACE_C)} °C general limit for burns (from memory): ${tooHotAdvice(lamps)}.${lamps.length ? ` ${controlAdvice(lamps)}` : ''} Choose a species sheet for its own basking range. ${ESTIMATE_TEMP}`
      : `The hottest surface the animal can reach is about ${f1(hot)} °C, under the ${f0(GENERAL_HOT_SURFACE_C)} °C general limit for burns (from memory). Choose a species sheet to check it against the species’ basking range. ${ESTIMATE_TEMP}`,
    numbers: { hotC: hot, limitC: GENERAL_HOT_SURFACE_C },
    where: segs.length ? { kind: 'segments', segments: segs } : undefined,
  };
}

/** What a climber hanging from one screen (a mesh lid, a wire guard) is near: the lamps in reach. */
export interface MeshRisk {
  screenId: string;
  /** Heat bulbs within the reach distance of the screen's underside (a burn). */
  burn: { lampId: string; distanceCm: number }[];
  /** UV lamps within the eye distance of it (UV far above the zone, at the eyes). */
  uv: { lampId: string; distanceCm: number }[];
}

/**
 * For a climbing animal, every screen it can hold on to with the lamps near it, by the same reach rule
 * as the safety findings (LAMP_REACH_CM, UV_EYE_CM; common practice, no published source). The studio
 * marks each screen with it.
 */
export function climberMeshRisks(design: Design): MeshRisk[] {
  const samples = reachableSurfaces(design, undefined, { climbs: true });
  const out: MeshRisk[] = [];
  for (const o of design.objects) {
    if (o.type !== 'screen') continue;
    const own = samples.filter((s) => s.surfaceId === o.id);
    const near = own.length ? unguardedDistances(design, own, { climbs: true }) : [];
    const bulb = (id: string) =>
      design.objects.some((l) => l.id === id && l.type === 'lamp' && l.form === 'bulb');
    out.push({
      screenId: o.id,
      burn: near
        .filter((n) => n.heat && bulb(n.id) && n.distance < LAMP_REACH_CM)
        .map((n) => ({ lampId: n.id, distanceCm: n.distance })),
      uv: near
        .filter((n) => n.uv && n.distance < UV_EYE_CM)
        .map((n) => ({ lampId: n.id, distanceCm: n.distance })),
    });
  }
  return out;
}
