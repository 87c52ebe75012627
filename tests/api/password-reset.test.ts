// "Forgot your password?" through the real route handlers, the outbox and the fake SMTP server: the same
// answer for a known and an unknown address, a hashed single-use 30-minute token, limits per address and
// per account, and a new password that ends every session of the person.
import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import * as complete from '@/app/api/password-reset/complete/route';
import * as request from '@/app/api/password-reset/route';
import * as enclosures from '@/app/api/enclosures/route';
import { authorizeCredentials } from '@/lib/auth/credentials';
import { settleMail } from '@/lib/auth/mail-soon';
import { RESET_LIMITS, RESET_TTL_MS } from '@/lib/auth/password-reset';
import { AccountLink, MailMessage, User, type Organisation } from '@/models';
import { FIXTURE_PASSWORD, closeDatabase, createMember, resetDatabase } from '../helpers/db';
import { clearMail, listMail, waitForMail } from '../helpers/mail';
import { call, sessionCookie } from './http';
import { trustOneProxy } from './trust-proxy';

afterAll(closeDatabase);
trustOneProxy();

let org: Organisation;
let user: User;
let address = 0;
const NEW_PASSWORD = 'a-brand-new-long-password';

beforeEach(async () => {
  await resetDatabase();
  await clearMail();
  ({ organisation: org, user } = await createMember('keeper'));
  address++;
});

/** Each test asks from its own client address, so the per-address limit of one does not reach the next. */
const ask = (email: string, from = `198.51.100.${address}`) =>
  call(request.POST, {
    method: 'POST',
    path: '/api/password-reset',
    body: { email },
    headers: { 'x-forwarded-for': from },
  });

const finish = (token: string, password = NEW_PASSWORD) =>
  call(complete.POST, { method: 'POST', path: '/api/password-reset/complete', body: { token, password } });

function tokenIn(text: string): string {
  const m = /\/reset-password#token=([A-Za-z0-9_-]{43})/.exec(text);
  if (!m?.[1]) throw new Error(`no reset link in: ${text}`);
  return m[1];
}

async function linkFor(email: string): Promise<string> {
  expect((await ask(email)).status).toBe(200);
  await settleMail();
  return tokenIn((await waitForMail(email, { subject: 'new Baskwell password' })).text);
}

describe('asking for a link', () => {
  it('answers a known and an unknown address the same way; only the known one gets mail', async () => {
    const known = await ask(user.email);
    const unknown = await ask('no.account.here@example.com');
    expect(known.status).toBe(200);
    expect(unknown.status).toBe(200);
    expect(unknown.text).toBe(known.text);
    await settleMail();
    const mail = await waitForMail(user.email);
    expect(mail.subject).toBe('Choose a new Baskwell password');
    expect(mail.text).toContain('works once, for 30 minutes');
    expect(await listMail('no.account.here@example.com')).toEqual([]);
    // The e-mail went through the outbox and is marked sent there.
    const row = await MailMessage.findOne({ where: { kind: 'password-reset', toUserId: user.id } });
    expect(row?.status).toBe('sent');
  });

  it('stores only the hash of the token', async () => {
    const token = await linkFor(user.email);
    const rows = await AccountLink.findAll({ where: { userId: user.id, purpose: 'password-reset' } });
    expect(rows).toHaveLength(1);
    expect(rows[0]!.tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(rows[0]!.tokenHash).not.toContain(token);
    const ttl = rows[0]!.expiresAt.getTime() - rows[0]!.createdAt.getTime();
    expect(Math.abs(ttl - RESET_TTL_MS)).toBeLessThan(2000);
  });

  it('limits one address (429 with Retry-After) and sends an account at most a few e-mails', async () => {
    for (let i = 0; i < RESET_LIMITS.perAddress; i++)
      expect((await ask(`someone.${i}@example.com`)).status).toBe(200);
    const refused = await ask(user.email);
    expect(refused.status).toBe(429);
    expect(Number(refused.res.headers.get('retry-after'))).toBeGreaterThan(0);
    // Per account: more asks from many addresses still answer the same, but no more mail goes out.
    for (let i = 0; i < RESET_LIMITS.perAccount + 3; i++)
      expect((await ask(user.email, `203.0.113.${i + 1}`)).status).toBe(200);
    await settleMail();
    expect(await MailMessage.count({ where: { kind: 'password-reset', toUserId: user.id } })).toBe(
      RESET_LIMITS.perAccount,
    );
  });

  it('refuses a malformed address naming the field', async () => {
    const r = await ask('not-an-address');
    expect(r.status).toBe(400);
    expect(r.body.error.field).toBe('email');
  });
});

describe('setting the new password', () => {
  it('sets it once, ends every session, and the old password stops working', async () => {
    const phone = await sessionCookie(user);
    const laptop = await sessionCookie(user);
    const list = (cookie: string) =>
      call(enclosures.GET, { path: `/api/enclosures?organisationId=${org.id}`, cookie });
    expect((await list(phone)).status).toBe(200);
    const token = await linkFor(user.email);
    const r = await finish(token);
    expect(r.status).toBe(200);
    expect(r.body).toEqual({ ok: true, signedOut: true });
    expect((await list(phone)).status).toBe(401);
    expect((await list(laptop)).status).toBe(401);
    const from = { 'x-forwarded-for': '192.0.2.50' };
    expect((await authorizeCredentials({ email: user.email, password: NEW_PASSWORD }, from)).id).toBe(
      String(user.id),
    );
    await expect(
      authorizeCredentials({ email: user.email, password: FIXTURE_PASSWORD }, from),
    ).rejects.toThrow();
    // Single use: the same link again is refused and changes nothing.
    const again = await finish(token, 'yet-another-long-password');
    expect(again.status).toBe(404);
    expect(again.body.error.field).toBe('token');
    const hash = (await User.scope('withPassword').findByPk(user.id))!.passwordHash;
    expect((await finish(token, 'a-third-long-password')).status).toBe(404);
    expect((await User.scope('withPassword').findByPk(user.id))!.passwordHash).toBe(hash);
  });

  it('refuses an expired link, a made-up one and a superseded one', async () => {
    const first = await linkFor(user.email);
    await clearMail();
    const second = await linkFor(user.email);
    expect((await finish(first)).status).toBe(404);
    vi.useFakeTimers({ now: Date.now() + RESET_TTL_MS + 1000, toFake: ['Date'] });
    try {
      expect((await finish(second)).status).toBe(404);
    } finally {
      vi.useRealTimers();
    }
    expect((await finish('A'.repeat(43))).status).toBe(404);
    const short = await finish('abc');
    expect(short.status).toBe(400);
    expect(short.body.error.field).toBe('token');
  });

  it('names a weak password and keeps the link usable', async () => {
    const token = await linkFor(user.email);
    const weak = await finish(token, 'short');
    expect(weak.status).toBe(400);
    expect(weak.body.error.field).toBe('password');
    expect((await finish(token)).status).toBe(200);
  });

  it('two uses of one link at the same moment: exactly one sets a password', async () => {
    const token = await linkFor(user.email);
    const results = await Promise.all([
      finish(token, 'first-long-password-x'),
      finish(token, 'second-long-password-y'),
    ]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 404]);
  });
});
