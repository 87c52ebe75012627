import { allow, json } from '@/lib/api';
import { csvImportRoute, rowErrorsResponse } from '@/lib/api/csv-import';
import { idSchema } from '@/lib/api/schemas';
import { importCounterCsv, previewCounterCsv } from '@/lib/counter/csv-import';

/**
 * Past counter tests from a CSV file: a preview (nothing saved) or the import of every row, or none. Only
 * the organisation's owners and staff, who may add customers and test lamps at its counter.
 */
export const POST = csvImportRoute(
  { organisationId: idSchema('The organisation') },
  async ({ body, user }) => {
    allow(user, 'create', { kind: 'customer', organisationId: body.organisationId }, 'The organisation');
    if (!body.commit) return previewCounterCsv(body.organisationId, body.csv, body.tzOffsetMinutes);
    const outcome = await importCounterCsv(user, body.organisationId, body.csv, body.tzOffsetMinutes);
    if (!outcome.ok) return rowErrorsResponse(outcome.errors);
    const { imported, customersAdded, lampsAdded } = outcome;
    return json({ imported, customersAdded, lampsAdded }, 201);
  },
);
