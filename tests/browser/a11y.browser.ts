// Accessibility of every page in Chromium: an axe scan (WCAG 2 A and AA rules) of each page signed out
// and of every page of the app signed in as staff, with a screenshot of each. A table of what axe found
// per page is printed at the end; each page is its own test and fails on any serious or critical
// violation, naming the rule and the first elements concerned.
// The browser runs in New York's time zone, not the server's UTC, and each page also fails on any page
// error — an uncaught exception or React's report of a hydration mismatch (dates formatted in one zone on
// the server and another in the browser were the usual cause).
import path from 'node:path';
import AxeBuilder from '@axe-core/playwright';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_SHOP } from '@/lib/demo/scenario';
import {
  closeContexts,
  newContext,
  screenshot,
  signInAsDemo,
  watchPageErrors,
  workerBrowser,
} from './harness';
import { pageRoutes } from './page-routes';
import { JOURNEY_MS, createDesign, createShare, enclosureIdByName, studioReady } from './journey-helpers';

const ROOT = path.resolve(import.meta.dirname, '..', '..');
/** Not UTC (the server's zone), and behind it: an evening here is already tomorrow on the server. */
const VIEWER_ZONE = 'America/New_York';
const IMPACTS = ['critical', 'serious', 'moderate', 'minor'] as const;
type Impact = (typeof IMPACTS)[number];
type PageResult = { name: string; path: string; counts: Record<Impact, number>; blocking: string[] };

/** Waits for a page to settle: its heading drawn, the network quiet (bounded: a worker may keep it busy). */
async function settle(page: Page, path: string): Promise<void> {
  await page.goto(path);
  await page.locator('h1').first().waitFor({ timeout: 60_000 });
  await page.waitForLoadState('networkidle', { timeout: 5_000 }).catch(() => undefined);
}

async function scan(page: Page, name: string, path: string): Promise<PageResult> {
  const results = await new AxeBuilder({ page }).withTags(['wcag2a', 'wcag2aa']).analyze();
  const counts = { critical: 0, serious: 0, moderate: 0, minor: 0 };
  const blocking: string[] = [];
  for (const v of results.violations) {
    const impact = (v.impact ?? 'minor') as Impact;
    counts[impact] += v.nodes.length;
    if (impact === 'critical' || impact === 'serious') {
      const where = v.nodes
        .slice(0, 3)
        .map((n) => n.target.join(' '))
        .join(' | ');
      blocking.push(`${name} (${path}): ${impact} ${v.id} — ${v.help} [${v.nodes.length}×: ${where}]`);
    }
  }
  await screenshot(page, `a11y-${name}`);
  return { name, path, counts, blocking };
}

function report(title: string, rows: PageResult[]): void {
  const w = Math.max(...rows.map((r) => r.name.length));
  console.log(
    [
      `axe (wcag2a, wcag2aa) — ${title}: violations (affected elements) by impact`,
      `  ${'page'.padEnd(w)}  critical serious moderate minor`,
      ...rows.map(
        (r) =>
          `  ${r.name.padEnd(w)}  ${IMPACTS.map((i) => String(r.counts[i]).padStart(i.length)).join(' ')}`,
      ),
    ].join('\n'),
  );
}

