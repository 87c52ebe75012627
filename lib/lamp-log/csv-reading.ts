import Papa from 'papaparse';
import { z } from 'zod';
import { MAX_CSV_ROWS } from '@/lib/uploads/limits';
import { displayToCm } from '@/shared/units';
import type { ReadingThrough, ReadingWarmedUp } from '@/shared/reading-setup';
import { readingFields } from './schemas';

/**
 * What every CSV of meter readings shares — the lamp log's readings import and the counter's import of
 * past tests: the file read with papaparse (header names case-insensitive, spaces and dashes as
 * underscores), the row limit, rows that do not fit the header, and one row's reading (when, distance and
 * its unit, value, meter kind, what lay between, warmed up, meter, note) checked with the same zod fields
 * as a typed-in reading. Every problem names its row (the header is row 1) and its column.
 */

export type CsvIssue = { row: number; field: string; message: string };

export const csvHeader = (h: string) =>
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

export const csvNumber = (raw: string | undefined) => {
  if (raw === undefined || raw.trim() === '') return undefined;
  // A decimal comma is common in meter exports from many countries.
  const n = Number(raw.trim().replace(/^(-?\d+),(\d+)$/, '$1.$2'));
  return Number.isFinite(n) ? n : Number.NaN;
};

export type CsvRecord = Record<string, string>;

/**
 * The file's header and records, or the issues that stop it before any row is read: columns missing
 * (`missing` names them, in order), more rows than MAX_CSV_ROWS; and the rows that do not fit the header.
 */
export function readCsv(
  text: string,
  missing: (has: (column: string) => boolean) => string[],
  expected: string,
  what = 'readings',
): { columns: string[]; records: CsvRecord[]; errors: CsvIssue[]; stop: boolean } {
  const parsed = Papa.parse<CsvRecord>(text.replace(/^\uFEFF/, ''), {
    header: true,
    skipEmptyLines: 'greedy',
    transformHeader: csvHeader,
  });
  const columns = parsed.meta.fields ?? [];
  const lacking = missing((c) => columns.includes(c));
  if (lacking.length > 0) {
    const message = `The header row lacks the column${lacking.length > 1 ? 's' : ''} ${lacking.join(', ')}. Expected: ${expected}.`;
    return { columns, records: [], errors: [{ row: 1, field: lacking[0]!, message }], stop: true };
  }
  if (parsed.data.length > MAX_CSV_ROWS) {
    const message = `At most ${MAX_CSV_ROWS} ${what} per file.`;
    return { columns, records: [], errors: [{ row: MAX_CSV_ROWS + 2, field: 'file', message }], stop: true };
  }
  const errors: CsvIssue[] = [];
  for (const e of parsed.errors) {
    if (e.row !== undefined && e.code !== 'UndetectableDelimiter') {
      errors.push({
        row: e.row + 2,
        field: 'row',
        message: `This row does not fit the header: ${e.message}.`,
      });
    }
  }
  return { columns, records: parsed.data, errors, stop: false };
}

/**
 * Calls `check` with each record that fits the header, its row number and a way to report a problem of
 * that row; then the rows `check` kept and every problem, in row order (a header with no rows is one).
 */
export function checkRows<R>(
  read: ReturnType<typeof readCsv>,
  what: string,
  check: (rec: CsvRecord, row: number, fail: (field: string, message: string) => undefined) => R | undefined,
): { rows: R[]; errors: CsvIssue[]; columns: string[] } {
  const { columns, errors } = read;
  const rows: R[] = [];
  if (read.stop) return { rows, errors, columns };
  const badRows = new Set(errors.map((e) => e.row));
  read.records.forEach((rec, i) => {
    const row = i + 2;
    if (badRows.has(row)) return;
    const kept = check(rec, row, (field, message) => {
      errors.push({ row, field, message });
      return undefined;
    });
    if (kept !== undefined) rows.push(kept);
  });
  if (rows.length === 0 && errors.length === 0) {
    errors.push({ row: 2, field: 'file', message: `The file has a header but no ${what}.` });
  }
  errors.sort((a, b) => a.row - b.row);
  return { rows, errors, columns };
}

/** The cell of a column, trimmed ('' when the column or the cell is missing). */
export const cell = (rec: CsvRecord, column: string) => rec[column]?.trim() ?? '';

