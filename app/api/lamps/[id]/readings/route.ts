import { z } from 'zod';
import { created, page, pageQuery, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { lampFor } from '@/lib/lamp-log/access';
import { createReading } from '@/lib/lamp-log/mutations';
import { createReadingBody } from '@/lib/lamp-log/schemas';
import { readingJson, readingsOf } from '@/lib/lamp-log/queries';

/** A lamp's readings, oldest first, paginated by id. */
export const GET = route({
  params: idParams,
  query: z.object(pageQuery),
  handler: async ({ params, query, user }) => {
    const lamp = await lampFor(user, params.id, 'read');
    return page(await readingsOf(lamp.id, query), query.limit, readingJson);
  },
});

/** One meter reading, typed in. Distances in cm or in (`distanceUnit`), stored in cm. */
export const POST = route({
  params: idParams,
  body: createReadingBody,
  handler: async ({ params, body, user }) => {
    const lamp = await lampFor(user, params.id, 'update');
    const reading = await createReading(lamp, body, user.id);
    return created({ reading: readingJson(reading) });
  },
});
