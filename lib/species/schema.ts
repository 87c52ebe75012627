import { z } from 'zod';
import { crossChecks } from '@/lib/api/cross-checks';
import { patchOf } from '@/lib/api/patch';
import { textSchema } from '@/lib/api/text';

/**
 * What a species sheet holds, as the API and the forms exchange it. Ranges are `{ min, max }` objects
 * (°C, µW/cm², hours); the database keeps them as column pairs (models/species.ts).
 */

const finite = (what: string) => z.number({ error: `${what} must be a number.` }).finite();

function range(what: string, unit: string, lo: number, hi: number) {
  const bound = finite(what)
    .min(lo, `${what} must be at least ${lo} ${unit}.`)
    .max(hi, `${what} must be at most ${hi} ${unit}.`);
  return z.strictObject({ min: bound, max: bound }).refine((r) => r.min <= r.max, {
    message: `${what}: the lowest value must not exceed the highest.`,
    path: ['max'],
  });
}

/** Sheet fields a source can speak for, so the UI can show which figure comes from where. */
export const SHEET_FIELDS = [
  'uvZone',
  'uvbTargetUw',
  'baskingSurfaceC',
  'warmAirC',
  'coolAirC',
  'nightMinC',
  'photoperiodH',
  'adultLengthCm',
  'climbs',
] as const;
export type SheetField = (typeof SHEET_FIELDS)[number];

export const FIELD_LABELS: Record<SheetField, string> = {
  uvZone: 'UV Index target (Ferguson zone)',
  uvbTargetUw: 'Shop rule of thumb (µW/cm², broadband meter)',
  baskingSurfaceC: 'Basking surface temperature',
  warmAirC: 'Warm side air',
  coolAirC: 'Cool side air',
  nightMinC: 'Night minimum',
  photoperiodH: 'Photoperiod',
  adultLengthCm: 'Adult length',
  climbs: 'Climbs glass and mesh',
};

export const sourceSchema = z.strictObject({
  citation: textSchema()
    .trim()
    .min(1, 'Give the citation, or write "from memory".')
    .max(500, 'A citation can be at most 500 characters.'),
  confidence: textSchema()
    .trim()
    .min(1, 'Say how sure the figure is (for example "published table" or "from memory; verify").')
    .max(500, 'The confidence note can be at most 500 characters.'),
  covers: z.array(z.enum(SHEET_FIELDS)).max(SHEET_FIELDS.length).default([]),
});
export type SpeciesSource = z.output<typeof sourceSchema>;

const text = (what: string, max: number) =>
  textSchema(`${what} must be text.`)
    .trim()
    .min(1, `${what} is required.`)
    .max(max, `${what} can be at most ${max} characters.`);

const adultLength = finite('The adult length')
  .min(1, 'The adult length must be at least 1 cm.')
  .max(1000, 'The adult length must be at most 1000 cm.');

const fields = {
  commonName: text('The common name', 120),
  scientificName: text('The scientific name', 160),
  uvZone: z
    .number({ error: 'The UV zone must be 1, 2, 3 or 4.' })
    .int('The UV zone must be 1, 2, 3 or 4.')
    .min(1, 'The UV zone must be 1, 2, 3 or 4.')
    .max(4, 'The UV zone must be 1, 2, 3 or 4.'),
  uvbTargetUw: range('The shop rule of thumb', 'µW/cm²', 0, 2000).nullable().default(null),
  baskingSurfaceC: range('The basking surface temperature', '°C', 0, 80),
  warmAirC: range('The warm side air temperature', '°C', 0, 60),
  coolAirC: range('The cool side air temperature', '°C', 0, 60),
  nightMinC: finite('The night minimum')
    .min(0, 'The night minimum must be at least 0 °C.')
    .max(40, 'The night minimum must be at most 40 °C.')
    .nullable()
    .default(null),
  photoperiodH: range('The photoperiod', 'hours', 0, 24).nullable().default(null),
  adultLengthCm: adultLength.nullable().default(null),
  climbs: z.boolean({ error: 'Climbs must be yes or no.' }).default(false),
  lowMelanin: z.boolean({ error: 'Albino or hypomelanistic must be yes or no.' }).default(false),
  notes: textSchema().trim().max(5000, 'Notes can be at most 5000 characters.').nullable().default(null),
  sources: z.array(sourceSchema).max(20, 'At most 20 sources.').default([]),
};

type SheetShape = {
  baskingSurfaceC: { min: number; max: number };
  warmAirC: { min: number; max: number };
  coolAirC: { min: number; max: number };
  nightMinC: number | null;
};

/** Checks across fields that a reader would otherwise trip over. */
const crossCheck = crossChecks<SheetShape>([
  {
    path: ['coolAirC', 'min'],
    message: 'The cool side cannot be warmer than the whole warm side range.',
    fails: (s) => s.coolAirC.min > s.warmAirC.max,
  },
  {
    path: ['nightMinC'],
    message: 'The night minimum is above the warm side air range.',
    fails: (s) => s.nightMinC !== null && s.nightMinC > s.warmAirC.max,
  },
]);

export const speciesInputSchema = z.strictObject(fields).superRefine(crossCheck);
export type SpeciesInput = z.output<typeof speciesInputSchema>;

/** PATCH: any subset of the fields; the merged sheet is checked again with `speciesInputSchema`. */
export const speciesPatchSchema = patchOf(fields);
export type SpeciesPatch = z.output<typeof speciesPatchSchema>;

export type Range = { min: number; max: number };

/** A sheet as the API returns it. */
export type SpeciesSheetDto = SpeciesInput & {
  id: number;
  organisationId: number;
  /** Which starting sheet it was copied from; null for the organisation's own sheets. */
  seedKey: string | null;
  updatedAt: string;
};
