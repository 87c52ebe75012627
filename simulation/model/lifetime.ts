/**
 * How each lamp technology ages: its UVB decay curve, the usual replacement interval and how often to
 * check it with a meter. This is the one table the studio's ageing preview, the lamp log's outlook and
 * reminders, the catalogue's starting entries and the guided start take a lamp's lifetime from, so a
 * lamp type's own advice and the dates the app works out never disagree.
 *
 * Months are months of ordinary use, about 12 hours a day (common practice, no published source); a lamp
 * lit fewer hours ages more slowly (the lamp log scales by the lamp's own hours a day).
 *
 * Every value says where it comes from. No published decay data per technology is used here: the
 * half-lives are recalled from makers' and keepers' meter logs and marked `from memory`; the replacement
 * and test intervals are what keepers are usually told (`common practice, no published source`). Where
 * the trade's advice is a range, the shorter end is taken, because a lamp replaced a little early costs
 * money while one kept too long leaves the animal short of UVB. A keeper's own meter readings in the lamp
 * log replace all of this for their lamp.
 */
import { lowerLabel } from './control';
import { LAMP_TECHS, type DecayCurve, type LampTech } from './techs';

/** Hours a day of "ordinary use", the day the months of this table count (common practice, no published source). */
export const ORDINARY_HOURS_PER_DAY = 12;

export type LifetimeMark = 'common practice, no published source' | 'from memory';

export interface LampLifetime {
  /** UVB output against months of ordinary use (1 when new); null: the lamp gives no UVB to age. */
  decay: DecayCurve | null;
  decayMark: LifetimeMark | null;
  /** Usual replacement interval, months of ordinary use; null: replace when it fails or when readings say. */
  replaceMonths: number | null;
  replaceMark: LifetimeMark | null;
  /** How often to measure it with a UV meter, calendar months; null: no UV to measure. */
  testMonths: number | null;
  testMark: LifetimeMark | null;
  /** Why, in a sentence a keeper can read. */
  note: string;
}

const CP = 'common practice, no published source' as const;
const FM = 'from memory' as const;

/** Usual interval between meter checks of a UV lamp (common practice, no published source). */
const TEST_EVERY_MONTHS = 3;

/** A lamp without UVB: nothing to fade or measure with a UV meter; it is replaced when it fails. */
const HEAT_ONLY: LampLifetime = {
  decay: null,
  decayMark: null,
  replaceMonths: null,
  replaceMark: null,
  testMonths: null,
  testMark: null,
  note: 'A heat lamp with no UVB: replace it when it fails.',
};

/**
 * A UV lamp whose UVB halves in `halfLifeMonths` (from memory), replaced after `replaceMonths` (common
 * practice; null where there is no established interval) and measured every `test.months` with a meter.
 */
function uvLamp(
  halfLifeMonths: number,
  replaceMonths: number | null,
  note: string,
  test: { months: number; mark: LifetimeMark } = { months: TEST_EVERY_MONTHS, mark: CP },
): LampLifetime {
  return {
    decay: { halfLifeMonths },
    decayMark: FM,
    replaceMonths,
    replaceMark: CP,
    testMonths: test.months,
    testMark: test.mark,
    note,
  };
}

export const LAMP_LIFETIME: Record<LampTech, LampLifetime> = {
  t5: uvLamp(
    12,
    12,
    'T5 UVB tubes are usually replaced after about a year, by which time their UVB is about half of new.',
  ),
  t8: uvLamp(6, 6, 'T8 UVB tubes fade faster than T5 and are usually replaced every 6 months.'),
  compact: uvLamp(
    6,
    6,
    'Compact UVB lamps often lose half their UVB within 6–8 months; the shorter end is taken.',
  ),
  'mercury-vapour': uvLamp(
    6,
    6,
    'Self-ballasted mercury vapour lamps vary widely from lamp to lamp and many lose much of their UVB ' +
      'within months; the trade says replace every 6–12 months, so the shorter end is taken, and they are ' +
      'measured more often than tubes.',
    { months: 2, mark: FM },
  ),
  'metal-halide': uvLamp(12, 12, 'Metal halide UVB lamps are usually replaced after about a year.'),
  'led-uvb': uvLamp(
    24,
    null,
    'UVB LEDs are new and vary widely: there is no established replacement interval, so meter readings ' +
      'decide when to replace one.',
  ),
  halogen: HEAT_ONLY,
  incandescent: HEAT_ONLY,
  ceramic: { ...HEAT_ONLY, note: 'A heat emitter with no light or UVB: replace it when it fails.' },
};

