import { z } from 'zod';
import { created, ownedRoute, pageQuery } from '@/lib/api';
import { todayIso } from '@/lib/lamp-log/dates';
import { createLamp } from '@/lib/lamp-log/mutations';
import { createLampBody } from '@/lib/lamp-log/schemas';
import { summarise } from '@/lib/lamp-log/queries';
import { lampsOfEnclosure } from '@/lib/lamp-log/queries';

/** The lamps installed in one enclosure, each with its age, last reading, fit and status. */
export const GET = ownedRoute('enclosure', 'read', {
  query: z.object(pageQuery),
  handler: async ({ thing: enclosure, query }) => {
    const rows = await lampsOfEnclosure(enclosure.id, query);
    const items = await summarise(rows.slice(0, query.limit), todayIso());
    const last = rows[query.limit - 1];
    return { items, nextCursor: rows.length > query.limit && last ? String(last.id) : null };
  },
});

export const POST = ownedRoute('enclosure', 'create', {
  body: createLampBody,
  handler: async ({ thing: enclosure, body, user }) => {
    const lamp = await createLamp(enclosure, body, user.id);
    const [summary] = await summarise([lamp], todayIso());
    return created({ lamp: summary });
  },
});
