import { cToDisplay, displayToC, formatNumber, type TempUnit } from '@/shared/units';
import type { SpeciesInput, SpeciesSheetDto, SpeciesSource } from '@/lib/species/schema';

/**
 * The species form's state: what the person typed, as text, with temperatures in the unit they typed
 * them in. Converting to the API's shape (°C numbers, nulls for empty optional fields) happens once, on
 * submit, so a half-typed "12." is never rewritten under the cursor.
 */

export const TEMP_RANGES = ['baskingSurfaceC', 'warmAirC', 'coolAirC'] as const;
export type TempRangeField = (typeof TEMP_RANGES)[number];
type Pair = { min: string; max: string };

export type SpeciesFormState = {
  unit: TempUnit;
  commonName: string;
  scientificName: string;
  uvZone: string;
  uvbTargetUw: Pair;
  temps: Record<TempRangeField, Pair>;
  nightMin: string;
  photoperiodH: Pair;
  /** Adult total length, cm, as typed. */
  adultLength: string;
  climbs: boolean;
  lowMelanin: boolean;
  notes: string;
  sources: SpeciesSource[];
};

const show = (c: number, unit: TempUnit) => formatNumber(cToDisplay(c, unit), 1);
const pairOf = (r: { min: number; max: number } | null, f: (n: number) => string = String): Pair =>
  r ? { min: f(r.min), max: f(r.max) } : { min: '', max: '' };

export function initialState(sheet: SpeciesSheetDto | null, unit: TempUnit): SpeciesFormState {
  const temp = (r: { min: number; max: number } | undefined) => pairOf(r ?? null, (c) => show(c, unit));
  return {
    unit,
    commonName: sheet?.commonName ?? '',
    scientificName: sheet?.scientificName ?? '',
    uvZone: sheet ? String(sheet.uvZone) : '',
    uvbTargetUw: pairOf(sheet?.uvbTargetUw ?? null),
    temps: {
      baskingSurfaceC: temp(sheet?.baskingSurfaceC),
      warmAirC: temp(sheet?.warmAirC),
      coolAirC: temp(sheet?.coolAirC),
    },
    nightMin: sheet?.nightMinC != null ? show(sheet.nightMinC, unit) : '',
    photoperiodH: pairOf(sheet?.photoperiodH ?? null),
    adultLength: sheet?.adultLengthCm != null ? String(sheet.adultLengthCm) : '',
    climbs: sheet?.climbs ?? false,
    lowMelanin: sheet?.lowMelanin ?? false,
    notes: sheet?.notes ?? '',
    sources: sheet?.sources ?? [{ citation: '', confidence: '', covers: [] }],
  };
}

function convertText(text: string, from: TempUnit, to: TempUnit): string {
  const v = Number(text);
  if (text.trim() === '' || !Number.isFinite(v) || from === to) return text;
  return formatNumber(cToDisplay(displayToC(v, from), to), 1);
}

/** The same state shown in another temperature unit. */
export function withUnit(s: SpeciesFormState, unit: TempUnit): SpeciesFormState {
  if (s.unit === unit) return s;
  const conv = (p: Pair): Pair => ({
    min: convertText(p.min, s.unit, unit),
    max: convertText(p.max, s.unit, unit),
  });
  return {
    ...s,
    unit,
    temps: {
      baskingSurfaceC: conv(s.temps.baskingSurfaceC),
      warmAirC: conv(s.temps.warmAirC),
      coolAirC: conv(s.temps.coolAirC),
    },
    nightMin: convertText(s.nightMin, s.unit, unit),
  };
}

/** Text to a number: empty stays empty (null), anything unreadable becomes NaN for the schema to name. */
const num = (t: string): number | null => (t.trim() === '' ? null : Number(t.trim().replace(',', '.')));
const toC = (t: string, unit: TempUnit) => {
  const v = num(t);
  return v === null || Number.isNaN(v) ? v : Math.round(displayToC(v, unit) * 100) / 100;
};
const optionalPair = (p: Pair, f: (t: string) => number | null) => {
  const min = f(p.min);
  const max = f(p.max);
  return min === null && max === null ? null : { min, max };
};

/** The request body (before validation) for the API. */
export function toPayload(s: SpeciesFormState): Record<keyof SpeciesInput, unknown> {
  const temp = (p: Pair) => ({ min: toC(p.min, s.unit), max: toC(p.max, s.unit) });
  return {
    commonName: s.commonName,
    scientificName: s.scientificName,
    uvZone: num(s.uvZone),
    uvbTargetUw: optionalPair(s.uvbTargetUw, num),
    baskingSurfaceC: temp(s.temps.baskingSurfaceC),
    warmAirC: temp(s.temps.warmAirC),
    coolAirC: temp(s.temps.coolAirC),
    nightMinC: toC(s.nightMin, s.unit),
    photoperiodH: optionalPair(s.photoperiodH, num),
    adultLengthCm: num(s.adultLength),
    climbs: s.climbs,
    lowMelanin: s.lowMelanin,
    notes: s.notes.trim() === '' ? null : s.notes,
    sources: s.sources.filter((x) => x.citation.trim() !== '' || x.confidence.trim() !== ''),
  };
}
