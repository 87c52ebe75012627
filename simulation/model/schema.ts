/**
 * The design file, version 2, as a zod schema: the single source of truth for the types.
 * Objects are strict: an unknown field is an error naming its path. Optional fields stay optional in
 * the stored document; the engine applies the documented defaults (see resolve.ts), so a saved file
 * keeps exactly what the user wrote.
 */
import { z } from 'zod';
import { DESIGN_ENCLOSURE_MAX_CM, ENCLOSURE_MIN_CM } from '@/shared/enclosure-size';
import { LAMP_TECH_IDS } from './techs';
import { designWorkProblem } from './work';
import { WALL_MATERIALS } from './walls';

export const DESIGN_FORMAT = 'baskwell.design';
/** Version 2 added depth: `enclosure.sectionZ` and a lamp's `z` (see migrations.ts for version 1). */
export const DESIGN_VERSION = 2;

/** Coordinates may lie outside the enclosure (a lamp on the lid) but within a sane range, cm. */
const coord = z.number().finite().min(-5000).max(5000);
/**
 * A distance from the front glass towards the back, cm. Within the enclosure's depth (checked against the
 * depth by the design's own refinement, since a field cannot see its enclosure).
 */
const depthCoord = z.number().finite().min(0).max(1000);
const size = (max: number) => z.number().finite().gt(0).max(max);
const transmission = z.number().min(0).max(1);
const id = z.string().trim().min(1, 'must not be empty').max(100);
const name = z.string().max(200).optional();

export const decayCurveSchema = z.union([
  z.strictObject({ halfLifeMonths: z.number().finite().gt(0).max(1e9) }),
  z.strictObject({
    points: z
      .array(z.tuple([z.number().finite().min(0).max(600), z.number().finite().min(0).max(2)]))
      .min(1)
      .max(200)
      .refine((p) => p.every((pt, k) => k === 0 || pt[0] > p[k - 1]![0]), 'months must increase'),
  }),
]);

/**
 * Where a lamp's output figures came from when they were fitted to meter readings of the real lamp
 * (from the lamp log): the day of the newest reading used (ISO date, or date and time) and a short
 * note of what they were fitted from ("6 readings"). Default: absent — the catalogue's figures.
 * Descriptive only: the engine reads the lamp's own fields, never this note.
 */
export const lampCalibrationSchema = z.strictObject({
  at: z.union([z.iso.date(), z.iso.datetime({ offset: true })], {
    error: 'expected an ISO date (YYYY-MM-DD)',
  }),
  from: z.string().trim().min(1, 'must not be empty').max(200),
});

export const lampSchema = z
  .strictObject({
    type: z.literal('lamp'),
    id,
    name,
    tech: z.enum(LAMP_TECH_IDS),
    form: z.enum(['tube', 'bulb']),
    /** Bulb: the emitting point. Tube: the centre of the tube (it runs along x). */
    x: coord,
    y: coord,
    /**
     * How far from the front the lamp hangs, cm (a tube runs parallel to the front). Default: half the
     * enclosure's depth, where version 1 put every lamp.
     */
    z: depthCoord.optional(),
    /** Tube length, cm (required for tubes). */
    length: size(1000).optional(),
    uvbAt30: z.number().finite().min(0).max(100000).optional(),
    uviPerUvb: z.number().finite().min(0).max(1).optional(),
    reflectorGain: z.number().finite().min(1).max(10).optional(),
    beamDeg: z.number().finite().min(1).max(360).optional(),
    watts: z.number().finite().min(0).max(5000).optional(),
    ageMonths: z.number().finite().min(0).max(600).optional(),
    radiantFraction: z.number().min(0).max(1).optional(),
    decay: decayCurveSchema.optional(),
    calibration: lampCalibrationSchema.optional(),
  })
  .superRefine((lamp, ctx) => {
    if (lamp.form === 'tube' && lamp.length === undefined) {
      ctx.addIssue({ code: 'custom', path: ['length'], message: 'a tube needs a length' });
    }
  });

/** A thin barrier given as a segment: mesh screen or glass pane. */
const segmentFields = { id, name, x1: coord, y1: coord, x2: coord, y2: coord };

export const screenSchema = z.strictObject({
  type: z.literal('screen'),
  ...segmentFields,
  /** Default: open area of a 1.0 mm / 0.25 mm woven mesh, 0.64 (ISO 9044). */
  uvbTransmission: transmission.optional(),
  /** Default: the same as uvbTransmission (a mesh passes its open area at every wavelength). */
  irTransmission: transmission.optional(),
});

export const glassSchema = z.strictObject({
  type: z.literal('glass'),
  ...segmentFields,
  /** Default 0: window glass passes no UVB (Duarte et al. 2009). */
  uvbTransmission: transmission.optional(),
  /** Default: per lamp technology (glass passes near-infrared only), see LAMP_TECHS.glassIrTransmission. */
  irTransmission: transmission.optional(),
});

export const perchSchema = z.strictObject({
  type: z.literal('perch'),
  ...segmentFields,
  thickness: size(100),
});

const boxFields = { id, name, x: coord, y: coord, width: size(1000), height: size(1000) };

export const ledgeSchema = z.strictObject({ type: z.literal('ledge'), ...boxFields });
export const hideSchema = z.strictObject({ type: z.literal('hide'), ...boxFields });
export const foliageSchema = z.strictObject({
  type: z.literal('foliage'),
  ...boxFields,
  /** Default 0.3 (common practice, no published source). */
  uvbTransmission: transmission.optional(),
  /** Default: the same as uvbTransmission. */
  irTransmission: transmission.optional(),
});

