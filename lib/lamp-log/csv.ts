import Papa from 'papaparse';
import { z } from 'zod';
import { MAX_CSV_ROWS } from '@/lib/uploads/limits';
import { displayToCm } from '@/shared/units';
import { throughShare, type ReadingThrough, type ReadingWarmedUp } from '@/shared/reading-setup';
import { readingFields } from './schemas';

/**
 * Readings from a CSV file: parsed with papaparse, every row checked the way a typed-in reading is, and
 * every problem reported with its row number (the header is row 1) before anything is saved.
 *
 * Columns (header names are case-insensitive; spaces and dashes count as underscores):
 *   lamp          the lamp's name in this enclosure, or its id (may be left out when there is one lamp)
 *   taken_at      2025-03-01, 2025-03-01 14:30 or an ISO time; times without an offset are the uploader's local time
 *   distance      number; with distance_unit cm (default) or in — or use a distance_cm / distance_in column
 *   value         the meter value
 *   unit          uvb (µW/cm²) or uvi (UV Index); "µW/cm²", "uW/cm2" and "UV Index" are understood
 *   meter, note   optional text (meter: the meter's own model or owner, in your words)
 *   through       optional: what was between lamp and meter — nothing, lid, screen or glass; left out or
 *                 empty: not recorded (read as the bare lamp)
 *   through_transmission  optional: share of UVB passing it, 0–1 (the lid: the lamp's own setting when
 *                 empty; a screen must give it)
 *   warmed_up     optional: yes or no (the lamp on for several minutes first); empty: not recorded
 */

export type CsvLamp = {
  id: number;
  label: string;
  firstUsedOn: string;
  baskingTransmission: number | null;
};

export type CsvRow = {
  row: number;
  lampId: number;
  lampLabel: string;
  takenAt: string;
  distanceCm: number;
  value: number;
  unit: 'uvb' | 'uvi';
  through: ReadingThrough;
  throughTransmission: number | null;
  warmedUp: ReadingWarmedUp;
  meter: string | null;
  note: string | null;
};

export type CsvIssue = { row: number; field: string; message: string };

export type CsvResult = { rows: CsvRow[]; errors: CsvIssue[]; columns: string[] };

const header = (h: string) =>
  h
    .replace(/^\uFEFF/, '')
    .trim()
    .toLowerCase()
    .replace(/[\s-]+/g, '_');

const UNIT_WORDS: Record<string, 'uvb' | 'uvi'> = {
  uvb: 'uvb',
  'µw/cm²': 'uvb',
  'µw/cm2': 'uvb',
  'uw/cm2': 'uvb',
  'uw/cm²': 'uvb',
  'μw/cm²': 'uvb',
  'μw/cm2': 'uvb',
  uvi: 'uvi',
  uv_index: 'uvi',
  'uv index': 'uvi',
  index: 'uvi',
};

const THROUGH_WORDS: Record<string, ReadingThrough> = {
  '': 'not-recorded',
  not_recorded: 'not-recorded',
  'not recorded': 'not-recorded',
  'not-recorded': 'not-recorded',
  nothing: 'nothing',
  none: 'nothing',
  bare: 'nothing',
  lid: 'lid',
  mesh: 'lid',
  screen: 'screen',
  glass: 'glass',
  acrylic: 'glass',
};

const WARM_WORDS: Record<string, ReadingWarmedUp> = {
  '': 'not-recorded',
  not_recorded: 'not-recorded',
  'not recorded': 'not-recorded',
  'not-recorded': 'not-recorded',
  yes: 'yes',
  y: 'yes',
  true: 'yes',
  no: 'no',
  n: 'no',
  false: 'no',
};

/** A local date-time without an offset, read in the uploader's time zone (minutes as Date#getTimezoneOffset). */
export function parseTakenAt(raw: string, tzOffsetMinutes: number): Date | null {
  const s = raw.trim();
  const local = /^(\d{4})-(\d{2})-(\d{2})(?:[ T](\d{1,2}):(\d{2})(?::(\d{2}))?)?$/.exec(s);
  if (local) {
    const [, y, mo, d, h, mi, se] = local;
    // A date alone is taken at noon, so no time zone can move it to another day.
    const hours = h === undefined ? 12 : Number(h);
    const utc = Date.UTC(Number(y), Number(mo) - 1, Number(d), hours, Number(mi ?? 0), Number(se ?? 0));
    const check = new Date(Date.UTC(Number(y), Number(mo) - 1, Number(d)));
    if (check.getUTCMonth() !== Number(mo) - 1 || check.getUTCDate() !== Number(d) || hours > 23) return null;
    return new Date(h === undefined ? utc : utc + tzOffsetMinutes * 60_000);
  }
  if (/^\d{4}-\d{2}-\d{2}T.+(Z|[+-]\d{2}:?\d{2})$/.test(s)) {
    const d = new Date(s);
    return Number.isNaN(d.getTime()) ? null : d;
  }
  return null;
}

const number = (raw: string | undefined) => {
  if (raw === undefined || raw.trim() === '') return undefined;
  // A decimal comma is common in meter exports from many countries.
  const n = Number(raw.trim().replace(/^(-?\d+),(\d+)$/, '$1.$2'));
  return Number.isFinite(n) ? n : Number.NaN;
};

