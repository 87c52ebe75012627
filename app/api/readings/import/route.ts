import { z } from 'zod';
import { json, route } from '@/lib/api';
import { checkCsvSize, rowErrorsResponse } from '@/lib/api/csv-import';
import { idSchema } from '@/lib/api/schemas';
import { enclosureFor } from '@/lib/enclosures/access';
import { importCsv, previewCsv } from '@/lib/lamp-log/csv-import';
import { MAX_CSV_IMPORT_BODY_BYTES } from '@/lib/uploads/limits';

const body = z.strictObject({
  enclosureId: idSchema('The enclosure'),
  // Its size cap is in bytes, as the file's, and answers 413 like every size cap: checked below.
  csv: z.string({ error: 'Send the CSV file’s text.' }).min(1, 'The file is empty.'),
  fileName: z.string().max(200).nullish(),
  /** The uploader's Date#getTimezoneOffset(), for times written without an offset. */
  tzOffsetMinutes: z.number().int().min(-840).max(840).default(0),
  /** false (default): check every row and show what would be imported; true: import all rows or none. */
  commit: z.boolean().default(false),
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
