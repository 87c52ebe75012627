// Shared steps of the end-to-end journeys (journey-*.browser.ts): waits that fit a busy machine, the
// studio's readiness, a variant read back through the API, and share links made by a staff member.
import type { Browser, Locator, Page } from 'playwright-core';
import { expect } from 'vitest';
import { newContext, signInAsDemo } from './harness';

/** A whole journey against one app on a 2-core machine: generous, never a speed check. */
export const JOURNEY_MS = 480_000;
/** How long a poll waits for the page to catch up (a save, a refetch, a navigation). */
export const eventually = { timeout: 60_000, interval: 250 };

export type DesignObjectJson = { type: string; id: string; name?: string; [key: string]: unknown };
export type VariantJson = {
  id: number;
  designId: number;
  name: string;
  version: number;
  design: { enclosure: { width: number; height: number }; objects: DesignObjectJson[] };
};

/** Waits until the studio has drawn its canvas and the engine has answered once. */
export async function studioReady(page: Page): Promise<void> {
  await page.waitForSelector('[data-testid=studio-canvas] canvas', { timeout: 90_000 });
  await page.waitForFunction(() => (window.__baskwellStudio?.roundTrips.length ?? 0) > 0, null, {
    timeout: 90_000,
  });
}

/** The stored variant as the signed-in person of this page may read it. */
export async function readVariant(
  page: Page,
  id: number,
): Promise<{ status: number; variant?: VariantJson }> {
  return page.evaluate(async (variantId) => {
    const res = await fetch(`/api/variants/${variantId}`);
    const body = (await res.json().catch(() => ({}))) as { variant?: VariantJson };
    return { status: res.status, variant: body.variant };
  }, id);
}

/** The UV Index read at a pinned probe, once the engine has answered for the current design. */
export async function probeUvi(page: Page, probeId: string): Promise<number> {
  const reading = page.getByTestId(`probe-reading-${probeId}`);
  await expect.poll(() => reading.textContent(), eventually).toMatch(/^UVI /);
  await expect.poll(() => page.getByTestId('worker-ms').textContent(), eventually).not.toMatch(/…$/);
  const m = /UVI (-?\d+(?:\.\d+)?)/.exec((await reading.textContent()) ?? '');
  if (!m) throw new Error('no UV Index in the probe reading');
  return Number(m[1]);
}

/** Page coordinates of a design point (cm, y up) from the studio's camera. */
export async function pagePoint(page: Page, x: number, y: number): Promise<{ x: number; y: number }> {
  const cam = await page.evaluate(() => window.__baskwellStudio!.camera!());
  const box = await page.getByTestId('studio-canvas').boundingBox();
  if (!box) throw new Error('the studio canvas is not on screen');
  return { x: box.x + cam.originX + x * cam.zoom, y: box.y + cam.originY - y * cam.zoom };
}

/** Local "YYYY-MM-DDTHH:mm" of a day some days ago, for a datetime-local field. */
export function localDateTime(daysAgo: number): string {
  const d = new Date(Date.now() - daysAgo * 86_400_000);
  d.setMinutes(d.getMinutes() - d.getTimezoneOffset());
  return d.toISOString().slice(0, 16);
}

/** Signs in as the demo staff member in a context of its own; the caller closes it. */
export async function staffPage(browser: Browser): Promise<Page> {
  const context = await newContext(browser);
  const page = await signInAsDemo(await context.newPage(), 'staff', { timeoutMs: 60_000 });
  return page;
}

/**
 * Opens a demo enclosure's page from the staff member's enclosure list. The list is paged and other
 * tests add enclosures, so it is searched for by name first.
 */
export async function openEnclosureByName(page: Page, name: string): Promise<void> {
  await page.goto(`/enclosures?q=${encodeURIComponent(name)}`);
  await page.getByRole('link', { name }).click();
  await page.getByRole('heading', { name: 'Designs', exact: true }).waitFor();
}

/**
 * Makes a design with the enclosure page's form and returns its card once the first variant, shown at
 * once (optimistic), has settled with its real id.
 */
