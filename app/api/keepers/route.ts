import { z } from 'zod';
import { allow, created, page, pageQuery, route } from '@/lib/api';
import { emailSchema, idSchema } from '@/lib/api/schemas';
import { invitationJson, inviteByEmail } from '@/lib/auth/invitations';
import { keepersOf } from '@/lib/organisations/queries';

/** The organisation's keepers (`?organisationId=`) with how many enclosures each has. Owner and staff. */
export const GET = route({
  query: z.object({ organisationId: idSchema('The organisation id'), ...pageQuery }),
  handler: async ({ query, user }) => {
    const organisationId = query.organisationId;
    allow(user, 'read', { kind: 'member', organisationId }, 'That organisation');
    const { rows, json } = await keepersOf(organisationId, query);
    return page(rows, query.limit, json);
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
