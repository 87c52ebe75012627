// Browser test harness: Debian's Chromium driven by playwright-core against the app that scripts/test.mjs
// builds and serves (E2E_BASE_URL) on the test database with the demo scenario.
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll, beforeEach, expect } from 'vitest';
import { demoSignIn } from '@/lib/demo/scenario';

// Not BASE_URL: vitest sets that one to Vite's base path ('/').
export const BASE_URL = process.env.E2E_BASE_URL ?? 'http://localhost:3100';
export const CHROMIUM_PATH = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
export const SCREENSHOT_DIR = path.resolve(import.meta.dirname, '..', '..', 'test-results', 'screenshots');

// This machine has no outside network: Chromium's background connections would only fail, slowly.
const CHROMIUM_FLAGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-dev-shm-usage',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--disable-quic',
  '--no-first-run',
];

/** Launches headless Chromium; playwright gives it a fresh, temporary profile. */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM_PATH, headless: true, args: CHROMIUM_FLAGS });
}

let workerChromium: Promise<Browser> | undefined;

/**
 * This worker's Chromium: launched by the first file that asks, then lent to the files the worker runs
 * after it (vitest reuses workers, vitest.browser.config.ts), instead of a launch a file. Files share
 * nothing through it: each works in contexts of its own and closes them all when it ends
 * (closeContexts). A Chromium that went away is launched again for the next file.
 */
export function workerBrowser(): Promise<Browser> {
  workerChromium ??= launchBrowser().then(
    (browser) => {
      browser.on('disconnected', () => (workerChromium = undefined));
      return browser;
    },
    (e: unknown) => {
      workerChromium = undefined;
      throw e;
    },
  );
  return workerChromium;
}

/** Closes every context (and so every page) of a file's Chromium, leaving it clean for the next file. */
export async function closeContexts(browser: Browser | undefined): Promise<void> {
  if (!browser?.isConnected()) return;
  await Promise.all(browser.contexts().map((c) => c.close()));
}

/**
 * A new isolated context (own cookies and storage) with the app as base URL. The browser's time zone is
 * the machine's unless `timezoneId` names another (the app must read the same in any zone).
 */
export function newContext(
  browser: Browser,
  options: { timezoneId?: string; viewport?: { width: number; height: number }; hasTouch?: boolean } = {},
): Promise<BrowserContext> {
  return browser.newContext({
    baseURL: BASE_URL,
    viewport: options.viewport ?? { width: 1280, height: 800 },
    locale: 'en-GB',
    ...(options.timezoneId ? { timezoneId: options.timezoneId } : {}),
    ...(options.hasTouch ? { hasTouch: true, isMobile: true } : {}),
  });
}

/**
 * What a page reports as broken: uncaught exceptions, and React's own console reports of a hydration
 * mismatch or a recoverable error (production builds log them as "Minified React error #418" and the
 * like). Failed resource loads are left out: a not-found page logs its 404 on purpose.
 */
export function watchPageErrors(page: Page): () => string[] {
  const seen: string[] = [];
  page.on('pageerror', (e) => seen.push(`uncaught: ${e.message}`));
  page.on('console', (m) => {
    if (m.type() !== 'error') return;
    const text = m.text();
    if (/Failed to load resource/i.test(text)) return;
    if (/React error|hydrat|did not match|Minified React/i.test(text))
      seen.push(`console: ${text.slice(0, 300)}`);
  });
  return () => seen.splice(0);
}

const fileSafe = (name: string) =>
  name
    .replace(/[^a-zA-Z0-9._-]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 120);

/** Saves a full-page PNG to test-results/screenshots/<name>.png and returns its path. */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(SCREENSHOT_DIR, { recursive: true });
  const file = path.join(SCREENSHOT_DIR, `${fileSafe(name)}.png`);
  await page.screenshot({ path: file, fullPage: true });
  return file;
}

/**
 * Signs in through the sign-in page as a person would, and waits until the app has left it.
 * Fails with the page's own error text when the sign-in is refused.
 */
export async function signIn(page: Page, email: string, password: string): Promise<void> {
  await page.goto('/sign-in');
  await page.getByLabel('Email').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
  try {
    await page.waitForURL((url) => !url.pathname.startsWith('/sign-in'), { timeout: 15_000 });
  } catch (e) {
    const alert = await page
      .getByRole('alert')
      .first()
      .textContent({ timeout: 500 })
      .catch(() => null);
    throw new Error(`sign-in as ${email} did not leave /sign-in${alert ? `: ${alert.trim()}` : ''}`, {
      cause: e,
    });
  }
}