/** The ids the signed-in pages need, found the way a staff member would: through the app's own lists. */
async function demoIds(page: Page) {
  const keeper = DEMO_SHOP.people.find((p) => p.role === 'keeper')!;
  const enclosureId = await enclosureIdByName(page, keeper.enclosures![0]!.name);
  const suffix = Date.now().toString(36);
  const one = await createDesign(page, enclosureId, `Accessibility check ${suffix}`);
  const two = await createDesign(page, enclosureId, `Accessibility check B ${suffix}`);
  const firstId = async (listPath: string, pattern: RegExp) => {
    await page.goto(listPath);
    // The list may still be streaming when `load` fires (React reveals a suspended page a little after its
    // HTML arrives, and the hidden part is outside <main> until then): wait for a matching link to appear.
    const found = await page
      .waitForFunction(
        ({ source, flags }) => {
          const re = new RegExp(source, flags);
          for (const a of document.querySelectorAll('main a[href]')) {
            const m = re.exec(a.getAttribute('href') ?? '');
            if (m?.[1]) return m[1];
          }
          return null;
        },
        { source: pattern.source, flags: pattern.flags },
        { timeout: 30_000 },
      )
      .then((h) => h.jsonValue())
      .catch(() => null);
    if (!found) throw new Error(`no link matching ${pattern} on ${listPath} (now at ${page.url()})`);
    return Number(found);
  };
  return {
    enclosureId,
    designId: one.designId,
    variantA: one.variantId,
    variantB: two.variantId,
    lampId: await firstId('/lamp-log', /^\/lamp-log\/(\d+)$/),
    speciesId: await firstId('/species', /^\/species\/(\d+)$/),
    lampTypeId: await firstId('/lamp-catalogue', /^\/lamp-catalogue\/(\d+)$/),
    ...(await counterIds()),
  };
  async function counterIds() {
    // The demo shop's invented customers, and a lamp the counter tested for the first of them.
    const customerId = await firstId('/customers', /^\/customers\/(\d+)$/);
    const counterLampId = await firstId(`/customers/${customerId}`, /^\/counter\/lamps\/(\d+)$/);
    return { customerId, counterLampId };
  }
}

/** One page to scan: its route pattern (as the app folder names it), the address, who looks at it. */
type Target = {
  name: string;
  route: string;
  path: () => string;
  signedIn: boolean;
  studio?: boolean;
  /** Seen by the organisation's owner instead of staff (a page only owners may open). */
  owner?: boolean;
};

let ids: Awaited<ReturnType<typeof demoIds>> & { sharePath: string };
const out = (name: string, route: string, path: () => string): Target => ({
  name: `out-${name}`,
  route,
  path,
  signedIn: false,
});
const staffSees = (name: string, route: string, path: () => string, studio = false): Target => ({
  name,
  route,
  path,
  signedIn: true,
  studio,
});
const ownerSees = (name: string, route: string, path: () => string): Target => ({
  ...staffSees(name, route, path),
  owner: true,
});
const targets: Target[] = [
  out('landing', '/', () => '/'),
  out('sign-in', '/sign-in', () => '/sign-in'),
  out('sign-up', '/sign-up', () => '/sign-up'),
  out('forgot-password', '/forgot-password', () => '/forgot-password'),
  out('reset-password', '/reset-password', () => `/reset-password#token=${'x'.repeat(43)}`),
  out('confirm-account', '/confirm-account', () => `/confirm-account#token=${'x'.repeat(43)}`),
  out('share', '/s/[token]', () => ids.sharePath),
  out('invite-unknown', '/invite/[token]', () => `/invite/${'x'.repeat(43)}`),
  // A link that does not verify: the page answers like any missing page (a real one stops a customer's e-mails).
  out('unsubscribe-unknown', '/unsubscribe', () => `/unsubscribe?token=${'x'.repeat(43)}`),
  staffSees('enclosures', '/enclosures', () => '/enclosures'),
  staffSees('guided-start', '/enclosures/new', () => '/enclosures/new'),
  staffSees('enclosure', '/enclosures/[id]', () => `/enclosures/${ids.enclosureId}`),
  staffSees('enclosure-lamps', '/enclosures/[id]/lamps', () => `/enclosures/${ids.enclosureId}/lamps`),
  staffSees('design', '/designs/[id]', () => `/designs/${ids.designId}`),
  staffSees('compare', '/compare', () => `/compare?a=${ids.variantA}&b=${ids.variantB}`),
  staffSees('keepers', '/keepers', () => '/keepers'),
  staffSees('members', '/members', () => '/members'),
  ownerSees('mail', '/mail', () => '/mail'),
  ownerSees('jobs', '/jobs', () => '/jobs'),
  ownerSees('organisation', '/organisation', () => '/organisation'),
  staffSees('lamp-log', '/lamp-log', () => '/lamp-log'),
  staffSees('lamp', '/lamp-log/[id]', () => `/lamp-log/${ids.lampId}`),
  staffSees('lamp-catalogue', '/lamp-catalogue', () => '/lamp-catalogue'),
  staffSees('lamp-type', '/lamp-catalogue/[id]', () => `/lamp-catalogue/${ids.lampTypeId}`),
  staffSees('lamp-type-edit', '/lamp-catalogue/[id]/edit', () => `/lamp-catalogue/${ids.lampTypeId}/edit`),
  staffSees('lamp-type-new', '/lamp-catalogue/new', () => '/lamp-catalogue/new'),
  staffSees('species', '/species', () => '/species'),
  staffSees('species-sheet', '/species/[id]', () => `/species/${ids.speciesId}`),
  staffSees('species-edit', '/species/[id]/edit', () => `/species/${ids.speciesId}/edit`),
  staffSees('species-new', '/species/new', () => '/species/new'),
  staffSees('customers', '/customers', () => '/customers'),
  staffSees('customer', '/customers/[id]', () => `/customers/${ids.customerId}`),
  staffSees('customer-edit', '/customers/[id]/edit', () => `/customers/${ids.customerId}/edit`),
  staffSees('customer-new', '/customers/new', () => '/customers/new'),
  staffSees('counter', '/counter', () => '/counter'),
  staffSees('counter-figures', '/counter/dashboard', () => '/counter/dashboard'),
  staffSees('counter-lamp', '/counter/lamps/[id]', () => `/counter/lamps/${ids.counterLampId}`),
  staffSees('account', '/account', () => '/account'),
  staffSees('not-found', '/enclosures/[id]', () => '/enclosures/999999999'),
  staffSees('studio', '/studio/[variantId]', () => `/studio/${ids.variantA}`, true),
  staffSees('studio-scratch', '/studio-scratch', () => '/studio-scratch', true),
];

