import 'server-only';
import { z } from 'zod';
import { ApiError, conflict } from '@/lib/api/errors';
import { emailSchema, organisationNameSchema, personNameSchema } from '@/lib/api/schemas';
import { getSequelize } from '@/lib/db';
import { checkLimits, countAttempt, limitKey } from '@/lib/rate-limit';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { Membership, Organisation, User } from '@/models';
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
 * Creates the account and its organisation, with the new user as owner, and gives the organisation its
 * starting species sheets and lamp types in the same transaction: the first page it sees is usable.
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
  if (await User.findOne({ where: { email: input.email }, attributes: ['id'] })) {
    throw conflict('An account with this e-mail already exists. Sign in instead.', 'account_exists');
  }
  const passwordHash = await hashPassword(input.password);
  return sequelize.transaction(async (transaction) => {
    const user = await User.create({ email: input.email, name: input.name, passwordHash }, { transaction });
    const organisation = await Organisation.create({ name: input.organisationName }, { transaction });
    await Membership.create(
      { organisationId: organisation.id, userId: user.id, role: 'owner' },
      { transaction },
    );
    await seedStartingCatalogue(organisation.id, { transaction });
    return { userId: user.id, organisationId: organisation.id };
  });
}
