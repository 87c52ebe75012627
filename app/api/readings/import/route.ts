import { json } from '@/lib/api';
import { csvImportRoute, rowErrorsResponse } from '@/lib/api/csv-import';
import { idSchema } from '@/lib/api/schemas';
import { enclosureFor } from '@/lib/enclosures/access';
import { importCsv, previewCsv } from '@/lib/lamp-log/csv-import';

/** Readings of an enclosure's lamps from a CSV file: a preview (nothing saved) or the import of every row, or none. */
export const POST = csvImportRoute({ enclosureId: idSchema('The enclosure') }, async ({ body, user }) => {
  const enclosure = await enclosureFor(user, body.enclosureId, body.commit ? 'update' : 'read');
  if (!body.commit) {
    const result = await previewCsv(enclosure, body.csv, body.tzOffsetMinutes);
    return { ok: result.errors.length === 0, total: result.rows.length + result.errors.length, ...result };
  }
  const outcome = await importCsv(user, enclosure, body.csv, {
    tzOffsetMinutes: body.tzOffsetMinutes,
    fileName: body.fileName ?? null,
  });
  if (!outcome.ok) return rowErrorsResponse(outcome.result.errors);
  const { imported, uploadId, rows } = outcome;
  return json({ imported, uploadId, rows }, 201);
});
