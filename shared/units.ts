// Units, the one module for both sides (pages, the studio, the server's reports and exports). Everything
// is stored in centimetres and °C so that a stored design never depends on who drew it; only what a
// person sees and types is converted.

export const LENGTH_UNITS = ['cm', 'in'] as const;
export const TEMP_UNITS = ['C', 'F'] as const;
export type LengthUnit = (typeof LENGTH_UNITS)[number];
export type TempUnit = (typeof TEMP_UNITS)[number];

/** The units one reader sees lengths and temperatures in. */
export interface DisplayUnits {
  length: LengthUnit;
  temp: TempUnit;
}

export const CM_PER_IN = 2.54; // exact, by definition of the international inch

export function cmToDisplay(cm: number, unit: LengthUnit): number {
  return unit === 'cm' ? cm : cm / CM_PER_IN;
}

export function displayToCm(value: number, unit: LengthUnit): number {
  return unit === 'cm' ? value : value * CM_PER_IN;
}

export function cToDisplay(c: number, unit: TempUnit): number {
  return unit === 'C' ? c : (c * 9) / 5 + 32;
}

export function displayToC(value: number, unit: TempUnit): number {
  return unit === 'C' ? value : ((value - 32) * 5) / 9;
}

/** A temperature difference (a range width, not a reading): no offset. */
export function cDeltaToDisplay(dc: number, unit: TempUnit): number {
  return unit === 'C' ? dc : (dc * 9) / 5;
}

/** Rounds for display without trailing zeros ("12.5", "12", "0.04"). */
export function roundTo(value: number, decimals: number): number {
  const f = 10 ** decimals;
  return Math.round(value * f) / f;
}

export function formatNumber(value: number, decimals = 1): string {
  if (!Number.isFinite(value)) return '–';
  const r = roundTo(value, decimals);
  // Avoid "-0".
  return (Object.is(r, -0) ? 0 : r).toString();
}

export function lengthLabel(unit: LengthUnit): string {
  return unit === 'cm' ? 'cm' : 'in';
}

export function tempLabel(unit: TempUnit): string {
  return unit === 'C' ? '°C' : '°F';
}

export function formatLength(cm: number, unit: LengthUnit, decimals = 1): string {
  return `${formatNumber(cmToDisplay(cm, unit), decimals)} ${lengthLabel(unit)}`;
}

/** A length in a table or a summary, where a whole centimetre (a tenth of an inch) is precise enough. */
export function formatLengthRounded(cm: number, unit: LengthUnit): string {
  return formatLength(cm, unit, unit === 'cm' ? 0 : 1);
}

/** "120 × 60 × 45 cm": an enclosure's size in one unit. */
export function formatSize(w: number, h: number, d: number, unit: LengthUnit): string {
  const decimals = unit === 'cm' ? 0 : 1;
  const dims = [w, h, d].map((v) => formatNumber(cmToDisplay(v, unit), decimals));
  return `${dims.join(' × ')} ${lengthLabel(unit)}`;
}

export function formatTemp(c: number, unit: TempUnit, decimals = 1): string {
  return `${formatNumber(cToDisplay(c, unit), decimals)} ${tempLabel(unit)}`;
}

/** Decimals that keep the input precise enough in the display unit (inches need one more). */
export function lengthDecimals(unit: LengthUnit): number {
  return unit === 'cm' ? 1 : 2;
}

// For readers whose units we do not know (a share link's visitor, a printed report): metric first, as the
// design stores it, then the imperial equivalent in brackets.

/** "35.2 °C (95.4 °F)". */
export function tempBoth(c: number): string {
  return `${formatTemp(c, 'C')} (${formatTemp(c, 'F')})`;
}

/** "120 × 60 × 60 cm (47.2 × 23.6 × 23.6 in)". */
export function sizeBoth(size: { width: number; height: number; depth: number }): string {
  const dims = [size.width, size.height, size.depth];
  const cm = dims.map((v) => formatNumber(v, 1)).join(' × ');
  const inches = dims.map((v) => formatNumber(cmToDisplay(v, 'in'), 1)).join(' × ');
  return `${cm} cm (${inches} in)`;
}

type RulerEnds = { a: { x: number; y: number }; b: { x: number; y: number } };

/** The ruler's reading: its length, horizontal and vertical parts, and angle, each formatted. */
export function rulerParts(ruler: RulerEnds, unit: LengthUnit) {
  const dx = ruler.b.x - ruler.a.x;
  const dy = ruler.b.y - ruler.a.y;
  return {
    length: formatLength(Math.hypot(dx, dy), unit),
    across: formatLength(Math.abs(dx), unit),
    up: formatLength(Math.abs(dy), unit),
    angle: `${formatNumber((Math.atan2(dy, dx) * 180) / Math.PI, 0)}°`,
  };
}

/** The ruler's label on the canvas. */
export function rulerText(ruler: RulerEnds, unit: LengthUnit): string {
  const r = rulerParts(ruler, unit);
  return `${r.length}  (${r.across} across, ${r.up} up)  ${r.angle}`;
}
