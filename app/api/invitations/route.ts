import { z } from 'zod';
import { allow, created, page, pageQuery, route } from '@/lib/api';
import { emailSchema, idSchema, roleSchema } from '@/lib/api/schemas';
import { invitationJson, inviteByEmail, pendingInvitations } from '@/lib/auth/invitations';

/** Pending invitations of an organisation (`?organisationId=`), for owner and staff. */
export const GET = route({
  query: z.object({ organisationId: idSchema('The organisation id'), ...pageQuery }),
  handler: async ({ query, user }) => {
    allow(user, 'read', { kind: 'invitation', organisationId: query.organisationId }, 'That organisation');
    const rows = await pendingInvitations(query.organisationId, query);
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
