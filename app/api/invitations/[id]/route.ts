import { route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { invitationJson, revokeInvitation } from '@/lib/auth/invitations';

/** Revokes a pending invitation: its link stops working. */
export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => invitationJson(await revokeInvitation(user, params.id)),
});
