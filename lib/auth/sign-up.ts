import 'server-only';
import { UniqueConstraintError } from 'sequelize';
import { z } from 'zod';
import { ApiError } from '@/lib/api/errors';
import { emailSchema, organisationNameSchema, personNameSchema } from '@/lib/api/schemas';
import { config } from '@/lib/config';
import { getSequelize } from '@/lib/db';
import { checkLimits, countAttempt, limitKey } from '@/lib/rate-limit';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { MailMessage, Membership, Organisation, User } from '@/models';
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
 * a stranger which addresses have accounts. The owner of an existing one is told by e-mail instead.
 */
export const SIGN_UP_ANSWER = { ok: true } as const;

/** At most one "someone tried to sign up with your address" e-mail per account in this time. */
export const EXISTING_NOTICE_EVERY_MS = 60 * 60_000;

/**
 * Creates the account and its organisation, with the new user as owner, and gives the organisation its
 * starting species sheets and lamp types in the same transaction: the first page it sees is usable.
 * For an address that already has an account nothing is created or changed: its owner gets an e-mail.
 */
export async function signUp(input: z.output<typeof signUpBody>, address: string) {
  const sequelize = getSequelize();
  const key = limitKey('sign-up', address);
  const verdict = await checkLimits([{ key, limit: SIGN_UP_LIMIT.perAddress }], SIGN_UP_LIMIT.windowMs);
  if (!verdict.allowed) {
    const minutes = Math.max(1, Math.ceil(verdict.retryAfterMs / 60_000));
    throw new ApiError(
      429,
      'rate_limited',
      `Too many new accounts from this address. Try again in ${minutes} minutes.`,
      undefined,
      undefined,
      {
        'Retry-After': String(minutes * 60),
      },
    );
  }
  await countAttempt([key], SIGN_UP_LIMIT.windowMs);
  // Hashed either way, so both paths spend the same password work.
  const passwordHash = await hashPassword(input.password);
  const existing = await User.findOne({ where: { email: input.email }, attributes: ['id', 'name', 'email'] });
  if (existing) {
    await tellExistingOwner(existing);
    return SIGN_UP_ANSWER;
  }
  try {
    await sequelize.transaction(async (transaction) => {
      const user = await User.create({ email: input.email, name: input.name, passwordHash }, { transaction });
      const organisation = await Organisation.create({ name: input.organisationName }, { transaction });
      await Membership.create(
        { organisationId: organisation.id, userId: user.id, role: 'owner' },
        { transaction },
      );
      await seedStartingCatalogue(organisation.id, { transaction });
    });
  } catch (e) {
    // Two sign-ups with one address at the same moment: the other one made the account.
    if (!(e instanceof UniqueConstraintError)) throw e;
  }
  return SIGN_UP_ANSWER;
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
