// A new account is confirmed by a single-use link e-mailed through the outbox and the fake SMTP server
// before it can sign in; nothing a stranger sees (sign-up's answer, sign-in's refusal, "send the link
// again") tells whether an address already had an account.
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import * as accept from '@/app/api/invitations/accept/route';
import * as invitations from '@/app/api/invitations/route';
import * as confirm from '@/app/api/sign-up/confirm/route';
import * as resend from '@/app/api/sign-up/resend/route';
import * as signUpRoute from '@/app/api/sign-up/route';
import { authorizeCredentials } from '@/lib/auth/credentials';
import { settleMail } from '@/lib/auth/mail-soon';
import { signInErrorMessage } from '@/lib/auth/messages';
import { CONFIRM_LIMITS, CONFIRM_TTL_MS, RESEND_ANSWER } from '@/lib/auth/sign-up';
import { AccountLink, Membership, Organisation, User } from '@/models';
import { closeDatabase, createMember, createUser, resetDatabase } from '../helpers/db';
import { clearMail, firstLink, listMail, waitForMail } from '../helpers/mail';
import { call } from './http';
import { trustOneProxy } from './trust-proxy';

afterAll(closeDatabase);
trustOneProxy();

let address = 0;
beforeEach(async () => {
  await resetDatabase();
  await clearMail();
  address++;
});

/** Each test comes from its own client address, so one test's per-address counts do not reach the next. */
const from = (n = address) => ({ 'x-forwarded-for': `10.0.0.1, 198.51.100.${n}` });

const body = (patch: Record<string, string> = {}) => ({
  name: 'Wren Hollis',
  email: `wren.hollis.${address}@example.com`,
  password: 'a-long-enough-password',
  organisationName: 'Hollis Household',
  ...patch,
});

const signUp = (b: ReturnType<typeof body>) =>
  call(signUpRoute.POST, { method: 'POST', path: '/api/sign-up', body: b, headers: from() });

const confirmWith = (token: string | null) =>
  call(confirm.POST, { method: 'POST', path: '/api/sign-up/confirm', body: { token } });

const askAgain = (email: string, n = address) =>
  call(resend.POST, { method: 'POST', path: '/api/sign-up/resend', body: { email }, headers: from(n) });

/** The token of the newest confirmation link e-mailed to `email`, read the way a person would. */
async function mailedToken(email: string): Promise<string> {
  await settleMail();
  const link = new URL(firstLink(await waitForMail(email, { subject: 'Confirm your new Baskwell account' })));
  expect(link.pathname).toBe('/confirm-account');
  const token = new URLSearchParams(link.hash.slice(1)).get('token');
  expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
  return token!;
}

/** What the sign-in page shows for this e-mail and password (or 'signed in'). */
async function signInOutcome(email: string, password: string): Promise<string> {
  try {
    await authorizeCredentials({ email, password }, from());
    return 'signed in';
  } catch (e) {
    return signInErrorMessage((e as Error).message);
  }
}

