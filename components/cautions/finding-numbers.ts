import type { Finding } from '@/simulation';
import type { SheetField, SpeciesSource } from '@/lib/species/schema';

/** Labels and units for the numbers behind each finding (the engine's keys). */
const LABELS: Record<string, { label: string; unit: string; decimals: number; temp?: boolean }> = {
  maxUvi: { label: 'Highest UV Index reached', unit: '', decimals: 1 },
  meanUvi: { label: 'Mean UV Index on the basking surface', unit: '', decimals: 1 },
  reachableMeanUvi: { label: 'Mean UV Index over reachable surfaces', unit: '', decimals: 2 },
  zoneMaxLo: { label: 'Zone basking range, from', unit: 'UVI', decimals: 1 },
  zoneMaxHi: { label: 'Zone basking range, to', unit: 'UVI', decimals: 1 },
  zoneMeanLo: { label: 'Zone mean range, from', unit: 'UVI', decimals: 1 },
  zoneMeanHi: { label: 'Zone mean range, to', unit: 'UVI', decimals: 1 },
  maxUvb: { label: 'UVB at the basking spot', unit: 'µW/cm²', decimals: 0 },
  refugeCm: { label: 'Reachable surface below the refuge level', unit: 'cm', decimals: 0 },
  refugeShare: { label: 'Share of reachable surface in UV-free shade', unit: '%', decimals: 0 },
  thresholdUvi: { label: 'UV-free below', unit: 'UVI', decimals: 1 },
  hotC: { label: 'Hottest reachable surface', unit: '°C', decimals: 1, temp: true },
  coolC: { label: 'Coolest reachable surface', unit: '°C', decimals: 1, temp: true },
  roomC: { label: 'Room temperature', unit: '°C', decimals: 1, temp: true },
  nightMinC: { label: 'Night minimum on the sheet', unit: '°C', decimals: 1, temp: true },
  reachCm: { label: 'Out-of-reach distance', unit: 'cm', decimals: 0 },
  eyeCm: { label: 'Eye-safety distance', unit: 'cm', decimals: 0 },
  closestCm: { label: 'Closest unguarded distance', unit: 'cm', decimals: 0 },
  lamps: { label: 'Lamps concerned', unit: '', decimals: 0 },
};

/** Range pairs shown as one line ("22–28 °C"). */
const PAIRS: [string, string, string, string][] = [
  ['targetLo', 'targetHi', 'Target on the species sheet', ''],
  ['zoneMaxLo', 'zoneMaxHi', 'Zone basking range', 'UVI'],
  ['zoneMeanLo', 'zoneMeanHi', 'Zone mean range', 'UVI'],
];

export type NumberLine = { key: string; label: string; value: string };

const fmt = (v: number, d: number) => (Math.round(v * 10 ** d) / 10 ** d).toString();

/** The numbers of a finding as labelled lines, ranges joined, in the engine's units. */
export function numberLines(f: Finding): NumberLine[] {
  const n = f.numbers;
  const used = new Set<string>(['zone']);
  const out: NumberLine[] = [];
  const targetUnit =
    f.id === 'basking-uvb' ? 'µW/cm²' : f.id === 'hot-spot' || f.id === 'cool-end' ? '°C' : '';
  for (const [lo, hi, label, unit] of PAIRS) {
    if (n[lo] === undefined || n[hi] === undefined) continue;
    used.add(lo).add(hi);
    const u = unit || targetUnit;
    out.push({ key: lo, label, value: `${fmt(n[lo]!, 1)}–${fmt(n[hi]!, 1)}${u ? ` ${u}` : ''}` });
  }
  for (const [key, v] of Object.entries(n)) {
    if (used.has(key)) continue;
    const meta = LABELS[key] ?? { label: key, unit: '', decimals: 2 };
    const value = meta.unit === '%' ? v * 100 : v;
    out.unshift({
      key,
      label: meta.label,
      value: `${fmt(value, meta.decimals)}${meta.unit ? ` ${meta.unit}` : ''}`,
    });
  }
  return out;
}

/** Which species-sheet figure a finding checks against. */
export const FINDING_SHEET_FIELD: Record<string, SheetField> = {
  'basking-uvi': 'uvZone',
  'uv-gradient': 'uvZone',
  'basking-uvb': 'uvbTargetUw',
  'hot-spot': 'baskingSurfaceC',
  'cool-end': 'coolAirC',
  'night-minimum': 'nightMinC',
};

/** The sheet's sources for the figure a finding is checked against. */
export function sourcesFor(findingId: string, sources: SpeciesSource[]): SpeciesSource[] {
  const field = FINDING_SHEET_FIELD[findingId];
  return field ? sources.filter((s) => s.covers.includes(field)) : [];
}
