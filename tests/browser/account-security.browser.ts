// Account security as a person meets it in Chromium against the production build: "Forgot your password?"
// end to end through the fake SMTP server (the e-mailed link, a new password, every session ended, the
// link used up), plain sign-out ending the session on the server (a copied cookie is refused afterwards),
// and a crafted return address after sign-in that must not leave the app.
import { describe, expect, it } from 'vitest';
import { firstLink, waitForMail } from '../helpers/mail';
import { BASE_URL, newContext, screenshot, signIn, withBrowser } from './harness';

const session = withBrowser();

/** A fresh account of its own, so changing its password disturbs no other test. */
async function newAccount(tag: string) {
  const email = `reset.${tag}.${Date.now()}@example.com`;
  const password = 'first-long-password-1';
  const res = await fetch(`${BASE_URL}/api/sign-up`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: BASE_URL },
    body: JSON.stringify({ name: 'Rena Setter', email, password, organisationName: 'Reset test household' }),
  });
  expect(res.status).toBe(201);
  return { email, password };
}

/** Whether a session cookie value still gets the signed-in person's data from the API. */
async function cookieWorks(value: string): Promise<boolean> {
  const res = await fetch(`${BASE_URL}/api/auth/session`, {
    headers: { cookie: `next-auth.session-token=${value}` },
  });
  const body = (await res.json()) as { user?: { email?: string } };
  return Boolean(body.user?.email);
}

describe('forgot your password', () => {
  it('e-mails a single-use link; the new password ends every session and the old one stops working', async () => {
    const { email, password } = await newAccount('journey');
    // Another device signed in before the reset.
    const otherContext = await newContext(session.browser());
    try {
      const other = await otherContext.newPage();
      await signIn(other, email, password);

      const page = session.page();
      await page.goto('/sign-in');
      await page.getByRole('link', { name: 'Forgot your password?' }).click();
      await page.waitForURL((u) => u.pathname === '/forgot-password');
      await page.getByLabel('Email').fill(email);
      await page.getByRole('button', { name: 'Send me a link' }).click();
      await page.getByText('If an account uses that address').waitFor();
      await screenshot(page, 'forgot-password-sent');

      const mail = await waitForMail(email, { subject: 'new Baskwell password', timeoutMs: 20_000 });
      const link = firstLink(mail);
      expect(new URL(link).origin).toBe(new URL(BASE_URL).origin);
      expect(new URL(link).pathname).toBe('/reset-password');
      await page.goto(link);
      await page.getByLabel('New password', { exact: true }).fill('second-long-password-2');
      await page.getByLabel('New password again').fill('second-long-password-2');
      await screenshot(page, 'reset-password-form');
      await page.getByRole('button', { name: 'Set the new password' }).click();
      await page.waitForURL((u) => u.pathname === '/sign-in', { timeout: 20_000 });
      await page.getByText('Your new password is set and every session ended.').waitFor();

      // The other device is signed out on its next page.
      await other.goto('/enclosures');
      expect(new URL(other.url()).pathname).toBe('/sign-in');

      // The old password no longer signs in; the new one does.
      await page.getByLabel('Email').fill(email);
      await page.getByLabel('Password', { exact: true }).fill(password);
      await page.getByRole('button', { name: 'Sign in' }).click();
      await page.getByText('That email and password do not match.').waitFor({ timeout: 20_000 });
      await signIn(page, email, 'second-long-password-2');

      // The link works once.
      const again = await newContext(session.browser());
      try {
        const p = await again.newPage();
        await p.goto(link);
        await p.getByLabel('New password', { exact: true }).fill('third-long-password-3');
        await p.getByLabel('New password again').fill('third-long-password-3');
        await p.getByRole('button', { name: 'Set the new password' }).click();
        await p.getByText('This link has expired or was already used.').waitFor({ timeout: 20_000 });
      } finally {
        await again.close();
      }
      expect(session.pageErrors()).toEqual([]);
    } finally {
      await otherContext.close();
    }
  });

  it('answers an address without an account exactly the same way, and sends nothing', async () => {
    const page = session.page();
    await page.goto('/forgot-password');
    await page.getByLabel('Email').fill('nobody.at.all@example.com');
    await page.getByRole('button', { name: 'Send me a link' }).click();
    await page.getByText('If an account uses that address').waitFor();
    await expect(waitForMail('nobody.at.all@example.com', { timeoutMs: 3000 })).rejects.toThrow(/no mail/);
  });
});

describe('signing out', () => {
  it('ends the session on the server: a copy of the cookie taken before is refused after', async () => {
    const { email, password } = await newAccount('signout');
    const page = session.page();
    await signIn(page, email, password);
    const copied = (await page.context().cookies()).find((c) => c.name === 'next-auth.session-token')?.value;
    expect(copied).toBeTruthy();
    expect(await cookieWorks(copied!)).toBe(true);
    await page.getByRole('button', { name: 'Sign out' }).first().click();
    await page.waitForURL((u) => u.pathname === '/', { timeout: 20_000 });
    expect(await cookieWorks(copied!)).toBe(false);
    const api = await fetch(`${BASE_URL}/api/account/sessions`, {
      method: 'DELETE',
      headers: { cookie: `next-auth.session-token=${copied}`, origin: BASE_URL },
    });
    expect(api.status).toBe(401);
  });
});

describe('return address after sign-in', () => {
  it('a tab or a backslash hidden in the address does not lead off the site', async () => {
    const { email, password } = await newAccount('redirect');
    const page = session.page();
    // Chromium strips a tab from an address, so `/\t/evil.example` would become `//evil.example`, another
    // site: the app refuses a return address with a control character before any page is drawn.
    const tab = await page.goto('/sign-in?callbackUrl=%2F%09%2Fevil.example');
    expect(tab?.status()).toBe(400);
    expect(new URL(page.url()).origin).toBe(new URL(BASE_URL).origin);
    expect(await page.getByLabel('Email').count()).toBe(0);
    // A backslash is read as a slash by browsers (`/\evil.example` is `//evil.example`): the form is drawn,
    // and signing in stays on the site.
    await page.goto('/sign-in?callbackUrl=%2F%5Cevil.example');
    await page.getByLabel('Email').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.waitForURL((u) => u.pathname !== '/sign-in', { timeout: 20_000 });
    expect(new URL(page.url()).origin).toBe(new URL(BASE_URL).origin);
    // Signed in already: the sign-in page sends the person on, and still not off the site.
    await page.goto('/sign-in?callbackUrl=%2F%5Cevil.example');
    expect(new URL(page.url()).origin).toBe(new URL(BASE_URL).origin);
    const newline = await fetch(`${BASE_URL}/sign-in?callbackUrl=%2F%0A%2Fevil.example`, {
      redirect: 'manual',
    });
    expect(newline.status).toBe(400);
    const auth = await fetch(`${BASE_URL}/api/auth/signin?callbackUrl=%2F%0A%2Fevil.example`, {
      redirect: 'manual',
    });
    expect(auth.status).toBe(400);
  });
});