describe('sign-up confirmation', () => {
  it('e-mails a single-use link, stores only its hash, and signs in only after it is followed', async () => {
    const b = body();
    expect((await signUp(b)).status).toBe(201);
    const user = await User.findOne({ where: { email: b.email } });
    expect(user?.emailConfirmedAt).toBeNull();
    expect(await signInOutcome(b.email, b.password)).toMatch(/confirmation link/);

    const token = await mailedToken(b.email);
    const rows = await AccountLink.findAll({ where: { userId: user!.id } });
    expect(rows).toHaveLength(1);
    expect(rows[0]!.purpose).toBe('confirm-account');
    expect(rows[0]!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(rows[0]!.tokenHash).not.toContain(token);
    const ttl = rows[0]!.expiresAt.getTime() - rows[0]!.createdAt.getTime();
    expect(Math.abs(ttl - CONFIRM_TTL_MS)).toBeLessThan(2000);

    expect((await confirmWith(token)).status).toBe(200);
    expect(await signInOutcome(b.email, b.password)).toBe('signed in');
    // Used once, it never works again.
    const again = await confirmWith(token);
    expect(again.status).toBe(404);
    expect(again.body.error.message).toMatch(/expired or was already used/);
  });

  it('refuses a lapsed link and a made-up one', async () => {
    const b = body();
    await signUp(b);
    const token = await mailedToken(b.email);
    await AccountLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: {} });
    expect((await confirmWith(token)).status).toBe(404);
    expect((await confirmWith('A'.repeat(43))).status).toBe(404);
    expect((await confirmWith('short')).status).toBe(400);
    expect(await signInOutcome(b.email, b.password)).not.toBe('signed in');
  });

  it('refuses an unconfirmed account with the right password exactly like a wrong password', async () => {
    // Sign up, then sign in with the same password: an existing address and a new one must look alike.
    const { user: existing } = await createUser({ email: `existing.${address}@example.com` });
    const fresh = body();
    await signUp(fresh);
    await signUp(body({ email: existing.email }));
    const newOne = await signInOutcome(fresh.email, fresh.password);
    const taken = await signInOutcome(existing.email, fresh.password);
    expect(newOne).toBe(taken);
    expect(newOne).toMatch(/^That email and password do not match/);
  });

  it('lets the newest sign-up with a still unconfirmed address replace the pending details; only its link works', async () => {
    const first = body({ password: 'the-first-long-password' });
    await signUp(first);
    const firstToken = await mailedToken(first.email);
    await clearMail();
    const second = body({ password: 'the-second-long-password', organisationName: 'Renamed Household' });
    expect((await signUp(second)).status).toBe(201);
    const secondToken = await mailedToken(second.email);
    expect(await User.count({ where: { email: first.email } })).toBe(1);
    expect((await confirmWith(firstToken)).status).toBe(404);
    expect((await confirmWith(secondToken)).status).toBe(200);
    expect(await signInOutcome(first.email, first.password)).not.toBe('signed in');
    expect(await signInOutcome(second.email, second.password)).toBe('signed in');
    const user = await User.findOne({ where: { email: second.email } });
    const owned = await Membership.findAll({ where: { userId: user!.id } });
    expect(owned).toHaveLength(1);
    expect((await Organisation.findByPk(owned[0]!.organisationId))?.name).toBe('Renamed Household');
  });

  it('sends the link again with one answer for every address, e-mailing only an account still waiting', async () => {
    const pending = body();
    await signUp(pending);
    await mailedToken(pending.email);
    await clearMail();
    const { user: confirmed } = await createUser();
    const answers = [
      await askAgain(pending.email),
      await askAgain(confirmed.email),
      await askAgain(`nobody.${address}@example.com`),
    ];
    for (const a of answers) {
      expect(a.status).toBe(200);
      expect(a.text).toBe(answers[0]!.text);
    }
    expect(answers[0]!.body).toEqual(RESEND_ANSWER);
    const token = await mailedToken(pending.email);
    expect(await listMail(confirmed.email)).toHaveLength(0);
    expect((await confirmWith(token)).status).toBe(200);
  });

  it('limits "send it again" per client address (429) and, silently, per account', async () => {
    const pending = body();
    await signUp(pending);
    // Sign-up sent one link; the account gets at most the limit in all, however often it is asked.
    for (let i = 0; i < CONFIRM_LIMITS.perAccount + 2; i++) {
      expect((await askAgain(pending.email, 100 + i)).status).toBe(200);
    }
    await settleMail();
    expect((await listMail(pending.email)).length).toBeLessThanOrEqual(CONFIRM_LIMITS.perAccount);
    for (let i = 0; i < CONFIRM_LIMITS.perAddress; i++) await askAgain(`x${i}.${address}@example.com`);
    const limited = await askAgain(pending.email);
    expect(limited.status).toBe(429);
    expect(limited.res.headers.get('retry-after')).toMatch(/^\d+$/);
  });

  it('confirms an account by accepting an invitation e-mailed to its address', async () => {
    const { organisation, user: owner } = await createMember('owner');
    const pending = body();
    await signUp(pending);
    await settleMail();
    const invited = await call(invitations.POST, {
      method: 'POST',
      path: '/api/invitations',
      as: owner,
      body: { organisationId: organisation.id, email: pending.email, role: 'keeper' },
    });
    expect(invited.status).toBe(201);
    const mail = await waitForMail(pending.email, { subject: organisation.name });
    const token = /\/invite\/([A-Za-z0-9_-]{43})/.exec(mail.text)?.[1];
    const accepted = await call(accept.POST, {
      method: 'POST',
      path: '/api/invitations/accept',
      body: { token, name: 'Wren Invited', password: 'the-invited-long-password' },
    });
    expect(accepted.status).toBe(201);
    // The invited person's password, not the unproven sign-up's, now signs in.
    expect(await signInOutcome(pending.email, 'the-invited-long-password')).toBe('signed in');
    expect(await signInOutcome(pending.email, pending.password)).not.toBe('signed in');
  });
});
