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
import { runsOf, type SurfaceSample } from './surfaces';
import { ESTIMATE_TEMP, GENERAL_HOT_SURFACE_C, LAMP_REACH_CM, UV_EYE_CM } from './thresholds';
import { f0, f1 } from './format';
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

export function safetyFindings(
  design: Design,
  samples: SurfaceSample[],
  opts: { climbs?: boolean } = {},
): Finding[] {
  const near = unguardedDistances(design, samples, opts);
  const guard = opts.climbs
    ? 'glass guard (mesh is no guard for a climber: it holds on to the mesh)'
    : 'mesh or glass guard';
  const reach = near.filter((n) => n.distance < LAMP_REACH_CM);
  const hotLamps = reach.filter(
    (n) => n.heat && design.objects.some((o) => o.id === n.id && o.type === 'lamp' && o.form === 'bulb'),
  );
  const closest = Math.min(Infinity, ...reach.map((n) => n.distance));
  const out: Finding[] = [
    {
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
  const eye = near.filter((n) => n.uv && n.distance < UV_EYE_CM);
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
  out.push(...shortWaveFindings(design));
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
): Finding {
  let hot = samples.length ? -Infinity : roomC;
  samples.forEach((_, k) => {
    hot = Math.max(hot, tempC[k]!);
  });
  const bad = hot > GENERAL_HOT_SURFACE_C;
  const segs = runsOf(samples, (k) => tempC[k]! > GENERAL_HOT_SURFACE_C);
  return {
    id: 'hot-surface',
    status: bad ? 'fail' : 'pass',
    title: 'Surfaces too hot to touch',
    message: bad
      ? `A surface the animal can reach gets about ${f1(hot)} °C, above the ${f0(GENERAL_HOT_SURFACE_C)} °C general limit for burns (from memory): ${tooHotAdvice(lamps)}.${lamps.length ? ` ${controlAdvice(lamps)}` : ''} Choose a species sheet for its own basking range. ${ESTIMATE_TEMP}`
      : `The hottest surface the animal can reach is about ${f1(hot)} °C, under the ${f0(GENERAL_HOT_SURFACE_C)} °C general limit for burns (from memory). Choose a species sheet to check it against the species’ basking range. ${ESTIMATE_TEMP}`,
    numbers: { hotC: hot, limitC: GENERAL_HOT_SURFACE_C },
    where: segs.length ? { kind: 'segments', segments: segs } : undefined,
  };
}
