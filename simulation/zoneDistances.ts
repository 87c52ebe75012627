/**
 * Zone distances: how far below a lamp the model's UV Index lies inside each Ferguson zone's basking
 * range (the UVI range animals of the zone seek out; Ferguson et al. 2010, Zoo Biology 29:317–334).
 * Computed by this engine for any lamp, never taken from a chart: a new lamp at the top of a tall, wide,
 * empty enclosure, read straight below its centre, in three set-ups — bare, with a reflector, and
 * shining through a mesh lid just below it. Every figure is an estimate to check with a meter.
 */
import { probe } from './fields/grid';
import type { Design, LampObject } from './model/schema';
import { GOOD_REFLECTOR_GAIN } from './model/presets';
import { DEFAULT_SCREEN_UVB_TRANSMISSION } from './model/materials';
import { UV_ZONES, type UvZone } from './assess/zones';

export type ZoneSetup = 'bare' | 'reflector' | 'mesh';

/** The lamp figures the distances depend on (a preset's `lamp`, a lamp type, or a lamp object). */
export type ZoneLamp = Omit<LampObject, 'type' | 'id' | 'x' | 'y' | 'name'>;

export interface ZoneDistance {
  zone: UvZone;
  /** The zone's basking UVI range. */
  uvi: [number, number];
  /** From this distance (cm below the lamp) … */
  fromCm: number;
  /** … to this one the UVI is inside the range (FARTHEST_CM: at least that far). */
  toCm: number;
}

export interface ZoneDistances {
  setup: ZoneSetup;
  /** Highest UVI the model gives right under the lamp (at the nearest distance read). */
  peakUvi: number;
  zones: ZoneDistance[];
}

/** Nearest and farthest distances read (cm). Closer than 5 cm nobody puts an animal under a lamp. */
export const NEAREST_CM = 5;
export const FARTHEST_CM = 500;
/** The mesh lid sits this far (cm) below the lamp in the 'mesh' set-up. */
export const MESH_GAP_CM = 2;

/** What each set-up assumes, in words for the page that shows the figures. */
export const ZONE_SETUP_ASSUMPTIONS: Record<ZoneSetup, string> = {
  bare: 'new lamp, no reflector, nothing between the lamp and the animal',
  reflector: `new lamp with a polished reflector taken as ×${GOOD_REFLECTOR_GAIN} inside its beam (common practice, no published source)`,
  mesh: `new, bare lamp shining through a mesh lid ${MESH_GAP_CM} cm below it that passes ${Math.round(
    DEFAULT_SCREEN_UVB_TRANSMISSION * 100,
  )} % of the UVB (a 1.0 mm / 0.25 mm woven mesh, ISO 9044 open area)`,
};

const WIDTH = 2 * FARTHEST_CM + 200;
const TOP = FARTHEST_CM + 10;

function scene(lamp: ZoneLamp, setup: ZoneSetup): Design {
  const x = WIDTH / 2;
  const l = {
    ...lamp,
    type: 'lamp',
    id: 'lamp',
    x,
    y: TOP,
    ageMonths: 0,
    reflectorGain: setup === 'reflector' ? GOOD_REFLECTOR_GAIN : 1,
  } as LampObject;
  const objects: Design['objects'] = [l];
  if (setup === 'mesh')
    objects.push({
      type: 'screen',
      id: 'lid',
      x1: 0,
      y1: TOP - MESH_GAP_CM,
      x2: WIDTH,
      y2: TOP - MESH_GAP_CM,
    });
  return {
    format: 'baskwell.design',
    version: 2,
    enclosure: { width: WIDTH, height: TOP, depth: 60 },
    objects,
  };
}

/**
 * The distance (cm) below the lamp at which the UVI falls to `uvi`, by bisection between the nearest
 * and farthest distances (the UVI falls steadily with distance straight below a lamp).
 */
function distanceTo(uviAt: (d: number) => number, uvi: number): number {
  let lo = NEAREST_CM;
  let hi = FARTHEST_CM;
  if (uviAt(lo) <= uvi) return lo;
  if (uviAt(hi) > uvi) return hi;
  for (let k = 0; k < 40 && hi - lo > 0.05; k++) {
    const mid = (lo + hi) / 2;
    if (uviAt(mid) > uvi) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/** The zone distances of a lamp in one set-up; zones the lamp never reaches (too weak) are left out. */
export function zoneDistances(lamp: ZoneLamp, setup: ZoneSetup): ZoneDistances {
  const design = scene(lamp, setup);
  const x = WIDTH / 2;
  const cache = new Map<number, number>();
  const uviAt = (d: number) => {
    let v = cache.get(d);
    if (v === undefined) {
      v = probe(design, [{ x, y: TOP - d }])[0]!.uvi;
      cache.set(d, v);
    }
    return v;
  };
  const peakUvi = uviAt(NEAREST_CM);
  const zones: ZoneDistance[] = [];
  for (const zone of [4, 3, 2, 1] as UvZone[]) {
    const [lo, hi] = UV_ZONES[zone].max;
    if (peakUvi < lo) continue;
    const fromCm = distanceTo(uviAt, hi);
    const toCm = distanceTo(uviAt, lo);
    // A range that ends within a centimetre of the nearest distance is no place for an animal.
    if (toCm < NEAREST_CM + 1) continue;
    zones.push({ zone, uvi: [lo, hi], fromCm, toCm });
  }
  return { setup, peakUvi, zones };
}

/** All three set-ups, or null for a lamp without UVB. */
export function allZoneDistances(lamp: ZoneLamp): ZoneDistances[] | null {
  if (!((lamp.uvbAt30 ?? 0) > 0)) return null;
  return (['bare', 'reflector', 'mesh'] as ZoneSetup[]).map((s) => zoneDistances(lamp, s));
}
