import { z } from 'zod';
import { json, route } from '@/lib/api';
import { checkCsvSize, csvImportFields, rowErrorsResponse } from '@/lib/api/csv-import';
import { idSchema } from '@/lib/api/schemas';
import { enclosureFor } from '@/lib/enclosures/access';
import { importCsv, previewCsv } from '@/lib/lamp-log/csv-import';
import { MAX_CSV_IMPORT_BODY_BYTES } from '@/lib/uploads/limits';

const body = z.strictObject({
  enclosureId: idSchema('The enclosure'),
  ...csvImportFields,
});

export const POST = route({
  body,
  maxBodyBytes: MAX_CSV_IMPORT_BODY_BYTES,
  handler: async ({ body, user }) => {
    checkCsvSize(body.csv);
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
  },
});