export const designObjectSchema = z.discriminatedUnion('type', [
  lampSchema,
  screenSchema,
  glassSchema,
  perchSchema,
  ledgeSchema,
  hideSchema,
  foliageSchema,
]);

/** An inside dimension: at least ENCLOSURE_MIN_CM, so a near-zero number never reaches the grid. */
const enclosureSize = z
  .number()
  .finite()
  .min(ENCLOSURE_MIN_CM, `must be at least ${ENCLOSURE_MIN_CM} cm`)
  .max(DESIGN_ENCLOSURE_MAX_CM, `must be at most ${DESIGN_ENCLOSURE_MAX_CM} cm`);

export const enclosureSchema = z.strictObject({
  width: enclosureSize,
  height: enclosureSize,
  depth: enclosureSize,
  /**
   * Where the side view cuts the enclosure: cm from the front. The fields are computed in this plane.
   * Default: half the depth.
   */
  sectionZ: depthCoord.optional(),
  /** Default 24 °C. */
  roomTempC: z.number().finite().min(-20).max(50).optional(),
  /** What the walls are made of; sets the air model's wall loss (see fields/heat.ts). Default 'glass'. */
  walls: z.enum(WALL_MATERIALS).optional(),
});

export const probePointSchema = z.strictObject({
  id,
  x: coord,
  y: coord,
  label: z.string().max(200).optional(),
});

/**
 * A photo of the real enclosure drawn under the design in the studio, to trace over:
 * which uploaded photo (its id; the studio draws it only for someone who may read that upload) and
 * where it lies, in design cm (x, y its bottom-left corner, y up), with its opacity and whether it is
 * shown. Default: absent — no photo. The engine never reads it: it is the user's tracing aid, not
 * part of the physics.
 */
export const backdropSchema = z.strictObject({
  uploadId: z.number().int('must be a whole number').positive('must be a photo id (a positive number)'),
  x: coord,
  y: coord,
  width: size(10000),
  height: size(10000),
  opacity: z.number().finite().min(0.05).max(1),
  visible: z.boolean(),
});

function checkUniqueIds(items: { id: string }[], key: string, ctx: z.RefinementCtx) {
  const seen = new Set<string>();
  items.forEach((item, i) => {
    if (seen.has(item.id)) {
      ctx.addIssue({ code: 'custom', path: [key, i, 'id'], message: `duplicate id "${item.id}"` });
    }
    seen.add(item.id);
  });
}

const withinDepth = (depth: number) => `must be within the enclosure's depth (0 to ${depth} cm)`;

/** The section plane and every lamp lie inside the enclosure's depth. */
function checkDepths(
  d: { enclosure: { depth: number; sectionZ?: number }; objects: { type: string; z?: number }[] },
  ctx: z.RefinementCtx,
) {
  const { depth, sectionZ } = d.enclosure;
  if (sectionZ !== undefined && sectionZ > depth) {
    ctx.addIssue({ code: 'custom', path: ['enclosure', 'sectionZ'], message: withinDepth(depth) });
  }
  d.objects.forEach((o, i) => {
    if (o.type === 'lamp' && o.z !== undefined && o.z > depth) {
      ctx.addIssue({ code: 'custom', path: ['objects', i, 'z'], message: withinDepth(depth) });
    }
  });
}

export const designSchema = z
  .strictObject({
    format: z.literal(DESIGN_FORMAT),
    version: z.literal(DESIGN_VERSION),
    enclosure: enclosureSchema,
    objects: z.array(designObjectSchema).max(500),
    probes: z.array(probePointSchema).max(100).optional(),
    notes: z.string().max(20000).optional(),
    backdrop: backdropSchema.optional(),
  })
  .superRefine((d, ctx) => {
    checkUniqueIds(d.objects, 'objects', ctx);
    if (d.probes) checkUniqueIds(d.probes, 'probes', ctx);
    checkDepths(d, ctx);
  });

/** The code of the issue a design beyond MAX_DESIGN_WORK gets (the API answers it with 422). */
export const TOO_COMPLEX = 'design_too_complex';

/**
 * The design file as the server takes it for saving and computing: also bounded in engine work
 * (grid cells × lamps × barrier edges, see work.ts). Reading stays on `designSchema`, so a stored or
 * backed-up design over the bound still opens in the studio to be simplified.
 */
export const computableDesignSchema = designSchema.superRefine((d, ctx) => {
  const problem = designWorkProblem(d);
  if (problem)
    ctx.addIssue({ code: 'custom', path: ['objects'], message: problem, params: { code: TOO_COMPLEX } });
});

export type Design = z.infer<typeof designSchema>;
export type DesignObject = z.infer<typeof designObjectSchema>;
export type LampObject = z.infer<typeof lampSchema>;
export type LampCalibration = z.infer<typeof lampCalibrationSchema>;
export type ScreenObject = z.infer<typeof screenSchema>;
export type GlassObject = z.infer<typeof glassSchema>;
export type PerchObject = z.infer<typeof perchSchema>;
export type LedgeObject = z.infer<typeof ledgeSchema>;
export type HideObject = z.infer<typeof hideSchema>;
export type FoliageObject = z.infer<typeof foliageSchema>;
export type Backdrop = z.infer<typeof backdropSchema>;
export type ProbePoint = z.infer<typeof probePointSchema>;
export type Enclosure = z.infer<typeof enclosureSchema>;
export type DecayCurveInput = z.infer<typeof decayCurveSchema>;
