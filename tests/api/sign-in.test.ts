import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { newSessionId } from '@/lib/auth/ended-sessions';
import * as enclosures from '@/app/api/enclosures/route';
import * as signUpRoute from '@/app/api/sign-up/route';
import * as confirmRoute from '@/app/api/sign-up/confirm/route';
import { authOptions, authorizeCredentials, SIGN_IN_LIMITS } from '@/lib/auth';
import { delayAfter } from '@/lib/auth/credentials';
import { signInErrorMessage } from '@/lib/auth/messages';
import { STARTING_LAMP_TYPES } from '@/lib/lamp-types/starting-lamp-types';
import { STARTING_SHEETS } from '@/lib/species/starting-sheets';
import { CatalogueSeeding, LampType, Organisation, SignInAttempt, SpeciesSheet, User } from '@/models';
import { settleMail } from '@/lib/auth/mail-soon';
import { clearMail, firstLink, listMail, waitForMail } from '../helpers/mail';
import { closeDatabase, createMember, resetDatabase } from '../helpers/db';
import { call, sessionCookie } from './http';
import { trustOneProxy } from './trust-proxy';

afterAll(closeDatabase);

let org: Organisation;
let alice: User;
let bob: User;
let password: string;

beforeEach(async () => {
  await resetDatabase();
  ({ organisation: org, user: alice, password } = await createMember('staff'));
  ({ user: bob } = await createMember('keeper', org));
});

// One trusted proxy in front (TRUST_PROXY=1): it appends the address it was reached from; anything before
// that entry is whatever the client wrote.
const from = (ip: string) => ({ 'x-forwarded-for': `10.0.0.1, ${ip}` });
trustOneProxy();

/** What the sign-in page shows for a refusal (next-auth forwards the thrown message as the error code). */
async function refusal(p: Promise<unknown>): Promise<string> {
  try {
    await p;
  } catch (e) {
    return signInErrorMessage((e as Error).message);
  }
  throw new Error('sign-in was not refused');
}

