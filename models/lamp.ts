import { dateOnly, double, id, ref, string, table, text, timestamps, unsigned } from './columns';

/**
 * A lamp installed in one enclosure: which catalogue lamp type it is, when it was first switched on and
 * for how many hours a day it runs, so its age in use is known. `designObjectId` links it to the lamp
 * object of that id in the enclosure's designs (for calibration). A retired lamp keeps its readings.
 */
export class Lamp extends table('lamps', {
  id: id(),
  enclosureId: ref(),
  lampTypeId: ref(),
  /** What the keeper calls it ("basking tube", "left spot"). */
  label: string(120),
  designObjectId: string(100).nullable(),
  /** Date of first use (YYYY-MM-DD). */
  firstUsedOn: dateOnly(),
  hoursPerDay: double(),
  /** Distance from the lamp to the basking spot, cm; null: use the distance of the latest reading. */
  baskingDistanceCm: double().nullable(),
  /** Share of UVB passing what lies between lamp and basking spot (a mesh lid ≈ 0.5–0.7); null: nothing. */
  baskingTransmission: double().nullable(),
  retiredOn: dateOnly().nullable(),
  notes: text().nullable(),
  createdById: ref().nullable(),
  /** Counts changes to what the lamp's outlook is computed from (models/outlook-invalidation.ts). */
  outlookVersion: unsigned().defaultsTo(1),
  ...timestamps(),
}) {}
