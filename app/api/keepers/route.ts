import { z } from 'zod';
import { afterCursor, allow, created, page, pageQuery, route } from '@/lib/api';
import { emailSchema, idSchema } from '@/lib/api/schemas';
import { invitationJson, inviteByEmail } from '@/lib/auth/invitations';
import { enclosureCounts } from '@/lib/api/enclosures';
import { Membership, User } from '@/models';

/** The organisation's keepers (`?organisationId=`) with how many enclosures each has. Owner and staff. */
export const GET = route({
  query: z.object({ organisationId: idSchema('The organisation id'), ...pageQuery }),
  handler: async ({ query, user }) => {
    const organisationId = query.organisationId;
    allow(user, 'read', { kind: 'member', organisationId }, 'That organisation');
    const rows = await Membership.findAll({
      where: { organisationId, role: 'keeper', ...afterCursor(query.cursor) },
      include: [{ model: User, as: 'user', attributes: ['id', 'name', 'email'] }],
      order: [['id', 'ASC']],
      limit: query.limit + 1,
    });
    const counts = await enclosureCounts(
      organisationId,
      rows.map((r) => r.userId),
    );
    return page(rows, query.limit, (m) => {
      const u = (m as Membership & { user?: User }).user;
      return {
        userId: m.userId,
        name: u?.name ?? '',
        email: u?.email ?? '',
        enclosureCount: counts.get(m.userId) ?? 0,
        joinedAt: m.createdAt.toISOString(),
      };
    });
  },
});

/** Keepers join by invitation (they choose their own password): this invites one. */
export const POST = route({
  body: z.object({ organisationId: idSchema('The organisation id'), email: emailSchema }),
  handler: async ({ body, user }) => {
    allow(
      user,
      'create',
      { kind: 'invitation', organisationId: body.organisationId, role: 'keeper' },
      'That organisation',
    );
    const invitation = await inviteByEmail({ ...body, role: 'keeper', invitedBy: user });
    return created(invitationJson(invitation));
  },
});
