// Lamp presets and technologies from the engine's generic catalogue, applied to a lamp object.
import { LAMP_PRESETS, type LampPresetId, LAMP_TECHS, type LampTech } from '@/simulation';
import { TUBE_LENGTH_CM } from '@/shared/object-kinds/lamp';
import type { LampObject, StudioCatalogueType } from './types';

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

/**
 * A catalogue type with an adopted curve applied to a lamp: the type's output figures and the shop's
 * measured decay table replace the lamp's, which keeps its place, name, reflector and age (as a preset).
 */
export function applyCatalogueType(l: LampObject, t: StudioCatalogueType): LampObject {
  const out: Record<string, unknown> = {};
  for (const k of OUTPUT_KEYS) if (t.lamp[k] !== undefined) out[k] = t.lamp[k];
  return { ...withoutOutput(l), ...out } as LampObject;
}

function samePoints(a: readonly (readonly [number, number])[], b: readonly (readonly [number, number])[]) {
  return a.length === b.length && a.every(([m, f], i) => m === b[i]![0] && f === b[i]![1]);
}

/**
 * The catalogue type whose adopted curve this lamp ages by, compared by content (a lamp made by the
 * guided start, or from the catalogue here, carries a copy of the table), or null.
 */
export function matchingCatalogueCurve(
  l: LampObject,
  types: readonly StudioCatalogueType[],
): StudioCatalogueType | null {
  const d = l.decay;
  if (!d || !('points' in d) || !d.points) return null;
  const points = d.points;
  return (
    types.find((t) => {
      const td = t.lamp.decay;
      return !!td && 'points' in td && !!td.points && samePoints(td.points, points);
    }) ?? null
  );
}

/** The catalogue type whose output and adopted curve this lamp carries unchanged, or null. */
export function matchingCatalogueType(
  l: LampObject,
  types: readonly StudioCatalogueType[],
): StudioCatalogueType | null {
  const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);
  const lamp = l as Record<string, unknown>;
  return (
    types.find((t) => {
      const fields = t.lamp as Record<string, unknown>;
      return OUTPUT_KEYS.every((k) => same(lamp[k], fields[k]));
    }) ?? null
  );
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
