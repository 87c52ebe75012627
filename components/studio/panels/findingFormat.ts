// Plain-language formatting of the engine's findings in the user's units. The engine writes its
// messages and numbers in cm and °C, the units a design is stored in; everything the studio shows goes through here.
import {
  cmToDisplay,
  cToDisplay,
  formatLength,
  formatNumber,
  formatTemp,
  lengthDecimals,
  lengthLabel,
  tempLabel,
  type DisplayUnits,
} from '@/shared/units';

export type FindingUnits = DisplayUnits;

/** "baskingMeanUvi" → "Basking mean UVI". */
export function humanKey(key: string): string {
  const bound = /Lo$/.test(key) ? ', lower bound' : /Hi$/.test(key) ? ', upper bound' : '';
  const words = key
    .replace(/(Lo|Hi)$/, '')
    .replace(/Uvi/g, ' UVI')
    .replace(/Uvb/g, ' UVB')
    .replace(/([a-z])([A-Z])/g, '$1 $2')
    .replace(/\s+/g, ' ')
    .trim()
    .split(' ');
  const out = words.map((w, i) => (w === 'UVI' || w === 'UVB' ? w : i === 0 ? w : w.toLowerCase()));
  const s = out.join(' ') + bound;
  return s.charAt(0).toUpperCase() + s.slice(1);
}

/** Plain names for the engine's keys (simulation/assess); other keys are named from the key itself. */
const KEY_LABELS: Record<string, string> = {
  hotC: 'Hottest reachable surface',
  coolC: 'Coolest reachable surface',
  roomC: 'Room temperature',
  nightMinC: 'Night minimum on the sheet',
  maxUvi: 'Highest UVI reached',
  meanUvi: 'Mean UVI on the basking surface',
  reachableMeanUvi: 'Mean UVI over reachable surfaces',
  maxUvb: 'UVB at the basking spot',
  zone: 'UV zone of the species',
  refugeCm: 'Reachable surface in UV-free shade',
  refugeShare: 'Share of reachable surface in UV-free shade',
  thresholdUvi: 'UV-free below UVI',
  reachCm: 'Out-of-reach distance',
  eyeCm: 'Eye-safety distance',
  closestCm: 'Closest unguarded distance',
  lamps: 'Lamps concerned',
  overlapCm: 'Basking spot with UV and heat together',
  neededCm: 'Basking spot the animal needs',
  uvSpotCm: 'Longest stretch in the UV range',
  heatSpotCm: 'Longest stretch at basking heat',
  limitC: 'General limit for burns',
};

const temp = (c: number, u: FindingUnits) => formatTemp(c, u.temp);
const length = (cm: number, u: FindingUnits) => formatLength(cm, u.length, lengthDecimals(u.length));

/** What the engine's unit-less keys `targetLo`/`targetHi` measure, by finding. */
function targetKind(findingId: string | undefined): 'temp' | 'uvb' | 'plain' {
  if (findingId === 'hot-spot' || findingId === 'cool-end' || findingId === 'shared-basking') return 'temp';
  if (findingId === 'basking-uvb') return 'uvb';
  return 'plain';
}

/**
 * Formats a finding number by the unit its key names (…C temperature, …Cm length, …Uvi, …Uw), or, for
 * the sheet's target bounds, by the finding it belongs to.
 */
export function formatFindingNumber(
  key: string,
  v: number,
  u: FindingUnits,
  findingId?: string,
): { label: string; value: string } {
  const f = formatByKey(key, v, u, findingId);
  return { label: KEY_LABELS[key] ?? f.label, value: f.value };
}

function formatByKey(
  key: string,
  v: number,
  u: FindingUnits,
  findingId?: string,
): { label: string; value: string } {
  if (key === 'targetLo' || key === 'targetHi') {
    const label = `Target on the species sheet, ${key === 'targetLo' ? 'from' : 'to'}`;
    const kind = targetKind(findingId);
    if (kind === 'temp') return { label, value: temp(v, u) };
    if (kind === 'uvb') return { label, value: `${formatNumber(v, 0)} µW/cm²` };
    return { label, value: formatNumber(v, 2) };
  }
  if (/(TempC|C)$/.test(key) && !/Cm$/.test(key)) {
    return { label: humanKey(key.replace(/(Temp)?C$/, '') || 'temperature'), value: temp(v, u) };
  }
  if (/Cm$/.test(key)) return { label: humanKey(key.replace(/Cm$/, '')), value: length(v, u) };
  if (/Uw$/.test(key))
    return { label: humanKey(key.replace(/Uw$/, '')), value: `${formatNumber(v, 0)} µW/cm²` };
  if (/Uvb$/.test(key)) return { label: humanKey(key), value: `${formatNumber(v, 0)} µW/cm²` };
  if (/Uvi$/i.test(key)) return { label: humanKey(key), value: formatNumber(v, 2) };
  if (/Months$/.test(key))
    return { label: humanKey(key.replace(/Months$/, '')), value: `${formatNumber(v, 0)} months` };
  if (/Fraction$|Share$/.test(key)) return { label: humanKey(key), value: `${formatNumber(v * 100, 0)} %` };
  return { label: humanKey(key), value: formatNumber(v, 2) };
}

