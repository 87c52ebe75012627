import { ownedRoute } from '@/lib/api';
import { updateReading } from '@/lib/lamp-log/mutations';
import { updateReadingBody } from '@/lib/lamp-log/schemas';
import { readingJson } from '@/lib/lamp-log/queries';

export const GET = ownedRoute('reading', 'read', {
  handler: async ({ thing: reading }) => {
    return { reading: readingJson(reading) };
  },
});

/** Corrects a reading (a typo in the value, the wrong unit). */
export const PATCH = ownedRoute('reading', 'update', {
  body: updateReadingBody,
  handler: async ({ thing: reading, body }) => {
    await updateReading(reading, body);
    return { reading: readingJson(reading) };
  },
});

export const DELETE = ownedRoute('reading', 'delete', {
  handler: async ({ thing: reading, params }) => {
    await reading.destroy();
    return { ok: true, id: params.id };
  },
});
