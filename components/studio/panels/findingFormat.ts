// Plain-language formatting of the engine's findings' numbers, in the user's units.
import {
  cToDisplay,
  cmToDisplay,
  formatNumber,
  lengthLabel,
  tempLabel,
  type LengthUnit,
  type TempUnit,
} from '../geometry/units';

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

/** Formats a finding number by the unit its key names (…C temperature, …Cm length, …Uvi, …Uw). */
export function formatFindingNumber(
  key: string,
  v: number,
  u: { length: LengthUnit; temp: TempUnit },
): { label: string; value: string } {
  if (/(TempC|C)$/.test(key) && !/Cm$/.test(key)) {
    return {
      label: humanKey(key.replace(/(Temp)?C$/, '') || 'temperature'),
      value: `${formatNumber(cToDisplay(v, u.temp), 1)} ${tempLabel(u.temp)}`,
    };
  }
  if (/Cm$/.test(key)) {
    return {
      label: humanKey(key.replace(/Cm$/, '')),
      value: `${formatNumber(cmToDisplay(v, u.length), 1)} ${lengthLabel(u.length)}`,
    };
  }
  if (/Uw$/.test(key))
    return { label: humanKey(key.replace(/Uw$/, '')), value: `${formatNumber(v, 0)} µW/cm²` };
  if (/Uvi$/i.test(key)) return { label: humanKey(key), value: formatNumber(v, 2) };
  if (/Months$/.test(key))
    return { label: humanKey(key.replace(/Months$/, '')), value: `${formatNumber(v, 0)} months` };
  if (/Fraction$|Share$/.test(key)) return { label: humanKey(key), value: `${formatNumber(v * 100, 0)} %` };
  return { label: humanKey(key), value: formatNumber(v, 2) };
}

export function unmetText(m: number | null | undefined, horizon: number): string {
  if (m === undefined) return 'Choose a species sheet to see how long the UV lasts.';
  if (m === null) return `The basking UV still meets this species’ need after ${horizon} months (estimate).`;
  if (m === 0) return 'The basking UV does not meet this species’ need even with new lamps.';
  return `The basking UV stops meeting this species’ need at month ${m} (estimate) — plan the lamp change before then.`;
}
