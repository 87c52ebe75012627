import { LAMP_TECH_IDS as ENGINE_LAMP_TECH_IDS } from '@/simulation';
import { authorship, double, id, oneOf, ref, string, table, text, timestamps } from './columns';

/** The generic lamp technologies of the design file (the design file's `tech`), as the engine defines them. */
export const LAMP_TECH_IDS = ENGINE_LAMP_TECH_IDS;
export type LampTechId = (typeof LAMP_TECH_IDS)[number];

export const LAMP_FORMS = ['tube', 'bulb'] as const;
export type LampForm = (typeof LAMP_FORMS)[number];

/**
 * One entry of an organisation's lamp catalogue: a generic lamp technology with the defaults a new lamp
 * of this kind gets in a design (never a brand or a product). Seeded from the engine's presets; owners
 * and staff may edit entries and add their own. `sourcesJson` holds, per field, where the default comes
 * from, so the catalogue can say which figures are published and which are common practice.
 * Lamps in the lamp log reference this row by `id`.
 */
export class LampType extends table('lamp_types', {
  id: id(),
  organisationId: ref(),
  name: string(120),
  tech: oneOf(LAMP_TECH_IDS),
  form: oneOf(LAMP_FORMS),
  /** Tubes only: the lit length along the tube, cm. */
  lengthCm: double().nullable(),
  /** UVB µW/cm² directly below, 30 cm away, new, bare; 0 for heat-only lamps. */
  uvbAt30: double(),
  /** UV Index per µW/cm² of broadband UVB for this technology's spectrum. */
  uviPerUvb: double(),
  /** Share of electrical power leaving as radiant heat (0..1). */
  radiantFraction: double(),
  /** Full beam angle, degrees (360: bare, all around). */
  beamDeg: double(),
  reflectorGain: double().defaultsTo(1),
  watts: double(),
  /** Months until UVB output halves (null: no UV output or no decay model). */
  halfLifeMonths: double().nullable(),
  /** Decay curve parameters as the engine takes them (JSON; null: the technology's default). */
  decayJson: text().nullable(),
  /** The shop's own measured decay curve, when adopted for this type (lib/population/mutations.ts). */
  adoptedCurveJson: text().nullable(),
  /** Typical replacement interval, months (null: replace on failure). */
  replaceAfterMonths: double().nullable(),
  notes: text().nullable(),
  /** JSON object: field name -> where the default comes from. */
  sourcesJson: text(),
  /** The engine preset this entry was seeded from (null: added by the organisation). */
  presetKey: string(60).nullable(),
  ...authorship(),
  ...timestamps(),
}) {}