describe(`accessibility (axe) and page errors in ${VIEWER_ZONE}: no serious or critical violation, no page error`, () => {
  let browser: Browser;
  let staffContext: BrowserContext;
  let visitorContext: BrowserContext;
  let staffPage: Page;
  let visitorPage: Page;
  let ownerPage: Page | null = null;
  let ownerErrors: () => string[] = () => [];
  let staffErrors: () => string[];
  let visitorErrors: () => string[];
  const results: PageResult[] = [];

  beforeAll(async () => {
    browser = await workerBrowser();
    staffContext = await newContext(browser, { timezoneId: VIEWER_ZONE });
    visitorContext = await newContext(browser, { timezoneId: VIEWER_ZONE });
    staffPage = await staffContext.newPage();
    visitorPage = await visitorContext.newPage();
    staffErrors = watchPageErrors(staffPage);
    visitorErrors = watchPageErrors(visitorPage);
    for (const p of [staffPage, visitorPage]) p.setDefaultTimeout(60_000);
    await signInAsDemo(staffPage, 'staff');
    const found = await demoIds(staffPage);
    ids = { ...found, sharePath: await createShare(staffPage, found.variantA) };
  }, JOURNEY_MS);

  afterAll(async () => {
    report(
      'signed out',
      results.filter((r) => r.name.startsWith('out-')),
    );
    report(
      'signed in as staff',
      results.filter((r) => !r.name.startsWith('out-')),
    );
    await closeContexts(browser);
  });

  it('scans a page of every route of the app', () => {
    // A route's pattern from its page file: route groups dropped, dynamic segments kept as [name].
    const routes = pageRoutes(path.join(ROOT, 'app'));
    const scanned = new Set(targets.map((t) => t.route));
    expect(routes.filter((r) => !scanned.has(r))).toEqual([]);
  });

  it.each(targets)('$name', async (t) => {
    if (t.owner && !ownerPage) {
      ownerPage = await (await newContext(browser, { timezoneId: VIEWER_ZONE })).newPage();
      ownerPage.setDefaultTimeout(60_000);
      ownerErrors = watchPageErrors(ownerPage);
      await signInAsDemo(ownerPage, 'owner');
    }
    const errorsOf = t.owner ? ownerErrors : t.signedIn ? staffErrors : visitorErrors;
    const page = t.owner ? ownerPage! : t.signedIn ? staffPage : visitorPage;
    const path = t.path();
    errorsOf(); // the set-up's are not this page's
    if (t.studio) {
      await page.goto(path);
      await studioReady(page);
    } else {
      await settle(page, path);
    }
    const r = await scan(page, t.name, path);
    results.push(r);
    const errors = errorsOf();
    expect(r.blocking, r.blocking.join('\n')).toEqual([]);
    expect(errors, `page errors on ${path} in ${VIEWER_ZONE}`).toEqual([]);
  });
});
