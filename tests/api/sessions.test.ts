// Ending sessions: "sign out everywhere", a password change and removal from the organisation each end
// every existing session of the person — on the very next request for route handlers and pages (the
// session version is re-read from the database on each), and within SESSION_RECHECK_MS (one minute) for
// next-auth's own /api/auth/session answer, whose JWT callback re-checks the version at most that often.
// Plain sign-out of one session is refused at once everywhere.
import { encode } from 'next-auth/jwt';
import { newSessionId } from '@/lib/auth/ended-sessions';
import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import * as password from '@/app/api/account/password/route';
import * as sessions from '@/app/api/account/sessions/route';
import * as enclosures from '@/app/api/enclosures/route';
import * as members from '@/app/api/organisations/[id]/members/route';
import { decodeSessionCookie, sessionUserFromHeaders } from '@/lib/api/session';
import { authorizeCredentials } from '@/lib/auth/credentials';
import { SESSION_MAX_AGE_S, SESSION_RECHECK_MS, SESSION_REFRESH_MS, authOptions } from '@/lib/auth/options';
import { authSecret } from '@/lib/auth/secret';
import { User, type Organisation } from '@/models';
import {
  FIXTURE_PASSWORD,
  addMember,
  closeDatabase,
  createMember,
  createUser,
  resetDatabase,
} from '../helpers/db';
import { call, sessionCookie } from './http';

afterAll(closeDatabase);

let shop: Organisation;
let owner: User;
let staff: User;

beforeEach(async () => {
  await resetDatabase();
  ({ organisation: shop, user: owner } = await createMember('owner'));
  staff = (await createUser({ name: 'Staff Person', email: 'staff.person@example.com' })).user;
  await addMember(shop, staff, 'staff');
});

/** Any signed-in request: the shop's enclosure list. */
const listAs = (cookie: string) =>
  call(enclosures.GET, { path: `/api/enclosures?organisationId=${shop.id}`, cookie });

/** Two devices of the same person: two cookies issued at different times, same session version. */
async function twoDevices(user: User) {
  const fresh = (await User.findByPk(user.id))!;
  const phone = await sessionCookie(fresh);
  const laptop = await sessionCookie(fresh);
  expect((await listAs(phone)).status).toBe(200);
  expect((await listAs(laptop)).status).toBe(200);
  return { phone, laptop };
}

async function expectEnded(...cookies: string[]) {
  for (const cookie of cookies) {
    const r = await listAs(cookie);
    expect(r.status).toBe(401);
    expect(r.body.error.code).toBe('unauthenticated');
    // Pages use the same check (lib/session.ts → sessionUserFromHeaders): they send the person to sign in.
    expect(await sessionUserFromHeaders(new Headers({ cookie }))).toBeNull();
  }
}

/** The session id inside a cookie made by sessionCookie (or by next-auth itself). */
async function sidOf(cookie: string): Promise<string> {
  const { decode } = await import('next-auth/jwt');
  const token = await decode({ token: cookie.split('=')[1]!, secret: authSecret() });
  return String(token?.sid);
}

describe('plain sign-out', () => {
  const signOut = async (cookie: string) => {
    const { decode } = await import('next-auth/jwt');
    const token = await decode({ token: cookie.split('=')[1]!, secret: authSecret() });
    // What next-auth's sign-out route calls with the decoded cookie before it clears it in the browser.
    await authOptions.events!.signOut!({ token: token!, session: undefined as never });
  };

  it('ends that session on the server: a copy of its cookie is refused, other devices keep theirs', async () => {
    const { phone, laptop } = await twoDevices(staff);
    const copied = phone;
    await signOut(phone);
    await expectEnded(copied);
    expect((await listAs(laptop)).status).toBe(200);
    // next-auth's own session answer refuses it at once too, even inside the minute between full checks.
    const { decode } = await import('next-auth/jwt');
    const token = await decode({ token: copied.split('=')[1]!, secret: authSecret() });
    await expect(
      authOptions.callbacks!.jwt!({ token: { ...token!, checkedAt: Date.now() }, account: null } as never),
    ).rejects.toThrow(/Session ended/);
    const laptopToken = await decode({ token: laptop.split('=')[1]!, secret: authSecret() });
    await expect(
      authOptions.callbacks!.jwt!({
        token: { ...laptopToken!, checkedAt: Date.now() },
        account: null,
      } as never),
    ).resolves.toMatchObject({ uid: staff.id });
  });

  it('refuses a cookie without a session id (one made before sessions had ids, or forged without one)', async () => {
    const user = (await User.findByPk(staff.id))!;
    const bare = await encode({
      token: { sub: String(user.id), uid: user.id, sv: user.sessionVersion, checkedAt: Date.now() },
      secret: authSecret(),
    });
    expect((await listAs(`next-auth.session-token=${bare}`)).status).toBe(401);
  });

  it('keeps the record only until the cookie would have lapsed', async () => {
    const { EndedSession } = await import('@/models');
    const cookie = await sessionCookie(staff);
    await signOut(cookie);
    const row = await EndedSession.findByPk(await sidOf(cookie));
    expect(row?.userId).toBe(staff.id);
    const left = row!.expiresAt.getTime() - Date.now();
    expect(left).toBeGreaterThan(0);
    expect(left).toBeLessThanOrEqual(SESSION_MAX_AGE_S * 1000);
    // Signing out twice is harmless.
    await signOut(cookie);
    expect(await EndedSession.count({ where: { userId: staff.id } })).toBe(1);
  });
});

