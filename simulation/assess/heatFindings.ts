/**
 * Temperature findings: the hottest reachable surface against the species' basking range, and the
 * coolest against its cool-end range. Surface temperatures are those of a dark matte surface in the
 * radiant heat of the lamps (see fields/heat.ts), so the cool end reads the local air temperature.
 */
import type { SpeciesSheet } from '../model/species';
import type { Design } from '../model/schema';
import { LAMP_TECHS, type LampTech } from '../model/techs';
import { resolveLamp } from '../model/resolve';
import { controlAdvice, controlSentence, lowerLabel, thermostatAllowed } from '../model/control';
import type { Finding, FindingStatus } from './types';
import { runsOf, type SurfaceSample } from './surfaces';
import { ESTIMATE_TEMP, TEMP_MARGIN_C } from './thresholds';
import { f1, range1, surfaceC } from './format';

function rangeStatus(v: number, [lo, hi]: [number, number]): FindingStatus {
  if (v >= lo && v <= hi) return 'pass';
  if (v >= lo - TEMP_MARGIN_C && v <= hi + TEMP_MARGIN_C) return 'attention';
  return 'fail';
}

/** A lamp as the texts name it: its own name, else its id, with its technology. */
export function lampForText(l: { id: string; name?: string; tech: LampTech }): {
  tech: LampTech;
  name: string;
} {
  return { tech: l.tech, name: `“${l.name || l.id}” (${lowerLabel(LAMP_TECHS[l.tech].label)})` };
}

/** The lamps that put heat into the design, named for the texts. */
export function heatLamps(design: Design): { tech: LampTech; name: string }[] {
  const out: { tech: LampTech; name: string }[] = [];
  for (const o of design.objects) {
    if (o.type !== 'lamp') continue;
    const l = resolveLamp(o);
    if (l.watts * l.radiantFraction > 0) out.push(lampForText(o));
  }
  return out;
}

/** "Too hot" advice that never tells a timer-only lamp to be dimmed (LAMP_CONTROL). */
export function tooHotAdvice(lamps: { tech: LampTech; name: string }[]): string {
  const dimmable = lamps.filter((l) => thermostatAllowed(l.tech));
  const fixed = lamps.filter((l) => !thermostatAllowed(l.tech));
  const parts = ['raise the lamp or use a lower wattage'];
  if (dimmable.length) parts.push(`turn down the thermostat of ${dimmable.map((l) => l.name).join(', ')}`);
  if (fixed.length && !dimmable.length)
    parts.push('or replace part of the heat with a separate, thermostat-controlled heat source');
  return parts.join(', ');
}

export function heatFindings(
  samples: SurfaceSample[],
  tempC: ArrayLike<number>,
  species: SpeciesSheet,
  roomC: number,
  lamps: { tech: LampTech; name: string }[] = [],
): Finding[] {
  let hot = -Infinity;
  let cool = Infinity;
  samples.forEach((_, k) => {
    hot = Math.max(hot, tempC[k]!);
    cool = Math.min(cool, tempC[k]!);
  });
  if (samples.length === 0) {
    hot = roomC;
    cool = roomC;
  }
  const out: Finding[] = [];
  const [blo, bhi] = species.baskingSurfaceC;
  const hs = rangeStatus(hot, species.baskingSurfaceC);
  const hotSegs = runsOf(samples, (k) => tempC[k]! >= hot - 1);
  out.push({
    id: 'hot-spot',
    status: hs,
    title: 'Basking surface temperature',
    message:
      `The hottest surface the animal can reach is ${surfaceC(hot)} °C; ${species.name} needs ${range1(species.baskingSurfaceC)} °C` +
      (hs === 'pass'
        ? '.'
        : hot < blo
          ? ' — too cool: a stronger or closer heat lamp, or a basking surface nearer the lamp.'
          : ` — too hot: ${tooHotAdvice(lamps)}${hot > bhi + 10 ? '; risk of burns' : ''}.`) +
      (lamps.length ? ` ${controlAdvice(lamps, species.photoperiodH)}` : '') +
      ` ${ESTIMATE_TEMP}`,
    numbers: { hotC: hot, targetLo: blo, targetHi: bhi },
    where: hotSegs.length ? { kind: 'segments', segments: hotSegs } : undefined,
  });
  const cs = rangeStatus(cool, species.coolEndC);
  const coolSegs = runsOf(samples, (k) => tempC[k]! <= cool + 0.5);
  out.push({
    id: 'cool-end',
    status: cs,
    title: 'Cool end temperature',
    message:
      `The coolest reachable surface is about ${f1(cool)} °C (room ${f1(roomC)} °C); ${species.name} needs ${range1(species.coolEndC)} °C at the cool end` +
      (cs === 'pass'
        ? '.'
        : cool > species.coolEndC[1]
          ? ' — there is nowhere cool enough to retreat to; give more space away from the heat, or less heat.'
          : ' — too cold; the room or the enclosure needs more background heat.') +
      ` ${ESTIMATE_TEMP}`,
    numbers: { coolC: cool, targetLo: species.coolEndC[0], targetHi: species.coolEndC[1], roomC },
    where: coolSegs.length ? { kind: 'segments', segments: coolSegs } : undefined,
  });
  if (species.nightMinC !== undefined) {
    const ok = roomC >= species.nightMinC;
    out.push({
      id: 'night-minimum',
      status: ok ? 'pass' : 'attention',
      title: 'Night temperature',
      message: ok
        ? `With the lamps off the enclosure falls to the room temperature; at ${f1(roomC)} °C that stays above the ${f1(species.nightMinC)} °C night minimum, if the room stays this warm at night. ${ESTIMATE_TEMP}`
        : `With the lamps off the enclosure falls to the room temperature, ${f1(roomC)} °C, below the ${f1(species.nightMinC)} °C night minimum: a night heat source without light may be needed. ${controlSentence('ceramic', 'a night heat source without light, such as a ceramic emitter,')} ${ESTIMATE_TEMP}`,
      numbers: { roomC, nightMinC: species.nightMinC },
    });
  }
  return out;
}
