import { z } from 'zod';
import { allow, created, route } from '@/lib/api';
import { keeperListQuery, listKeepers } from '@/lib/people/queries';
import { emailSchema, idSchema } from '@/lib/api/schemas';
import { invitationJson, inviteByEmail } from '@/lib/auth/invitations';

/**
 * The organisation's keepers (`?organisationId=`) with how many enclosures each has, searched, sorted
 * and paged (`q`, `sort`, `dir`, `offset`, `limit`; see people-list.ts). Owner and staff.
 */
export const GET = route({
  query: keeperListQuery,
  handler: async ({ query, user }) => {
    allow(user, 'read', { kind: 'member', organisationId: query.organisationId }, 'That organisation');
    return listKeepers(query);
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
