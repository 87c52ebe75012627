import 'server-only';
import type { Transaction } from 'sequelize';
import { z } from 'zod';
import { ApiError, badRequest } from '@/lib/api/errors';
import { SIGN_IN_LIMITS } from '@/lib/auth/credentials';
import { hashPassword, newPasswordSchema, verifyPassword } from '@/lib/auth/password';
import { getSequelize } from '@/lib/db';
import { checkLimits, clearFailures, countAttempt, limitKey } from '@/lib/rate-limit';
import { User } from '@/models';

/**
 * A person's own account: changing the password and ending sessions. Both work through the session
 * version: bumping it makes every session cookie issued before it fail the database check that every
 * route handler and page does (lib/auth/session-user.ts) — this browser's too, so the person signs in
 * again with the new password.
 */

export const changePasswordBody = z.strictObject({
  currentPassword: z
    .string({ error: 'Enter your current password.' })
    .min(1, 'Enter your current password.')
    .max(1000),
  newPassword: newPasswordSchema,
});

export type ChangePasswordInput = z.infer<typeof changePasswordBody>;

/** Ends every session of the user, everywhere (the next request of each is refused). */
export async function endAllSessions(userId: number, transaction?: Transaction): Promise<void> {
  getSequelize();
  await User.increment('sessionVersion', { where: { id: userId }, transaction });
}

export async function changePassword(userId: number, input: ChangePasswordInput): Promise<void> {
  const sequelize = getSequelize();
  const user = await User.scope('withPassword').findByPk(userId);
  if (!user) throw new ApiError(404, 'not_found', 'That account was not found.');
  // The same per-account limit as sign-in: a stolen session cannot guess the password to lock its owner out.
  const key = limitKey('account', user.email);
  const verdict = await checkLimits([{ key, limit: SIGN_IN_LIMITS.perAccount }], SIGN_IN_LIMITS.windowMs);
  if (!verdict.allowed) {
    const minutes = Math.max(1, Math.ceil(verdict.retryAfterMs / 60_000));
    throw new ApiError(
      429,
      'rate_limited',
      `Too many wrong passwords. Try again in ${minutes} minutes.`,
      undefined,
      undefined,
      {
        'Retry-After': String(Math.ceil(verdict.retryAfterMs / 1000)),
      },
    );
  }
  if (!(await verifyPassword(input.currentPassword, user.passwordHash))) {
    await countAttempt([key], SIGN_IN_LIMITS.windowMs);
    throw badRequest('currentPassword', 'That is not your current password.');
  }
  if (input.newPassword === input.currentPassword) {
    throw badRequest('newPassword', 'Choose a password different from the current one.');
  }
  const passwordHash = await hashPassword(input.newPassword);
  await sequelize.transaction(async (transaction) => {
    await User.update({ passwordHash }, { where: { id: userId }, transaction });
    await endAllSessions(userId, transaction);
  });
  await clearFailures(key);
}
