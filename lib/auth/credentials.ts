import 'server-only';
import { z } from 'zod';
import { getSequelize } from '@/lib/db';
import { isDatabaseUnavailable } from '@/lib/api/errors';
import { checkLimits, clearFailures, limitKey, countAttempt } from '@/lib/rate-limit';
import { User } from '@/models';
import { clientAddress } from './client-address';
import { burnPasswordCheck, verifyPassword } from './password';
import { logger } from '@/lib/log';

/** Failures allowed per window before sign-in is refused for the account or the client address. */
export const SIGN_IN_LIMITS = { perAccount: 5, perAddress: 20, windowMs: 15 * 60_000 } as const;

/**
 * Error codes handed to the sign-in page through next-auth (it forwards the thrown message).
 * The page turns them into sentences; nothing here reveals whether an account exists.
 */
export const SIGN_IN_ERRORS = {
  mismatch: 'CredentialsSignin',
  tooMany: 'TooManyAttempts',
  unavailable: 'ServiceUnavailable',
} as const;

export class SignInRefused extends Error {
  constructor(
    readonly code: string,
    readonly retryAfterMinutes?: number,
  ) {
    super(retryAfterMinutes ? `${code}:${retryAfterMinutes}` : code);
  }
}

const credentialsSchema = z.object({
  email: z.string().trim().toLowerCase().max(254),
  password: z.string().max(1000),
});

export type SignedInUser = { id: string; email: string; name: string };

/**
 * Checks an e-mail and password for next-auth's credentials provider. Returns the user, or throws
 * SignInRefused (wrong pair, too many attempts, database down). The password is never logged.
 */
export async function authorizeCredentials(
  raw: unknown,
  headers: Headers | Record<string, string | string[] | undefined> | undefined,
): Promise<SignedInUser> {
  const parsed = credentialsSchema.safeParse(raw);
  if (!parsed.success || !parsed.data.email || !parsed.data.password) {
    throw new SignInRefused(SIGN_IN_ERRORS.mismatch);
  }
  const { email, password } = parsed.data;
  const accountKey = limitKey('account', email);
  const addressKey = limitKey('address', clientAddress(headers));
  try {
    getSequelize();
    const verdict = await checkLimits(
      [
        { key: accountKey, limit: SIGN_IN_LIMITS.perAccount },
        { key: addressKey, limit: SIGN_IN_LIMITS.perAddress },
      ],
      SIGN_IN_LIMITS.windowMs,
    );
    if (!verdict.allowed) {
      throw new SignInRefused(SIGN_IN_ERRORS.tooMany, Math.max(1, Math.ceil(verdict.retryAfterMs / 60_000)));
    }
    const user = await User.scope('withPassword').findOne({ where: { email } });
    const ok = user
      ? await verifyPassword(password, user.passwordHash)
      : (await burnPasswordCheck(password), false);
    if (!user || !ok) {
      await countAttempt([accountKey, addressKey], SIGN_IN_LIMITS.windowMs);
      throw new SignInRefused(SIGN_IN_ERRORS.mismatch);
    }
    await clearFailures(accountKey);
    return { id: String(user.id), email: user.email, name: user.name };
  } catch (error) {
    if (error instanceof SignInRefused) throw error;
    if (isDatabaseUnavailable(error)) throw new SignInRefused(SIGN_IN_ERRORS.unavailable);
    logger().error({ err: error }, 'sign-in failed unexpectedly');
    throw new SignInRefused(SIGN_IN_ERRORS.unavailable);
  }
}
