import { z } from 'zod';
import { allow, json, route } from '@/lib/api';
import { checkCsvSize, rowErrorsResponse } from '@/lib/api/csv-import';
import { idSchema } from '@/lib/api/schemas';
import { importCounterCsv, previewCounterCsv } from '@/lib/counter/csv-import';
import { MAX_CSV_IMPORT_BODY_BYTES } from '@/lib/uploads/limits';

const body = z.strictObject({
  organisationId: idSchema('The organisation'),
  // Its size cap is in bytes, as the file's, and answers 413 like every size cap: checked below.
  csv: z.string({ error: 'Send the CSV file’s text.' }).min(1, 'The file is empty.'),
  fileName: z.string().max(200).nullish(),
  /** The uploader's Date#getTimezoneOffset(), for times written without an offset. */
  tzOffsetMinutes: z.number().int().min(-840).max(840).default(0),
  /** false (default): check every row and show what would be imported; true: import all rows or none. */
  commit: z.boolean().default(false),
});

/**
 * Past counter tests from a CSV file: a preview (nothing saved) or the import of every row, or none. Only
 * the organisation's owners and staff, who may add customers and test lamps at its counter.
 */
export const POST = route({
  body,
  maxBodyBytes: MAX_CSV_IMPORT_BODY_BYTES,
  handler: async ({ body, user }) => {
    checkCsvSize(body.csv);
    allow(user, 'create', { kind: 'customer', organisationId: body.organisationId }, 'The organisation');
    if (!body.commit) return previewCounterCsv(body.organisationId, body.csv, body.tzOffsetMinutes);
    const outcome = await importCounterCsv(user, body.organisationId, body.csv, body.tzOffsetMinutes);
    if (!outcome.ok) return rowErrorsResponse(outcome.errors);
    const { imported, customersAdded, lampsAdded } = outcome;
    return json({ imported, customersAdded, lampsAdded }, 201);
  },
});
