import 'server-only';
import { z } from 'zod';
import { idSchema, optionalTextSchema, textSchema } from '@/lib/api/schemas';
import { READING_UNITS } from '@/models/reading';
import { READING_THROUGH, READING_WARMED_UP } from '@/shared/reading-setup';
import { LENGTH_UNITS } from '@/shared/units';

/** Request shapes of the lamp log routes and forms, with messages a person can act on. */

export const isoDate = (what: string) =>
  z
    .string({ error: `Enter ${what} as a date (YYYY-MM-DD).` })
    .regex(/^\d{4}-\d{2}-\d{2}$/, `Enter ${what} as a date (YYYY-MM-DD).`)
    .refine(
      (s) =>
        !Number.isNaN(Date.parse(`${s}T00:00:00Z`)) && new Date(`${s}T00:00:00Z`).toISOString().startsWith(s),
      {
        message: `${what[0]!.toUpperCase()}${what.slice(1)} is not a real date.`,
      },
    );

const lengthUnit = z.enum(LENGTH_UNITS, { error: 'The length unit must be cm or in.' }).default('cm');

const distance = (what: string, max: number) =>
  z
    .number({ error: `Enter the ${what}.` })
    .positive(`The ${what} must be more than 0.`)
    .max(max, `The ${what} is too large.`);

export const lampFields = {
  lampTypeId: idSchema('The lamp type'),
  label: textSchema('Give the lamp a name, e.g. "Basking tube".')
    .trim()
    .min(1, 'Give the lamp a name, e.g. "Basking tube".')
    .max(120, 'Use at most 120 characters.'),
  designObjectId: optionalTextSchema(100),
  firstUsedOn: isoDate('the date of first use'),
  hoursPerDay: z
    .number({ error: 'Enter the hours a day it is on.' })
    .min(0.5, 'A lamp in use is on at least half an hour a day.')
    .max(24, 'A day has 24 hours.'),
  /** In `lengthUnit` (cm unless given). */
  baskingDistance: distance('basking distance', 2000).nullish(),
  baskingTransmission: z
    .number({ error: 'The share passing through must be a number.' })
    .gt(0, 'The share passing through must be more than 0 (0 would block all UV).')
    .max(1, 'The share passing through is at most 1 (nothing in between).')
    .nullish(),
  retiredOn: isoDate('the retirement date').nullish(),
  notes: optionalTextSchema(5000),
  lengthUnit,
};

export const createLampBody = z
  .strictObject(lampFields)
  .refine((b) => !b.retiredOn || b.retiredOn >= b.firstUsedOn, {
    message: 'A lamp cannot be retired before its first use.',
    path: ['retiredOn'],
  });

export const updateLampBody = z
  .strictObject(lampFields)
  .partial()
  .refine((b) => Object.keys(b).filter((k) => k !== 'lengthUnit').length > 0, {
    message: 'Send at least one field to change.',
  });

export const readingFields = {
  takenAt: z.coerce
    .date({ error: 'Enter when the reading was taken (a date and time).' })
    .refine((d) => d.getTime() <= Date.now() + 24 * 3600 * 1000, 'A reading cannot be in the future.')
    .refine((d) => d.getUTCFullYear() >= 1990, 'That date is too long ago.'),
  distance: distance('distance from the lamp', 2000),
  distanceUnit: lengthUnit,
  value: z
    .number({ error: 'Enter the meter value.' })
    .min(0, 'A meter value cannot be negative.')
    .max(100000, 'That meter value is too large.'),
  /** The meter kind: a broadband UVB meter reads µW/cm² (`uvb`), a UV Index meter UVI (`uvi`). */
  unit: z.enum(READING_UNITS, { error: 'The unit must be uvb (µW/cm²) or uvi (UV Index).' }),
  /** What lay between lamp and meter; left out: not recorded (read as the bare lamp). */
  through: z
    .enum(READING_THROUGH, {
      error: 'What was between lamp and meter must be nothing, lid, screen, glass or not-recorded.',
    })
    .default('not-recorded'),
  /** Share of UVB passing it (0–1]; for the lid, the lamp's own setting when left out. */
  throughTransmission: z
    .number({ error: 'The share of UVB passing must be a number.' })
    .gt(0, 'The share of UVB passing must be more than 0.')
    .max(1, 'The share of UVB passing is at most 1.')
    .nullish()
    .transform((v) => v ?? null),
  warmedUp: z
    .enum(READING_WARMED_UP, { error: 'Warmed up must be yes, no or not-recorded.' })
    .default('not-recorded'),
  meter: optionalTextSchema(160),
  note: optionalTextSchema(2000),
};

export const createReadingBody = z.strictObject(readingFields);
export const updateReadingBody = z
  .strictObject({
    ...readingFields,
    // A correction changes only what it names: no defaults here.
    through: z
      .enum(READING_THROUGH, {
        error: 'What was between lamp and meter must be nothing, lid, screen, glass or not-recorded.',
      })
      .optional(),
    warmedUp: z.enum(READING_WARMED_UP, { error: 'Warmed up must be yes, no or not-recorded.' }).optional(),
  })
  .partial()
  .refine((b) => Object.keys(b).filter((k) => k !== 'distanceUnit').length > 0, {
    message: 'Send at least one field to change.',
  });

export const calibrationBody = z.strictObject({
  variantId: idSchema('The variant'),
  /** The variant version the proposal was shown for; a newer save makes this 409. */
  baseVersion: z.number().int().positive().optional(),
});
