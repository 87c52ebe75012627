import { LAMP_PRESETS, LAMP_TECHS, type LampPresetId } from '@/simulation';
import type { LampTypeField, LampTypeInput } from './schema';
import {
  HEAT_REPLACEMENT_SOURCE,
  LED_REPLACEMENT_SOURCE,
  REPLACEMENT_SOURCE,
  TYPICAL_REPLACEMENT_MONTHS,
} from './replacement';

/**
 * The lamp catalogue every organisation starts with, derived from the engine's presets and technology
 * defaults (simulation/model/presets.ts and techs.ts) so the figures live in one place. Each field says
 * where it comes from: the preset's own note for its output figures, the technology's note for the rest.
 */

export type StartingLampType = LampTypeInput & { presetKey: LampPresetId };

/** Decay half-lives this long mean "no UV to decay" in the engine (heat-only lamps). */
const NO_DECAY_MONTHS = 1e6;

export function startingLampType(presetKey: LampPresetId): StartingLampType {
  const preset = LAMP_PRESETS[presetKey];
  const lamp = preset.lamp;
  const tech = LAMP_TECHS[lamp.tech];
  const uvbAt30 = lamp.uvbAt30 ?? tech.uvbAt30;
  const halfLife = 'halfLifeMonths' in tech.decay ? tech.decay.halfLifeMonths : null;
  const decays = uvbAt30 > 0 && halfLife !== null && halfLife < NO_DECAY_MONTHS;
  const replace = TYPICAL_REPLACEMENT_MONTHS[lamp.tech];

  const techNote = `${tech.label} defaults: ${tech.source}`;
  const sources: Partial<Record<LampTypeField, string>> = {
    uvbAt30: preset.source,
    watts: preset.source,
    beamDeg: lamp.beamDeg !== undefined ? preset.source : techNote,
    uviPerUvb: techNote,
    radiantFraction: techNote,
    reflectorGain: 'bare lamp, no reflector (gain 1)',
    halfLifeMonths: decays ? techNote : 'no UVB output to decay',
    replaceAfterMonths:
      replace !== null
        ? REPLACEMENT_SOURCE
        : lamp.tech === 'led-uvb'
          ? LED_REPLACEMENT_SOURCE
          : HEAT_REPLACEMENT_SOURCE,
  };
  if (lamp.form === 'tube') sources.lengthCm = preset.source;

  return {
    presetKey,
    name: preset.label,
    tech: lamp.tech,
    form: lamp.form,
    lengthCm: lamp.form === 'tube' ? (lamp.length ?? null) : null,
    uvbAt30,
    uviPerUvb: lamp.uviPerUvb ?? tech.uviPerUvb,
    radiantFraction: lamp.radiantFraction ?? tech.radiantFraction,
    beamDeg: lamp.beamDeg ?? tech.beamDeg,
    reflectorGain: lamp.reflectorGain ?? 1,
    watts: lamp.watts ?? tech.watts,
    halfLifeMonths: decays ? halfLife : null,
    decayPoints: null,
    replaceAfterMonths: replace,
    notes: preset.usefulReachCm !== null ? usefulReachNote(preset.usefulReachCm) : null,
    sources,
  };
}

function usefulReachNote(cm: number): string {
  return (
    `Useful reach about ${cm} cm: the distance below a new, bare lamp at which the UV Index falls to 1 ` +
    '(the lower bound of the zone 3 mean of Ferguson et al. 2010). An estimate — verify with a meter.'
  );
}

export const STARTING_LAMP_TYPES: readonly StartingLampType[] = (
  Object.keys(LAMP_PRESETS) as LampPresetId[]
).map(startingLampType);
