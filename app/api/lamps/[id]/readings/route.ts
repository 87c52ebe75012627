import { z } from 'zod';
import { created, pageQuery, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { lampFor } from '@/lib/lamp-log/access';
import { createReading } from '@/lib/lamp-log/mutations';
import { createReadingBody } from '@/lib/lamp-log/schemas';
import { readingJson } from '@/lib/lamp-log/store';
import { Reading } from '@/models';
import { Op } from 'sequelize';

/** A lamp's readings, oldest first, paginated by id. */
export const GET = route({
  params: idParams,
  query: z.object(pageQuery),
  handler: async ({ params, query, user }) => {
    const lamp = await lampFor(user, params.id, 'read');
    const rows = await Reading.findAll({
      where: { lampId: lamp.id, ...(query.cursor ? { id: { [Op.gt]: query.cursor } } : {}) },
      order: [['id', 'ASC']],
      limit: query.limit + 1,
    });
    const items = rows.slice(0, query.limit);
    const last = items[items.length - 1];
    return {
      items: items.map(readingJson),
      nextCursor: rows.length > query.limit && last ? String(last.id) : null,
    };
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
