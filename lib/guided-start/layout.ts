import type { Design, DesignObject } from '@/simulation';
import {
  ASSESSMENT_THRESHOLDS,
  DEFAULT_WALLS,
  DESIGN_FORMAT,
  DESIGN_VERSION,
  GOOD_REFLECTOR_GAIN,
  type WallMaterial,
} from '@/simulation';
import type { LampTypeDto } from '@/lib/lamp-types/schema';
import { lampObjectFromType } from '@/lib/lamp-types/to-engine';

/**
 * The shape of a guided-start design: a UV lamp (and, if needed, a heat lamp) over a basking perch on the
 * warm side, a hide on the cool side, and the lid. The search in propose.ts varies the lamps, where they
 * hang and the perch height; everything else follows from the enclosure.
 */

export type Lid = 'mesh' | 'glass' | 'open';
/**
 * 'above': resting on the lid (or on a stand over an open top); 'inside': hung under the lid;
 * 'raised': on a frame well above a mesh lid, for animals that climb the mesh.
 */
export type Mount = 'above' | 'inside' | 'raised';

export type EnclosureInput = {
  width: number;
  height: number;
  depth: number;
  roomTempC: number;
  /** What the walls are made of (the engine's wall table); glass when not given. */
  walls?: WallMaterial;
};

export type Candidate = {
  uv: LampTypeDto;
  /** A reflector on the UV lamp (tubes only): gain GOOD_REFLECTOR_GAIN from the engine's presets. */
  reflector: boolean;
  heat: LampTypeDto | null;
  /** How many UV lamps side by side over the perch (default 1): a long animal needs a long basking spot. */
  uvCount?: number;
  /** How many heat lamps side by side (default 1 when there is a heat lamp). */
  heatCount?: number;
  mount: Mount;
  /** 'raised' only: how far above the lid the lamps stand, cm. */
  raiseCm?: number;
  /** 'raised' only: how far above the lid the heat lamps stand, when not at the UV lamps' height. */
  heatRaiseCm?: number;
  /** Bulbs side by side: centre-to-centre distance, cm (default: the needed length shared among them). */
  spreadCm?: number;
  /** Height of the perch's top surface above the floor, cm. */
  perchTopCm: number;
};

export const PERCH_THICKNESS_CM = 4;
/** Lamps on a lid sit a little above it; over an open top, on a stand (common practice, no published source). */
const ABOVE_LID_CM = { tube: 2, bulb: 3 };
const ABOVE_OPEN_CM = 10;
/** Hung under the lid: the lamp centre this far below it (a fitting and a guard). */
const BELOW_LID_CM = { tube: 3, bulb: 6 };
/** Bulbs side by side over the perch at least this far apart (centre to centre). */
export const BULB_SPACING_CM = 10;
/** Tubes end to end: the gap between their fittings. */
const TUBE_GAP_CM = 2;

export const UV_LAMP_ID = 'uv-lamp';
export const HEAT_LAMP_ID = 'heat-lamp';
export const PERCH_ID = 'basking-perch';
export const HIDE_ID = 'cool-hide';

const clamp = (v: number, lo: number, hi: number) => Math.min(hi, Math.max(lo, v));
const round1 = (v: number) => Math.round(v * 10) / 10;

/**
 * On a frame over a mesh lid that a climber can hang from: the lamp stays beyond the reach (15 cm) and
 * eye (20 cm) distances of the engine's safety checks from the mesh (common practice, no published source).
 */
export const RAISED_ABOVE_LID_CM = [ASSESSMENT_THRESHOLDS.UV_EYE_CM + 2, 30, 40, 55] as const;
/**
 * Heat lamps over a climber's mesh lid may stand higher still: for animals that want only gentle warmth
 * (a tree frog), a common heat lamp must be far from the mesh it hangs from.
 */
export const HEAT_RAISED_ABOVE_LID_CM = [...RAISED_ABOVE_LID_CM, 70] as const;

export function lampY(
  enc: EnclosureInput,
  lid: Lid,
  mount: Mount,
  form: 'tube' | 'bulb',
  raiseCm: number = RAISED_ABOVE_LID_CM[0],
): number {
  if (mount === 'inside') return enc.height - BELOW_LID_CM[form];
  if (mount === 'raised') return enc.height + raiseCm;
  return enc.height + (lid === 'open' ? ABOVE_OPEN_CM : ABOVE_LID_CM[form]);
}

/**
 * The basking zone on the warm side: perch centre and width. The perch is at least as long as the
 * shared basking spot the species needs (`neededCm`), with a little to spare.
 */
export function baskingZone(enc: EnclosureInput, neededCm = 0): { x: number; width: number } {
  const width = Math.min(Math.max(clamp(enc.width * 0.25, 15, 35), neededCm + 6), enc.width * 0.6);
  return {
    x: round1(clamp(enc.width * 0.7, width / 2 + 2, enc.width - width / 2 - 2)),
    width: round1(width),
  };
}

export function hideBox(enc: EnclosureInput): { x: number; y: number; width: number; height: number } {
  return {
    x: 2,
    y: 0,
    width: round1(clamp(enc.width * 0.2, 12, 30)),
    height: round1(clamp(enc.height * 0.25, 8, 15)),
  };
}

/** Lamps of a candidate: how many of each kind (the counts default to one). */
export function lampCounts(c: Pick<Candidate, 'heat' | 'uvCount' | 'heatCount'>): {
  uv: number;
  heat: number;
} {
  return { uv: c.uvCount ?? 1, heat: c.heat ? (c.heatCount ?? 1) : 0 };
}

/**
 * Where the lamps' centres go over the basking zone; null when they do not fit. Tubes lie end to end
 * (kept inside the enclosure) with the heat bulbs spread along them; bulbs hang in one row, UV and heat
 * alternating, spread over the length the animal needs so their pools join into one basking spot.
 */