export function parseReadingsCsv(text: string, lamps: readonly CsvLamp[], tzOffsetMinutes = 0): CsvResult {
  const parsed = Papa.parse<Record<string, string>>(text.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: header,
  });
  const columns = parsed.meta.fields ?? [];
  const errors: CsvIssue[] = [];
  const rows: CsvRow[] = [];
  const need = (c: string) => columns.includes(c);
  const hasDistance = need('distance') || need('distance_cm') || need('distance_in');
  const missing = [
    !need('taken_at') && !need('date') ? 'taken_at' : null,
    !hasDistance ? 'distance' : null,
    !need('value') ? 'value' : null,
    !need('unit') ? 'unit' : null,
    !need('lamp') && lamps.length !== 1 ? 'lamp' : null,
  ].filter((c): c is string => c !== null);
  if (missing.length > 0) {
    errors.push({
      row: 1,
      field: missing[0]!,
      message: `The header row lacks the column${missing.length > 1 ? 's' : ''} ${missing.join(', ')}. Expected: lamp, taken_at, distance, distance_unit, value, unit, and optionally through, through_transmission, warmed_up, meter, note.`,
    });
    return { rows, errors, columns };
  }
  if (parsed.data.length > MAX_CSV_ROWS) {
    errors.push({
      row: MAX_CSV_ROWS + 2,
      field: 'file',
      message: `At most ${MAX_CSV_ROWS} readings per file.`,
    });
    return { rows, errors, columns };
  }
  for (const e of parsed.errors) {
    if (e.row !== undefined && e.code !== 'UndetectableDelimiter') {
      errors.push({
        row: e.row + 2,
        field: 'row',
        message: `This row does not fit the header: ${e.message}.`,
      });
    }
  }
  const badRows = new Set(errors.map((e) => e.row));
  const byLabel = new Map(lamps.map((l) => [l.label.trim().toLowerCase(), l]));
  parsed.data.forEach((rec, i) => {
    const row = i + 2;
    if (badRows.has(row)) return;
    const at = (k: string) => rec[k]?.trim() ?? '';
    const fail = (field: string, message: string) => errors.push({ row, field, message });
    // Which lamp.
    let lamp: CsvLamp | undefined;
    const ref = at('lamp');
    if (ref === '' && lamps.length === 1) lamp = lamps[0];
    else if (/^\d+$/.test(ref))
      lamp = lamps.find((l) => l.id === Number(ref)) ?? byLabel.get(ref.toLowerCase());
    else lamp = byLabel.get(ref.toLowerCase());
    if (!lamp) {
      fail('lamp', ref ? `No lamp called “${ref}” in this enclosure.` : 'Say which lamp (its name).');
      return;
    }
    // When.
    const when = at('taken_at') || [at('date'), at('time')].filter(Boolean).join(' ');
    const takenAt = parseTakenAt(when, tzOffsetMinutes);
    if (!takenAt) {
      fail('taken_at', `“${when}” is not a date like 2025-03-01 or 2025-03-01 14:30.`);
      return;
    }
    // How far, in which unit.
    let distance = number(rec.distance);
    let distanceUnit = (at('distance_unit') || 'cm').toLowerCase();
    if (distance === undefined && rec.distance_cm !== undefined) distance = number(rec.distance_cm);
    else if (distance === undefined && rec.distance_in !== undefined) {
      distance = number(rec.distance_in);
      distanceUnit = 'in';
    }
    const unitWord = at('unit').toLowerCase();
    const unit = UNIT_WORDS[unitWord] ?? (unitWord as 'uvb');
    const r = z.strictObject(readingFields).safeParse({
      takenAt,
      distance,
      distanceUnit: ['inch', 'inches', '"'].includes(distanceUnit) ? 'in' : distanceUnit,
      value: number(rec.value),
      unit,
      through: THROUGH_WORDS[at('through').toLowerCase()] ?? at('through'),
      throughTransmission: number(rec.through_transmission) ?? null,
      warmedUp: WARM_WORDS[at('warmed_up').toLowerCase()] ?? at('warmed_up'),
      meter: at('meter') || null,
      note: at('note') || null,
    });
    if (!r.success) {
      for (const issue of r.error.issues) {
        const field = String(issue.path[0] ?? 'row');
        const column =
          {
            takenAt: 'taken_at',
            distanceUnit: 'distance_unit',
            throughTransmission: 'through_transmission',
            warmedUp: 'warmed_up',
          }[field] ?? field;
        const got = ['value', 'distance', 'through_transmission'].includes(column) ? rec[column] : undefined;
        fail(
          column,
          got !== undefined && Number.isNaN(number(got)) ? `“${got}” is not a number.` : issue.message,
        );
      }
      return;
    }
    if (r.data.takenAt.toISOString().slice(0, 10) < lamp.firstUsedOn) {
      fail('taken_at', `“${lamp.label}” was first used on ${lamp.firstUsedOn}; this reading is earlier.`);
      return;
    }
    const share = throughShare(lamp.baskingTransmission, r.data.through, r.data.throughTransmission);
    if (!share.ok) {
      fail('through_transmission', share.message);
      return;
    }
    rows.push({
      row,
      lampId: lamp.id,
      lampLabel: lamp.label,
      takenAt: r.data.takenAt.toISOString(),
      distanceCm: Math.round(displayToCm(r.data.distance, r.data.distanceUnit) * 10) / 10,
      value: r.data.value,
      unit: r.data.unit,
      through: r.data.through,
      throughTransmission: share.share,
      warmedUp: r.data.warmedUp,
      meter: r.data.meter,
      note: r.data.note,
    });
  });
  if (rows.length === 0 && errors.length === 0) {
    errors.push({ row: 2, field: 'file', message: 'The file has a header but no readings.' });
  }
  errors.sort((a, b) => a.row - b.row);
  return { rows, errors, columns };
}
