import { allow, notFound, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { invitationJson, invitationState } from '@/lib/auth/invitations';
import { conflict } from '@/lib/api/errors';
import { Invitation } from '@/models';

/** Revokes a pending invitation: its link stops working. */
export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const invitation = await Invitation.findByPk(params.id);
    if (!invitation) throw notFound('That invitation');
    allow(
      user,
      'delete',
      { kind: 'invitation', organisationId: invitation.organisationId, role: invitation.role },
      'That invitation',
    );
    const state = invitationState(invitation);
    if (state !== 'pending') throw conflict(`That invitation is already ${state}.`, `invitation_${state}`);
    invitation.revokedAt = new Date();
    await invitation.save();
    return invitationJson(invitation);
  },
});