/** Signs in through next-auth's own endpoints, as a script would; returns the session cookie. */
export async function signInCookie(email: string, password: string): Promise<string> {
  const csrf = await fetch(`${BASE_URL}/api/auth/csrf`);
  const jar = csrf.headers.getSetCookie().map((c) => c.split(';')[0]!);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await fetch(`${BASE_URL}/api/auth/callback/credentials`, {
    method: 'POST',
    redirect: 'manual',
    headers: {
      'content-type': 'application/x-www-form-urlencoded',
      cookie: jar.join('; '),
      origin: BASE_URL,
    },
    body: new URLSearchParams({ csrfToken, email, password, json: 'true' }),
  });
  const session = res.headers.getSetCookie().find((c) => c.startsWith('next-auth.session-token='));
  if (!session) throw new Error(`sign-in as ${email} gave no session cookie (${res.status})`);
  return session.split(';')[0]!;
}

/**
 * Signs `page` in as the demo scenario's person of `role`, first giving the page's waits `timeoutMs` when
 * a test needs them longer than playwright's default, and opens the enclosures page, where the sign-in
 * form leads. The session is the one the form would get — next-auth's own credentials check, through its
 * endpoints (signInCookie) — put in the page's context as the server set it, without loading and
 * hydrating the sign-in page each time: this is the set-up of journeys about something else. The form
 * itself is walked through by the journeys about signing in (sign-in, sessions, account security, the
 * keeper's journey, the demo walk), with signIn above.
 * Returns the page, so a test can start with `const page = await signInAsDemo(session.page(), 'staff')`.
 */
export async function signInAsDemo(
  page: Page,
  role: Parameters<typeof demoSignIn>[0],
  { timeoutMs }: { timeoutMs?: number } = {},
): Promise<Page> {
  if (timeoutMs !== undefined) page.setDefaultTimeout(timeoutMs);
  const person = demoSignIn(role);
  const cookie = await signInCookie(person.email, person.password);
  const at = cookie.indexOf('=');
  await page.context().addCookies([
    {
      name: cookie.slice(0, at),
      value: cookie.slice(at + 1),
      url: BASE_URL,
      httpOnly: true,
      sameSite: 'Lax',
    },
  ]);
  await page.goto('/enclosures');
  if (new URL(page.url()).pathname.startsWith('/sign-in')) {
    throw new Error(`the session cookie of ${person.email} did not sign the page in (now at ${page.url()})`);
  }
  return page;
}

export type BrowserSession = {
  browser: () => Browser;
  context: () => BrowserContext;
  page: () => Page;
  /** Uncaught exceptions in the page during this test. */
  pageErrors: () => string[];
  /** What the page logged with console.error (includes failed resource loads). */
  consoleErrors: () => string[];
};

/**
 * Registers the hooks of a browser test file: the worker's Chromium (workerBrowser), a fresh context and
 * page for each test, and a screenshot named after any test that fails; the file's contexts are closed
 * when it ends.
 */
export function withBrowser(): BrowserSession {
  let browser: Browser | undefined;
  let context: BrowserContext | undefined;
  let page: Page | undefined;
  let errors: string[] = [];
  let logged: string[] = [];
  const need = <T>(v: T | undefined, what: string): T => {
    if (v === undefined) throw new Error(`${what} is only available inside a test`);
    return v;
  };

  beforeAll(async () => {
    browser = await workerBrowser();
  });
  beforeEach(async () => {
    context = await newContext(need(browser, 'the browser'));
    page = await context.newPage();
    errors = [];
    logged = [];
    page.on('pageerror', (e) => errors.push(e.message));
    page.on('console', (m) => {
      if (m.type() === 'error') logged.push(m.text());
    });
  });
  afterEach(async (ctx) => {
    if (ctx.task.result?.state === 'fail' && page) {
      await screenshot(page, `FAILED-${ctx.task.name}`).catch(() => undefined);
    }
    await context?.close();
    context = undefined;
    page = undefined;
  });
  afterAll(async () => {
    await closeContexts(browser);
    browser = undefined;
  });

  return {
    browser: () => need(browser, 'the browser'),
    context: () => need(context, 'the context'),
    page: () => need(page, 'the page'),
    pageErrors: () => [...errors],
    consoleErrors: () => [...logged],
  };
}

export { expect };
