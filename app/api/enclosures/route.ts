import { z } from 'zod';
import { afterCursor, allow, created, page, pageQuery, route } from '@/lib/api';
import { assertKeeperInOrganisation, createEnclosureBody, enclosureJson } from '@/lib/api/enclosures';
import { idSchema } from '@/lib/api/schemas';
import { roleIn } from '@/lib/permissions';
import { Enclosure, User } from '@/models';

/**
 * Enclosures of an organisation (`?organisationId=`, optional `keeperId`). Owner and staff see all of
 * them; a keeper only their own.
 */
export const GET = route({
  query: z.object({
    organisationId: idSchema('The organisation id'),
    keeperId: idSchema('The keeper').optional(),
    ...pageQuery,
  }),
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
    const rows = await Enclosure.findAll({
      where: { organisationId, ...(keeperId ? { keeperId } : {}), ...afterCursor(query.cursor) },
      include: [{ model: User, as: 'keeper', attributes: ['id', 'name'] }],
      order: [['id', 'ASC']],
      limit: query.limit + 1,
    });
    return page(rows, query.limit, enclosureJson);
  },
});

export const POST = route({
  body: createEnclosureBody,
  handler: async ({ body, user }) => {
    const { organisationId, keeperId = user.id, ...fields } = body;
    allow(user, 'create', { kind: 'enclosure', organisationId, keeperId }, 'That organisation');
    await assertKeeperInOrganisation(organisationId, keeperId);
    const enclosure = await Enclosure.create({ organisationId, keeperId, ...fields });
    const keeper = await User.findByPk(keeperId, { attributes: ['id', 'name'] });
    return created(enclosureJson(Object.assign(enclosure, { keeper })));
  },
});
