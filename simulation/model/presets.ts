/**
 * Catalogue of generic lamp presets (technologies and output classes, never brands).
 *
 * USEFUL REACH (used throughout the engine and its docs): the distance straight below a new, bare lamp
 * (below the centre of a tube), with nothing in between, at which the UV Index falls to 1.0 — the lower
 * bound of the mean UVI of Ferguson zone 3 (Ferguson et al. 2010, Zoo Biology 29:317–334). With the default
 * ratio of 0.04 UVI per µW/cm² that is 25 µW/cm² of UVB.
 *
 * The uvbAt30 of each UV preset is set so that its useful reach matches the trade's figure for its class
 * (common practice, no published source): low-output tubes about 8 cm, medium about 30 cm, high 40–45 cm,
 * very high 50–55 cm, mercury vapour about 90 cm, metal halide about 180 cm. Tests check these within ±10 %.
 */
import type { LampObject } from './schema';

export type LampPresetId =
  | 't5-low'
  | 't5-medium'
  | 't5-high'
  | 't5-very-high'
  | 't8-medium'
  | 'compact'
  | 'mercury-vapour-160'
  | 'metal-halide-70'
  | 'led-uvb'
  | 'halogen-75'
  | 'incandescent-60'
  | 'ceramic-100';

export interface LampPreset {
  label: string;
  /** Fields to copy onto a new lamp object (plus type, id, x, y). */
  lamp: Omit<LampObject, 'type' | 'id' | 'x' | 'y' | 'name'>;
  /** Useful reach in cm as the trade states it, or null for lamps without UVB. */
  usefulReachCm: number | null;
  source: string;
}

/** UVI at which useful reach ends (lower bound of Ferguson zone 3 mean). */
export const USEFUL_REACH_UVI = 1.0;

const TRADE = 'useful reach of the class (common practice, no published source)';

export const LAMP_PRESETS: Record<LampPresetId, LampPreset> = {
  't5-low': {
    label: 'T5 tube, low output, 55 cm',
    lamp: { tech: 't5', form: 'tube', length: 55, uvbAt30: 5.3, watts: 24 },
    usefulReachCm: 8,
    source: `uvbAt30 from the ${TRADE}, 8 cm; length and watts from memory`,
  },
  't5-medium': {
    label: 'T5 tube, medium output, 55 cm',
    lamp: { tech: 't5', form: 'tube', length: 55, uvbAt30: 25, watts: 24 },
    usefulReachCm: 30,
    source: `uvbAt30 from the ${TRADE}, 30 cm; length and watts from memory`,
  },
  't5-high': {
    label: 'T5 tube, high output, 55 cm',
    lamp: { tech: 't5', form: 'tube', length: 55, uvbAt30: 42.5, watts: 24 },
    usefulReachCm: 42.5,
    source: `uvbAt30 from the ${TRADE}, 40–45 cm; length and watts from memory`,
  },
  't5-very-high': {
    label: 'T5 tube, very high output, 55 cm',
    lamp: { tech: 't5', form: 'tube', length: 55, uvbAt30: 61, watts: 24 },
    usefulReachCm: 52.5,
    source: `uvbAt30 from the ${TRADE}, 50–55 cm; length and watts from memory`,
  },
  't8-medium': {
    label: 'T8 tube, medium output, 60 cm',
    lamp: { tech: 't8', form: 'tube', length: 60, uvbAt30: 25, watts: 18 },
    usefulReachCm: 30,
    source: `uvbAt30 from the ${TRADE}, 30 cm; length and watts from memory`,
  },
  compact: {
    label: 'Compact fluorescent UVB, 26 W',
    lamp: { tech: 'compact', form: 'bulb', uvbAt30: 20, watts: 26 },
    usefulReachCm: null,
    source: 'uvbAt30 and watts from memory (reach about 27 cm); no trade reach figure for the class',
  },
  'mercury-vapour-160': {
    label: 'Mercury vapour, 160 W',
    lamp: { tech: 'mercury-vapour', form: 'bulb', uvbAt30: 225, watts: 160, beamDeg: 90 },
    usefulReachCm: 90,
    source: `uvbAt30 from the ${TRADE}, 90 cm; beam, heat: see LAMP_TECHS`,
  },
  'metal-halide-70': {
    label: 'Metal halide UVB, 70 W',
    lamp: { tech: 'metal-halide', form: 'bulb', uvbAt30: 900, watts: 70, beamDeg: 30 },
    usefulReachCm: 180,
    source: `uvbAt30 from the ${TRADE}, 180 cm; beam from memory`,
  },
  'led-uvb': {
    label: 'UVB LED panel, 15 W',
    lamp: { tech: 'led-uvb', form: 'bulb', uvbAt30: 60, watts: 15, beamDeg: 120 },
    usefulReachCm: null,
    source: 'from memory; LED UVB sources vary widely — calibrate with a meter',
  },
  'halogen-75': {
    label: 'Halogen flood, 75 W',
    lamp: { tech: 'halogen', form: 'bulb', uvbAt30: 0, watts: 75, beamDeg: 30 },
    usefulReachCm: null,
    source: 'beam and heat: see LAMP_TECHS (from memory)',
  },
  'incandescent-60': {
    label: 'Incandescent reflector, 60 W',
    lamp: { tech: 'incandescent', form: 'bulb', uvbAt30: 0, watts: 60, beamDeg: 60 },
    usefulReachCm: null,
    source: 'beam and heat: see LAMP_TECHS (from memory)',
  },
  'ceramic-100': {
    label: 'Ceramic heat emitter, 100 W',
    lamp: { tech: 'ceramic', form: 'bulb', uvbAt30: 0, watts: 100, beamDeg: 180 },
    usefulReachCm: null,
    source: 'heat: see LAMP_TECHS (from memory)',
  },
};

/** Reflector gain that stretches a medium T5 tube's useful reach from about 30 cm to about 50 cm (common practice, no published source). */
export const GOOD_REFLECTOR_GAIN = 2.2;
