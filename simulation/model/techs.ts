/**
 * Defaults per lamp technology. A lamp object's own fields override these.
 *
 * Provenance is stated for every value: "published" (with the source),
 * "common practice, no published source", or "from memory" (an engineer's
 * recollection of typical catalogue figures, to be replaced by measured data).
 */

export const LAMP_TECH_IDS = [
  't5',
  't8',
  'compact',
  'mercury-vapour',
  'metal-halide',
  'led-uvb',
  'halogen',
  'incandescent',
  'ceramic',
] as const;

export type LampTech = (typeof LAMP_TECH_IDS)[number];

/** Ageing curve: exponential with a half-life, or a table of (month, factor) points (e.g. fitted from readings). */
export type DecayCurve = { halfLifeMonths: number } | { points: [number, number][] };

export interface LampTechDefaults {
  label: string;
  /** Usual shape of this technology. */
  form: 'tube' | 'bulb';
  /** µW/cm² directly below, 30 cm, new, bare. 0 for lamps that emit no UVB. */
  uvbAt30: number;
  /** UV Index per µW/cm² of broadband UVB (depends on the spectrum). */
  uviPerUvb: number;
  /** Full beam angle, degrees, pointing down. */
  beamDeg: number;
  /** Electrical power, W. */
  watts: number;
  /** Share of the electrical power leaving as radiation (visible + infrared) — what heats a surface it falls on. */
  radiantFraction: number;
  /**
   * Share of the radiant heat that passes ordinary glass: glass passes near-infrared (below about
   * 2.7 µm) and absorbs longer waves, so hot filaments get through and warm ceramics do not.
   */
  glassIrTransmission: number;
  /**
   * Share of the radiant heat kept inside the nominal beam; the rest is spread evenly over the lower
   * hemisphere. Besides the lamp's real infrared pattern (wider than its visible beam), this calibration
   * absorbs what the surface balance leaves out (conduction into the substrate, stronger convection over
   * a hot spot), so that narrow-beam lamps give the surface temperatures keepers measure. 1 for lamps
   * whose radiation is not concentrated by a reflector.
   */
  beamHeatShare: number;
  /** Where the numbers come from (the lamp's ageing is in lifetime.ts). */
  source: string;
}

/**
 * glassIrTransmission values: 0.9 × the black-body share below 2.7 µm at an assumed radiator temperature
 * (Planck's law; fractions from Incropera, Fundamentals of Heat and Mass Transfer, Table 12.2); the
 * radiator temperatures are from memory.
 */
