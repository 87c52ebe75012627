import type { LampObject } from '@/simulation';
import type { StudioCatalogueType } from '@/shared/designs/catalogue-type';
import type { AdoptedCurve, LampTypeDto, LampTypeInput } from './schema';

/**
 * A design-file lamp object for a catalogue entry, placed at (x, y). Every catalogue figure is written
 * onto the object, so the design keeps showing this lamp even if the catalogue entry is edited later.
 */
export function lampObjectFromType(
  t: LampTypeInput & { adoptedCurve?: AdoptedCurve | null },
  at: { id: string; x: number; y: number; name?: string; ageMonths?: number; reflectorGain?: number },
): LampObject {
  const lamp: LampObject = {
    type: 'lamp',
    id: at.id,
    name: at.name ?? t.name,
    tech: t.tech,
    form: t.form,
    x: at.x,
    y: at.y,
    uvbAt30: t.uvbAt30,
    uviPerUvb: t.uviPerUvb,
    reflectorGain: at.reflectorGain ?? t.reflectorGain,
    beamDeg: t.beamDeg,
    watts: t.watts,
    radiantFraction: t.radiantFraction,
    ageMonths: at.ageMonths ?? 0,
  };
  if (t.form === 'tube' && t.lengthCm !== null) lamp.length = t.lengthCm;
  // The shop's own measured curve, when adopted for the type, is how its lamps of this type age.
  if (t.adoptedCurve) lamp.decay = { points: t.adoptedCurve.points };
  else if (t.decayPoints) lamp.decay = { points: t.decayPoints };
  else if (t.halfLifeMonths !== null) lamp.decay = { halfLifeMonths: t.halfLifeMonths };
  return lamp;
}

/**
 * What the design studio offers of a catalogue type whose measured curve the shop adopted: its lamp
 * object as the guided start would place it (so the decay table is the adopted one), or null for a type
 * that ages by the catalogue's curve.
 */
export function studioCatalogueType(t: LampTypeDto): StudioCatalogueType | null {
  if (!t.adoptedCurve) return null;
  return {
    id: String(t.id),
    name: t.name,
    lamps: t.adoptedCurve.lamps,
    lamp: lampObjectFromType(t, { id: `catalogue-${t.id}`, x: 0, y: 0 }),
  };
}
