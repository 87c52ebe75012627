// A keeper's journey in Chromium: they sign in and see their own enclosures and designs only; another
// keeper's enclosure, design, variant and lamps, typed in as addresses, show the not-found page (404),
// exactly like an id that does not exist; their API answers 404.
import { describe, expect, it } from 'vitest';
import { DEMO_SHOP, demoSignIn } from '@/lib/demo/scenario';
import { screenshot, signIn, withBrowser } from './harness';
import { JOURNEY_MS, createDesign, enclosureIdByName, eventually, staffPage } from './journey-helpers';

const session = withBrowser();
const [other, keeper] = DEMO_SHOP.people.filter((p) => p.role === 'keeper');
const shot = (page: Parameters<typeof screenshot>[0], name: string) =>
  screenshot(page, `journey-keeper-${name}`);

describe('keeper journey', () => {
  it(
    "sees only their own enclosures; another keeper's things answer not found",
    async () => {
      if (!keeper || !other) throw new Error('the demo shop has two keepers');
      const own = (keeper.enclosures ?? []).map((e) => e.name);
      const theirs = (other.enclosures ?? []).map((e) => e.name);
      expect(own.length).toBeGreaterThan(0);
      expect(theirs.length).toBeGreaterThan(0);

      // Staff prepare a design on each keeper's first enclosure (ids the keeper could try to guess).
      const staff = await staffPage(session.browser());
      const ownEnclosure = await enclosureIdByName(staff, own[0]!);
      const otherEnclosure = await enclosureIdByName(staff, theirs[0]!);
      const suffix = Date.now().toString(36);
      const ownDesign = await createDesign(staff, ownEnclosure, `Keeper's own ${suffix}`);
      const otherDesign = await createDesign(staff, otherEnclosure, `Not for them ${suffix}`);
      await staff.context().close();

      const page = session.page();
      page.setDefaultTimeout(60_000);
      await signIn(page, keeper.email, demoSignIn('keeper').password);
      await page.waitForURL((u) => u.pathname === '/enclosures');
      const table = page.getByRole('table', { name: 'Enclosures' });
      await table.waitFor();
      for (const name of own) expect(await table.getByRole('link', { name, exact: true }).count()).toBe(1);
      for (const name of theirs) expect(await page.getByText(name, { exact: true }).count()).toBe(0);
      // Other tests may add enclosures for this keeper: at least their own, and nobody else's (above).
      expect(await table.getByRole('link').count()).toBeGreaterThanOrEqual(own.length);
      await shot(page, '01-enclosures');

      // Their own enclosure, design and studio open.
      await table.getByRole('link', { name: own[0]!, exact: true }).click();
      await page.getByRole('heading', { name: own[0]!, level: 1 }).waitFor();
      await expect
        .poll(
          () =>
            page
              .getByTestId('design-card')
              .filter({ hasText: `Keeper's own ${suffix}` })
              .count(),
          eventually,
        )
        .toBe(1);
      await shot(page, '02-own-enclosure');
      const res = await page.goto(`/studio/${ownDesign.variantId}`);
      expect(res?.status()).toBe(200);
      await page.waitForSelector('[data-testid=studio-canvas] canvas', { timeout: 90_000 });
      await shot(page, '03-own-studio');

      // Another keeper's things, by address: the not-found page, as for an id that never existed.
      const foreign = [
        ['enclosure', `/enclosures/${otherEnclosure}`],
        ['lamps', `/enclosures/${otherEnclosure}/lamps`],
        ['design', `/designs/${otherDesign.designId}`],
        ['studio', `/studio/${otherDesign.variantId}`],
        ['missing-enclosure', '/enclosures/999999999'],
      ] as const;
      for (const [what, path] of foreign) {
        // A real 404, as the API below answers: no loading boundary starts these pages' responses early.
        const res = await page.goto(path);
        expect(res?.status(), path).toBe(404);
        await page.getByRole('heading', { name: 'Not found' }).waitFor();
        expect(await page.getByText(`Not for them ${suffix}`).count()).toBe(0);
        for (const name of theirs) expect(await page.getByText(name, { exact: true }).count()).toBe(0);
        await shot(page, `04-not-found-${what}`);
      }
      // Compared with their own variant, the foreign one is simply not there.
      await page.goto(`/compare?a=${ownDesign.variantId}&b=${otherDesign.variantId}`);
      await page.getByText('That variant was not found, or it is not yours to see.').waitFor();
      // Their own variant is there (its heading is drawn with the page; the field follows from the worker).
      await page.getByTestId('compare-a').getByRole('heading', { level: 2 }).waitFor();
      expect(await page.getByText(`Not for them ${suffix}`).count()).toBe(0);
      await shot(page, '05-compare-foreign');
      // The API answers the same: 404, nothing of the design.
      const api = await page.evaluate(async (id) => {
        const r = await fetch(`/api/variants/${id}`);
        return { status: r.status, text: await r.text() };
      }, otherDesign.variantId);
      expect(api.status).toBe(404);
      expect(api.text).not.toContain('Not for them');
      expect(session.pageErrors()).toEqual([]);
    },
    JOURNEY_MS,
  );
});
