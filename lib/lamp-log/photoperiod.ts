import { controlSentence, type LampTech } from '@/simulation';
import type { SpeciesNeed } from './need';

/**
 * A lamp's hours a day against the species sheet's day length. Outside it, the advice is a timer set to
 * the sheet's day, in the words of the engine's lamp-control table (so a UV lamp is never told to go on a
 * thermostat). Null when the sheet gives no day length or the hours fit it.
 */
export function photoperiodAdvice(
  lamp: { hoursPerDay: number; type: { tech: LampTech } },
  species: SpeciesNeed | null,
): string | null {
  const p = species?.photoperiodH;
  if (!p) return null;
  const h = lamp.hoursPerDay;
  if (h >= p.min && h <= p.max) return null;
  const day = p.min === p.max ? `${p.min}` : `${p.min}–${p.max}`;
  return (
    `This lamp is on ${h} hours a day, ${h > p.max ? 'longer' : 'shorter'} than the ${day} hour day on the sheet for ${species!.name}. ` +
    controlSentence(lamp.type.tech, 'it', [p.min, p.max])
  );
}