describe('credentials sign-in', () => {
  it('signs in with the right password, whatever the e-mail case', async () => {
    const user = await authorizeCredentials(
      { email: alice.email.toUpperCase(), password },
      from('203.0.113.5'),
    );
    expect(user).toEqual({ id: String(alice.id), email: alice.email, name: alice.name });
  });

  it('refuses a wrong password with a clear message and no session', async () => {
    const message = await refusal(
      authorizeCredentials({ email: alice.email, password: 'wrong-password-1' }, from('203.0.113.5')),
    );
    expect(message).toMatch(/^That email and password do not match/);
    // An unknown e-mail gets exactly the same answer (no account discovery).
    const unknown = await refusal(
      authorizeCredentials({ email: 'nobody@example.com', password }, from('203.0.113.5')),
    );
    expect(unknown).toBe(message);
    // No session: the API still answers 401 to a request without a cookie.
    const r = await call(enclosures.GET, { path: `/api/enclosures?organisationId=${org.id}` });
    expect(r.status).toBe(401);
  });

  it('slows one address on one account down with growing waits, without counting tries made during a wait', async () => {
    // The clock stands still (a slow machine must not let a wait lapse mid-test); it is moved by hand.
    const start = Date.now();
    vi.useFakeTimers({ now: start, toFake: ['Date'] });
    try {
      const wrong = (i: number) =>
        refusal(
          authorizeCredentials({ email: alice.email, password: `wrong-${i}-pw` }, from('198.51.100.7')),
        );
      for (let i = 0; i < SIGN_IN_LIMITS.pairFreeFailures; i++)
        expect(await wrong(i)).toMatch(/^That email and password do not match/);
      // The next try, even with the right password, has to wait; it is not checked, and not counted.
      const waiting = await refusal(
        authorizeCredentials({ email: alice.email, password }, from('198.51.100.7')),
      );
      expect(waiting).toMatch(
        /^Too many wrong passwords for this account\. Wait 1 second, then try again\.$/,
      );
      for (let i = 0; i < 5; i++) await wrong(99);
      const counters = await SignInAttempt.findAll();
      expect(Math.max(...counters.map((c) => c.count))).toBe(SIGN_IN_LIMITS.pairFreeFailures);
      // One more wrong password after the wait doubles the next one.
      vi.setSystemTime(start + 1500);
      await wrong(100);
      expect(await wrong(101)).toMatch(/Wait 2 seconds/);
      // Once the wait has passed, the right password signs in (nothing is locked).
      vi.setSystemTime(start + 4000);
      const user = await authorizeCredentials({ email: alice.email, password }, from('198.51.100.7'));
      expect(user.id).toBe(String(alice.id));
    } finally {
      vi.useRealTimers();
    }
    // The table holds hashes, never the e-mail or address in the clear.
    const keys = (await SignInAttempt.findAll()).map((r) => r.key).join(' ');
    expect(keys).not.toContain(alice.email);
    expect(keys).not.toContain('198.51.100.7');
  });

  it('keeps brute force slow: the wait doubles to 15 minutes for one address, one minute account-wide', () => {
    const { pairFreeFailures: free, pairMaxDelayMs, accountFreeFailures, accountMaxDelayMs } = SIGN_IN_LIMITS;
    expect(delayAfter(free - 1, free, pairMaxDelayMs)).toBe(0);
    expect([0, 1, 2, 3].map((k) => delayAfter(free + k, free, pairMaxDelayMs))).toEqual([
      1000, 2000, 4000, 8000,
    ]);
    expect(delayAfter(free + 40, free, pairMaxDelayMs)).toBe(15 * 60_000);
    expect(delayAfter(accountFreeFailures + 40, accountFreeFailures, accountMaxDelayMs)).toBe(60_000);
    // Guesses one address can make at one account in a day once at the cap, and across accounts.
    expect((24 * 3600_000) / pairMaxDelayMs).toBe(96);
    expect(SIGN_IN_LIMITS.perAddress * ((24 * 3600_000) / SIGN_IN_LIMITS.windowMs)).toBe(1920);
  });

  it('an attacker elsewhere cannot keep the owner out', async () => {
    // The clock stands still while the guesses are made: on a busy machine they take longer than the delay
    // they earn, which would let the last sign-in through for the wrong reason.
    vi.useFakeTimers({ now: Date.now(), toFake: ['Date'] });
    try {
      await attackedFromElsewhere();
    } finally {
      vi.useRealTimers();
    }
  });

  async function attackedFromElsewhere() {
    // The owner signed in from home before.
    await authorizeCredentials({ email: alice.email, password }, from('192.0.2.10'));
    // Then many addresses guess wrong, far past every free try.
    for (let i = 0; i < 12; i++) {
      await refusal(
        authorizeCredentials({ email: alice.email, password: `guess-${i}-pw` }, from(`203.0.113.${i + 1}`)),
      );
    }
    // From home: in at once.
    expect((await authorizeCredentials({ email: alice.email, password }, from('192.0.2.10'))).id).toBe(
      String(alice.id),
    );
    // From a new address: at most the account-wide cap to wait (a minute), never a lock.
    for (let i = 0; i < 12; i++) {
      await refusal(
        authorizeCredentials({ email: alice.email, password: `guess-${i}-pw` }, from(`203.0.113.${i + 1}`)),
      );
    }
    const elsewhere = await refusal(
      authorizeCredentials({ email: alice.email, password }, from('192.0.2.77')),
    );
    const seconds = Number(/Wait (\d+) seconds?/.exec(elsewhere)?.[1]);
    expect(seconds).toBeGreaterThan(0);
    expect(seconds).toBeLessThanOrEqual(SIGN_IN_LIMITS.accountMaxDelayMs / 1000);
    vi.setSystemTime(Date.now() + SIGN_IN_LIMITS.accountMaxDelayMs + 1000);
    expect((await authorizeCredentials({ email: alice.email, password }, from('192.0.2.77'))).id).toBe(
      String(alice.id),
    );
    // Another account is untouched throughout.
    expect((await authorizeCredentials({ email: bob.email, password }, from('203.0.113.1'))).id).toBe(
      String(bob.id),
    );
  }

  it('a forged X-Forwarded-For entry does not give a fresh address', async () => {
    vi.useFakeTimers({ now: Date.now(), toFake: ['Date'] });
    try {
      // The proxy appends the real address; what the client wrote in front of it changes nothing.
      const forged = (i: number) => ({ 'x-forwarded-for': `10.9.9.${i}, 198.51.100.20` });
      for (let i = 0; i < SIGN_IN_LIMITS.pairFreeFailures; i++)
        await refusal(authorizeCredentials({ email: alice.email, password: `wrong-${i}-pw` }, forged(i)));
      expect(await refusal(authorizeCredentials({ email: alice.email, password }, forged(50)))).toMatch(
        /^Too many/,
      );
    } finally {
      vi.useRealTimers();
    }
  });

  it('limits one address trying many accounts', async () => {
    for (let i = 0; i < SIGN_IN_LIMITS.perAddress; i++) {
      await refusal(
        authorizeCredentials(
          { email: `guess${i}@example.com`, password: 'guess-password-1' },
          from('198.51.100.8'),
        ),
      );
    }
    expect(await refusal(authorizeCredentials({ email: bob.email, password }, from('198.51.100.8')))).toMatch(
      /^Too many sign-in attempts/,
    );
    // Bob himself, from his own address, is not affected.
    expect((await authorizeCredentials({ email: bob.email, password }, from('192.0.2.45'))).id).toBe(
      String(bob.id),
    );
  });

  it('a successful sign-in clears the counters of the account', async () => {
    for (let i = 0; i < SIGN_IN_LIMITS.pairFreeFailures - 1; i++) {
      await refusal(
        authorizeCredentials({ email: alice.email, password: 'not-her-password' }, from('198.51.100.9')),
      );
    }
    await authorizeCredentials({ email: alice.email, password }, from('198.51.100.9'));
    for (let i = 0; i < SIGN_IN_LIMITS.pairFreeFailures - 1; i++) {
      await refusal(
        authorizeCredentials({ email: alice.email, password: 'not-her-password' }, from('198.51.100.9')),
      );
    }
    expect((await authorizeCredentials({ email: alice.email, password }, from('198.51.100.9'))).id).toBe(
      String(alice.id),
    );
  });
});

