import { created, json, route } from '@/lib/api';
import { acceptInvitation, acceptInvitationBody } from '@/lib/auth/accept-invitation';

/** Accepts an invitation (see acceptInvitation): 201 when it created the account, 200 when it joined one. */
export const POST = route({
  body: acceptInvitationBody,
  auth: false,
  handler: async ({ body, user }) => {
    const { accountCreated, result } = await acceptInvitation(body, user);
    return accountCreated ? created(result) : json(result);
  },
});
