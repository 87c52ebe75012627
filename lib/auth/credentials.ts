import 'server-only';
import { z } from 'zod';
import { isDatabaseUnavailable } from '@/lib/api/errors';
import {
  checkLimits,
  clearFailures,
  countAttempt,
  isKnown,
  limitKey,
  markKnown,
  readCounters,
} from '@/lib/rate-limit';
import { User } from '@/models';
import { clientAddress } from './client-address';
import { burnPasswordCheck, verifyPassword } from './password';
import { logger } from '@/lib/log';

/**
 * How wrong passwords are slowed down. Nothing locks an account: a wrong password makes the next try on
 * that account wait, a little longer each time, and the waits are capped so its owner is never kept out
 * for long.
 * - One address on one account: free tries, then 1 s, 2 s, 4 s … up to 15 minutes between tries.
 * - One account from anywhere (many addresses): free tries, then 1 s … up to one minute between tries; an
 *   address that has signed in to the account before is exempt, so an attacker elsewhere cannot hold its
 *   owner up at all.
 * - One address across accounts: at most `perAddress` wrong passwords per `windowMs`.
 * Failures are counted over `counterMs`; a successful sign-in clears the account's counts.
 */
export const SIGN_IN_LIMITS = {
  perAddress: 20,
  windowMs: 15 * 60_000,
  pairFreeFailures: 3,
  pairMaxDelayMs: 15 * 60_000,
  accountFreeFailures: 5,
  accountMaxDelayMs: 60_000,
  counterMs: 24 * 3600_000,
} as const;

/** The wait before the next try after `failures` wrong passwords: 0 while free, then doubling to a cap. */
export function delayAfter(failures: number, free: number, maxMs: number): number {
  if (failures < free) return 0;
  return Math.min(1000 * 2 ** Math.min(failures - free, 30), maxMs);
}

/**
 * Error codes handed to the sign-in page through next-auth (it forwards the thrown message).
 * The page turns them into sentences; nothing here reveals whether an account exists. `mismatch` also
 * covers an account waiting for its confirmation link, so its sentence mentions the link.
 */
export const SIGN_IN_ERRORS = {
  mismatch: 'CredentialsSignin',
  tooMany: 'TooManyAttempts',
  slowDown: 'SlowDown',
  unavailable: 'ServiceUnavailable',
} as const;

export class SignInRefused extends Error {
  constructor(
    readonly code: string,
    readonly retryAfter?: number,
  ) {
    super(retryAfter ? `${code}:${retryAfter}` : code);
  }
}

const credentialsSchema = z.object({
  email: z.string().trim().toLowerCase().max(254),
  password: z.string().max(1000),
});

export type SignedInUser = { id: string; email: string; name: string };

export const signInKeys = (email: string, address: string) => ({
  account: limitKey('account', email),
  address: limitKey('address', address),
  pair: limitKey('pair', `${email}|${address}`),
  known: limitKey('known', `${email}|${address}`),
});

/**
 * Whether this account may be tried now, and from this address: null when it may, else the wait in ms.
 * Refused tries are not counted, so hammering during a wait does not make it longer.
 */
export async function accountWait(
  keys: { account: string; pair?: string; known?: string },
  now = Date.now(),
): Promise<number> {
  const counters = await readCounters(
    [keys.account, ...(keys.pair ? [keys.pair] : [])],
    SIGN_IN_LIMITS.counterMs,
    new Date(now),
  );
  const since = (key: string, free: number, max: number) => {
    const c = counters.get(key);
    return c ? c.lastAt.getTime() + delayAfter(c.count, free, max) - now : 0;
  };
  let wait = keys.pair ? since(keys.pair, SIGN_IN_LIMITS.pairFreeFailures, SIGN_IN_LIMITS.pairMaxDelayMs) : 0;
  const accountWide = since(
    keys.account,
    SIGN_IN_LIMITS.accountFreeFailures,
    SIGN_IN_LIMITS.accountMaxDelayMs,
  );
  if (accountWide > wait && !(keys.known && (await isKnown(keys.known)))) wait = accountWide;
  return Math.max(0, wait);
}

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
  const keys = signInKeys(email, clientAddress(headers));
  try {
    const verdict = await checkLimits(
      [{ key: keys.address, limit: SIGN_IN_LIMITS.perAddress }],
      SIGN_IN_LIMITS.windowMs,
    );
    if (!verdict.allowed) {
      throw new SignInRefused(SIGN_IN_ERRORS.tooMany, Math.max(1, Math.ceil(verdict.retryAfterMs / 60_000)));
    }
    const wait = await accountWait(keys);
    if (wait > 0) throw new SignInRefused(SIGN_IN_ERRORS.slowDown, Math.max(1, Math.ceil(wait / 1000)));
    const user = await User.scope('withPassword').findOne({ where: { email } });
    const ok = user
      ? await verifyPassword(password, user.passwordHash)
      : (await burnPasswordCheck(password), false);
    // An account not yet confirmed by its e-mailed link is refused exactly like a wrong password (same
    // answer, same counting): otherwise signing up with an address and then signing in with the same
    // password would tell a stranger whether the address already had an account.
    if (!user || !ok || !user.emailConfirmedAt) {
      await countAttempt([keys.address], SIGN_IN_LIMITS.windowMs);
      await countAttempt([keys.account, keys.pair], SIGN_IN_LIMITS.counterMs);
      throw new SignInRefused(SIGN_IN_ERRORS.mismatch);
    }
    await clearFailures(keys.account);
    await clearFailures(keys.pair);
    await markKnown(keys.known);
    return { id: String(user.id), email: user.email, name: user.name };
  } catch (error) {
    if (error instanceof SignInRefused) throw error;
    if (isDatabaseUnavailable(error)) throw new SignInRefused(SIGN_IN_ERRORS.unavailable);
    logger().error({ err: error }, 'sign-in failed unexpectedly');
    throw new SignInRefused(SIGN_IN_ERRORS.unavailable);
  }
}