describe('sign out everywhere', () => {
  it('ends every session of the person, the one that asked included, and no one else', async () => {
    const { phone, laptop } = await twoDevices(staff);
    const ownerCookie = await sessionCookie(owner);
    const r = await call(sessions.DELETE, { method: 'DELETE', path: '/api/account/sessions', cookie: phone });
    expect(r.status).toBe(200);
    expect(r.body).toEqual({ ok: true, signedOut: true });
    await expectEnded(phone, laptop);
    expect((await listAs(ownerCookie)).status).toBe(200);
    // Signing in again gives a session that works.
    const again = await sessionCookie((await User.findByPk(staff.id))!);
    expect((await listAs(again)).status).toBe(200);
  });

  it('needs a session', async () => {
    const r = await call(sessions.DELETE, { method: 'DELETE', path: '/api/account/sessions' });
    expect(r.status).toBe(401);
  });
});

describe('password change', () => {
  const change = (cookie: string, body: unknown) =>
    call(password.PUT, { method: 'PUT', path: '/api/account/password', cookie, body });

  it('refuses a wrong current password and a weak new one, and changes nothing', async () => {
    const { phone } = await twoDevices(staff);
    const wrong = await change(phone, {
      currentPassword: 'not-my-password',
      newPassword: 'a-long-new-password',
    });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.field).toBe('currentPassword');
    const weak = await change(phone, { currentPassword: FIXTURE_PASSWORD, newPassword: 'short' });
    expect(weak.status).toBe(400);
    expect(weak.body.error.field).toBe('newPassword');
    expect((await listAs(phone)).status).toBe(200);
    await expect(
      authorizeCredentials({ email: staff.email, password: FIXTURE_PASSWORD }, {}),
    ).resolves.toMatchObject({ email: staff.email });
  });

  it('ends every session and only the new password signs in', async () => {
    const { phone, laptop } = await twoDevices(staff);
    const r = await change(phone, { currentPassword: FIXTURE_PASSWORD, newPassword: 'a-long-new-password' });
    expect(r.status, r.text).toBe(200);
    await expectEnded(phone, laptop);
    await expect(
      authorizeCredentials({ email: staff.email, password: 'a-long-new-password' }, {}),
    ).resolves.toMatchObject({ email: staff.email });
    await expect(
      authorizeCredentials({ email: staff.email, password: FIXTURE_PASSWORD }, {}),
    ).rejects.toThrow();
  });

  it('slows down repeated wrong current passwords, like sign-in, without locking the account', async () => {
    const { phone } = await twoDevices(staff);
    // The clock stands still (a slow machine must not let the wait lapse mid-test); it is moved by hand.
    const start = Date.now();
    vi.useFakeTimers({ now: start, toFake: ['Date'] });
    try {
      const statuses: number[] = [];
      for (let i = 0; i < 6; i++) {
        const r = await change(phone, { currentPassword: `guess-${i}`, newPassword: 'a-long-new-password' });
        statuses.push(r.status);
      }
      expect(statuses).toEqual([400, 400, 400, 400, 400, 429]);
      // The right password is refused too while the wait lasts.
      const right = await change(phone, {
        currentPassword: FIXTURE_PASSWORD,
        newPassword: 'a-long-new-password',
      });
      expect(right.status).toBe(429);
      const wait = Number(right.res.headers.get('retry-after'));
      expect(wait).toBeGreaterThan(0);
      expect(wait).toBeLessThanOrEqual(60);
      // Once it has passed, the right password works.
      vi.setSystemTime(start + (wait + 1) * 1000);
      const later = await change(phone, {
        currentPassword: FIXTURE_PASSWORD,
        newPassword: 'a-long-new-password',
      });
      expect(later.status, later.text).toBe(200);
    } finally {
      vi.useRealTimers();
    }
  });
});

