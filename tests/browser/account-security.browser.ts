// Account security as a person meets it in Chromium against the production build: creating an account
// (the same page for a new address and a taken one; the e-mailed link confirms a new one), "Forgot your password?"
// end to end through the fake SMTP server (the e-mailed link, a new password, every session ended, the
// link used up), plain sign-out ending the session on the server (a copied cookie is refused afterwards),
// and a crafted return address after sign-in that must not leave the app.
import { describe, expect, it } from 'vitest';
import { firstLink, listMail, waitForMail } from '../helpers/mail';
import type { Page } from 'playwright-core';
import { BASE_URL, newContext, screenshot, signIn, withBrowser } from './harness';

const session = withBrowser();

/**
 * A fresh account of its own, so changing its password disturbs no other test: signed up through the
 * API, then confirmed as its owner would, by opening the e-mailed link in a browser.
 */
async function newAccount(tag: string) {
  const email = `reset.${tag}.${Date.now()}@example.com`;
  const password = 'first-long-password-1';
  const res = await fetch(`${BASE_URL}/api/sign-up`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', origin: BASE_URL },
    body: JSON.stringify({ name: 'Rena Setter', email, password, organisationName: 'Reset test household' }),
  });
  expect(res.status).toBe(201);
  await followConfirmation(email);
  return { email, password };
}

/** Opens the newest confirmation link e-mailed to `email` in a context of its own; lands on sign-in. */
async function followConfirmation(email: string, page?: Page): Promise<void> {
  const mail = await waitForMail(email, { subject: 'Confirm your new Baskwell account', timeoutMs: 20_000 });
  const link = firstLink(mail);
  expect(new URL(link).pathname).toBe('/confirm-account');
  const context = page ? undefined : await newContext(session.browser());
  try {
    const p = page ?? (await context!.newPage());
    await p.goto(link);
    await p.waitForURL((u) => u.pathname === '/sign-in', { timeout: 20_000 });
    await p.getByText('Your account is confirmed.').waitFor();
  } finally {
    await context?.close();
  }
}

/** Fills and sends the sign-up form; returns once the page has settled on its answer. */
async function submitSignUp(page: Page, email: string, password: string) {
  await page.goto('/sign-up');
  await page.getByLabel('Your name').fill('Ivo Brack');
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByLabel('Organisation name').fill('Brack household');
  await page.getByRole('button', { name: 'Create account' }).click();
  // Either answer ends the wait: a page that stays, or one that goes somewhere else.
  await page.waitForFunction(
    () => location.pathname !== '/sign-up' || document.body.innerText.includes('Check the inbox'),
    undefined,
    { timeout: 20_000 },
  );
  await page.waitForLoadState('networkidle');
}

/** What a person sees after sending the form, with the address they typed taken out. */
async function outcome(page: Page, email: string) {
  const cookies = await page.context().cookies();
  return {
    path: new URL(page.url()).pathname,
    text: (await page.locator('main').innerText()).replaceAll(email, '<address>'),
    signedIn: cookies.some((c) => c.name === 'next-auth.session-token'),
  };
}

/** Whether a session cookie value still gets the signed-in person's data from the API. */
async function cookieWorks(value: string): Promise<boolean> {
  const res = await fetch(`${BASE_URL}/api/auth/session`, {
    headers: { cookie: `next-auth.session-token=${value}` },
  });
  const body = (await res.json()) as { user?: { email?: string } };
  return Boolean(body.user?.email);
}

describe('creating an account', () => {
  it('ends on the same page for a new address and one that already has an account', async () => {
    const existing = await newAccount('existing');
    const fresh = `new.person.${Date.now()}@example.com`;
    const seen = [];
    for (const email of [fresh, existing.email]) {
      const context = await newContext(session.browser());
      try {
        const page = await context.newPage();
        await submitSignUp(page, email, 'a-stranger-long-password');
        seen.push(await outcome(page, email));
      } finally {
        await context.close();
      }
    }
    expect(seen[0]!.path).toBe('/sign-up');
    expect(seen[0]!.text).toContain('Check the inbox of <address>');
    expect(seen[0]!.signedIn).toBe(false);
    expect(seen[1]).toEqual(seen[0]);
    // Signing in with the password just chosen cannot tell them apart either.
    const refusals = [];
    for (const email of [fresh, existing.email]) {
      const context = await newContext(session.browser());
      try {
        const page = await context.newPage();
        await page.goto('/sign-in');
        await page.getByLabel('Email').fill(email);
        await page.getByLabel('Password', { exact: true }).fill('a-stranger-long-password');
        await page.getByRole('button', { name: 'Sign in' }).click();
        await page.getByRole('alert').waitFor({ timeout: 20_000 });
        refusals.push((await page.locator('main').innerText()).replaceAll(email, '<address>'));
      } finally {
        await context.close();
      }
    }
    expect(refusals[1]).toBe(refusals[0]);
  });

  it('confirms a new account with the e-mailed link; until then sign-in offers to send it again', async () => {
    // Neither address may contain the other: the mail viewer's filter matches part of an address, and the
    // phone's mail must not count as (or be taken for) the desktop account's.
    const stamp = Date.now();
    const email = `confirm.me.${stamp}@example.com`;
    const password = 'my-own-long-password';
    for (const [name, viewport] of [
      ['desktop', { width: 1280, height: 800 }],
      ['phone', { width: 390, height: 844 }],
    ] as const) {
      const context = await newContext(session.browser(), { viewport });
      try {
        const page = await context.newPage();
        await submitSignUp(page, name === 'desktop' ? email : `confirm.phone.${stamp}@example.com`, password);
        await screenshot(page, `sign-up-check-inbox-${name}`);
      } finally {
        await context.close();
      }
    }
    const page = session.page();
    await page.goto('/sign-in');
    await page.getByLabel('Email').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(password);
    await page.getByRole('button', { name: 'Sign in' }).click();
    await page.getByText('Open the confirmation link we e-mailed you first').waitFor({ timeout: 20_000 });
    await page.getByRole('button', { name: `Send the confirmation link to ${email} again` }).click();
    await page.getByText('If that address has an account waiting for confirmation').waitFor();
    await screenshot(page, 'sign-in-unconfirmed-resent');
    // Two links went out; only the newest works, and it confirms the account.
    await expect
      .poll(async () => (await listMail(email)).length, { timeout: 20_000 })
      .toBeGreaterThanOrEqual(2);
    await followConfirmation(email, page);
    await screenshot(page, 'sign-in-account-confirmed');
    await signIn(page, email, password);
    expect(new URL(page.url()).pathname).toBe('/enclosures');
    expect(session.pageErrors()).toEqual([]);
  });
});

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
      await page.getByText('That email and password do not match').waitFor({ timeout: 20_000 });
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
