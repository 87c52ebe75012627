// A visitor's journey in Chromium: someone with a share link and no account opens it and sees the design
// read-only (fields, figures, cautions, the estimate note) with no edit control and nothing else of the
// organisation; the app itself stays closed to them.
import { describe, expect, it } from 'vitest';
import { DEMO_SHOP } from '@/lib/demo/scenario';
import { newContext, screenshot, withBrowser } from './harness';
import { JOURNEY_MS, createDesign, createShare, enclosureIdByName, staffPage } from './journey-helpers';

const session = withBrowser();
const enclosureName = DEMO_SHOP.people.find((p) => p.role === 'keeper')!.enclosures![0]!.name;

describe('visitor journey', () => {
  it(
    'opens a share link without a session and sees the read-only design with its cautions',
    async () => {
      const staff = await staffPage(session.browser());
      const enclosureId = await enclosureIdByName(staff, enclosureName);
      const designName = `Shared with a friend ${Date.now().toString(36)}`;
      const { variantId } = await createDesign(staff, enclosureId, designName);
      const sharePath = await createShare(staff, variantId);
      await staff.context().close();

      const visitorContext = await newContext(session.browser());
      try {
        const page = await visitorContext.newPage();
        page.setDefaultTimeout(60_000);
        const res = await page.goto(sharePath);
        expect(res?.status()).toBe(200);
        await page.getByRole('heading', { level: 1 }).waitFor();
        const main = page.locator('main');
        expect(await main.innerText()).toContain(designName);
        expect(await page.getByText('Shared read-only').count()).toBe(1);
        // The field picture, the estimate note and the cautions.
        expect(await main.getByRole('img').count()).toBeGreaterThan(0);
        // The field is a picture at its own address, cacheable for ever and revalidated by its ETag, so the
        // page's own HTML stays small: it loads, and it carries its text alternative.
        const picture = main.locator('img[src*="/picture/"]');
        expect(await picture.getAttribute('alt')).toMatch(/^UV Index of /);
        await expect
          .poll(() => picture.evaluate((img: HTMLImageElement) => (img.complete ? img.naturalWidth : 0)))
          .toBeGreaterThan(0);
        const src = (await picture.getAttribute('src'))!;
        expect(src).toMatch(new RegExp(`^${sharePath}/picture/\\d+/uvi\\.svg$`));
        const drawn = await page.request.get(src);
        expect(drawn.status()).toBe(200);
        expect(drawn.headers()['content-type']).toBe('image/svg+xml; charset=utf-8');
        expect(drawn.headers()['cache-control']).toBe('public, max-age=31536000, immutable');
        const etag = drawn.headers()['etag']!;
        expect((await page.request.get(src, { headers: { 'if-none-match': etag } })).status()).toBe(304);
        // No drawing inline: the page's only SVG is the decorative brand mark.
        expect(await res!.text()).not.toMatch(/<svg[^>]*role="img"/);
        expect(await main.innerText()).toMatch(/estimate/i);
        expect(await main.innerText()).toMatch(/verify it with a UV meter and a thermometer/);
        const cautions = page.getByRole('region', { name: 'Safety', exact: true });
        expect(await cautions.count()).toBe(1);
        expect(await cautions.locator('li').count()).toBeGreaterThan(0);
        // No edit control and no way into the app.
        expect(await main.locator('button, input, select, textarea, form, [contenteditable]').count()).toBe(
          0,
        );
        expect(
          await page.locator('a[href^="/studio"], a[href^="/enclosures"], a[href^="/designs"]').count(),
        ).toBe(0);
        expect(await page.getByText(/Open in studio|Delete|Rename/).count()).toBe(0);
        await screenshot(page, 'journey-visitor-01-share');

        // Another field is a plain link on the same read-only page.
        await page
          .getByRole('navigation', { name: 'Field' })
          .getByRole('link', { name: 'Temperature' })
          .click();
        await page.waitForURL(/field=tempC/);
        expect(await main.locator('button, input, select, textarea, form').count()).toBe(0);
        await screenshot(page, 'journey-visitor-02-share-temperature');

        // The app behind it asks for a sign-in; the design's API answers 401.
        await page.goto(`/studio/${variantId}`);
        await page.waitForURL((u) => u.pathname === '/sign-in');
        await screenshot(page, 'journey-visitor-03-sign-in');
        // Asked from the page (the browser's own fetch, without a session): the test's own HTTP client may
        // reuse a connection the busy server has just closed as idle, and fail with a reset that says nothing.
        const apiStatus = await page.evaluate(
          async (id) => (await fetch(`/api/variants/${id}`, { cache: 'no-store' })).status,
          variantId,
        );
        expect(apiStatus).toBe(401);
        // A made-up token is a plain 404.
        expect((await page.goto('/s/' + 'x'.repeat(43)))?.status()).toBe(404);
        await screenshot(page, 'journey-visitor-04-unknown-link');
      } finally {
        await visitorContext.close();
      }
      expect(session.pageErrors()).toEqual([]);
    },
    JOURNEY_MS,
  );
});
