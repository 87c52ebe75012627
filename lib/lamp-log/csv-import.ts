import 'server-only';
import type { CurrentUser } from '@/lib/auth/session-user';
import { getSequelize } from '@/lib/db';
import { deleteObject } from '@/lib/storage/s3';
import { storeCsv } from '@/lib/uploads/mutations';
import { Lamp, Reading, type Enclosure, type Upload } from '@/models';
import { parseReadingsCsv, type CsvResult } from './csv';
import { measurementColumns } from './csv-reading';

export type { CsvResult };

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

export type ImportOutcome =
  | { ok: true; imported: number; uploadId: number; rows: CsvResult['rows'] }
  | { ok: false; result: CsvResult };

export async function importCsv(
  user: CurrentUser,
  enclosure: Enclosure,
  csv: string,
  opts: { tzOffsetMinutes: number; fileName: string | null },
): Promise<ImportOutcome> {
  const result = await previewCsv(enclosure, csv, opts.tzOffsetMinutes);
  if (result.errors.length > 0) return { ok: false, result };
  const sequelize = getSequelize();
  let stored: Upload | null = null;
  try {
    const upload = await sequelize.transaction(async (transaction) => {
      stored = await storeCsv(user, enclosure, csv, opts.fileName, transaction);
      await Reading.bulkCreate(
        result.rows.map((r) => ({
          lampId: r.lampId,
          ...measurementColumns(r),
          note: r.note,
          takenById: user.id,
          uploadId: stored!.id,
        })),
        { transaction, validate: true },
      );
      return stored;
    });
    return { ok: true, imported: result.rows.length, uploadId: upload.id, rows: result.rows };
  } catch (e) {
    // The transaction rolled back: take the stored file back out too.
    const key = (stored as Upload | null)?.storageKey;
    if (key) await deleteObject(key).catch(() => undefined);
    throw e;
  }
}
