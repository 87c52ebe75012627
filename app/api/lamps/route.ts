import { z } from 'zod';
import { allow, pageQuery, route } from '@/lib/api';
import { idSchema } from '@/lib/api/schemas';
import { todayIso } from '@/lib/lamp-log/dates';
import { summarise } from '@/lib/lamp-log/outlook-store';
import { lampsOfOrganisation } from '@/lib/lamp-log/store';
import { roleIn } from '@/lib/permissions';

/**
 * Lamps across an organisation (`?organisationId=`): owners and staff see every enclosure's lamps,
 * a keeper only those of their own enclosures.
 */
export const GET = route({
  query: z.object({
    organisationId: idSchema('The organisation id'),
    includeRetired: z.enum(['true', 'false']).default('false'),
    ...pageQuery,
  }),
  handler: async ({ query, user }) => {
    // Reading "a lamp" of the organisation: any member may, keepers are narrowed to their own below.
    allow(
      user,
      'read',
      { kind: 'lamp', organisationId: query.organisationId, keeperId: user.id },
      'That organisation',
    );
    const keeperOnly = roleIn(user, query.organisationId) === 'keeper' ? user.id : null;
    const rows = await lampsOfOrganisation(query.organisationId, keeperOnly, {
      ...query,
      includeRetired: query.includeRetired === 'true',
    });
    const items = await summarise(rows.slice(0, query.limit), todayIso());
    const last = rows[query.limit - 1];
    return { items, nextCursor: rows.length > query.limit && last ? String(last.id) : null };
  },
});
