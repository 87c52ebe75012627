// A design's changed fields in words for the "what differs" table: units as a design stores them (cm,
// °C, months), shares as percentages, and the lamp's nested notes (its own decline curve, its
// calibration from the lamp log) as a phrase rather than their stored form.
import type { FieldChange } from '@/shared/designs/diff';
import { decayFactor, LAMP_TECHS, type DecayCurve } from '@/simulation';
import { calibrationDate } from '@/components/studio/state/calibration';

type FieldWords = {
  label: string;
  unit?: string;
  percent?: boolean;
  /** What an absent value means, when the default is worth naming. */
  unset?: string;
  /** Words for a value the table cannot show as a number or plain text. */
  words?: (v: unknown) => string | null;
};

const FIELD: Record<string, FieldWords> = {
  width: { label: 'width', unit: 'cm' },
  height: { label: 'height', unit: 'cm' },
  depth: { label: 'depth', unit: 'cm' },
  roomTempC: { label: 'room temperature', unit: '°C' },
  sectionZ: { label: 'side view from the front', unit: 'cm' },
  walls: { label: 'walls' },
  x: { label: 'x', unit: 'cm' },
  y: { label: 'y', unit: 'cm' },
  x1: { label: 'start x', unit: 'cm' },
  y1: { label: 'start y', unit: 'cm' },
  x2: { label: 'end x', unit: 'cm' },
  y2: { label: 'end y', unit: 'cm' },
  z: { label: 'depth from the front', unit: 'cm' },
  length: { label: 'length', unit: 'cm' },
  thickness: { label: 'thickness', unit: 'cm' },
  uvbAt30: { label: 'UVB at 30 cm', unit: 'µW/cm²' },
  uviPerUvb: { label: 'UV Index per µW/cm²' },
  reflectorGain: { label: 'reflector gain', unit: '×' },
  beamDeg: { label: 'beam', unit: '°' },
  watts: { label: 'power', unit: 'W' },
  ageMonths: { label: 'age', unit: 'months' },
  radiantFraction: { label: 'power given off as radiant heat', percent: true },
  uvbTransmission: { label: 'UVB let through', percent: true },
  irTransmission: { label: 'infrared let through', percent: true },
  tech: {
    label: 'technology',
    words: (v) => (typeof v === 'string' ? (LAMP_TECHS[v as keyof typeof LAMP_TECHS]?.label ?? v) : null),
  },
  form: { label: 'form' },
  name: { label: 'name' },
  decay: { label: 'output decline', unset: 'the technology’s usual curve', words: decayWords },
  calibration: {
    label: 'output figures',
    unset: 'the catalogue’s (not calibrated)',
    words: (v) => {
      if (!v || typeof v !== 'object') return null;
      const { at, from } = v as { at?: unknown; from?: unknown };
      if (typeof at !== 'string') return null;
      return `calibrated ${calibrationDate(at)}${typeof from === 'string' ? ` from ${from}` : ''}`;
    },
  },
};

/** A decline curve as what it means for the lamp: how much output is left a year on. */
function decayWords(v: unknown): string | null {
  if (!v || typeof v !== 'object') return null;
  const curve = v as DecayCurve;
  if ('halfLifeMonths' in curve && typeof curve.halfLifeMonths === 'number')
    return `halves every ${num(curve.halfLifeMonths)} months`;
  if ('points' in curve && Array.isArray(curve.points) && curve.points.length > 0) {
    const left = Math.round(decayFactor(curve, 12) * 100);
    return `this lamp’s own curve (${left} % left at 12 months)`;
  }
  return null;
}

const num = (v: number) => Number(v.toFixed(2)).toString();

/** One value of `field` in words (`precise`: numbers to 4 significant digits, not 2 decimals). */
export function valueText(v: unknown, field?: string, precise = false): string {
  const f = field ? FIELD[field] : undefined;
  if (v === undefined) return f?.unset ?? 'not set (default)';
  const worded = f?.words?.(v);
  if (worded) return worded;
  if (typeof v === 'number') {
    const n = (x: number) => (precise ? String(Number(x.toPrecision(4))) : num(x));
    if (f?.percent) return `${precise ? n(v * 100) : Number((v * 100).toFixed(1))} %`;
    return f?.unit ? `${n(v)} ${f.unit}` : n(v);
  }
  if (typeof v === 'string') return v;
  if (typeof v === 'boolean') return v ? 'yes' : 'no';
  // Not a field this table knows: say that it changed rather than print its stored form.
  return 'set';
}

/**
 * "age: 10.8 months → 0 months". Two numbers that differ but round alike (a lamp type's 0.0402 UVI per
 * µW/cm² against 0.04) are shown to more digits, so a change never reads "0.04 → 0.04".
 */
export function changeText(c: FieldChange): string {
  let a = valueText(c.a, c.field);
  let b = valueText(c.b, c.field);
  if (a === b && typeof c.a === 'number' && typeof c.b === 'number') {
    a = valueText(c.a, c.field, true);
    b = valueText(c.b, c.field, true);
  }
  return `${FIELD[c.field]?.label ?? c.field}: ${a} → ${b}`;
}

/** "54 cm right, 2 cm down". */
export function offsetText(dx: number, dy: number): string {
  const parts: string[] = [];
  const cm = (v: number) => `${Number(Math.abs(v).toFixed(1))} cm`;
  if (dx) parts.push(`${cm(dx)} ${dx > 0 ? 'right' : 'left'}`);
  if (dy) parts.push(`${cm(dy)} ${dy > 0 ? 'up' : 'down'}`);
  return parts.join(', ');
}