/** The curve of a lamp that does not age (no UVB): output stays as new. */
export const NO_DECAY: DecayCurve = { points: [[0, 1]] };

export function lampLifetime(tech: LampTech): LampLifetime {
  return LAMP_LIFETIME[tech];
}

/** The technology's UVB ageing curve (NO_DECAY for lamps without UVB). */
export function techDecay(tech: LampTech): DecayCurve {
  return LAMP_LIFETIME[tech].decay ?? NO_DECAY;
}

/** The technology's half-life in months, or null for a lamp without UVB or with a tabulated curve. */
export function techHalfLifeMonths(tech: LampTech): number | null {
  const d = LAMP_LIFETIME[tech].decay;
  return d && 'halfLifeMonths' in d ? d.halfLifeMonths : null;
}

/** Where each lifetime figure of a technology comes from, one clause per figure. */
export function lifetimeSources(tech: LampTech): { decay: string; replace: string; test: string } {
  const l = LAMP_LIFETIME[tech];
  const half = techHalfLifeMonths(tech);
  return {
    decay:
      l.decay === null
        ? 'no UVB output to decay'
        : `${half !== null ? `half-life ${half} months` : 'ageing curve'} of ordinary use (${l.decayMark}); ${l.note}`,
    replace:
      l.replaceMonths !== null
        ? `typical replacement interval ${l.replaceMonths} months (${l.replaceMark}) — meter readings in the lamp log decide better`
        : l.decay !== null
          ? `no established replacement interval (${l.replaceMark}) — follow meter readings`
          : 'heat-only lamp: replace it when it fails',
    test:
      l.testMonths !== null
        ? `measure it with a UV meter every ${l.testMonths} months (${l.testMark})`
        : 'no UV to measure',
  };
}

/**
 * One paragraph of lifetime advice for a lamp: when to replace it and how often to measure it. `name` is
 * how the text calls it (default: the technology's label); `own` carries a catalogue entry's own figures
 * when they differ from the technology's (an edited entry), each null for "none".
 */
export function lifetimeSentence(
  tech: LampTech,
  name?: string,
  own?: { replaceMonths: number | null; halfLifeMonths: number | null },
): string {
  const l = LAMP_LIFETIME[tech];
  const who = name ?? `the ${lowerLabel(LAMP_TECHS[tech].label)}`;
  if (l.decay === null) return `Replace ${who} when it fails (it gives no UVB to fade).`;
  const replace = own ? own.replaceMonths : l.replaceMonths;
  const half = own ? own.halfLifeMonths : techHalfLifeMonths(tech);
  const mark = (m: LifetimeMark | null, tableValue: number | null, value: number | null) =>
    value === tableValue ? ` (${m})` : ' (the catalogue entry’s figure)';
  const day = `${ORDINARY_HOURS_PER_DAY}-hour days`;
  const when =
    replace !== null
      ? `Replace ${who} after about ${replace} months of ${day}${mark(l.replaceMark, l.replaceMonths, replace)}`
      : `There is no established replacement interval for ${who}${mark(l.replaceMark, l.replaceMonths, replace)}: replace it when the readings fall short`;
  const fade =
    half !== null
      ? `; its UVB falls to about half in ${half} months${mark(l.decayMark, techHalfLifeMonths(tech), half)}`
      : '';
  return (
    `${when}${fade}. Measure it with a UV meter every ${l.testMonths} months (${l.testMark}); ` +
    'the lamp log turns those readings into this lamp’s own replacement date.'
  );
}
