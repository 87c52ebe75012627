import { personNameSchema } from '@/lib/api/schemas';
import {
  cell,
  checkRows,
  csvMeasurement,
  readCsv,
  readingOfRow,
  takenAtOf,
  type CsvIssue,
  type CsvMeasurement,
} from '@/lib/lamp-log/csv-reading';
import { throughShare } from '@/shared/reading-setup';

/**
 * Past counter tests from a CSV file (a shop's own records from before it used the counter), read with
 * the lamp log's CSV reading rules (lib/lamp-log/csv-reading.ts) and checked row by row before anything
 * is saved. Columns (header names case-insensitive; spaces and dashes count as underscores):
 *   customer      the customer's name (an existing customer of that name, else a new one); empty: a walk-in
 *   lamp_type     the lamp type's name in the organisation's catalogue, or its id
 *   first_use     the lamp's first switch-on, 2025-01-31
 *   date          when it was tested (or taken_at): 2025-03-01 or 2025-03-01 14:30, the uploader's time
 *   distance      with distance_unit cm (default) or in — or a distance_cm or distance_in column
 *   value, unit   the meter value and kind: uvb (µW/cm²) or uvi (UV Index)
 *   meter         optional: the meter, in your words
 *   through, through_transmission, warmed_up   optional, as in the readings import
 * Rows with the same customer, lamp type and first use are one lamp, tested on each row's date.
 */

export type CounterCsvType = { id: number; name: string };

export type CounterCsvRow = {
  row: number;
  customerName: string | null;
  lampTypeId: number;
  lampTypeName: string;
  firstUsedOn: string;
} & CsvMeasurement;

export type CounterCsvResult = { rows: CounterCsvRow[]; errors: CsvIssue[]; columns: string[] };

export const COUNTER_CSV_COLUMNS =
  'customer, lamp_type, first_use, date, distance, distance_unit, value, unit, meter, and optionally through, through_transmission, warmed_up';

const ISO_DAY = /^(\d{4})-(\d{2})-(\d{2})$/;
const validDay = (s: string) => {
  const m = ISO_DAY.exec(s);
  if (!m) return false;
  const d = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])));
  return d.getUTCMonth() === Number(m[2]) - 1 && d.getUTCDate() === Number(m[3]);
};

export function parseCounterCsv(
  text: string,
  types: readonly CounterCsvType[],
  tzOffsetMinutes = 0,
  today = new Date().toISOString().slice(0, 10),
): CounterCsvResult {
  const read = readCsv(
    text,
    (has) =>
      [
        has('customer') ? null : 'customer',
        has('lamp_type') ? null : 'lamp_type',
        has('first_use') || has('first_used') ? null : 'first_use',
        has('date') || has('taken_at') ? null : 'date',
        has('distance') || has('distance_cm') || has('distance_in') ? null : 'distance',
        has('value') ? null : 'value',
        has('unit') ? null : 'unit',
      ].filter((c): c is string => c !== null),
    COUNTER_CSV_COLUMNS,
    'tests',
  );
  const byName = new Map(types.map((t) => [t.name.trim().toLowerCase(), t]));
  return checkRows(read, 'tests', (rec, row, fail): CounterCsvRow | undefined => {
    // Whose lamp: a name, checked as a typed-in one; none is a walk-in.
    let customerName: string | null = null;
    if (cell(rec, 'customer') !== '') {
      const name = personNameSchema.safeParse(cell(rec, 'customer'));
      if (!name.success) return fail('customer', name.error.issues[0]!.message);
      customerName = name.data;
    }
    const ref = cell(rec, 'lamp_type');
    const type = /^\d+$/.test(ref)
      ? (types.find((t) => t.id === Number(ref)) ?? byName.get(ref.toLowerCase()))
      : byName.get(ref.toLowerCase());
    if (!type)
      return fail(
        'lamp_type',
        ref ? `No lamp type called “${ref}” in the catalogue.` : 'Say which lamp type (its catalogue name).',
      );
    const firstUse = cell(rec, 'first_use') || cell(rec, 'first_used');
    const firstColumn = read.columns.includes('first_use') ? 'first_use' : 'first_used';
    if (!validDay(firstUse)) return fail(firstColumn, `“${firstUse}” is not a date like 2025-01-31.`);
    if (firstUse > today) return fail(firstColumn, 'The first switch-on cannot be in the future.');
    const dateColumn = read.columns.includes('taken_at') ? 'taken_at' : 'date';
    const { when, at } = takenAtOf(rec, tzOffsetMinutes);
    if (!at) return fail(dateColumn, `“${when}” is not a date like 2025-03-01 or 2025-03-01 14:30.`);
    const checked = readingOfRow(rec, at);
    if (!checked.ok) {
      for (const issue of checked.issues)
        fail(issue.field === 'taken_at' ? dateColumn : issue.field, issue.message);
      return;
    }
    const r = checked.reading;
    if (r.takenAt.toISOString().slice(0, 10) < firstUse)
      return fail(dateColumn, `The lamp was first switched on ${firstUse}; this test is earlier.`);
    // A counter lamp has no lid setting of its own: a lid or screen must give its share.
    const share = throughShare(null, r.through, r.throughTransmission);
    if (!share.ok) return fail('through_transmission', share.message);
    return {
      row,
      customerName,
      lampTypeId: type.id,
      lampTypeName: type.name,
      firstUsedOn: firstUse,
      ...csvMeasurement(r, share.share),
    };
  });
}
