import 'server-only';
import { DomainError, conflict } from '@/lib/errors';
import { createHash, randomBytes } from 'node:crypto';
import { Op } from 'sequelize';
import { config } from '@/lib/config';
import { sendMail } from '@/lib/mail';

import { afterCursor } from '@/lib/api/pagination';
import { loadOwned } from '@/lib/access';
import type { CurrentUser } from './session-user';
import { Invitation, Membership, Organisation, User, type Role } from '@/models';
import { logger } from '@/lib/log';

export const INVITATION_TTL_MS = 7 * 24 * 3600_000;

export const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

export const newToken = () => randomBytes(32).toString('base64url');

export const inviteUrl = (token: string) => new URL(`/invite/${token}`, config().APP_URL).toString();

const ROLE_WORDS: Record<Role, string> = {
  owner: 'an owner (members, catalogues and settings, as well as all enclosures)',
  staff: 'staff (all enclosures, designs, lamps and readings of the organisation)',
  keeper: 'a keeper (your own enclosures, designs and meter readings)',
};

export type InvitationState = 'pending' | 'accepted' | 'revoked' | 'expired';

export function invitationState(inv: Invitation, now = new Date()): InvitationState {
  if (inv.acceptedAt) return 'accepted';
  if (inv.revokedAt) return 'revoked';
  if (inv.expiresAt.getTime() <= now.getTime()) return 'expired';
  return 'pending';
}

/**
 * Creates an invitation and e-mails its link. Only the token's SHA-256 is stored, so a database leak
 * does not hand out working links. A newer invitation to the same address replaces older pending ones.
 */
export async function inviteByEmail(input: {
  organisationId: number;
  email: string;
  role: Role;
  invitedBy: { id: number; name: string };
}): Promise<Invitation> {
  const organisation = await Organisation.findByPk(input.organisationId);
  if (!organisation) throw new DomainError('not_found', 'That organisation was not found.');
  const existing = await User.findOne({ where: { email: input.email }, attributes: ['id'] });
  if (existing) {
    const member = await Membership.findOne({
      where: { organisationId: input.organisationId, userId: existing.id },
    });
    if (member) throw conflict(`${input.email} is already a member (${member.role}).`, 'already_member');
  }
  const now = new Date();
  await Invitation.update(
    { revokedAt: now },
    {
      where: {
        organisationId: input.organisationId,
        email: input.email,
        acceptedAt: null,
        revokedAt: null,
        expiresAt: { [Op.gt]: now },
      },
    },
  );
  const token = newToken();
  const invitation = await Invitation.create({
    organisationId: input.organisationId,
    email: input.email,
    role: input.role,
    tokenHash: hashToken(token),
    invitedById: input.invitedBy.id,
    expiresAt: new Date(now.getTime() + INVITATION_TTL_MS),
  });
  const link = inviteUrl(token);
  try {
    await sendMail({
      tag: { kind: 'invitation', organisationId: input.organisationId },
      to: input.email,
      subject: `${input.invitedBy.name} invited you to ${organisation.name} on Baskwell`,
      text: [
        `${input.invitedBy.name} invited you to join ${organisation.name} on Baskwell as ${ROLE_WORDS[input.role]}.`,
        '',
        'Baskwell plans the light and heat of reptile and amphibian enclosures and keeps lamp meter readings.',
        '',
        `Accept the invitation: ${link}`,
        '',
        'The link works for 7 days and only once. If you were not expecting this, ignore this e-mail.',
      ].join('\n'),
    });
  } catch (error) {
    // Without the e-mail the invitation is useless (only the recipient can learn the token): undo it.
    await invitation.destroy();
    logger().error({ err: error, invitationId: invitation.id }, 'invitation e-mail could not be sent');
    throw new DomainError(
      'unavailable',
      'The invitation e-mail could not be sent, so no invitation was made. Try again in a minute.',
      { code: 'mail_unavailable', retryAfterS: 30 },
    );
  }
  return invitation;
}

export function invitationJson(inv: Invitation) {
  return {
    id: inv.id,
    organisationId: inv.organisationId,
    email: inv.email,
    role: inv.role,
    state: invitationState(inv),
    expiresAt: inv.expiresAt.toISOString(),
    createdAt: inv.createdAt.toISOString(),
  };
}

/** An organisation's invitations still waiting for an answer, by id, from after `cursor`. */
export async function pendingInvitations(organisationId: number, opts: { cursor?: number; limit: number }) {
  return Invitation.findAll({
    where: {
      organisationId,
      acceptedAt: null,
      revokedAt: null,
      expiresAt: { [Op.gt]: new Date() },
      ...afterCursor(opts.cursor),
    },
    order: [['id', 'ASC']],
    limit: opts.limit + 1,
  });
}

/** Withdraws a pending invitation, if `user` may: its link stops working. */
export async function revokeInvitation(user: CurrentUser, id: number) {
  const invitation = await loadOwned('invitation', id, user, 'delete');
  const state = invitationState(invitation);
  if (state !== 'pending') throw conflict(`That invitation is already ${state}.`, `invitation_${state}`);
  invitation.revokedAt = new Date();
  await invitation.save();
  return invitation;
}

/** The invitation behind a link's token, with its organisation's name; null for a token that is not one. */
export async function invitationForToken(token: string) {
  if (!/^[A-Za-z0-9_-]{43}$/.test(token)) return null;
  const invitation = await Invitation.findOne({
    where: { tokenHash: hashToken(token) },
    include: [{ model: Organisation, as: 'organisation', attributes: ['name'] }],
  });
  if (!invitation) return null;
  const organisation = (invitation as Invitation & { organisation?: Organisation }).organisation;
  return { invitation, organisationName: organisation?.name ?? null };
}

/** Whether an address already has an account (the invitation page then asks to sign in). */
export async function hasAccount(email: string): Promise<boolean> {
  return Boolean(await User.findOne({ where: { email }, attributes: ['id'] }));
}
