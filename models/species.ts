import {
  authorship,
  boolean,
  double,
  id,
  ref,
  smallUnsigned,
  string,
  table,
  text,
  timestamps,
} from './columns';

/**
 * A species sheet of one organisation: the light and heat a species needs, with where each figure comes
 * from. Ranges are stored as min/max pairs (°C, µW/cm², hours). `sourcesJson` is a JSON array of
 * `{ citation, confidence, covers }` (see lib/species/schema.ts). Owners and staff edit; keepers read.
 */
export class SpeciesSheet extends table('species_sheets', {
  id: id(),
  organisationId: ref(),
  commonName: string(120),
  scientificName: string(160),
  /** Ferguson et al. 2010 UV zone, 1..4. */
  uvZone: smallUnsigned(),
  /** Optional basking-spot target for keepers with a broadband UVB meter, µW/cm². */
  uvbTargetMinUw: double().nullable(),
  uvbTargetMaxUw: double().nullable(),
  baskingSurfaceMinC: double(),
  baskingSurfaceMaxC: double(),
  warmAirMinC: double(),
  warmAirMaxC: double(),
  coolAirMinC: double(),
  coolAirMaxC: double(),
  nightMinC: double().nullable(),
  photoperiodMinH: double().nullable(),
  photoperiodMaxH: double().nullable(),
  /** Adult total length, cm (sizes the shared basking spot). */
  adultLengthCm: double().nullable(),
  /** Climbs walls and mesh: mesh undersides are reachable surfaces. */
  climbs: boolean().defaultsTo(false),
  /** Albino or hypomelanistic: a lower UV target and a caution. */
  lowMelanin: boolean().defaultsTo(false),
  notes: text().nullable(),
  sourcesJson: text(),
  /** The starting sheet this row was copied from (null: written by the organisation). */
  seedKey: string(60).nullable(),
  ...authorship(),
  ...timestamps(),
}) {}