describe('sessions', () => {
  it('carries the user id, session version and memberships in the token and session', async () => {
    const jwt = authOptions.callbacks!.jwt!;
    const token = await jwt({
      token: { sub: String(alice.id) } as never,
      user: { id: String(alice.id), email: alice.email, name: alice.name },
      account: null,
      trigger: 'signIn',
    });
    expect(token).toMatchObject({
      uid: alice.id,
      sv: 1,
      memberships: [{ organisationId: org.id, organisationName: org.name, role: 'staff' }],
    });
    const session = await authOptions.callbacks!.session!({
      session: { user: {}, expires: '' } as never,
      token,
      user: undefined as never,
      newSession: undefined,
      trigger: 'update',
    });
    expect(session.user).toMatchObject({ id: alice.id, sessionVersion: 1, email: alice.email });
  });

  it('ends a session within a minute of a bumped session version', async () => {
    const jwt = authOptions.callbacks!.jwt!;
    const base = { sub: String(alice.id), uid: alice.id, sv: 1, sid: newSessionId(), memberships: [] };
    await User.increment('sessionVersion', { where: { id: alice.id } });
    // Checked 10 s ago: still trusted until the minute is up.
    const recent = await jwt({ token: { ...base, checkedAt: Date.now() - 10_000 }, account: null } as never);
    expect(recent.uid).toBe(alice.id);
    // Checked 61 s ago: re-checked against the database and refused (next-auth then clears the cookie).
    await expect(
      jwt({ token: { ...base, checkedAt: Date.now() - 61_000 }, account: null } as never),
    ).rejects.toThrow();
    // The API does not wait for the minute: the very next request with the old cookie is refused.
    const cookie = await sessionCookie(alice, 1);
    const r = await call(enclosures.GET, { path: `/api/enclosures?organisationId=${org.id}`, cookie });
    expect(r.status).toBe(401);
  });

  it('refreshes memberships on the periodic check', async () => {
    const jwt = authOptions.callbacks!.jwt!;
    const { organisation: second } = await createMember('owner');
    await second.reload();
    const { Membership } = await import('@/models');
    await Membership.create({ organisationId: second.id, userId: alice.id, role: 'keeper' });
    const token = await jwt({
      token: {
        sub: String(alice.id),
        uid: alice.id,
        sv: 1,
        sid: newSessionId(),
        memberships: [],
        checkedAt: 0,
      },
      account: null,
    } as never);
    expect(token.memberships?.map((m) => m.organisationId).sort()).toEqual([org.id, second.id].sort());
  });
});

