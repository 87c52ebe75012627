import type { Design, DesignObject } from '@/simulation';
import { ASSESSMENT_THRESHOLDS, DESIGN_FORMAT, DESIGN_VERSION, GOOD_REFLECTOR_GAIN } from '@/simulation';
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

export type EnclosureInput = { width: number; height: number; depth: number; roomTempC: number };

export type Candidate = {
  uv: LampTypeDto;
  /** A reflector on the UV lamp (tubes only): gain GOOD_REFLECTOR_GAIN from the engine's presets. */
  reflector: boolean;
  heat: LampTypeDto | null;
  mount: Mount;
  /** 'raised' only: how far above the lid the lamps stand, cm. */
  raiseCm?: number;
  /** Height of the perch's top surface above the floor, cm. */
  perchTopCm: number;
};

export const PERCH_THICKNESS_CM = 4;
/** Lamps on a lid sit a little above it; over an open top, on a stand (common practice, no published source). */
const ABOVE_LID_CM = { tube: 2, bulb: 3 };
const ABOVE_OPEN_CM = 10;
/** Hung under the lid: the lamp centre this far below it (a fitting and a guard). */
const BELOW_LID_CM = { tube: 3, bulb: 6 };
/** Two bulbs side by side over the perch, this far apart (centre to centre). */
const BULB_SPACING_CM = 10;

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

/** Where the UV lamp's centre goes (a tube is kept inside the enclosure); null when it does not fit. */
export function uvLampX(enc: EnclosureInput, uv: LampTypeDto, heat: boolean, neededCm = 0): number | null {
  const zone = baskingZone(enc, neededCm);
  if (uv.form === 'tube') {
    const half = (uv.lengthCm ?? 0) / 2;
    if (2 * half > enc.width - 2) return null;
    return round1(clamp(zone.x, half + 1, enc.width - half - 1));
  }
  return round1(heat ? zone.x - BULB_SPACING_CM / 2 : zone.x);
}

export function heatLampX(enc: EnclosureInput, uv: LampTypeDto, neededCm = 0): number {
  const zone = baskingZone(enc, neededCm);
  return round1(uv.form === 'tube' ? zone.x : zone.x + BULB_SPACING_CM / 2);
}

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
  const x = uvLampX(enc, c.uv, c.heat !== null, neededCm);
  if (x === null) return null;
  const objects: DesignObject[] = [
    lampObjectFromType(c.uv, {
      id: UV_LAMP_ID,
      x,
      y: lampY(enc, lid, c.mount, c.uv.form, c.raiseCm),
      reflectorGain: c.reflector ? GOOD_REFLECTOR_GAIN : undefined,
    }),
  ];
  if (c.heat) {
    objects.push(
      lampObjectFromType(c.heat, {
        id: HEAT_LAMP_ID,
        x: heatLampX(enc, c.uv, neededCm),
        y: lampY(enc, lid, c.mount, 'bulb', c.raiseCm),
      }),
    );
  }
  objects.push(...lidObject(enc, lid));
  return {
    format: DESIGN_FORMAT,
    version: DESIGN_VERSION,
    enclosure: { width: enc.width, height: enc.height, depth: enc.depth, roomTempC: enc.roomTempC },
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
