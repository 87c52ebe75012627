import 'server-only';
import { z } from 'zod';
import { idSchema, textSchema } from '@/lib/api/schemas';
import { customerFields } from '@/lib/customers/schemas';
import { isoDate, lampFields, readingFields } from '@/lib/lamp-log/schemas';

/** Request shapes of the counter: the same lamp and reading fields as the lamp log, with messages a person can act on. */

/** The lamp as the customer describes it: its type, its age (a date or months), its use and home. */
export const counterLampBody = z
  .strictObject({
    lampTypeId: lampFields.lampTypeId,
    firstUsedOn: isoDate('the date of first use').nullish(),
    ageMonths: z
      .number({ error: 'Enter the age in months.' })
      .min(0, 'The age cannot be negative.')
      .max(240, 'That lamp is older than 20 years: give its first switch-on date.')
      .nullish(),
    hoursPerDay: lampFields.hoursPerDay,
    speciesSheetId: idSchema('The species').nullish(),
    baskingDistance: lampFields.baskingDistance,
    baskingTransmission: lampFields.baskingTransmission,
    lengthUnit: lampFields.lengthUnit,
    label: textSchema()
      .trim()
      .max(120, 'Use at most 120 characters.')
      .nullish()
      .transform((v) => (v ? v : null)),
  })
  .refine((l) => (l.firstUsedOn ? 1 : 0) + (l.ageMonths != null ? 1 : 0) === 1, {
    message: 'Give either the first switch-on date or the age in months.',
    path: ['ageMonths'],
  });

/** The reading taken now: the lamp log's reading fields, without a time (it is now) or a note. */
export const counterReadingBody = z.strictObject({
  distance: readingFields.distance,
  distanceUnit: readingFields.distanceUnit,
  value: readingFields.value,
  unit: readingFields.unit,
  through: readingFields.through,
  throughTransmission: readingFields.throughTransmission,
  warmedUp: readingFields.warmedUp,
  meter: readingFields.meter,
});

const common = {
  organisationId: idSchema('The organisation id'),
  /** Testing a lamp kept before: its readings so far give it its own decay. */
  counterLampId: idSchema('The lamp').nullish(),
  /** A lamp in the enclosure of the keeper a customer is linked to: the reading is added to it. */
  enclosureLampId: idSchema('The lamp in the keeper’s enclosure').nullish(),
  lamp: counterLampBody.nullish(),
  reading: counterReadingBody,
};

type LampChoice = { counterLampId?: number | null; enclosureLampId?: number | null; lamp?: unknown };
const needsLamp = (b: LampChoice) => Boolean(b.counterLampId || b.enclosureLampId || b.lamp);
/** A lamp of the lamp log is tested as it is: its type, age and home are the lamp log's. */
const oneLamp = (b: LampChoice) => !b.enclosureLampId || (!b.counterLampId && !b.lamp);
const oneLampMessage = {
  message: 'A lamp in the keeper’s enclosure is tested as it is: send no other lamp with it.',
  path: ['enclosureLampId'],
};
const lampMessage = {
  message: 'Describe the lamp (its type and age), or pick a lamp tested before.',
  path: ['lamp'],
};

export const assessBody = z
  .strictObject(common)
  .refine(needsLamp, lampMessage)
  .refine(oneLamp, oneLampMessage);

/** Who the lamp is kept for: nobody (a walk-in, kept anonymous), a customer on record, or a new one. */
export const counterCustomer = z.discriminatedUnion(
  'kind',
  [
    z.strictObject({ kind: z.literal('walk-in') }),
    z.strictObject({ kind: z.literal('existing'), id: idSchema('The customer') }),
    z.strictObject({ kind: z.literal('new'), ...customerFields }),
  ],
  { error: 'Say who the lamp is kept for: walk-in, existing (with its id) or new (with a name).' },
);

export const saveTestBody = z
  .strictObject({ ...common, customer: counterCustomer.default({ kind: 'walk-in' }) })
  .refine(needsLamp, lampMessage)
  .refine(oneLamp, oneLampMessage)
  .refine((b) => !b.enclosureLampId || b.customer.kind !== 'new', {
    message: 'A lamp in a keeper’s enclosure belongs to the customer linked to that keeper.',
    path: ['customer'],
  })
  .refine((b) => b.customer.kind !== 'new' || !b.customer.reminderConsent || b.customer.email, {
    message: 'Reminder e-mails need an e-mail address.',
    path: ['customer', 'email'],
  });

export type AssessInput = z.output<typeof assessBody>;
export type SaveTestInput = z.output<typeof saveTestBody>;
export type CounterLampInput = z.output<typeof counterLampBody>;
export type CounterReadingInput = z.output<typeof counterReadingBody>;