export function lampPositions(
  enc: EnclosureInput,
  c: Pick<Candidate, 'uv' | 'heat' | 'uvCount' | 'heatCount' | 'spreadCm'>,
  neededCm = 0,
): { uv: number[]; heat: number[] } | null {
  const zone = baskingZone(enc, neededCm);
  const n = lampCounts(c);
  const row = (count: number, spacing: number): number[] | null => {
    if (count === 0) return [];
    const span = spacing * (count - 1);
    if (span > enc.width - 6) return null;
    const centre = clamp(zone.x, span / 2 + 3, enc.width - span / 2 - 3);
    return Array.from({ length: count }, (_, i) => round1(centre - span / 2 + i * spacing));
  };
  const spacingFor = (count: number) =>
    c.spreadCm ?? Math.max(BULB_SPACING_CM, neededCm / Math.max(1, count));
  if (c.uv.form === 'tube') {
    const length = c.uv.lengthCm ?? 0;
    const total = n.uv * length + (n.uv - 1) * TUBE_GAP_CM;
    if (total > enc.width - 2) return null;
    const left = clamp(zone.x, total / 2 + 1, enc.width - total / 2 - 1) - total / 2;
    const uv = Array.from({ length: n.uv }, (_, i) => round1(left + length / 2 + i * (length + TUBE_GAP_CM)));
    const heat = row(n.heat, spacingFor(n.heat));
    return heat ? { uv, heat } : null;
  }
  // One row of bulbs: alternate the kinds, starting with the more numerous, so UV and heat overlap.
  const kinds: ('uv' | 'heat')[] = [];
  let u = n.uv;
  let h = n.heat;
  let next: 'uv' | 'heat' = u >= h ? 'uv' : 'heat';
  while (u + h > 0) {
    if ((next === 'uv' && u > 0) || h === 0) {
      kinds.push('uv');
      u -= 1;
    } else {
      kinds.push('heat');
      h -= 1;
    }
    next = next === 'uv' ? 'heat' : 'uv';
  }
  const xs = row(kinds.length, spacingFor(kinds.length));
  if (!xs) return null;
  return {
    uv: xs.filter((_, i) => kinds[i] === 'uv'),
    heat: xs.filter((_, i) => kinds[i] === 'heat'),
  };
}

/** The design ids of the k-th UV or heat lamp (the first keeps the plain id). */
export const lampId = (base: string, k: number) => (k === 0 ? base : `${base}-${k + 1}`);

/** Twin lamps get told apart in the object list and the findings ("… (2 of 2)"). */
const numbered = (name: string, k: number, n: number) => (n > 1 ? `${name} (${k + 1} of ${n})` : name);

/** The lid as a barrier across the top (none for an open top). */
function lidObject(enc: EnclosureInput, lid: Lid): DesignObject[] {
  if (lid === 'mesh')
    return [
      { type: 'screen', id: 'lid', name: 'Mesh lid', x1: 0, y1: enc.height, x2: enc.width, y2: enc.height },
    ];
  if (lid === 'glass')
    return [
      { type: 'glass', id: 'lid', name: 'Glass lid', x1: 0, y1: enc.height, x2: enc.width, y2: enc.height },
    ];
  return [];
}

/** The lamps and lid only (no perch): what the coarse search probes. */
export function lampsOnly(
  enc: EnclosureInput,
  lid: Lid,
  c: Omit<Candidate, 'perchTopCm'>,
  neededCm = 0,
): Design | null {
  const at = lampPositions(enc, c, neededCm);
  if (at === null) return null;
  const objects: DesignObject[] = at.uv.map((x, k) =>
    lampObjectFromType(c.uv, {
      id: lampId(UV_LAMP_ID, k),
      name: numbered(c.uv.name, k, at.uv.length),
      x,
      y: lampY(enc, lid, c.mount, c.uv.form, c.raiseCm),
      reflectorGain: c.reflector ? GOOD_REFLECTOR_GAIN : undefined,
    }),
  );
  if (c.heat) {
    const heat = c.heat;
    objects.push(
      ...at.heat.map((x, k) =>
        lampObjectFromType(heat, {
          id: lampId(HEAT_LAMP_ID, k),
          name: numbered(heat.name, k, at.heat.length),
          x,
          y: lampY(enc, lid, c.mount, 'bulb', c.heatRaiseCm ?? c.raiseCm),
        }),
      ),
    );
  }
  objects.push(...lidObject(enc, lid));
  return {
    format: DESIGN_FORMAT,
    version: DESIGN_VERSION,
    enclosure: {
      width: enc.width,
      height: enc.height,
      depth: enc.depth,
      roomTempC: enc.roomTempC,
      ...(enc.walls && enc.walls !== DEFAULT_WALLS ? { walls: enc.walls } : {}),
    },
    objects,
  };
}

/** The whole proposed design: lamps, lid, the basking perch and a hide on the cool side. */
export function buildDesign(enc: EnclosureInput, lid: Lid, c: Candidate, neededCm = 0): Design | null {
  const base = lampsOnly(enc, lid, c, neededCm);
  if (!base) return null;
  const zone = baskingZone(enc, neededCm);
  const y = round1(c.perchTopCm - PERCH_THICKNESS_CM / 2);
  const hide = hideBox(enc);
  base.objects.push(
    {
      type: 'perch',
      id: PERCH_ID,
      name: 'Basking perch',
      x1: round1(zone.x - zone.width / 2),
      y1: y,
      x2: round1(zone.x + zone.width / 2),
      y2: y,
      thickness: PERCH_THICKNESS_CM,
    },
    { type: 'hide', id: HIDE_ID, name: 'Hide (cool side)', ...hide },
  );
  return base;
}
