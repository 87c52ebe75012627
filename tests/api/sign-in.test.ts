import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { newSessionId } from '@/lib/auth/ended-sessions';
import * as enclosures from '@/app/api/enclosures/route';
import * as signUpRoute from '@/app/api/sign-up/route';
import { authOptions, authorizeCredentials, SIGN_IN_LIMITS } from '@/lib/auth';
import { signInErrorMessage } from '@/lib/auth/messages';
import { STARTING_LAMP_TYPES } from '@/lib/lamp-types/starting-lamp-types';
import { STARTING_SHEETS } from '@/lib/species/starting-sheets';
import { CatalogueSeeding, LampType, SignInAttempt, SpeciesSheet, User, type Organisation } from '@/models';
import { closeDatabase, createMember, resetDatabase } from '../helpers/db';
import { call, sessionCookie } from './http';

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

const from = (ip: string) => ({ 'x-forwarded-for': `${ip}, 10.0.0.1` });

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
    expect(message).toBe('That email and password do not match.');
    // An unknown e-mail gets exactly the same answer (no account discovery).
    const unknown = await refusal(
      authorizeCredentials({ email: 'nobody@example.com', password }, from('203.0.113.5')),
    );
    expect(unknown).toBe(message);
    // No session: the API still answers 401 to a request without a cookie.
    const r = await call(enclosures.GET, { path: `/api/enclosures?organisationId=${org.id}` });
    expect(r.status).toBe(401);
  });

  it('refuses the 6th attempt on an account, even with the right password, while others still sign in', async () => {
    for (let i = 0; i < SIGN_IN_LIMITS.perAccount; i++) {
      await refusal(
        authorizeCredentials({ email: alice.email, password: `wrong-${i}-password` }, from('198.51.100.7')),
      );
    }
    const sixth = await refusal(authorizeCredentials({ email: alice.email, password }, from('198.51.100.7')));
    expect(sixth).toMatch(/^Too many sign-in attempts\. Try again in (1[0-5]|[1-9]) minutes?\.$/);
    // The same account from a fresh address is still locked: the limit is per account too.
    expect(await refusal(authorizeCredentials({ email: alice.email, password }, from('192.0.2.99')))).toMatch(
      /^Too many sign-in attempts/,
    );
    // Another account from another address signs in.
    const other = await authorizeCredentials({ email: bob.email, password }, from('192.0.2.44'));
    expect(other.id).toBe(String(bob.id));
    // The table holds hashes, never the e-mail or address in the clear.
    const keys = (await SignInAttempt.findAll()).map((r) => r.key).join(' ');
    expect(keys).not.toContain(alice.email);
    expect(keys).not.toContain('198.51.100.7');
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

  it('a successful sign-in clears the account counter', async () => {
    for (let i = 0; i < SIGN_IN_LIMITS.perAccount - 1; i++) {
      await refusal(
        authorizeCredentials({ email: alice.email, password: 'not-her-password' }, from('198.51.100.9')),
      );
    }
    await authorizeCredentials({ email: alice.email, password }, from('198.51.100.9'));
    await refusal(
      authorizeCredentials({ email: alice.email, password: 'not-her-password' }, from('198.51.100.9')),
    );
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

  it('creates the account and an organisation it owns, then the password signs in', async () => {
    const r = await call(signUpRoute.POST, { method: 'POST', path: '/api/sign-up', body });
    expect(r.status).toBe(201);
    const user = await authorizeCredentials(
      { email: body.email, password: body.password },
      from('192.0.2.1'),
    );
    const { memberships } = await import('@/lib/auth/session-user');
    expect(await memberships(Number(user.id))).toEqual([
      { organisationId: r.body.organisationId, organisationName: 'Quarry Household', role: 'owner' },
    ]);
    const stored = await User.scope('withPassword').findOne({ where: { email: body.email } });
    expect(stored?.passwordHash).toMatch(/^\$2[aby]\$/);
    expect(stored?.passwordHash).not.toContain(body.password);
  });

  it('gives the new organisation its starting species sheets and lamp types at once', async () => {
    const r = await call(signUpRoute.POST, { method: 'POST', path: '/api/sign-up', body });
    expect(r.status).toBe(201);
    const organisationId = r.body.organisationId as number;
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

  it('answers 409 for an e-mail that already has an account', async () => {
    const r = await call(signUpRoute.POST, {
      method: 'POST',
      path: '/api/sign-up',
      body: { ...body, email: alice.email },
    });
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('account_exists');
  });
});
