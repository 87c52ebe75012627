import { z } from 'zod';
import { ApiError, json, route } from '@/lib/api';
import { idSchema } from '@/lib/api/schemas';
import { enclosureFor } from '@/lib/enclosures/access';
import { importCsv, previewCsv, type CsvResult } from '@/lib/lamp-log/csv-import';
import { MAX_CSV_BYTES, MAX_CSV_IMPORT_BODY_BYTES } from '@/lib/uploads/limits';

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

const csvTooLarge = () =>
  new ApiError(
    413,
    'payload_too_large',
    `The file is larger than ${MAX_CSV_BYTES / 1024} KB; split it into smaller files.`,
    'csv',
    [{ field: 'csv', message: `The file is larger than ${MAX_CSV_BYTES / 1024} KB.` }],
  );

/** Every row's problem, beside the usual error body: the page marks each row. */
function rowErrorsResponse(result: CsvResult): Response {
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

export const POST = route({
  body,
  maxBodyBytes: MAX_CSV_IMPORT_BODY_BYTES,
  handler: async ({ body, user }) => {
    if (Buffer.byteLength(body.csv, 'utf8') > MAX_CSV_BYTES) throw csvTooLarge();
    const enclosure = await enclosureFor(user, body.enclosureId, body.commit ? 'update' : 'read');
    if (!body.commit) {
      const result = await previewCsv(enclosure, body.csv, body.tzOffsetMinutes);
      return { ok: result.errors.length === 0, total: result.rows.length + result.errors.length, ...result };
    }
    const outcome = await importCsv(user, enclosure, body.csv, {
      tzOffsetMinutes: body.tzOffsetMinutes,
      fileName: body.fileName ?? null,
    });
    if (!outcome.ok) return rowErrorsResponse(outcome.result);
    const { imported, uploadId, rows } = outcome;
    return json({ imported, uploadId, rows }, 201);
  },
});
