import 'server-only';
import { ApiError, json } from '@/lib/api';
import type { CurrentUser } from '@/lib/auth/session-user';
import { getSequelize } from '@/lib/db';
import { deleteObject } from '@/lib/storage/s3';
import { storeCsv } from '@/lib/uploads/service';
import { Lamp, Reading, type Enclosure, type Upload } from '@/models';
import { parseReadingsCsv, type CsvResult } from './csv';

/**
 * CSV import in two steps: a preview (every row checked, nothing saved) and the import, which checks
 * again and then saves every row — with the file itself — in one transaction, or nothing at all.
 */

export async function csvLampsOf(enclosure: Enclosure) {
  const lamps = await Lamp.findAll({ where: { enclosureId: enclosure.id }, order: [['id', 'ASC']] });
  return lamps.map((l) => ({
    id: l.id,
    label: l.label,
    firstUsedOn: l.firstUsedOn,
    baskingTransmission: l.baskingTransmission ?? null,
  }));
}

export async function previewCsv(
  enclosure: Enclosure,
  csv: string,
  tzOffsetMinutes: number,
): Promise<CsvResult> {
  return parseReadingsCsv(csv, await csvLampsOf(enclosure), tzOffsetMinutes);
}

export function rowErrorsResponse(result: CsvResult): Response {
  const first = result.errors[0]!;
  return json(
    {
      error: {
        code: 'invalid',
        message: `Nothing was imported: ${result.errors.length} row${result.errors.length > 1 ? 's have' : ' has'} a problem. Row ${first.row}: ${first.message}`,
        field: `rows[${first.row}].${first.field}`,
        issues: result.errors.map((e) => ({ field: `rows[${e.row}].${e.field}`, message: e.message })),
      },
      errors: result.errors,
    },
    400,
  );
}

export async function importCsv(
  user: CurrentUser,
  enclosure: Enclosure,
  csv: string,
  opts: { tzOffsetMinutes: number; fileName: string | null },
): Promise<Response> {
  const result = await previewCsv(enclosure, csv, opts.tzOffsetMinutes);
  if (result.errors.length > 0) return rowErrorsResponse(result);
  const sequelize = getSequelize();
  let stored: Upload | null = null;
  try {
    const upload = await sequelize.transaction(async (transaction) => {
      stored = await storeCsv(user, enclosure, csv, opts.fileName, transaction);
      await Reading.bulkCreate(
        result.rows.map((r) => ({
          lampId: r.lampId,
          takenAt: new Date(r.takenAt),
          distanceCm: r.distanceCm,
          value: r.value,
          unit: r.unit,
          through: r.through,
          throughTransmission: r.throughTransmission,
          warmedUp: r.warmedUp,
          meter: r.meter,
          note: r.note,
          takenById: user.id,
          uploadId: stored!.id,
        })),
        { transaction, validate: true },
      );
      return stored;
    });
    return json({ imported: result.rows.length, uploadId: upload.id, rows: result.rows }, 201);
  } catch (e) {
    // The transaction rolled back: take the stored file back out too.
    const key = (stored as Upload | null)?.storageKey;
    if (key) await deleteObject(key).catch(() => undefined);
    if (e instanceof ApiError) throw e;
    throw e;
  }
}
