import 'server-only';
import { DomainError } from '@/lib/errors';
import { createHash, randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { z } from 'zod';

import { config } from '@/lib/config';
import { getSequelize } from '@/lib/db';
import { checkLimits, clearFailures, countAttempt, limitKey } from '@/lib/rate-limit';
import { AccountLink, MailMessage, User, type LinkPurpose } from '@/models';

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

const linkUrl = (page: string, token: string) =>
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

/** The live link with this token (not used, not expired); "expired" when there is none. */
export async function liveLink(token: string, purpose: LinkPurpose, now = new Date()): Promise<AccountLink> {
  const link = await AccountLink.findOne({
    where: { tokenHash: hashLinkToken(token), purpose, usedAt: null, expiresAt: { [Op.gt]: now } },
  });
  if (!link) throw expiredLink();
  return link;
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

/**
 * A new link for the person (`issueLink`) and the e-mail that carries it, queued in the outbox in the same
 * transaction (the caller hands it to `deliverSoon` once committed). `lines` is the text after the
 * greeting, given the link's address.
 */
export async function queueLinkMail(
  user: Pick<User, 'id' | 'name' | 'email'>,
  mail: {
    purpose: LinkPurpose;
    ttlMs: number;
    /** The page that opens the link. */
    page: string;
    subject: string;
    lines: (url: string) => string[];
  },
  transaction: Transaction,
): Promise<MailMessage> {
  const { token, link } = await issueLink(user.id, mail.purpose, mail.ttlMs, transaction);
  return MailMessage.create(
    {
      kind: mail.purpose,
      toEmail: user.email,
      toUserId: user.id,
      subject: mail.subject,
      body: [`Hello ${user.name},`, '', ...mail.lines(linkUrl(mail.page, token))].join('\n'),
      dedupeKey: `${mail.purpose}:${link.id}`,
    },
    { transaction },
  );
}

/**
 * Opens a live link (found with `liveLink`): uses it up, confirms the person's address (opening the
 * e-mailed link proves they hold it) and makes the link's own change (`change`) in one transaction.
 * "Expired" when another request used it first or the account is gone. Afterwards earlier wrong
 * guesses at the account's password no longer slow its owner's sign-in. Returns the account's address.
 */
export async function openLink(
  link: AccountLink,
  now: Date,
  change: (userId: number, transaction: Transaction) => Promise<void> = async () => {},
): Promise<string> {
  const email = await getSequelize().transaction(async (transaction) => {
    // Of two requests with one link, only one goes on.
    if (!(await useLink(link, now, transaction))) throw expiredLink();
    const user = await User.findByPk(link.userId, { attributes: ['id', 'email'], transaction });
    if (!user) throw expiredLink();
    await User.update(
      { emailConfirmedAt: now },
      { where: { id: user.id, emailConfirmedAt: null }, transaction },
    );
    await change(user.id, transaction);
    return user.email;
  });
  await clearFailures(limitKey('account', email));
  return email;
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
