import 'server-only';
import { DomainError } from '@/lib/errors';
import { createHash, randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { z } from 'zod';

import { config } from '@/lib/config';
import { checkLimits, countAttempt, limitKey } from '@/lib/rate-limit';
import { AccountLink, User, type LinkPurpose } from '@/models';

/**
 * E-mailed single-use links (choose a new password, confirm a new account). A link's token is 256 random
 * bits of which only the SHA-256 is stored, so a database leak hands out no working link; it works once
 * and until its expiry. The token travels in the address's fragment (`#token=…`), which browsers never
 * send to a server, so it stays out of logs and Referer headers.
 */

export const linkTokenSchema = z
  .string({ error: 'The link is incomplete. Ask for a new one.' })
  .regex(/^[A-Za-z0-9_-]{43}$/, 'The link is incomplete. Ask for a new one.');

export const hashLinkToken = (token: string) => createHash('sha256').update(token).digest('hex');

export const linkUrl = (page: string, token: string) =>
  new URL(`${page}#token=${token}`, config().APP_URL).toString();

/** A new link for the person; any earlier unused one of the same purpose stops working (only the newest does). */
export async function issueLink(
  userId: number,
  purpose: LinkPurpose,
  ttlMs: number,
  transaction: Transaction,
): Promise<{ token: string; link: AccountLink }> {
  const token = randomBytes(32).toString('base64url');
  await AccountLink.destroy({ where: { userId, purpose, usedAt: null }, transaction });
  const link = await AccountLink.create(
    { userId, purpose, tokenHash: hashLinkToken(token), expiresAt: new Date(Date.now() + ttlMs) },
    { transaction },
  );
  return { token, link };
}

/** The live link with this token, if any (not used, not expired). */
export function findLiveLink(token: string, purpose: LinkPurpose, now = new Date()) {
  return AccountLink.findOne({
    where: { tokenHash: hashLinkToken(token), purpose, usedAt: null, expiresAt: { [Op.gt]: now } },
  });
}

/**
 * Uses the link up. A compare-and-set: of two requests with one link, only one gets true. Other unused
 * links of the same purpose are dropped with it.
 */
export async function useLink(link: AccountLink, now: Date, transaction: Transaction): Promise<boolean> {
  const [used] = await AccountLink.update(
    { usedAt: now },
    { where: { id: link.id, usedAt: null }, transaction },
  );
  if (used !== 1) return false;
  await AccountLink.destroy({
    where: { userId: link.userId, purpose: link.purpose, usedAt: null },
    transaction,
  });
  return true;
}

export const expiredLink = () =>
  new DomainError('not_found', 'This link has expired or was already used. Ask for a new one.', {
    field: 'token',
  });

/**
 * The rate limits of "e-mail me a link" requests: per client address (429, which says nothing about any
 * account) and, silently, per e-mail address (the answer is the same; no more mail is sent). Returns the
 * account with the address when a link may be sent to it, else null.
 */
export async function limitedLinkRequest(
  kind: string,
  email: string,
  address: string,
  limits: { perAddress: number; perAccount: number; windowMs: number },
): Promise<Pick<User, 'id' | 'name' | 'email' | 'emailConfirmedAt'> | null> {
  const addressKey = limitKey(`${kind}-address`, address);
  const verdict = await checkLimits([{ key: addressKey, limit: limits.perAddress }], limits.windowMs);
  if (!verdict.allowed) {
    const minutes = Math.max(1, Math.ceil(verdict.retryAfterMs / 60_000));
    throw new DomainError(
      'rate_limited',
      `Too many requests from this address. Try again in ${minutes} ${minutes === 1 ? 'minute' : 'minutes'}.`,
      { retryAfterS: minutes * 60 },
    );
  }
  const accountKey = limitKey(`${kind}-account`, email);
  const perAccount = await checkLimits([{ key: accountKey, limit: limits.perAccount }], limits.windowMs);
  await countAttempt(perAccount.allowed ? [addressKey, accountKey] : [addressKey], limits.windowMs);
  if (!perAccount.allowed) return null;
  return User.findOne({ where: { email }, attributes: ['id', 'name', 'email', 'emailConfirmedAt'] });
}
