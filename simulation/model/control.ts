/**
 * How each lamp technology may be switched and controlled. This is the one table every finding,
 * caution, guided-start text and report sentence takes its control advice from, so a lamp that must not
 * be dimmed is never told to be.
 *
 * - Filament lamps (halogen, incandescent) tolerate dimming; an on/off thermostat would flash their
 *   light on and off through the day, so a dimming thermostat is the usual control.
 * - A ceramic emitter gives no light, so an on/off (or pulse-proportional) thermostat is fine.
 * - Self-ballasted mercury vapour and metal halide lamps are discharge lamps: dimmed they go out or run
 *   unstably, and once off they must cool for minutes before they strike again, so thermostat cycling
 *   leaves them dark and wears them out. Their heat is set by wattage and distance.
 * - Fluorescent tubes and compact lamps run on ballasts that are not made for dimming or cycling; UV LED
 *   drivers likewise. Cycling or dimming changes the UV the animal gets through the day.
 * All of it is common practice, no published source; the restrike delay of discharge lamps is from
 * memory of makers' instructions.
 */
import type { LampTech } from './techs';
import { LAMP_TECHS } from './techs';

export type LampControl = 'dimming-thermostat' | 'on-off-thermostat' | 'timer-only';
export type ControlMark = 'source' | 'common practice, no published source' | 'from memory';

export interface LampControlRule {
  control: LampControl;
  /** Why, in one plain sentence. */
  reason: string;
  mark: ControlMark;
}

const DISCHARGE =
  'a discharge lamp: dimmed it goes out or runs unstably, and once switched off it must cool for minutes before it strikes again, so a thermostat would leave it dark and wear it out';
const FLUORESCENT =
  'its ballast is not made for dimming or frequent switching, and cycling it would change the UV the animal gets through the day';

export const LAMP_CONTROL: Record<LampTech, LampControlRule> = {
  t5: { control: 'timer-only', reason: FLUORESCENT, mark: 'common practice, no published source' },
  t8: { control: 'timer-only', reason: FLUORESCENT, mark: 'common practice, no published source' },
  compact: { control: 'timer-only', reason: FLUORESCENT, mark: 'common practice, no published source' },
  'mercury-vapour': {
    control: 'timer-only',
    reason: DISCHARGE,
    mark: 'common practice, no published source',
  },
  'metal-halide': { control: 'timer-only', reason: DISCHARGE, mark: 'common practice, no published source' },
  'led-uvb': {
    control: 'timer-only',
    reason:
      'UV LEDs and their drivers change their UV output when dimmed, and cycling them changes the UV dose',
    mark: 'from memory',
  },
  halogen: {
    control: 'dimming-thermostat',
    reason: 'a filament lamp dims smoothly, while an on/off thermostat would flash its light on and off',
    mark: 'common practice, no published source',
  },
  incandescent: {
    control: 'dimming-thermostat',
    reason: 'a filament lamp dims smoothly, while an on/off thermostat would flash its light on and off',
    mark: 'common practice, no published source',
  },
  ceramic: {
    control: 'on-off-thermostat',
    reason:
      'it gives no light, so switching it on and off does not disturb the day (a pulse-proportional thermostat also works)',
    mark: 'common practice, no published source',
  },
};

export const CONTROL_LABELS: Record<LampControl, string> = {
  'dimming-thermostat': 'dimming thermostat',
  'on-off-thermostat': 'on/off thermostat',
  'timer-only': 'timer only',
};

export function lampControl(tech: LampTech): LampControlRule {
  return LAMP_CONTROL[tech];
}

/** May a thermostat (dimming or on/off) control this technology? */
export function thermostatAllowed(tech: LampTech): boolean {
  return LAMP_CONTROL[tech].control !== 'timer-only';
}

/** Lower-cases a label's first letter, but not an abbreviation such as "T5". */
export const lowerLabel = (s: string) => (/^[A-Z][a-z]/.test(s) ? s.charAt(0).toLowerCase() + s.slice(1) : s);

/**
 * One sentence of control advice for a lamp: `name` is how the text calls it (an id or a catalogue
 * name), defaulting to the technology's label. `photoperiodH` names the day length the timer keeps.
 */
export function controlSentence(tech: LampTech, name?: string, photoperiodH?: [number, number]): string {
  const rule = LAMP_CONTROL[tech];
  const who = name ?? `the ${lowerLabel(LAMP_TECHS[tech].label)}`;
  const day = photoperiodH
    ? ` (on for the sheet’s ${photoperiodH[0] === photoperiodH[1] ? photoperiodH[0] : `${photoperiodH[0]}–${photoperiodH[1]}`} hour day)`
    : '';
  switch (rule.control) {
    case 'timer-only':
      return `Switch ${who} by a timer only${day}; never dim it or put it on a thermostat (${rule.reason}); set its heat by wattage and distance, and use a separate thermostat-controlled heat source where control is needed (${rule.mark}).`;
    case 'dimming-thermostat':
      return `Run ${who} on a dimming thermostat with its probe at the basking spot, and a timer${day} (${rule.reason}; ${rule.mark}).`;
    case 'on-off-thermostat':
      return `Run ${who} on an on/off thermostat with its probe at the basking spot (${rule.reason}; ${rule.mark}).`;
  }
}

/** Control advice for a set of lamps, one sentence per lamp (each lamp named by `name`). */
export function controlAdvice(
  lamps: { tech: LampTech; name?: string }[],
  photoperiodH?: [number, number],
): string {
  return lamps.map((l) => controlSentence(l.tech, l.name, photoperiodH)).join(' ');
}

const CONTROL_CLASS: Record<LampControl, string> = {
  'dimming-thermostat': 'a dimming thermostat',
  'on-off-thermostat': 'an on/off thermostat',
  'timer-only': 'a timer only, never dimmed or put on a thermostat',
};

/** Every technology grouped by how it may be controlled, in one line (for general notes). */
export function controlSummary(): string {
  const groups = new Map<LampControl, string[]>();
  for (const t of Object.keys(LAMP_CONTROL) as LampTech[]) {
    const c = LAMP_CONTROL[t].control;
    groups.set(c, [...(groups.get(c) ?? []), LAMP_TECHS[t].label]);
  }
  return [...groups].map(([c, labels]) => `${labels.join(', ')}: ${CONTROL_CLASS[c]}.`).join(' ');
}
