import { z } from 'zod';
import { route } from '@/lib/api';
import { idSchema } from '@/lib/api/schemas';
import { enclosureForLamps } from '@/lib/lamp-log/access';
import { importCsv, previewCsv } from '@/lib/lamp-log/csv-import';
import { MAX_CSV_BYTES } from '@/lib/uploads/limits';

const body = z.strictObject({
  enclosureId: idSchema('The enclosure'),
  csv: z
    .string({ error: 'Send the CSV file’s text.' })
    .min(1, 'The file is empty.')
    .max(MAX_CSV_BYTES, `The file is larger than ${MAX_CSV_BYTES / 1024} KB; split it into smaller files.`),
  fileName: z.string().max(200).nullish(),
  /** The uploader's Date#getTimezoneOffset(), for times written without an offset. */
  tzOffsetMinutes: z.number().int().min(-840).max(840).default(0),
  /** false (default): check every row and show what would be imported; true: import all rows or none. */
  commit: z.boolean().default(false),
});

export const POST = route({
  body,
  handler: async ({ body, user }) => {
    const enclosure = await enclosureForLamps(user, body.enclosureId, body.commit ? 'update' : 'read');
    if (!body.commit) {
      const result = await previewCsv(enclosure, body.csv, body.tzOffsetMinutes);
      return { ok: result.errors.length === 0, total: result.rows.length + result.errors.length, ...result };
    }
    return importCsv(user, enclosure, body.csv, {
      tzOffsetMinutes: body.tzOffsetMinutes,
      fileName: body.fileName ?? null,
    });
  },
});
