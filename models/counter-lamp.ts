import { boolean, dateOnly, double, id, oneOf, ref, string, table, timestamps } from './columns';
import { readingColumns } from './reading';

/**
 * A lamp a customer brought to the counter: its lamp type, age and use, and (optionally) the species and
 * basking distance at home. `customerId` is null for a walk-in kept without a record, and after the
 * customer was deleted: the lamp and its readings stay, anonymous.
 */
export class CounterLamp extends table('counter_lamps', {
  id: id(),
  organisationId: ref(),
  customerId: ref().nullable(),
  lampTypeId: ref(),
  label: string(120).nullable(),
  /** Date of first use (YYYY-MM-DD); approximate when `firstUsedEstimated`. */
  firstUsedOn: dateOnly(),
  firstUsedEstimated: boolean().defaultsTo(false),
  hoursPerDay: double(),
  speciesSheetId: ref().nullable(),
  /** Distance from the lamp to the basking spot at home, cm. */
  baskingDistanceCm: double().nullable(),
  /** Share of UVB passing what lies between lamp and basking spot at home; null: nothing. */
  baskingTransmission: double().nullable(),
  createdById: ref().nullable(),
  ...timestamps(),
}) {}

export const COUNTER_VERDICTS = ['keep', 'test-again', 'replace', 'no-verdict'] as const;
export type CounterVerdictKind = (typeof COUNTER_VERDICTS)[number];

/** One meter reading taken at the counter, with the same set-up fields as a lamp-log reading. */
export class CounterReading extends table('counter_readings', {
  id: id(),
  counterLampId: ref(),
  ...readingColumns(),
  verdict: oneOf(COUNTER_VERDICTS),
  testAgainOn: dateOnly().nullable(),
  takenById: ref().nullable(),
  ...timestamps(),
}) {}
