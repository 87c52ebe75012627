import type { LampObject } from '@/simulation';
import type { AdoptedCurve, LampTypeInput } from './schema';

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