describe('POST /api/sign-up', () => {
  const body = {
    name: 'Nell Quarry',
    email: 'nell.quarry@example.com',
    password: 'a-long-enough-password',
    organisationName: 'Quarry Household',
  };

  it('creates the account and an organisation it owns; the password signs in once the e-mailed link confirms it', async () => {
    await clearMail();
    const r = await call(signUpRoute.POST, { method: 'POST', path: '/api/sign-up', body });
    expect(r.status).toBe(201);
    await expect(
      authorizeCredentials({ email: body.email, password: body.password }, from('192.0.2.1')),
    ).rejects.toThrow();
    await settleMail();
    const link = new URL(
      firstLink(await waitForMail(body.email, { subject: 'Confirm your new Baskwell account' })),
    );
    expect(link.pathname).toBe('/confirm-account');
    const token = new URLSearchParams(link.hash.slice(1)).get('token');
    const confirmed = await call(confirmRoute.POST, {
      method: 'POST',
      path: '/api/sign-up/confirm',
      body: { token },
    });
    expect(confirmed.status).toBe(200);
    const user = await authorizeCredentials(
      { email: body.email, password: body.password },
      from('192.0.2.1'),
    );
    const { memberships } = await import('@/lib/auth/session-user');
    expect(await memberships(Number(user.id))).toEqual([
      {
        organisationId: expect.any(Number),
        organisationName: 'Quarry Household',
        role: 'owner',
        exampleData: false,
      },
    ]);
    const stored = await User.scope('withPassword').findOne({ where: { email: body.email } });
    expect(stored?.passwordHash).toMatch(/^\$2[aby]\$/);
    expect(stored?.passwordHash).not.toContain(body.password);
  });

  it('gives the new organisation its starting species sheets and lamp types at once', async () => {
    const r = await call(signUpRoute.POST, { method: 'POST', path: '/api/sign-up', body });
    expect(r.status).toBe(201);
    const organisationId = (await Organisation.findOne({ where: { name: body.organisationName } }))!.id;
    const sheets = await SpeciesSheet.findAll({ where: { organisationId }, attributes: ['seedKey'] });
    expect(sheets.map((s) => s.seedKey).sort()).toEqual(STARTING_SHEETS.map((s) => s.seedKey).sort());
    const lampTypes = await LampType.findAll({ where: { organisationId }, attributes: ['presetKey'] });
    expect(lampTypes.map((l) => l.presetKey).sort()).toEqual(
      STARTING_LAMP_TYPES.map((l) => l.presetKey).sort(),
    );
    expect(await CatalogueSeeding.findByPk(organisationId)).not.toBeNull();
  });

  it.each([
    ['password', { password: 'short-pass' }, 'at least 12'],
    ['email', { email: 'not-an-email' }, 'valid e-mail'],
    ['name', { name: '' }, 'Enter a name'],
    ['organisationName', { organisationName: '' }, 'organisation'],
  ])('answers 400 naming %s', async (field, patch, words) => {
    const r = await call(signUpRoute.POST, {
      method: 'POST',
      path: '/api/sign-up',
      body: { ...body, ...patch },
    });
    expect(r.status).toBe(400);
    expect(r.body.error.field).toBe(field);
    expect(r.body.error.message).toContain(words);
  });

  it('answers an address that already has an account exactly like a new one, and e-mails its owner', async () => {
    await clearMail();
    const fresh = await call(signUpRoute.POST, { method: 'POST', path: '/api/sign-up', body });
    const before = { users: await User.count(), organisations: await Organisation.count() };
    const taken = await call(signUpRoute.POST, {
      method: 'POST',
      path: '/api/sign-up',
      body: { ...body, email: alice.email.toUpperCase(), password: 'someone-elses-password' },
    });
    expect(taken.status).toBe(fresh.status);
    expect(taken.text).toBe(fresh.text);
    expect(fresh.body).toEqual({ ok: true });
    // Nothing created, nothing changed: the stranger's password does not sign in as Alice.
    expect({ users: await User.count(), organisations: await Organisation.count() }).toEqual(before);
    await expect(
      authorizeCredentials({ email: alice.email, password: 'someone-elses-password' }, from('192.0.2.3')),
    ).rejects.toThrow();
    // Alice hears of it by e-mail, once per hour however often it is tried.
    await settleMail();
    const mail = await waitForMail(alice.email, { subject: 'tried to create a Baskwell account' });
    expect(mail.text).toContain('/forgot-password');
    await call(signUpRoute.POST, {
      method: 'POST',
      path: '/api/sign-up',
      body: { ...body, email: alice.email },
    });
    await settleMail();
    expect(await listMail(alice.email)).toHaveLength(1);
  });
});
