import 'server-only';
import { createHash, randomBytes } from 'node:crypto';
import { Op } from 'sequelize';
import { z } from 'zod';
import { endAllSessions } from '@/lib/account/service';
import { ApiError } from '@/lib/api/errors';
import { emailSchema } from '@/lib/api/schemas';
import { config } from '@/lib/config';
import { getSequelize } from '@/lib/db';
import { checkLimits, clearFailures, countAttempt, limitKey } from '@/lib/rate-limit';
import { MailMessage, PasswordReset, User } from '@/models';
import { deliverSoon } from './mail-soon';
import { hashPassword, newPasswordSchema } from './password';

/**
 * "Forgot your password?": a link to choose a new one, e-mailed through the outbox. The link's token is
 * 256 random bits of which only the SHA-256 is stored; it works once and for RESET_TTL_MS. Asking gives the
 * same answer whether or not an account has the address (the e-mail is queued and sent after the answer,
 * so the answer's timing does not tell either). Setting the new password ends every session of the person.
 */

export const RESET_TTL_MS = 30 * 60_000;

/** Asking is limited per client address (429) and, silently, per account (no more mail is sent). */
export const RESET_LIMITS = { perAddress: 10, perAccount: 3, windowMs: 60 * 60_000 } as const;

export const resetRequestBody = z.strictObject({ email: emailSchema });

export const resetCompleteBody = z.strictObject({
  token: z
    .string({ error: 'The link is incomplete. Ask for a new one.' })
    .regex(/^[A-Za-z0-9_-]{43}$/, 'The link is incomplete. Ask for a new one.'),
  password: newPasswordSchema,
});

/** What anyone asking is told, whether or not the address has an account. */
export const RESET_ANSWER = {
  ok: true,
  message:
    'If an account uses that address, we have e-mailed it a link to choose a new password. The link works once, for 30 minutes.',
} as const;

const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

export const resetUrl = (token: string) =>
  new URL(`/reset-password#token=${token}`, config().APP_URL).toString();

export async function requestPasswordReset(input: z.output<typeof resetRequestBody>, address: string) {
  getSequelize();
  const addressKey = limitKey('reset-address', address);
  const verdict = await checkLimits(
    [{ key: addressKey, limit: RESET_LIMITS.perAddress }],
    RESET_LIMITS.windowMs,
  );
  if (!verdict.allowed) {
    const minutes = Math.max(1, Math.ceil(verdict.retryAfterMs / 60_000));
    throw new ApiError(
      429,
      'rate_limited',
      `Too many requests from this address. Try again in ${minutes} ${minutes === 1 ? 'minute' : 'minutes'}.`,
      undefined,
      undefined,
      { 'Retry-After': String(minutes * 60) },
    );
  }
  const accountKey = limitKey('reset-account', input.email);
  const perAccount = await checkLimits(
    [{ key: accountKey, limit: RESET_LIMITS.perAccount }],
    RESET_LIMITS.windowMs,
  );
  await countAttempt(perAccount.allowed ? [addressKey, accountKey] : [addressKey], RESET_LIMITS.windowMs);
  const user = perAccount.allowed
    ? await User.findOne({ where: { email: input.email }, attributes: ['id', 'name', 'email'] })
    : null;
  if (user) {
    deliverSoon((await queueResetMail(user)).id);
  }
  return RESET_ANSWER;
}

async function queueResetMail(user: Pick<User, 'id' | 'name' | 'email'>): Promise<MailMessage> {
  const token = randomBytes(32).toString('base64url');
  const now = new Date();
  return getSequelize().transaction(async (transaction) => {
    // A new link replaces any earlier one still waiting: only the newest works.
    await PasswordReset.destroy({ where: { userId: user.id, usedAt: null }, transaction });
    const reset = await PasswordReset.create(
      { userId: user.id, tokenHash: hashToken(token), expiresAt: new Date(now.getTime() + RESET_TTL_MS) },
      { transaction },
    );
    return MailMessage.create(
      {
        kind: 'password-reset',
        toEmail: user.email,
        toUserId: user.id,
        subject: 'Choose a new Baskwell password',
        body: [
          `Hello ${user.name},`,
          '',
          'Someone (we hope you) asked to choose a new password for your Baskwell account.',
          '',
          `Choose a new password: ${resetUrl(token)}`,
          '',
          'The link works once, for 30 minutes. Choosing a new password signs you out everywhere.',
          'If you did not ask, ignore this e-mail: your password stays as it is.',
        ].join('\n'),
        dedupeKey: `password-reset:${reset.id}`,
      },
      { transaction },
    );
  });
}

export const invalidResetLink = () =>
  new ApiError(404, 'not_found', 'This link has expired or was already used. Ask for a new one.', 'token');

/** Sets the new password if the token is live, uses the token up, and ends every session of the person. */
export async function completePasswordReset(input: z.output<typeof resetCompleteBody>): Promise<void> {
  const sequelize = getSequelize();
  const now = new Date();
  const reset = await PasswordReset.findOne({
    where: { tokenHash: hashToken(input.token), usedAt: null, expiresAt: { [Op.gt]: now } },
  });
  if (!reset) throw invalidResetLink();
  const passwordHash = await hashPassword(input.password);
  const email = await sequelize.transaction(async (transaction) => {
    // Using the token is a compare-and-set: of two requests with one link, only one sets a password.
    const [used] = await PasswordReset.update(
      { usedAt: now },
      { where: { id: reset.id, usedAt: null }, transaction },
    );
    if (used !== 1) throw invalidResetLink();
    const user = await User.findByPk(reset.userId, { attributes: ['id', 'email'], transaction });
    if (!user) throw invalidResetLink();
    await User.update({ passwordHash }, { where: { id: user.id }, transaction });
    await endAllSessions(user.id, transaction);
    await PasswordReset.destroy({ where: { userId: user.id, usedAt: null }, transaction });
    return user.email;
  });
  // The owner has proved they hold the address: earlier wrong guesses no longer slow their sign-in.
  await clearFailures(limitKey('account', email));
}
