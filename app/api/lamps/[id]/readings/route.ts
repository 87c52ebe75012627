import { z } from 'zod';
import { created, ownedRoute, page, pageQuery } from '@/lib/api';
import { createReading } from '@/lib/lamp-log/mutations';
import { createReadingBody } from '@/lib/lamp-log/schemas';
import { readingJson, readingsOf } from '@/lib/lamp-log/queries';

/** A lamp's readings, oldest first, paginated by id. */
export const GET = ownedRoute('lamp', 'read', {
  query: z.object(pageQuery),
  handler: async ({ thing: lamp, query }) => {
    return page(await readingsOf(lamp.id, query), query.limit, readingJson);
  },
});

/** One meter reading, typed in. Distances in cm or in (`distanceUnit`), stored in cm. */
export const POST = ownedRoute('lamp', 'update', {
  body: createReadingBody,
  handler: async ({ thing: lamp, body, user }) => {
    const reading = await createReading(lamp, body, user.id);
    return created({ reading: readingJson(reading) });
  },
});
