import { z } from 'zod';
import { crossChecks } from '@/lib/api/cross-checks';
import { patchOf } from '@/lib/api/patch';
import { textSchema } from '@/lib/api/text';
import { LAMP_TECH_IDS } from '@/simulation';

/** Pure (no database imports): the forms use this schema in the browser. */
const LAMP_FORMS = ['tube', 'bulb'] as const;

/** A lamp catalogue entry as the API and the forms exchange it. */

export const LAMP_TYPE_FIELDS = [
  'uvbAt30',
  'uviPerUvb',
  'radiantFraction',
  'beamDeg',
  'reflectorGain',
  'watts',
  'lengthCm',
  'halfLifeMonths',
  'replaceAfterMonths',
] as const;
export type LampTypeField = (typeof LAMP_TYPE_FIELDS)[number];

export const LAMP_FIELD_LABELS: Record<LampTypeField, string> = {
  uvbAt30: 'UVB at 30 cm (µW/cm²)',
  uviPerUvb: 'UV Index per µW/cm²',
  radiantFraction: 'Radiant heat fraction',
  beamDeg: 'Beam angle (°)',
  reflectorGain: 'Reflector gain',
  watts: 'Power (W)',
  lengthCm: 'Tube length',
  halfLifeMonths: 'UVB half-life (months)',
  replaceAfterMonths: 'Typical replacement (months)',
};

const num = (what: string, min: number, max: number, unit = '') =>
  z
    .number({ error: `${what} must be a number.` })
    .finite(`${what} must be a number.`)
    .min(min, `${what} must be at least ${min}${unit}.`)
    .max(max, `${what} must be at most ${max}${unit}.`);

const decayPoints = z
  .array(z.tuple([num('A month', 0, 600), num('An output factor', 0, 2)]))
  .min(1, 'A decay table needs at least one point.')
  .max(200, 'A decay table can have at most 200 points.')
  .refine(
    (p) => p.every((pt, k) => k === 0 || pt[0] > p[k - 1]![0]),
    'The months of a decay table must increase.',
  );

const fields = {
  name: textSchema('The name must be text.')
    .trim()
    .min(1, 'Give the lamp type a name.')
    .max(120, 'The name can be at most 120 characters.'),
  tech: z.enum(LAMP_TECH_IDS, { error: `The technology must be one of: ${LAMP_TECH_IDS.join(', ')}.` }),
  form: z.enum(LAMP_FORMS, { error: 'The form must be "tube" or "bulb".' }),
  lengthCm: num('The tube length', 1, 1000, ' cm').nullable().default(null),
  uvbAt30: num('The UVB at 30 cm', 0, 100000, ' µW/cm²'),
  uviPerUvb: num('The UV Index per µW/cm²', 0, 1),
  radiantFraction: num('The radiant heat fraction', 0, 1),
  beamDeg: num('The beam angle', 1, 360, '°'),
  reflectorGain: num('The reflector gain', 1, 10).default(1),
  watts: num('The power', 0, 5000, ' W'),
  halfLifeMonths: num('The UVB half-life', 0.1, 1000, ' months').nullable().default(null),
  decayPoints: decayPoints.nullable().default(null),
  replaceAfterMonths: num('The replacement interval', 0.1, 600, ' months').nullable().default(null),
  notes: textSchema().trim().max(5000, 'Notes can be at most 5000 characters.').nullable().default(null),
  sources: z
    .partialRecord(
      z.enum(LAMP_TYPE_FIELDS),
      textSchema().trim().max(1000, 'A source note can be at most 1000 characters.'),
    )
    .default({}),
};

type Shape = { form: 'tube' | 'bulb'; lengthCm: number | null; tech: string; uvbAt30: number };

const crossCheck = crossChecks<Shape>([
  {
    path: ['lengthCm'],
    message: 'A tube needs its length.',
    fails: (v) => v.form === 'tube' && v.lengthCm === null,
  },
  {
    path: ['lengthCm'],
    message: 'Only tubes have a length; leave it empty for a bulb.',
    fails: (v) => v.form === 'bulb' && v.lengthCm !== null,
  },
  {
    path: ['uvbAt30'],
    message: 'Halogen, incandescent and ceramic lamps give no UVB: set the UVB at 30 cm to 0.',
    fails: (v) =>
      (v.tech === 'halogen' || v.tech === 'incandescent' || v.tech === 'ceramic') && v.uvbAt30 > 0,
  },
]);

export const lampTypeInputSchema = z.strictObject(fields).superRefine(crossCheck);
export type LampTypeInput = z.output<typeof lampTypeInputSchema>;

export const lampTypePatchSchema = patchOf(fields);
export type LampTypePatch = z.output<typeof lampTypePatchSchema>;

/**
 * The shop's own measured decay curve, adopted for this type in place of the catalogue's curve: a decay
 * table starting at 1 (months of ordinary use, output factor), and how many lamps and readings it was
 * fitted to. Read wherever the type's curve is (lib/lamp-log/decay.ts, the studio's lamp objects).
 */
export type AdoptedCurve = { points: [number, number][]; lamps: number; readings: number; adoptedAt: string };

export type LampTypeDto = LampTypeInput & {
  /** In force for this organisation's lamps of this type; null: the catalogue's curve. */
  adoptedCurve?: AdoptedCurve | null;
  id: number;
  organisationId: number;
  /** The engine preset it was seeded from; null for the organisation's own entries. */
  presetKey: string | null;
  updatedAt: string;
};
