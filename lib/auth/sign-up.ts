import 'server-only';
import { DomainError } from '@/lib/errors';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { z } from 'zod';

import { emailSchema, organisationNameSchema, personNameSchema } from '@/lib/api/schemas';
import { config } from '@/lib/config';
import { getSequelize } from '@/lib/db';
import { checkLimits, countAttempt, limitKey } from '@/lib/rate-limit';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { MailMessage, Membership, Organisation, User } from '@/models';
import { limitedLinkRequest, linkTokenSchema, liveLink, openLink, queueLinkMail } from './account-links';
import { deliverSoon } from './mail-soon';
import { hashPassword, newPasswordSchema } from './password';

export const signUpBody = z.object({
  name: personNameSchema,
  email: emailSchema,
  password: newPasswordSchema,
  organisationName: organisationNameSchema,
});

/** Account creation is limited per client address, so a script cannot mass-create accounts. */
export const SIGN_UP_LIMIT = { perAddress: 10, windowMs: 60 * 60_000 } as const;

/**
 * What sign-up answers, whether the address was new or already had an account: the answer never tells
 * a stranger which addresses have accounts. Either way the rest happens by e-mail: a new account gets
 * a link that confirms it (it cannot sign in before), the owner of an existing one is told of the try.
 */
export const SIGN_UP_ANSWER = { ok: true } as const;

/** How long a confirmation link works. Another can be asked for from the sign-in page. */
export const CONFIRM_TTL_MS = 2 * 3600_000;

/**
 * Confirmation links are e-mailed at most `perAccount` times per window to one address (silently: the
 * answer stays the same), and "send it again" is limited per client address (429).
 */
export const CONFIRM_LIMITS = { perAddress: 10, perAccount: 5, windowMs: 60 * 60_000 } as const;

export const confirmBody = z.strictObject({ token: linkTokenSchema });
export const resendBody = z.strictObject({ email: emailSchema });

/** What "send the link again" answers, whatever the address. */
export const RESEND_ANSWER = {
  ok: true,
  message:
    'If that address has an account waiting for confirmation, we have e-mailed it a new link. The link works once, for 2 hours. An account that is already confirmed gets no e-mail: check the password, or choose a new one.',
} as const;

/** At most one "someone tried to sign up with your address" e-mail per account in this time. */
export const EXISTING_NOTICE_EVERY_MS = 60 * 60_000;

/**
 * Creates the account (not yet confirmed) and its organisation, with the new user as owner, and gives
 * the organisation its starting species sheets and lamp types in the same transaction: the first page it
 * sees is usable. Then e-mails the link that confirms the account.
 * For an address that already has a confirmed account nothing is created or changed: its owner gets an
 * e-mail. An account still waiting for confirmation has never been usable and nobody has proved they
 * hold its address, so the newest sign-up replaces its name, password and organisation name, and a new
 * link (the only one that works) is sent: whoever holds the address confirms what they last submitted.
 */
