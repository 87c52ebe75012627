import { route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { readingFor } from '@/lib/lamp-log/access';
import { updateReading } from '@/lib/lamp-log/mutations';
import { updateReadingBody } from '@/lib/lamp-log/schemas';
import { readingJson } from '@/lib/lamp-log/queries';

export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const reading = await readingFor(user, params.id, 'read');
    return { reading: readingJson(reading) };
  },
});

/** Corrects a reading (a typo in the value, the wrong unit). */
export const PATCH = route({
  params: idParams,
  body: updateReadingBody,
  handler: async ({ params, body, user }) => {
    const reading = await readingFor(user, params.id, 'update');
    await updateReading(reading, body);
    return { reading: readingJson(reading) };
  },
});

export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const reading = await readingFor(user, params.id, 'delete');
    await reading.destroy();
    return { ok: true, id: params.id };
  },
});
