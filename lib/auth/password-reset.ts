import 'server-only';
import { z } from 'zod';
import { endAllSessions } from '@/lib/account/mutations';
import { emailSchema } from '@/lib/api/schemas';
import { getSequelize } from '@/lib/db';
import { MailMessage, User } from '@/models';
import { limitedLinkRequest, linkTokenSchema, liveLink, openLink, queueLinkMail } from './account-links';
import { deliverSoon } from './mail-soon';
import { hashPassword, newPasswordSchema } from './password';

/**
 * "Forgot your password?": a link to choose a new one, e-mailed through the outbox (see account-links.ts:
 * only the token's hash is stored; it works once and for RESET_TTL_MS). Asking gives the
 * same answer whether or not an account has the address (the e-mail is queued and sent after the answer,
 * so the answer's timing does not tell either). Setting the new password ends every session of the person.
 */

export const RESET_TTL_MS = 30 * 60_000;

/** Asking is limited per client address (429) and, silently, per account (no more mail is sent). */
export const RESET_LIMITS = { perAddress: 10, perAccount: 3, windowMs: 60 * 60_000 } as const;

export const resetRequestBody = z.strictObject({ email: emailSchema });

export const resetCompleteBody = z.strictObject({
  token: linkTokenSchema,
  password: newPasswordSchema,
});

/** What anyone asking is told, whether or not the address has an account. */
export const RESET_ANSWER = {
  ok: true,
  message:
    'If an account uses that address, we have e-mailed it a link to choose a new password. The link works once, for 30 minutes.',
} as const;

export async function requestPasswordReset(input: z.output<typeof resetRequestBody>, address: string) {
  const user = await limitedLinkRequest('reset', input.email, address, RESET_LIMITS);
  if (user) {
    deliverSoon((await queueResetMail(user)).id);
  }
  return RESET_ANSWER;
}

function queueResetMail(user: Pick<User, 'id' | 'name' | 'email'>): Promise<MailMessage> {
  return getSequelize().transaction((transaction) =>
    queueLinkMail(
      user,
      {
        purpose: 'password-reset',
        ttlMs: RESET_TTL_MS,
        page: '/reset-password',
        subject: 'Choose a new Baskwell password',
        lines: (url) => [
          'Someone (we hope you) asked to choose a new password for your Baskwell account.',
          '',
          `Choose a new password: ${url}`,
          '',
          'The link works once, for 30 minutes. Choosing a new password signs you out everywhere.',
          'If you did not ask, ignore this e-mail: your password stays as it is.',
        ],
      },
      transaction,
    ),
  );
}

/**
 * Sets the new password if the token is live, uses the token up, and ends every session of the person
 * (choosing it through the e-mailed link also confirms the address).
 */
export async function completePasswordReset(input: z.output<typeof resetCompleteBody>): Promise<void> {
  const now = new Date();
  const reset = await liveLink(input.token, 'password-reset', now);
  const passwordHash = await hashPassword(input.password);
  await openLink(reset, now, async (userId, transaction) => {
    await User.update({ passwordHash }, { where: { id: userId }, transaction });
    await endAllSessions(userId, transaction);
  });
}
