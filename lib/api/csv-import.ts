import 'server-only';
import { z } from 'zod';
import type { CurrentUser } from '@/lib/auth/session-user';
import { ApiError } from './errors';
import { json, route } from './route';
import { MAX_CSV_BYTES, MAX_CSV_IMPORT_BODY_BYTES } from '@/lib/uploads/limits';

/** A problem of one CSV row: its line number, the column it is in and what is wrong. */
export type CsvRowError = { row: number; field: string; message: string };

/**
 * The 400 answer of an import refused for its rows (the lamp log's readings and the counter's past
 * tests): the usual error body, naming the first problem, and every row's problem beside it, so the page
 * marks each row.
 */
export function rowErrorsResponse(errors: CsvRowError[]): Response {
  const first = errors[0]!;
  return json(
    {
      error: {
        code: 'invalid',
        message: `Nothing was imported: ${errors.length} row${errors.length > 1 ? 's have' : ' has'} a problem. Row ${first.row}: ${first.message}`,
        field: `rows[${first.row}].${first.field}`,
        issues: errors.map((e) => ({ field: `rows[${e.row}].${e.field}`, message: e.message })),
      },
      errors,
    },
    400,
  );
}

/** A CSV file's size cap is in bytes, as the file's, and answers 413 like every size cap. */
export function checkCsvSize(csv: string): void {
  if (Buffer.byteLength(csv, 'utf8') > MAX_CSV_BYTES)
    throw new ApiError(
      413,
      'payload_too_large',
      `The file is larger than ${MAX_CSV_BYTES / 1024} KB; split it into smaller files.`,
      'csv',
      [{ field: 'csv', message: `The file is larger than ${MAX_CSV_BYTES / 1024} KB.` }],
    );
}

/** The fields both CSV imports (readings, past counter tests) take besides whose rows they are. */
export const csvImportFields = {
  // Its size cap is in bytes, as the file's, and answers 413 like every size cap: see checkCsvSize.
  csv: z.string({ error: 'Send the CSV file’s text.' }).min(1, 'The file is empty.'),
  fileName: z.string().max(200).nullish(),
  /** The uploader's Date#getTimezoneOffset(), for times written without an offset. */
  tzOffsetMinutes: z.number().int().min(-840).max(840).default(0),
  /** false (default): check every row and show what would be imported; true: import all rows or none. */
  commit: z.boolean().default(false),
};

/** The body of a CSV import: whose rows they are (`target`'s fields) and the import's own fields. */
type CsvImportBody<T extends z.ZodRawShape> = z.output<z.ZodObject<T>> &
  z.output<z.ZodObject<typeof csvImportFields>>;

/**
 * The route of a CSV import: a body naming whose rows they are (`target`, e.g. the enclosure) beside the
 * file and the import's own fields, within the import's body cap, and a file within its own size cap,
 * before the handler checks who may import there and previews or imports.
 */
export function csvImportRoute<T extends z.ZodRawShape>(
  target: T,
  handler: (input: { body: CsvImportBody<T>; user: CurrentUser }) => Promise<unknown>,
) {
  return route({
    body: z.strictObject({ ...target, ...csvImportFields }),
    maxBodyBytes: MAX_CSV_IMPORT_BODY_BYTES,
    handler: async ({ body, user }) => {
      const parsed = body as unknown as CsvImportBody<T>;
      checkCsvSize(parsed.csv);
      return handler({ body: parsed, user });
    },
  });
}
