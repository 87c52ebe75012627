// The first hour of a visitor on the demo: the staff member signs in and, without creating anything,
// finds the example designs through the first-visit hint, compares the desert enclosure's two variants,
// sees its share links (one live, one revoked), a lamp of the lamp log that calibrates against those
// designs, the calibrated lamp in the studio, and the reminder e-mail the seed sent. Any write request
// the pages send fails the test. A screenshot of every page on the way.
import { describe, expect, it } from 'vitest';
import { CURRENT_VARIANT_NAME, DESERT_DESIGN_NAME, IMPROVED_VARIANT_NAME } from '@/lib/demo/designs';
import { demoSignIn } from '@/lib/demo/scenario';
import { newContext, screenshot, signIn, signInAsDemo, withBrowser } from './harness';
import { JOURNEY_MS, eventually, studioReady } from './journey-helpers';

const session = withBrowser();
const shot = (name: string) => screenshot(session.page(), `demo-walk-${name}`);

describe('the demo tells its story on first sight', () => {
  it(
    'staff sign-in → hint → designs, a comparison, share links, a calibrated lamp; the owner’s sent reminder',
    async () => {
      const page = session.page();
      page.setDefaultTimeout(60_000);
      const writes: string[] = [];
      // Through the sign-in form, as the visitor of the walk would.
      const staff = demoSignIn('staff');
      await signIn(page, staff.email, staff.password);
      // From here on the visitor only looks: no page may send a change.
      page.on('request', (r) => {
        const url = new URL(r.url());
        if (!['GET', 'HEAD', 'OPTIONS'].includes(r.method()) && url.pathname.startsWith('/api/')) {
          if (!url.pathname.startsWith('/api/auth/')) writes.push(`${r.method()} ${url.pathname}`);
        }
      });

      // 1. The enclosures page points at the desert enclosure's design.
      await page.goto('/enclosures');
      const hint = page.getByTestId('first-design-hint');
      await hint.waitFor();
      await shot('01-enclosures-hint');
      await hint.getByRole('link', { name: 'Open the desert enclosure’s design' }).click();
      await page.waitForURL(/\/designs\/\d+$/);
      const designPath = new URL(page.url()).pathname;
      await page.getByRole('heading', { name: DESERT_DESIGN_NAME }).first().waitFor();
      const main = page.locator('main');
      for (const name of [CURRENT_VARIANT_NAME, IMPROVED_VARIANT_NAME]) {
        await main.getByText(name, { exact: true }).first().waitFor();
      }
      // 2. Its share links: the improved plan's live, the current set-up's revoked.
      await expect
        .poll(() => main.getByText('Active', { exact: true }).count(), eventually)
        .toBeGreaterThan(0);
      await expect
        .poll(() => main.getByText('Revoked', { exact: true }).count(), eventually)
        .toBeGreaterThan(0);
      await shot('02-design-with-share-links');

      // 3. Compare the two variants: the tube that moved is a difference.
      await page.goto('/enclosures');
      await page
        .getByTestId('first-design-hint')
        .getByRole('link', { name: 'compare the two variants' })
        .click();
      await page.waitForURL(/\/compare\?a=\d+&b=\d+/);
      for (const side of ['compare-a', 'compare-b'])
        await page.getByTestId(side).getByRole('img').first().waitFor();
      const diff = page.getByTestId('diff-row');
      await expect.poll(() => diff.count(), eventually).toBeGreaterThan(0);
      expect((await diff.allInnerTexts()).join('\n')).toContain('Basking tube');
      await shot('03-compare');

      // 4. The lamp log's worn tube: calibration finds it in both variants at once.
      await page.goto('/lamp-log');
      await page.getByRole('link', { name: 'Basking tube' }).first().click();
      await page.waitForURL(/\/lamp-log\/\d+$/);
      const calibration = page.locator('section[aria-labelledby=calibration]');
      await expect
        .poll(() => calibration.innerText(), eventually)
        .toContain(`${DESERT_DESIGN_NAME} · ${CURRENT_VARIANT_NAME}`);
      expect(await calibration.innerText()).toContain(`${DESERT_DESIGN_NAME} · ${IMPROVED_VARIANT_NAME}`);
      expect(await calibration.innerText()).not.toMatch(/No design of this enclosure/);
      await shot('04-lamp-calibration');

      // 5. The current set-up in the studio: the tube is calibrated to the readings, the photo traced.
      await page.goto(designPath);
      const currentRow = main.locator('li').filter({ hasText: CURRENT_VARIANT_NAME }).first();
      await currentRow
        .getByRole('link', { name: /Open in studio/ })
        .first()
        .click();
      await page.waitForURL(/\/studio\/\d+$/);
      await studioReady(page);
      await expect
        .poll(() => page.getByTestId('object-summary').textContent(), eventually)
        .toMatch(/calibrated/i);
      await shot('05-studio-current-set-up');

      // 6. The reminder the seed sent about the worn tube waits in the mail viewer, which only the
      // organisation's owner may open.
      const ownerPage = await (await newContext(session.browser())).newPage();
      await signInAsDemo(ownerPage, 'owner', { timeoutMs: 60_000 });
      await ownerPage.goto('/mail');
      const mail = ownerPage.locator('main');
      await expect.poll(() => mail.innerText(), eventually).toMatch(/Baskwell lamp log:/);
      expect(await mail.innerText()).toContain('Basking tube');
      await screenshot(ownerPage, 'demo-walk-06-mail-reminder');
      await ownerPage.context().close();

      expect(writes, 'the walk changed something').toEqual([]);
      expect(session.pageErrors()).toEqual([]);
    },
    JOURNEY_MS,
  );
});
