// The nonce-based Content-Security-Policy (proxy.ts) in Chromium on the production build: the landing
// page, sign-in, the studio (with its field worker) and a share page work with not one CSP violation,
// counted both from the console ("Refused to …") and from `securitypolicyviolation` events. A nonce is
// fresh on every request and on every script Next writes into the page.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORDS, demoSignIn } from '@/lib/demo/scenario';
import { BASE_URL, screenshot, signIn, withBrowser } from './harness';
import { createDesign, createShare, enclosureIdByName, studioReady } from './journey-helpers';

const session = withBrowser();

declare global {
  interface Window {
    __cspViolations?: string[];
  }
}

/** Records violation events from the first moment of every document (before any page script runs). */
async function watchViolations(page: Page): Promise<string[]> {
  const fromConsole: string[] = [];
  const note = (text: string) => {
    if (/Content Security Policy|Refused to (load|execute|apply|create|connect|frame)/i.test(text))
      fromConsole.push(text);
  };
  page.on('console', (m) => note(m.text()));
  // A dedicated worker's console is its own; a refused import inside it shows up there.
  page.on('worker', (w) => w.on('console', (m) => note(`worker: ${m.text()}`)));
  await page.addInitScript(() => {
    window.__cspViolations = [];
    document.addEventListener('securitypolicyviolation', (e) => {
      window.__cspViolations!.push(
        `${e.violatedDirective} blocked ${e.blockedURI || 'inline'} (${e.sourceFile}:${e.lineNumber})`,
      );
    });
  });
  return fromConsole;
}

async function violationsOf(page: Page, fromConsole: string[]): Promise<string[]> {
  const events = await page.evaluate(() => window.__cspViolations ?? []).catch(() => ['(page gone)']);
  return [...events, ...fromConsole];
}

function nonceOf(csp: string | null): string {
  const m = /'nonce-([A-Za-z0-9+/=]+)'/.exec(csp ?? '');
  if (!m) throw new Error(`no nonce in the CSP: ${csp}`);
  return m[1]!;
}

describe('nonce-based Content-Security-Policy', () => {
  it('sends a fresh nonce with every page, and puts it on every script of the page', async () => {
    const nonces = new Set<string>();
    for (let i = 0; i < 3; i++) {
      const res = await fetch(`${BASE_URL}/sign-in`);
      const csp = res.headers.get('content-security-policy');
      expect(csp).toMatch(/script-src [^;]*'strict-dynamic'/);
      expect(csp).not.toMatch(/script-src[^;]*'unsafe-(inline|eval)'/);
      const nonce = nonceOf(csp);
      nonces.add(nonce);
      const html = await res.text();
      const scripts = [...html.matchAll(/<script\b[^>]*>/g)].map((m) => m[0]);
      expect(scripts.length).toBeGreaterThan(0);
      for (const tag of scripts) expect(tag).toContain(`nonce="${nonce}"`);
    }
    expect(nonces.size).toBe(3);
  });

  it('the landing page and sign-in load with no CSP violation', async () => {
    const page = session.page();
    const logged = await watchViolations(page);
    await page.goto('/', { waitUntil: 'load' });
    await screenshot(page, 'csp-landing');
    await page.goto('/sign-in');
    await page.getByLabel('Email').waitFor();
    // Hydrated: the client code runs (an unhydrated form would post natively and reload).
    await page.waitForFunction(() => document.querySelector('form') !== null);
    await screenshot(page, 'csp-sign-in');
    expect(await violationsOf(page, logged)).toEqual([]);
  });

  it('the studio computes its fields in the worker, and a share page opens, with no CSP violation', async () => {
    const page = session.page();
    const logged = await watchViolations(page);
    await signIn(page, demoSignIn('staff').email, DEMO_PASSWORDS.staff);
    const { variantId } = await createDesign(
      page,
      await enclosureIdByName(page, 'Desert vivarium'),
      'CSP test',
    );

    const workers: string[] = [];
    page.on('worker', (w) => workers.push(w.url()));
    await page.goto(`/studio/${variantId}`);
    // The fields arrived: the worker was allowed to start and to load what it needs.
    await studioReady(page);
    expect(workers.length).toBeGreaterThan(0);
    await screenshot(page, 'csp-studio');
    expect(await violationsOf(page, logged)).toEqual([]);

    const sharePath = await createShare(page, variantId);

    const visitor = await session.browser().newPage({ baseURL: BASE_URL });
    try {
      const seen = await watchViolations(visitor);
      const res = await visitor.goto(sharePath);
      expect(res?.status()).toBe(200);
      expect(res?.headers()['content-security-policy']).toMatch(/'nonce-/);
      await visitor.waitForLoadState('load');
      await screenshot(visitor, 'csp-share-page');
      expect(await violationsOf(visitor, seen)).toEqual([]);

      // Seen again, the page is the HTML held since the first view, joined with this answer's nonce: a
      // fresh one, the only one in the page, and Next's scripts run with it.
      const nonceOf = (policy: string | undefined) => /'nonce-([^']+)'/.exec(policy ?? '')?.[1];
      const again = await visitor.goto(sharePath);
      expect(again?.status()).toBe(200);
      const nonce = nonceOf(again?.headers()['content-security-policy']);
      expect(nonce).toBeTruthy();
      expect(nonce).not.toBe(nonceOf(res?.headers()['content-security-policy']));
      const html = await again!.text();
      expect(new Set([...html.matchAll(/nonce="([^"]+)"/g)].map((m) => m[1]))).toEqual(new Set([nonce]));
      await visitor.waitForFunction(() => 'next' in window);
      expect(await violationsOf(visitor, seen)).toEqual([]);
    } finally {
      await visitor.close();
    }
  });
});
