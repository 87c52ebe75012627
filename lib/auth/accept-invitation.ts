import 'server-only';
import { DomainError, invalid } from '@/lib/errors';
import { z } from 'zod';

import { personNameSchema } from '@/lib/api/schemas';
import type { CurrentUser } from '@/lib/auth/session-user';
import { getSequelize } from '@/lib/db';
import { Invitation, Membership, User } from '@/models';
import { hashPassword, newPasswordSchema } from './password';
import { hashToken, invitationState } from './invitations';

export const acceptInvitationBody = z.object({
  token: z
    .string({ error: 'The invitation token is missing.' })
    .regex(/^[A-Za-z0-9_-]{43}$/, 'That is not a valid invitation link.'),
  name: personNameSchema.optional(),
  password: z.string().optional(),
});

/**
 * Accepts an invitation. Signed in: joins with the current account (its e-mail must be the invited one).
 * Signed out: creates the account (name + password) — or, if the address already has an account,
 * asks to sign in first. `accountCreated` says which happened.
 */
export async function acceptInvitation(
  body: z.output<typeof acceptInvitationBody>,
  user: CurrentUser | null,
) {
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    const invitation = await Invitation.findOne({
      where: { tokenHash: hashToken(body.token) },
      lock: transaction.LOCK.UPDATE,
      transaction,
    });
    if (!invitation) throw new DomainError('not_found', 'This invitation link is not valid.');
    const state = invitationState(invitation);
    if (state !== 'pending') {
      const why = { accepted: 'has already been used', revoked: 'was withdrawn', expired: 'has expired' }[
        state
      ];
      throw new DomainError('gone', `This invitation ${why}. Ask for a new one.`, {
        code: `invitation_${state}`,
      });
    }
    let userId: number;
    let accountCreated = false;
    if (user) {
      if (user.email !== invitation.email) {
        throw new DomainError(
          'forbidden',
          `This invitation is for ${invitation.email}, but you are signed in as ${user.email}. Sign out and open the link again.`,
          { code: 'wrong_account' },
        );
      }
      userId = user.id;
    } else {
      const existing = await User.findOne({ where: { email: invitation.email }, transaction });
      if (existing?.emailConfirmedAt) {
        throw new DomainError(
          'conflict',
          `${invitation.email} already has a Baskwell account. Sign in, then open the link again.`,
          { code: 'account_exists' },
        );
      }
      if (!body.name) throw invalid('name', 'Enter your name.');
      const password = newPasswordSchema.safeParse(body.password ?? '');
      if (!password.success)
        throw invalid('password', password.error.issues[0]?.message ?? 'Invalid password.');
      // The invitation came by e-mail to this address: accepting it proves the address. An account
      // waiting for its sign-up confirmation was never usable and proved nothing, so the invited person's
      // name and password replace the ones it was created with.
      const account = {
        name: body.name,
        passwordHash: await hashPassword(password.data),
        emailConfirmedAt: new Date(),
      };
      if (existing) await existing.update(account, { transaction });
      const created =
        existing ?? (await User.create({ email: invitation.email, ...account }, { transaction }));
      userId = created.id;
      accountCreated = true;
    }
    const already = await Membership.findOne({
      where: { organisationId: invitation.organisationId, userId },
      transaction,
    });
    if (!already) {
      await Membership.create(
        { organisationId: invitation.organisationId, userId, role: invitation.role },
        { transaction },
      );
    }
    invitation.acceptedAt = new Date();
    await invitation.save({ transaction });
    const result = {
      organisationId: invitation.organisationId,
      email: invitation.email,
      role: already?.role ?? invitation.role,
      alreadyMember: Boolean(already),
    };
    return { accountCreated, result };
  });
}
