// The studio while the server is down: saves answer 503 (as the app does when its database is away),
// the edit is kept on this device across a reload and offered back, and once the server answers again it
// is saved — the server holding exactly that design. The network itself stays up (unlike the offline
// step of studio.browser.ts): only the save requests fail, the way a server outage looks to a browser.
import type { Page, Route } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORDS, demoSignIn } from '@/lib/demo/scenario';
import { screenshot, signIn, withBrowser } from './harness';
import { enclosureIdByName } from './journey-helpers';

const session = withBrowser();

type Stored = { version: number; design: { objects: { type: string; id: string }[] } };

async function studioReady(page: Page) {
  await page.waitForSelector('[data-testid=studio-canvas] canvas', { timeout: 60_000 });
}

async function openStudio(page: Page, path: string) {
  await page.goto(path);
  await studioReady(page);
}

const saveState = (page: Page) => page.getByTestId('save-state').getAttribute('data-state');

async function stored(page: Page, id: number): Promise<Stored> {
  return page.evaluate(async (variantId) => {
    const res = await fetch(`/api/variants/${variantId}`, { cache: 'no-store' });
    return ((await res.json()) as { variant: Stored }).variant;
  }, id);
}

/** The server's version and lamps, the local copy's, the save state and whether the studio is view-only. */
async function offerFacts(page: Page, id: number): Promise<string> {
  const server = await stored(page, id);
  const local = await page.evaluate(
    (variantId) => localStorage.getItem(`baskwell.studio.unsaved.variant:${variantId}`),
    id,
  );
  const copy = local ? (JSON.parse(local) as { baseVersion: number; design: Stored['design'] }) : null;
  const lamps = (d: Stored['design']) => d.objects.filter((o) => o.type === 'lamp').length;
  return JSON.stringify({
    server: { version: server.version, lamps: lamps(server.design) },
    localCopy: copy && { baseVersion: copy.baseVersion, lamps: lamps(copy.design) },
    saveState: await saveState(page),
    viewOnly: await page.getByTestId('view-only').count(),
  });
}

/** What the app answers while its database is down (lib/api: 503, Retry-After, JSON without internals). */
function serverDown(route: Route) {
  if (route.request().method() !== 'PUT') return route.continue();
  return route.fulfill({
    status: 503,
    headers: { 'content-type': 'application/json', 'retry-after': '2' },
    body: JSON.stringify({
      error: { code: 'unavailable', message: 'Saving is unavailable. Try again shortly.' },
    }),
  });
}

describe('design studio while the server is down', () => {
  it('keeps the unsaved edit across a reload and saves it when the server is back', async () => {
    const page = session.page();
    const who = demoSignIn('staff');
    await signIn(page, who.email, DEMO_PASSWORDS.staff);
    // By name: the first link under /enclosures/ may be "/enclosures/new".
    const enclosureId = await enclosureIdByName(page, 'Desert vivarium');
    const variantId = await page.evaluate(async (id) => {
      const res = await fetch(`/api/enclosures/${id}/designs`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ name: 'Outage browser test' }),
      });
      return ((await res.json()) as { variant: { id: number } }).variant.id;
    }, enclosureId);
    const before = await stored(page, variantId);
    expect(before.design.objects.some((o) => o.type === 'lamp')).toBe(false);

    const saves = `**/api/variants/${variantId}`;
    await page.route(saves, serverDown);
    await openStudio(page, `/studio/${variantId}`);
    await page.getByTestId('studio-canvas').focus();
    await page.keyboard.press('l');
    await page.keyboard.press('Enter');
    await expect.poll(() => page.getByTestId('object-summary').textContent()).toMatch(/Lamp:/);
    await expect.poll(() => saveState(page), { timeout: 30_000 }).toBe('offline');
    await screenshot(page, 'studio-server-down');
    expect((await stored(page, variantId)).version).toBe(before.version);

    // A reload while the server is still down: the edit is found on this device and offered back. One
    // navigation: a reload followed by a second opening would leave and load the studio twice.
    await page.reload();
    await studioReady(page);
    const banner = page.getByTestId('restore-banner');
    await banner.waitFor({ state: 'visible', timeout: 30_000 }).catch(async (e: unknown) => {
      // Which of the offer's conditions failed: the server already holding the edit, no local copy, or
      // a studio that cannot be edited.
      throw new Error(`no offer of the unsaved edit after the reload: ${await offerFacts(page, variantId)}`, {
        cause: e,
      });
    });
    expect(await banner.textContent()).toContain('Unsaved changes');
    await screenshot(page, 'studio-server-down-restore');
    await banner.getByRole('button', { name: 'Restore them' }).click();
    await expect.poll(() => page.getByTestId('object-summary').textContent()).toMatch(/Lamp:/);
    await expect.poll(() => saveState(page), { timeout: 30_000 }).toBe('offline');

    // The server is back: the kept edit is saved (the studio retries; "Save now" does it at once).
    await page.unroute(saves, serverDown);
    const saveNow = page.getByRole('button', { name: 'Save now' });
    // The studio's own retry may save first and take the button away between a look and a click, so
    // the click is only tried briefly; whichever saves, the state below must reach "saved".
    if (await saveNow.isVisible()) await saveNow.click({ timeout: 2_000 }).catch(() => undefined);
    await expect.poll(() => saveState(page), { timeout: 60_000 }).toBe('saved');
    const after = await stored(page, variantId);
    expect(after.version).toBeGreaterThan(before.version);
    expect(after.design.objects.filter((o) => o.type === 'lamp')).toHaveLength(1);

    // Saved: nothing is offered back any more.
    await page.reload();
    await studioReady(page);
    await expect.poll(() => page.getByTestId('object-summary').textContent()).toMatch(/Lamp:/);
    expect(await page.getByTestId('restore-banner').count()).toBe(0);
    expect(session.pageErrors()).toEqual([]);
  });
});
