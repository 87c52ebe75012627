import { Op } from 'sequelize';
import { z } from 'zod';
import { afterCursor, allow, created, page, pageQuery, route } from '@/lib/api';
import { emailSchema, idSchema, roleSchema } from '@/lib/api/schemas';
import { invitationJson, inviteByEmail } from '@/lib/auth/invitations';
import { Invitation } from '@/models';

/** Pending invitations of an organisation (`?organisationId=`), for owner and staff. */
export const GET = route({
  query: z.object({ organisationId: idSchema('The organisation id'), ...pageQuery }),
  handler: async ({ query, user }) => {
    allow(user, 'read', { kind: 'invitation', organisationId: query.organisationId }, 'That organisation');
    const rows = await Invitation.findAll({
      where: {
        organisationId: query.organisationId,
        acceptedAt: null,
        revokedAt: null,
        expiresAt: { [Op.gt]: new Date() },
        ...afterCursor(query.cursor),
      },
      order: [['id', 'ASC']],
      limit: query.limit + 1,
    });
    return page(rows, query.limit, invitationJson);
  },
});

/** Invites someone by e-mail. Staff may invite keepers; only an owner invites staff or owners. */
export const POST = route({
  body: z.object({ organisationId: idSchema('The organisation id'), email: emailSchema, role: roleSchema }),
  handler: async ({ body, user }) => {
    allow(
      user,
      'create',
      { kind: 'invitation', organisationId: body.organisationId, role: body.role },
      'That organisation',
    );
    const invitation = await inviteByEmail({ ...body, invitedBy: user });
    return created(invitationJson(invitation));
  },
});