export async function signUp(input: z.output<typeof signUpBody>, address: string) {
  const sequelize = getSequelize();
  const key = limitKey('sign-up', address);
  const verdict = await checkLimits([{ key, limit: SIGN_UP_LIMIT.perAddress }], SIGN_UP_LIMIT.windowMs);
  if (!verdict.allowed) {
    const minutes = Math.max(1, Math.ceil(verdict.retryAfterMs / 60_000));
    throw new DomainError(
      'rate_limited',
      `Too many new accounts from this address. Try again in ${minutes} minutes.`,
      { retryAfterS: minutes * 60 },
    );
  }
  await countAttempt([key], SIGN_UP_LIMIT.windowMs);
  // Hashed either way, so both paths spend the same password work.
  const passwordHash = await hashPassword(input.password);
  const existing = await User.findOne({
    where: { email: input.email },
    attributes: ['id', 'name', 'email', 'emailConfirmedAt'],
  });
  if (existing?.emailConfirmedAt) {
    await tellExistingOwner(existing);
    return SIGN_UP_ANSWER;
  }
  const accountKey = limitKey('confirm-account', input.email);
  const mayMail = (
    await checkLimits([{ key: accountKey, limit: CONFIRM_LIMITS.perAccount }], CONFIRM_LIMITS.windowMs)
  ).allowed;
  if (mayMail) await countAttempt([accountKey], CONFIRM_LIMITS.windowMs);
  let mail: MailMessage | undefined;
  try {
    mail = await sequelize.transaction(async (transaction) => {
      let user: Pick<User, 'id' | 'name' | 'email'>;
      if (existing) {
        const [replaced] = await User.update(
          { name: input.name, passwordHash },
          { where: { id: existing.id, emailConfirmedAt: null }, transaction },
        );
        // Confirmed a moment ago: it is no longer a pending sign-up to replace.
        if (replaced !== 1) return undefined;
        const owned = await Membership.findAll({
          where: { userId: existing.id, role: 'owner' },
          attributes: ['organisationId'],
          transaction,
        });
        await Organisation.update(
          { name: input.organisationName },
          { where: { id: owned.map((m) => m.organisationId) }, transaction },
        );
        user = { id: existing.id, email: existing.email, name: input.name };
      } else {
        user = await User.create({ email: input.email, name: input.name, passwordHash }, { transaction });
        const organisation = await Organisation.create({ name: input.organisationName }, { transaction });
        await Membership.create(
          { organisationId: organisation.id, userId: user.id, role: 'owner' },
          { transaction },
        );
        await seedStartingCatalogue(organisation.id, { transaction });
      }
      return mayMail ? queueConfirmMail(user, transaction) : undefined;
    });
  } catch (e) {
    // Two sign-ups with one address at the same moment: the other one made the account and sent its link.
    if (!(e instanceof UniqueConstraintError)) throw e;
  }
  if (mail) deliverSoon(mail.id);
  return SIGN_UP_ANSWER;
}

function queueConfirmMail(
  user: Pick<User, 'id' | 'name' | 'email'>,
  transaction: Transaction,
): Promise<MailMessage> {
  return queueLinkMail(
    user,
    {
      purpose: 'confirm-account',
      ttlMs: CONFIRM_TTL_MS,
      page: '/confirm-account',
      subject: 'Confirm your new Baskwell account',
      lines: (url) => [
        'Someone (we hope you) created a Baskwell account with this e-mail address.',
        '',
        `Confirm the account: ${url}`,
        '',
        'The link works once, for 2 hours; then sign in with the password you chose.',
        'If you did not create this account, ignore this e-mail: without the link it cannot be used.',
      ],
    },
    transaction,
  );
}

/** "Send the link again", from the sign-in page: the same answer whether or not the address has an account. */
export async function resendConfirmation(input: z.output<typeof resendBody>, address: string) {
  const user = await limitedLinkRequest('confirm', input.email, address, CONFIRM_LIMITS);
  if (user && !user.emailConfirmedAt) {
    const mail = await getSequelize().transaction((transaction) => queueConfirmMail(user, transaction));
    deliverSoon(mail.id);
  }
  return RESEND_ANSWER;
}

/**
 * Confirms the account of a live link (once); its owner then signs in with the password they chose. Tries
 * before confirming were refused like wrong passwords; they no longer slow the first sign-in.
 */
export async function confirmAccount(input: z.output<typeof confirmBody>): Promise<{ email: string }> {
  const now = new Date();
  const link = await liveLink(input.token, 'confirm-account', now);
  return { email: await openLink(link, now) };
}

async function tellExistingOwner(user: Pick<User, 'id' | 'name' | 'email'>): Promise<void> {
  const app = config().APP_URL;
  const bucket = Math.floor(Date.now() / EXISTING_NOTICE_EVERY_MS);
  try {
    const message = await MailMessage.create({
      kind: 'sign-up-existing',
      toEmail: user.email,
      toUserId: user.id,
      subject: 'Someone tried to create a Baskwell account with your address',
      body: [
        `Hello ${user.name},`,
        '',
        'Someone (perhaps you) tried to create a new Baskwell account with this e-mail address. It already',
        'has an account, so nothing was created and nothing about your account was changed.',
        '',
        `If it was you, sign in: ${new URL('/sign-in', app).toString()}`,
        `Forgot your password? Choose a new one: ${new URL('/forgot-password', app).toString()}`,
        '',
        'If it was not you, you can ignore this e-mail.',
      ].join('\n'),
      dedupeKey: `sign-up-existing:${user.id}:${bucket}`,
    });
    deliverSoon(message.id);
  } catch (e) {
    // Already told within the hour: one e-mail is enough, the answer stays the same.
    if (!(e instanceof UniqueConstraintError)) throw e;
  }
}
