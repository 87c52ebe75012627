import { allow, created, route } from '@/lib/api';
import { enclosureListQuery, listEnclosures } from '@/lib/enclosures/queries';
import { createEnclosure } from '@/lib/enclosures/mutations';
import { createEnclosureBody } from '@/lib/enclosures/schemas';
import { enclosureJson } from '@/lib/enclosures/queries';
import { roleIn } from '@/lib/permissions';

/**
 * Enclosures of an organisation (`?organisationId=`, optional `keeperId`), searched, sorted and paged
 * (`q`, `sort`, `dir`, `offset`, `limit`; see enclosure-list.ts). Owner and staff see all of them; a
 * keeper only their own, whatever they search for.
 */
export const GET = route({
  query: enclosureListQuery,
  handler: async ({ query, user }) => {
    const { organisationId } = query;
    const role = roleIn(user, organisationId);
    const keeperId = role === 'keeper' ? (query.keeperId ?? user.id) : query.keeperId;
    allow(
      user,
      'read',
      keeperId ? { kind: 'enclosure', organisationId, keeperId } : { kind: 'member', organisationId },
      'That organisation',
    );
    return listEnclosures({ ...query, keeperId });
  },
});

export const POST = route({
  body: createEnclosureBody,
  handler: async ({ body, user }) => {
    const { organisationId, keeperId = user.id, ...fields } = body;
    allow(user, 'create', { kind: 'enclosure', organisationId, keeperId }, 'That organisation');
    return created(enclosureJson(await createEnclosure({ organisationId, keeperId, ...fields })));
  },
});