describe('removal from the organisation', () => {
  it('ends the removed person’s sessions at once', async () => {
    const { phone, laptop } = await twoDevices(staff);
    const r = await call(members.DELETE, {
      method: 'DELETE',
      path: `/api/organisations/${shop.id}/members?userId=${staff.id}`,
      params: { id: shop.id },
      as: owner,
    });
    expect(r.status).toBe(200);
    await expectEnded(phone, laptop);
  });
});

describe('next-auth JWT callback (what /api/auth/session answers)', () => {
  type JwtArgs = Parameters<NonNullable<typeof authOptions.callbacks>['jwt'] & object>[0];
  const jwt = (token: Record<string, unknown>) =>
    authOptions.callbacks!.jwt!({ token, account: null } as unknown as JwtArgs);
  const tokenOf = (user: User, checkedAt: number) => ({
    uid: user.id,
    sv: (user.sessionVersion ?? 1) as number,
    sid: newSessionId(),
    checkedAt,
  });

  it('re-checks the session version in the database once the last check is a minute old', async () => {
    const before = (await User.findByPk(staff.id))!;
    const minuteAgo = Date.now() - SESSION_RECHECK_MS - 1;
    await expect(jwt(tokenOf(before, minuteAgo))).resolves.toMatchObject({ uid: staff.id });
    await call(sessions.DELETE, { method: 'DELETE', path: '/api/account/sessions', as: before });
    // Checked moments ago: trusted until the minute is up (this is the "within a minute").
    await expect(jwt(tokenOf(before, Date.now()))).resolves.toMatchObject({ uid: staff.id });
    // A minute later the database says no, and next-auth drops the cookie.
    await expect(jwt(tokenOf(before, minuteAgo))).rejects.toThrow(/Session ended/);
  });

  it('keeps sessions short-lived: an hour, renewed by open tabs well inside it', () => {
    expect(SESSION_MAX_AGE_S).toBe(3600);
    expect(authOptions.session).toEqual({ strategy: 'jwt', maxAge: SESSION_MAX_AGE_S });
    expect(authOptions.jwt?.maxAge).toBe(SESSION_MAX_AGE_S);
    // A visible tab renews every 10 minutes: a late or throttled timer still renews in time.
    expect(SESSION_REFRESH_MS).toBe(10 * 60_000);
    expect(SESSION_REFRESH_MS * 4).toBeLessThanOrEqual(SESSION_MAX_AGE_S * 1000);
  });

  it('refuses a cookie past its lifetime', async () => {
    const user = (await User.findByPk(staff.id))!;
    const expired = await encode({
      token: {
        sub: String(user.id),
        uid: user.id,
        sv: user.sessionVersion,
        sid: newSessionId(),
        checkedAt: Date.now(),
      },
      secret: authSecret(),
      maxAge: -60,
    });
    const r = await listAs(`next-auth.session-token=${expired}`);
    expect(r.status).toBe(401);
  });
});

describe('the session cookie, decoded once and remembered', () => {
  /** A cookie of the staff member's that lapses `lifetimeS` from now. */
  async function cookieLasting(lifetimeS: number) {
    const user = (await User.findByPk(staff.id))!;
    const token = await encode({
      token: { sub: String(user.id), uid: user.id, sv: user.sessionVersion, sid: newSessionId() },
      secret: authSecret(),
      maxAge: lifetimeS,
    });
    return `next-auth.session-token=${token}`;
  }

  it('refuses a remembered cookie once it has lapsed', async () => {
    const cookie = await cookieLasting(120);
    expect((await sessionUserFromHeaders(new Headers({ cookie })))?.id).toBe(staff.id);
    expect((await listAs(cookie)).status).toBe(200);
    // Only the clock moves: the same cookie text, already decoded, is now past its lifetime (and next-auth's
    // 15 s of leeway).
    vi.useFakeTimers({ toFake: ['Date'], now: Date.now() + 140_000 });
    try {
      expect(await sessionUserFromHeaders(new Headers({ cookie }))).toBeNull();
      expect((await listAs(cookie)).status).toBe(401);
    } finally {
      vi.useRealTimers();
    }
  });

  it('refuses a remembered cookie changed by one character, and any cookie under another secret', async () => {
    const cookie = await cookieLasting(600);
    expect((await sessionUserFromHeaders(new Headers({ cookie })))?.id).toBe(staff.id);
    const last = cookie.at(-2) === 'A' ? 'B' : 'A';
    const changed = `${cookie.slice(0, -2)}${last}${cookie.at(-1)}`;
    expect(await sessionUserFromHeaders(new Headers({ cookie: changed }))).toBeNull();
    const token = cookie.split('=')[1]!;
    expect(await decodeSessionCookie({ token, secret: authSecret() })).not.toBeNull();
    expect(await decodeSessionCookie({ token, secret: `${authSecret()}-rotated` })).toBeNull();
    expect(await decodeSessionCookie({ token, secret: authSecret() })).not.toBeNull();
  });
});
