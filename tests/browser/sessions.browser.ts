// "Sign out everywhere" as a person does it: signed in on two devices (two browser contexts), they use the
// account page on one; the other, on its next page, is back at sign-in. An owner of an organisation of
// their own, made for this test in the browser tests' database: ending every session of a demo person
// would sign out another browser file running at the same time.
// The session's short lifetime: the cookie lasts an hour, and an open tab renews it (the page's clock is
// Playwright's, moved on by hand, so nothing waits ten real minutes).
import { describe, expect, it } from 'vitest';
import { SESSION_MAX_AGE_S, SESSION_REFRESH_MS } from '@/lib/auth/lifetime';
import { DEMO_PASSWORDS, DEMO_SHOP } from '@/lib/demo/scenario';
import { createMember } from '../helpers/db';
import { newContext, screenshot, signIn, withBrowser } from './harness';

const session = withBrowser();

describe('sign out everywhere', () => {
  it('ends the session on the other device too', async () => {
    const { user: who, password } = await createMember('owner');
    const phone = session.page();
    await signIn(phone, who.email, password);
    const laptopContext = await newContext(session.browser());
    try {
      const laptop = await laptopContext.newPage();
      await signIn(laptop, who.email, password);
      await laptop.goto('/enclosures');
      expect(new URL(laptop.url()).pathname).toBe('/enclosures');

      await phone.getByRole('link', { name: new RegExp(who.name) }).click();
      await phone.waitForURL('**/account');
      await phone.getByRole('heading', { name: 'Your account' }).waitFor();
      await screenshot(phone, 'account-page');
      await phone.getByRole('button', { name: 'Sign out everywhere' }).click();
      await phone.waitForURL((u) => u.pathname === '/sign-in', { timeout: 30_000 });
      await phone.getByText('You were signed out on every device.').waitFor();

      // The other device's very next page is the sign-in page: its cookie no longer counts.
      await laptop.goto('/enclosures');
      expect(new URL(laptop.url()).pathname).toBe('/sign-in');
      // And signing in again works.
      await signIn(laptop, who.email, password);
      expect(new URL(laptop.url()).pathname).not.toBe('/sign-in');
    } finally {
      await laptopContext.close();
    }
  });
});

/** Seconds from now until an Expires attribute of a Set-Cookie header. */
const secondsLeft = (setCookie: string) => {
  const expires = /next-auth\.session-token=[^;]*;[^\n]*?Expires=([^;\n]+)/i.exec(setCookie)?.[1];
  if (!expires) throw new Error(`no session cookie with an expiry in: ${setCookie.slice(0, 200)}`);
  return (Date.parse(expires) - Date.now()) / 1000;
};

describe('session lifetime', () => {
  it('lasts an hour from sign-in, and an open tab renews it for another hour', async () => {
    const page = session.page();
    await page.clock.install();
    const who = DEMO_SHOP.people.find((p) => p.role === 'staff')!;
    await signIn(page, who.email, DEMO_PASSWORDS.staff);
    const cookie = (await page.context().cookies()).find((c) => c.name === 'next-auth.session-token');
    expect(cookie, 'a session cookie after sign-in').toBeDefined();
    const left = cookie!.expires - Date.now() / 1000;
    expect(left).toBeGreaterThan(SESSION_MAX_AGE_S - 300);
    expect(left).toBeLessThanOrEqual(SESSION_MAX_AGE_S + 5);

    await page.goto('/lamp-log');
    await page.getByRole('heading', { level: 1 }).first().waitFor();
    const renewal = page.waitForResponse((r) => new URL(r.url()).pathname === '/api/auth/session', {
      timeout: 60_000,
    });
    // Jumps the page's clock: the renewal timer, due by then, fires once.
    await page.clock.fastForward(SESSION_REFRESH_MS);
    const res = await renewal;
    expect(res.status()).toBe(200);
    // (Its body is not read here: the page never reads it, and Playwright would wait for it.)
    const renewed = secondsLeft((await res.headerValue('set-cookie')) ?? '');
    expect(renewed).toBeGreaterThan(SESSION_MAX_AGE_S - 300);
    expect(renewed).toBeLessThanOrEqual(SESSION_MAX_AGE_S + 5);
  });
});
