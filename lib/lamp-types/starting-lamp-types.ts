import {
  LAMP_LIFETIME,
  LAMP_PRESETS,
  LAMP_TECHS,
  lifetimeSources,
  techHalfLifeMonths,
  type LampPresetId,
} from '@/simulation';
import type { LampTypeField, LampTypeInput } from './schema';

/**
 * The lamp catalogue every organisation starts with, derived from the engine's presets and technology
 * defaults (simulation/model/presets.ts, techs.ts and lifetime.ts) so the figures live in one place. Each field says
 * where it comes from: the preset's own note for its output figures, the technology's note for the rest.
 */

export type StartingLampType = LampTypeInput & { presetKey: LampPresetId };

export function startingLampType(presetKey: LampPresetId): StartingLampType {
  const preset = LAMP_PRESETS[presetKey];
  const lamp = preset.lamp;
  const tech = LAMP_TECHS[lamp.tech];
  const uvbAt30 = lamp.uvbAt30 ?? tech.uvbAt30;
  const life = LAMP_LIFETIME[lamp.tech];
  const lifeNote = lifetimeSources(lamp.tech);
  const halfLife = uvbAt30 > 0 ? techHalfLifeMonths(lamp.tech) : null;

  const presetNote = readable(preset.source);
  const techNote = (...keys: string[]) => `${tech.label} defaults: ${readable(clauses(tech.source, keys))}`;
  const sources: Partial<Record<LampTypeField, string>> = {
    uvbAt30: presetNote,
    watts: presetNote,
    beamDeg: lamp.beamDeg !== undefined ? presetNote : techNote('beamDeg', 'beam'),
    uviPerUvb: techNote('uviPerUvb'),
    radiantFraction: techNote('radiantFraction'),
    reflectorGain: 'bare lamp, no reflector (gain 1)',
    halfLifeMonths: halfLife !== null ? `${tech.label}: ${lifeNote.decay}` : 'no UVB output to decay',
    replaceAfterMonths: `${tech.label}: ${lifeNote.replace}`,
  };
  if (lamp.form === 'tube') sources.lengthCm = presetNote;

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
    halfLifeMonths: halfLife,
    decayPoints: null,
    replaceAfterMonths: life.replaceMonths,
    // How far below the lamp each UV zone lies is computed on the catalogue page from these figures.
    notes: null,
    sources,
  };
}

/** The parts of an engine source note (clauses separated by ";") that speak of one of `keys`. */
export function clauses(source: string, keys: string[]): string {
  const parts = source.split(/;\s*/);
  const hit = parts.filter((p) => keys.some((k) => p.toLowerCase().includes(k.toLowerCase())));
  return hit.length > 0 ? hit.join('; ') : source;
}

/** Engine notes name code constants; people read "the technology's defaults". */
function readable(note: string): string {
  return note
    .replace(/\bsee LAMP_TECHS\b/g, 'see the technology’s defaults')
    .replace(/\(see presets\.ts\)/g, '(the preset)');
}

export const STARTING_LAMP_TYPES: readonly StartingLampType[] = (
  Object.keys(LAMP_PRESETS) as LampPresetId[]
).map(startingLampType);
