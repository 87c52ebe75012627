import { throughShare } from '@/shared/reading-setup';
import {
  cell,
  checkRows,
  csvMeasurement,
  parseTakenAt,
  readCsv,
  readingOfRow,
  takenAtOf,
  type CsvIssue,
  type CsvMeasurement,
} from './csv-reading';

/**
 * Readings from a CSV file: read by the rules every CSV of meter readings shares (./csv-reading.ts, also
 * the counter's import of past tests), every row checked the way a typed-in reading is, and every problem
 * reported with its row number (the header is row 1) before anything is saved.
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

export type CsvRow = { row: number; lampId: number; lampLabel: string } & CsvMeasurement & {
    note: string | null;
  };

export type { CsvIssue };
export { parseTakenAt };

export type CsvResult = { rows: CsvRow[]; errors: CsvIssue[]; columns: string[] };

export function parseReadingsCsv(text: string, lamps: readonly CsvLamp[], tzOffsetMinutes = 0): CsvResult {
  const read = readCsv(
    text,
    (has) =>
      [
        !has('taken_at') && !has('date') ? 'taken_at' : null,
        !(has('distance') || has('distance_cm') || has('distance_in')) ? 'distance' : null,
        !has('value') ? 'value' : null,
        !has('unit') ? 'unit' : null,
        !has('lamp') && lamps.length !== 1 ? 'lamp' : null,
      ].filter((c): c is string => c !== null),
    'lamp, taken_at, distance, distance_unit, value, unit, and optionally through, through_transmission, warmed_up, meter, note',
  );
  const byLabel = new Map(lamps.map((l) => [l.label.trim().toLowerCase(), l]));
  return checkRows(read, 'readings', (rec, row, fail): CsvRow | undefined => {
    // Which lamp.
    let lamp: CsvLamp | undefined;
    const ref = cell(rec, 'lamp');
    if (ref === '' && lamps.length === 1) lamp = lamps[0];
    else if (/^\d+$/.test(ref))
      lamp = lamps.find((l) => l.id === Number(ref)) ?? byLabel.get(ref.toLowerCase());
    else lamp = byLabel.get(ref.toLowerCase());
    if (!lamp) {
      fail('lamp', ref ? `No lamp called “${ref}” in this enclosure.` : 'Say which lamp (its name).');
      return;
    }
    // When.
    const { when, at: takenAt } = takenAtOf(rec, tzOffsetMinutes);
    if (!takenAt) {
      fail('taken_at', `“${when}” is not a date like 2025-03-01 or 2025-03-01 14:30.`);
      return;
    }
    // The reading, checked as a typed-in one.
    const checked = readingOfRow(rec, takenAt);
    if (!checked.ok) {
      for (const issue of checked.issues) fail(issue.field, issue.message);
      return;
    }
    const r = { data: checked.reading };
    if (r.data.takenAt.toISOString().slice(0, 10) < lamp.firstUsedOn) {
      fail('taken_at', `“${lamp.label}” was first used on ${lamp.firstUsedOn}; this reading is earlier.`);
      return;
    }
    const share = throughShare(lamp.baskingTransmission, r.data.through, r.data.throughTransmission);
    if (!share.ok) {
      fail('through_transmission', share.message);
      return;
    }
    return {
      row,
      lampId: lamp.id,
      lampLabel: lamp.label,
      ...csvMeasurement(r.data, share.share),
      note: r.data.note,
    };
  });
}