/** When a row's reading was taken: `taken_at`, or `date` with an optional `time`. */
export function takenAtOf(rec: CsvRecord, tzOffsetMinutes: number): { when: string; at: Date | null } {
  const when = cell(rec, 'taken_at') || [cell(rec, 'date'), cell(rec, 'time')].filter(Boolean).join(' ');
  return { when, at: parseTakenAt(when, tzOffsetMinutes) };
}

export type CsvReading = z.output<z.ZodObject<typeof readingFields>> & { distanceCm: number };

/** A checked row's measurement as an import previews and then stores it (its time as ISO text). */
export type CsvMeasurement = {
  takenAt: string;
  distanceCm: number;
  value: number;
  unit: CsvReading['unit'];
  through: ReadingThrough;
  throughTransmission: number | null;
  warmedUp: ReadingWarmedUp;
  meter: string | null;
};

/** A checked reading's measurement, with the share through what lay between as the import settled it. */
export const csvMeasurement = (r: CsvReading, throughTransmission: number | null): CsvMeasurement => ({
  takenAt: r.takenAt.toISOString(),
  distanceCm: r.distanceCm,
  value: r.value,
  unit: r.unit,
  through: r.through,
  throughTransmission,
  warmedUp: r.warmedUp,
  meter: r.meter,
});

/** The columns a stored reading (of the lamp log or the counter) takes from a measurement. */
export const measurementColumns = (m: CsvMeasurement) => ({
  takenAt: new Date(m.takenAt),
  distanceCm: m.distanceCm,
  value: m.value,
  unit: m.unit,
  through: m.through,
  throughTransmission: m.throughTransmission,
  warmedUp: m.warmedUp,
  meter: m.meter,
});

/**
 * One row's reading checked as a typed-in one, or the issues with the columns they concern. The distance
 * is a `distance` column with `distance_unit` (cm by default, or in), or a `distance_cm` or `distance_in`
 * column; the unit and "through" and "warmed up" are understood in the common words for them.
 */
export function readingOfRow(
  rec: CsvRecord,
  takenAt: Date,
): { ok: true; reading: CsvReading } | { ok: false; issues: { field: string; message: string }[] } {
  let distance = csvNumber(rec.distance);
  let distanceUnit = (cell(rec, 'distance_unit') || 'cm').toLowerCase();
  if (distance === undefined && rec.distance_cm !== undefined) distance = csvNumber(rec.distance_cm);
  else if (distance === undefined && rec.distance_in !== undefined) {
    distance = csvNumber(rec.distance_in);
    distanceUnit = 'in';
  }
  const unitWord = cell(rec, 'unit').toLowerCase();
  const r = z.strictObject(readingFields).safeParse({
    takenAt,
    distance,
    distanceUnit: ['inch', 'inches', '"'].includes(distanceUnit) ? 'in' : distanceUnit,
    value: csvNumber(rec.value),
    unit: UNIT_WORDS[unitWord] ?? unitWord,
    through: THROUGH_WORDS[cell(rec, 'through').toLowerCase()] ?? cell(rec, 'through'),
    throughTransmission: csvNumber(rec.through_transmission) ?? null,
    warmedUp: WARM_WORDS[cell(rec, 'warmed_up').toLowerCase()] ?? cell(rec, 'warmed_up'),
    meter: cell(rec, 'meter') || null,
    note: cell(rec, 'note') || null,
  });
  if (r.success) {
    const distanceCm = Math.round(displayToCm(r.data.distance, r.data.distanceUnit) * 10) / 10;
    return { ok: true, reading: { ...r.data, distanceCm } };
  }
  return {
    ok: false,
    issues: r.error.issues.map((issue) => {
      const field = String(issue.path[0] ?? 'row');
      const column =
        {
          takenAt: 'taken_at',
          distanceUnit: 'distance_unit',
          throughTransmission: 'through_transmission',
          warmedUp: 'warmed_up',
        }[field] ?? field;
      const got = ['value', 'distance', 'through_transmission'].includes(column) ? rec[column] : undefined;
      return {
        field: column,
        message:
          got !== undefined && Number.isNaN(csvNumber(got)) ? `“${got}” is not a number.` : issue.message,
      };
    }),
  };
}