export const LAMP_TECHS: Record<LampTech, LampTechDefaults> = {
  t5: {
    label: 'T5 fluorescent tube',
    form: 'tube',
    uvbAt30: 42.5,
    uviPerUvb: 0.04,
    beamDeg: 360,
    watts: 24,
    radiantFraction: 0.5,
    glassIrTransmission: 0.05,
    beamHeatShare: 1,
    source:
      'uvbAt30: the t5-high preset (see presets.ts); watts: a 55 cm T5 (from memory); uviPerUvb 0.04: typical ratio of UVI-meter ' +
      'to broadband-meter readings under fluorescent UVB lamps (from memory); radiantFraction 0.5 (from memory); ' +
      'glass share: tube wall near 40 °C radiates long-wave only (Planck)',
  },
  t8: {
    label: 'T8 fluorescent tube',
    form: 'tube',
    uvbAt30: 25,
    uviPerUvb: 0.04,
    beamDeg: 360,
    watts: 18,
    radiantFraction: 0.5,
    glassIrTransmission: 0.05,
    beamHeatShare: 1,
    source:
      'uvbAt30: the t8-medium preset (see presets.ts); watts: a 60 cm T8 (from memory); uviPerUvb as T5 (from memory)',
  },
  compact: {
    label: 'Compact fluorescent UVB lamp',
    form: 'bulb',
    uvbAt30: 20,
    uviPerUvb: 0.04,
    beamDeg: 360,
    watts: 26,
    radiantFraction: 0.5,
    glassIrTransmission: 0.05,
    beamHeatShare: 1,
    source: 'uvbAt30, watts (from memory)',
  },
  'mercury-vapour': {
    label: 'Self-ballasted mercury vapour lamp',
    form: 'bulb',
    uvbAt30: 225,
    uviPerUvb: 0.04,
    beamDeg: 90,
    watts: 160,
    radiantFraction: 0.6,
    glassIrTransmission: 0.6,
    beamHeatShare: 1,
    source:
      'uvbAt30 chosen so that UVI 1 is reached about 90 cm below (common practice, no published source); ' +
      'beamDeg, radiantFraction, glass share (from memory), checked against a 35 °C floor hot spot 40 cm below ' +
      '(common practice, no published source)',
  },
  'metal-halide': {
    label: 'Metal halide UVB lamp',
    form: 'bulb',
    uvbAt30: 900,
    uviPerUvb: 0.04,
    beamDeg: 30,
    watts: 70,
    radiantFraction: 0.6,
    glassIrTransmission: 0.6,
    beamHeatShare: 0.3,
    source:
      'uvbAt30 chosen so that UVI 1 is reached about 180 cm below (common practice, no published source); ' +
      'beamDeg, radiantFraction, beamHeatShare (from memory)',
  },
  'led-uvb': {
    label: 'UVB LED panel',
    form: 'bulb',
    uvbAt30: 60,
    uviPerUvb: 0.035,
    beamDeg: 120,
    watts: 15,
    radiantFraction: 0.3,
    glassIrTransmission: 0.05,
    beamHeatShare: 1,
    source: 'all values from memory; LED UVB sources are new and vary widely — calibrate with a meter',
  },
  halogen: {
    label: 'Halogen flood lamp',
    form: 'bulb',
    uvbAt30: 0,
    uviPerUvb: 0,
    beamDeg: 30,
    watts: 75,
    radiantFraction: 0.85,
    glassIrTransmission: 0.77,
    beamHeatShare: 0.1,
    source:
      'radiantFraction 0.85 (from memory: most of a filament lamp input leaves as visible and infrared radiation); ' +
      'glass share: filament about 3000 K, 86 % of black-body emission below 2.7 µm (Incropera Table 12.2), × 0.9; ' +
      'beamHeatShare 0.1 calibrated so that a 75 W flood 30 cm above a dark surface gives about 50 °C, and on the ' +
      'mesh lid of a 40 cm tall enclosure about 35 °C on the floor, like a 160 W mercury vapour lamp (common ' +
      'practice, no published source)',
  },
  incandescent: {
    label: 'Incandescent reflector lamp',
    form: 'bulb',
    uvbAt30: 0,
    uviPerUvb: 0,
    beamDeg: 60,
    watts: 60,
    radiantFraction: 0.85,
    glassIrTransmission: 0.75,
    beamHeatShare: 0.25,
    source:
      'radiantFraction (from memory); glass share: filament about 2700 K, 83 % below 2.7 µm (Incropera ' +
      'Table 12.2), × 0.9; beamHeatShare 0.25 so that a 60 W reflector lamp 30 cm above gives about 40 °C ' +
      '(from memory)',
  },
  ceramic: {
    label: 'Ceramic heat emitter (no light)',
    form: 'bulb',
    uvbAt30: 0,
    uviPerUvb: 0,
    beamDeg: 180,
    watts: 100,
    radiantFraction: 0.6,
    glassIrTransmission: 0.05,
    beamHeatShare: 1,
    source:
      'radiantFraction 0.6 (from memory); glass share: surface about 700 K, 6 % below 2.7 µm (Incropera ' +
      'Table 12.2), × 0.9',
  },
};

/** Output factor (1 when new) of a decay curve after `months`. */
export function decayFactor(curve: DecayCurve, months: number): number {
  const m = Math.max(0, months);
  if ('halfLifeMonths' in curve) return Math.pow(2, -m / curve.halfLifeMonths);
  const pts = curve.points;
  if (pts.length === 0) return 1;
  const first = pts[0]!;
  if (m <= first[0]) return first[1];
  for (let k = 1; k < pts.length; k++) {
    const a = pts[k - 1]!;
    const b = pts[k]!;
    if (m <= b[0]) return a[1] + ((b[1] - a[1]) * (m - a[0])) / (b[0] - a[0]);
  }
  return pts[pts.length - 1]![1];
}