export async function newDesignOnPage(page: Page, name: string): Promise<Locator> {
  await page.getByLabel('New design name').fill(name);
  await page.getByRole('button', { name: 'New design' }).click();
  const card = page.getByTestId('design-card').filter({ hasText: name });
  await expect
    .poll(() => card.locator('[data-testid=variant-row][aria-busy=false]').count(), eventually)
    .toBe(1);
  return card;
}

/** The value of the first T5 tube that gives UV in the lamp-type list of `within` (a page or a form). */
export async function firstUvTube(within: Page | Locator): Promise<string> {
  const value = await within
    .locator('select[name=lampTypeId] option:not([disabled])')
    .filter({ hasText: 'T5' })
    .filter({ hasNotText: '(no UV)' })
    .first()
    .getAttribute('value');
  return value!;
}

/**
 * The id of a demo enclosure, as the staff member's enclosure list links it. The list is paged and
 * other tests add enclosures, so it is searched for by name (the search lives in the address).
 */
export async function enclosureIdByName(page: Page, name: string): Promise<number> {
  await page.goto(`/enclosures?q=${encodeURIComponent(name)}`);
  const href = await page
    .getByRole('table', { name: 'Enclosures' })
    .getByRole('link', { name, exact: true })
    .getAttribute('href');
  const id = Number(/\/enclosures\/(\d+)$/.exec(href ?? '')?.[1]);
  if (!(id > 0)) throw new Error(`no link to the enclosure "${name}"`);
  return id;
}

/** A JSON request as the page's signed-in person; the status and the body. */
export async function api(page: Page, method: string, url: string, body?: unknown) {
  return page.evaluate(
    async ({ method, url, body }) => {
      const res = await fetch(url, {
        method,
        headers: body === undefined ? {} : { 'content-type': 'application/json' },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      return { status: res.status, body: (await res.json().catch(() => ({}))) as Record<string, unknown> };
    },
    { method, url, body },
  );
}

/**
 * A new 120 × 60 × 60 cm enclosure for the demo keeper of "Desert vivarium", made by the page's staff
 * member (so a test leaves the demo's own enclosures alone), with a design; the ids a test needs.
 */
export async function demoKeeperEnclosure(
  page: Page,
  name: string,
): Promise<{ organisationId: number; keeperId: number; enclosureId: number; variantId: number }> {
  const known = await api(page, 'GET', `/api/enclosures/${await enclosureIdByName(page, 'Desert vivarium')}`);
  expect(known.status).toBe(200);
  const organisationId = known.body.organisationId as number;
  const keeperId = known.body.keeperId as number;
  const made = await api(page, 'POST', '/api/enclosures', {
    organisationId,
    keeperId,
    name: `${name} ${Date.now().toString(36)}`,
    widthCm: 120,
    heightCm: 60,
    depthCm: 60,
  });
  expect(made.status).toBe(201);
  const enclosureId = made.body.id as number;
  const { variantId } = await createDesign(page, enclosureId, `${name} plan`);
  return { organisationId, keeperId, enclosureId, variantId };
}

/** A new design (with its first variant) on an enclosure, made through the API as the page's person. */
export async function createDesign(
  page: Page,
  enclosureId: number,
  name: string,
): Promise<{ designId: number; variantId: number }> {
  const r = await page.evaluate(
    async ({ id, designName }) => {
      const res = await fetch(`/api/enclosures/${id}/designs`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ name: designName }),
      });
      return {
        status: res.status,
        body: (await res.json()) as { design?: { id: number }; variant?: { id: number } },
      };
    },
    { id: enclosureId, designName: name },
  );
  expect(r.status).toBe(201);
  return { designId: r.body.design!.id, variantId: r.body.variant!.id };
}

/** A share link of a variant, made through the API; its path (/s/<token>). */
export async function createShare(page: Page, variantId: number): Promise<string> {
  const r = await page.evaluate(async (id) => {
    const res = await fetch(`/api/variants/${id}/shares`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({}),
    });
    return { status: res.status, body: (await res.json()) as { share?: { url: string } } };
  }, variantId);
  expect(r.status).toBe(201);
  return new URL(r.body.share!.url).pathname;
}
