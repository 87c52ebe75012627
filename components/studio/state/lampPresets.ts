// Lamp presets and technologies from the engine's generic catalogue, applied to a lamp object.
import { LAMP_PRESETS, type LampPresetId, LAMP_TECHS, type LampTech } from '@/simulation';
import { TUBE_LENGTH_CM } from '@/shared/object-kinds/lamp';
import type { LampObject } from './types';

/** Fields a preset or technology sets; other lamp fields (position, name, age, reflector) are the fixture's. */
const OUTPUT_KEYS = [
  'tech',
  'form',
  'length',
  'uvbAt30',
  'uviPerUvb',
  'beamDeg',
  'watts',
  'radiantFraction',
  'decay',
] as const;

function withoutOutput(l: LampObject): LampObject {
  const out = { ...l } as Record<string, unknown>;
  for (const k of OUTPUT_KEYS) delete out[k];
  return out as LampObject;
}

export function applyPreset(l: LampObject, id: LampPresetId): LampObject {
  const p = LAMP_PRESETS[id];
  return { ...withoutOutput(l), ...p.lamp } as LampObject;
}

/** The preset this lamp matches exactly, if any (else it is a custom lamp). */
export function matchingPreset(l: LampObject): LampPresetId | null {
  for (const [id, p] of Object.entries(LAMP_PRESETS) as [
    LampPresetId,
    (typeof LAMP_PRESETS)[LampPresetId],
  ][]) {
    const fields = p.lamp as Record<string, unknown>;
    const lamp = l as Record<string, unknown>;
    const extra = OUTPUT_KEYS.some((k) => !(k in fields) && lamp[k] !== undefined);
    if (!extra && Object.entries(fields).every(([k, v]) => lamp[k] === v)) return id;
  }
  return null;
}

/** Switches technology: its defaults apply (overrides of output are dropped), the lamp keeps its place. */
export function applyTech(l: LampObject, tech: LampTech): LampObject {
  const form = LAMP_TECHS[tech].form;
  const base = { ...withoutOutput(l), tech, form } as LampObject;
  if (form === 'tube') base.length = l.length ?? TUBE_LENGTH_CM;
  return base;
}

export function applyForm(l: LampObject, form: 'tube' | 'bulb'): LampObject {
  if (form === l.form) return l;
  const next = { ...l, form } as LampObject;
  if (form === 'tube') next.length = l.length ?? TUBE_LENGTH_CM;
  else delete next.length;
  return next;
}

export const PRESET_OPTIONS = (Object.entries(LAMP_PRESETS) as [LampPresetId, { label: string }][]).map(
  ([id, p]) => ({
    value: id,
    label: p.label,
  }),
);

export const TECH_OPTIONS = (Object.entries(LAMP_TECHS) as [LampTech, { label: string }][]).map(
  ([id, t]) => ({
    value: id,
    label: t.label,
  }),
);
