/**
 * Catalogue of generic lamp presets (technologies and output classes, never brands).
 *
 * Each UV preset's output is one figure, uvbAt30: the UVB (µW/cm²) straight below a new, bare lamp at
 * 30 cm, recalled for a typical lamp of the class (from memory; real lamps vary, calibrate with a meter).
 * How far below the lamp each UV zone lies is not a figure of the preset: the engine computes it from this
 * output (zoneDistances.ts, "zone distances"), bare, with a reflector and through a mesh lid.
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
  source: string;
}

const OUTPUT = 'uvbAt30: a typical new lamp of the class (from memory; calibrate with a meter)';

/** A UVB fluorescent tube of an output class: its length and watts (from memory) and its uvbAt30. */
const tube = (
  tech: 't5' | 't8',
  output: string,
  length: number,
  watts: number,
  uvbAt30: number,
): LampPreset => ({
  label: `${tech.toUpperCase()} tube, ${output} output, ${length} cm`,
  lamp: { tech, form: 'tube', length, uvbAt30, watts },
  source: `${OUTPUT}; length and watts from memory`,
});

export const LAMP_PRESETS: Record<LampPresetId, LampPreset> = {
  't5-low': tube('t5', 'low', 55, 24, 5.3),
  't5-medium': tube('t5', 'medium', 55, 24, 25),
  't5-high': tube('t5', 'high', 55, 24, 42.5),
  't5-very-high': tube('t5', 'very high', 55, 24, 61),
  't8-medium': tube('t8', 'medium', 60, 18, 25),
  compact: {
    label: 'Compact fluorescent UVB, 26 W',
    lamp: { tech: 'compact', form: 'bulb', uvbAt30: 20, watts: 26 },
    source: `${OUTPUT}; watts from memory`,
  },
  'mercury-vapour-160': {
    label: 'Mercury vapour, 160 W',
    lamp: { tech: 'mercury-vapour', form: 'bulb', uvbAt30: 225, watts: 160, beamDeg: 90 },
    source: `${OUTPUT}; beam, heat: see LAMP_TECHS`,
  },
  'metal-halide-70': {
    label: 'Metal halide UVB, 70 W',
    lamp: { tech: 'metal-halide', form: 'bulb', uvbAt30: 900, watts: 70, beamDeg: 30 },
    source: `${OUTPUT}; beam from memory`,
  },
  'led-uvb': {
    label: 'UVB LED panel, 15 W',
    lamp: { tech: 'led-uvb', form: 'bulb', uvbAt30: 60, watts: 15, beamDeg: 120 },
    source: 'from memory; LED UVB sources vary widely — calibrate with a meter',
  },
  'halogen-75': {
    label: 'Halogen flood, 75 W',
    lamp: { tech: 'halogen', form: 'bulb', uvbAt30: 0, watts: 75, beamDeg: 30 },
    source: 'beam and heat: see LAMP_TECHS (from memory)',
  },
  'incandescent-60': {
    label: 'Incandescent reflector, 60 W',
    lamp: { tech: 'incandescent', form: 'bulb', uvbAt30: 0, watts: 60, beamDeg: 60 },
    source: 'beam and heat: see LAMP_TECHS (from memory)',
  },
  'ceramic-100': {
    label: 'Ceramic heat emitter, 100 W',
    lamp: { tech: 'ceramic', form: 'bulb', uvbAt30: 0, watts: 100, beamDeg: 180 },
    source: 'heat: see LAMP_TECHS (from memory)',
  },
};

/** Gain of a good polished reflector inside its beam, for the zone distances' reflector set-up (from memory; reflectors differ, so measure the fitted lamp). */
export const GOOD_REFLECTOR_GAIN = 2.2;