/** Range pairs the engine sends as `…Lo` / `…Hi`, shown as one line ("40–45 °F"). */
const PAIR_LABELS: Record<string, string> = {
  target: 'Target on the species sheet',
  zoneMax: 'Zone range of the basking UVI',
  zoneMean: 'Zone range of the mean UVI',
  uvi: 'Basking UVI range',
};

/** The numbers behind a finding as labelled lines in the user's units, `…Lo`/`…Hi` pairs joined. */
export function findingNumberLines(
  findingId: string,
  numbers: Record<string, number>,
  u: FindingUnits,
): { label: string; value: string }[] {
  const out: { label: string; value: string }[] = [];
  const used = new Set<string>();
  for (const [key, v] of Object.entries(numbers)) {
    if (used.has(key)) continue;
    const prefix = /^(.*)Lo$/.exec(key)?.[1];
    const hi = prefix !== undefined ? numbers[`${prefix}Hi`] : undefined;
    if (prefix !== undefined && hi !== undefined) {
      used.add(`${prefix}Hi`);
      const a = formatFindingNumber(key, v, u, findingId).value;
      const b = formatFindingNumber(`${prefix}Hi`, hi, u, findingId).value;
      // "40 °F" and "45 °F" → "40–45 °F": the unit once, after the range.
      const unit = / (.+)$/.exec(b)?.[1];
      const from = unit && a.endsWith(` ${unit}`) ? a.slice(0, -unit.length - 1) : a;
      out.push({ label: PAIR_LABELS[prefix] ?? `${humanKey(prefix)} range`, value: `${from}–${b}` });
      continue;
    }
    out.push(formatFindingNumber(key, v, u, findingId));
  }
  return out;
}

const NUM = String.raw`(-?\d+(?:\.\d+)?)`;
// "43.8 °C", "40.0–45.0 °C" (a range shares one unit).
const TEMP_IN_TEXT = new RegExp(`${NUM}(?:\\s*[–-]\\s*${NUM})?\\s*°C`, 'g');
// "30 cm", "10–20 cm"; never the "cm" of µW/cm².
const LENGTH_IN_TEXT = new RegExp(`${NUM}(?:\\s*[–-]\\s*${NUM})?\\s*cm(?![²\\w])`, 'g');

/** "a unit", or "a–b unit" (a range shares one unit), each number shown by `f`. */
const rangeText = (a: string, b: string | undefined, f: (s: string) => string, unit: string) =>
  `${b === undefined ? f(a) : `${f(a)}–${f(b)}`} ${unit}`;

/**
 * Rewrites the temperatures and lengths inside an engine message into the user's units
 * ("about 43.8 °C" → "about 110.8 °F"; "within 15 cm" → "within 5.91 in"). Other numbers (UVI, µW/cm²,
 * percentages) have no unit to convert and are left alone.
 */
export function localiseFindingText(message: string, u: FindingUnits): string {
  let out = message;
  if (u.temp !== 'C') {
    const f = (s: string) => formatNumber(cToDisplay(Number(s), u.temp), 1);
    out = out.replace(TEMP_IN_TEXT, (_m, a: string, b?: string) => rangeText(a, b, f, tempLabel(u.temp)));
  }
  if (u.length !== 'cm') {
    const f = (s: string) => formatNumber(cmToDisplay(Number(s), u.length), 1);
    out = out.replace(LENGTH_IN_TEXT, (_m, a: string, b?: string) =>
      rangeText(a, b, f, lengthLabel(u.length)),
    );
  }
  return out;
}

export function unmetText(m: number | null | undefined, horizon: number): string {
  if (m === undefined) return 'Choose a species sheet to see how long the UV lasts.';
  if (m === null) return `The basking UV still meets this species’ need after ${horizon} months (estimate).`;
  if (m === 0) return 'The basking UV does not meet this species’ need even with new lamps.';
  return `The basking UV stops meeting this species’ need at month ${m} (estimate) — plan the lamp change before then.`;
}
