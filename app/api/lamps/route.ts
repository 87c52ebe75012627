import { allow, route } from '@/lib/api';
import { lampListQuery, listLamps } from '@/lib/lamp-log/list-queries';
import { roleIn } from '@/lib/permissions';

/**
 * Lamps across an organisation (`?organisationId=`), searched, filtered (`status`, `enclosure`,
 * `keeper`, `tech`, `due` within days, `retired=1`), sorted and paged (`q`, `sort`, `dir`, `offset`,
 * `limit`; see lib/lamp-log/list-queries.ts), with the organisation's status counts. Owners and staff see every
 * enclosure's lamps, a keeper only those of their own enclosures, whatever they filter by.
 */
export const GET = route({
  query: lampListQuery,
  handler: async ({ query, user }) => {
    // Reading "a lamp" of the organisation: any member may, keepers are narrowed to their own below.
    allow(
      user,
      'read',
      { kind: 'lamp', organisationId: query.organisationId, keeperId: user.id },
      'That organisation',
    );
    const { keeper, ...rest } = query;
    const keeperId = roleIn(user, query.organisationId) === 'keeper' ? user.id : keeper;
    return listLamps({ ...rest, keeperId });
  },
});
