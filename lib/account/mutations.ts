import 'server-only';
import { DomainError, invalid } from '@/lib/errors';
import type { Transaction } from 'sequelize';
import { z } from 'zod';

import { SIGN_IN_LIMITS, accountWait } from '@/lib/auth/credentials';
import { hashPassword, newPasswordSchema, verifyPassword } from '@/lib/auth/password';
import { getSequelize } from '@/lib/db';
import { clearFailures, countAttempt, limitKey } from '@/lib/rate-limit';
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
  await User.increment('sessionVersion', { where: { id: userId }, transaction });
}

export async function changePassword(userId: number, input: ChangePasswordInput): Promise<void> {
  const sequelize = getSequelize();
  const user = await User.scope('withPassword').findByPk(userId);
  if (!user) throw new DomainError('not_found', 'That account was not found.');
  // The same growing per-account delay as sign-in: a stolen session cannot guess the password quickly,
  // and cannot lock its owner out either (the waits are capped).
  const key = limitKey('account', user.email);
  const wait = await accountWait({ account: key });
  if (wait > 0) {
    const seconds = Math.max(1, Math.ceil(wait / 1000));
    throw new DomainError(
      'rate_limited',
      `Too many wrong passwords. Wait ${seconds} ${seconds === 1 ? 'second' : 'seconds'}, then try again.`,
      { retryAfterS: seconds },
    );
  }
  if (!(await verifyPassword(input.currentPassword, user.passwordHash))) {
    await countAttempt([key], SIGN_IN_LIMITS.counterMs);
    throw invalid('currentPassword', 'That is not your current password.');
  }
  if (input.newPassword === input.currentPassword) {
    throw invalid('newPassword', 'Choose a password different from the current one.');
  }
  const passwordHash = await hashPassword(input.newPassword);
  await sequelize.transaction(async (transaction) => {
    await User.update({ passwordHash }, { where: { id: userId }, transaction });
    await endAllSessions(userId, transaction);
  });
  await clearFailures(key);
}
