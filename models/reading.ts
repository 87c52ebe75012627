import { READING_THROUGH, READING_WARMED_UP } from '@/shared/reading-setup';
import { date, double, id, oneOf, ref, string, table, text, timestamps } from './columns';

export const READING_UNITS = ['uvb', 'uvi'] as const;
/** `uvb`: broadband UVB irradiance, µW/cm². `uvi`: UV Index (a UV Index meter). */
export type ReadingUnit = (typeof READING_UNITS)[number];

/** What a meter reading records, in the lamp log and at the counter alike. */
export const readingColumns = () => ({
  takenAt: date(),
  distanceCm: double(),
  value: double(),
  /** The meter kind: a UV Index meter gives `uvi`, a broadband UVB meter `uvb`. */
  unit: oneOf(READING_UNITS),
  through: oneOf(READING_THROUGH).defaultsTo('not-recorded'),
  /** Share of UVB passing what lay between (0–1]; null when nothing, not recorded, or not known (glass). */
  throughTransmission: double().nullable(),
  warmedUp: oneOf(READING_WARMED_UP).defaultsTo('not-recorded'),
  /** Which meter, in the keeper's own words (free text: its model, whose it is). */
  meter: string(160).nullable(),
});

/** One meter reading of one lamp: taken directly below it, `distanceCm` away, stored in centimetres. */
export class Reading extends table('readings', {
  id: id(),
  lampId: ref(),
  ...readingColumns(),
  takenById: ref().nullable(),
  note: text().nullable(),
  /** The CSV upload it came from, if imported. */
  uploadId: ref().nullable(),
  ...timestamps(),
}) {}
