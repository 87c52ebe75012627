// Designs, variants, comparison and sharing in Chromium: a staff member creates a design on a customer's
// enclosure, duplicates its variant, uploads a design file with lamps as another variant (a broken file
// first, whose error must name the field), compares the empty and the lit variant, shares the lit one,
// opens the link in a fresh browser with no session, downloads its PDF report, and revokes the link.
import { readFileSync } from 'node:fs';
import { PDFDocument } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { pdfDrawnText } from '../api/variants.helpers';
import { BASE_URL, newContext, screenshot, signInAsDemo, withBrowser } from './harness';
import { newDesignOnPage, openEnclosureByName } from './journey-helpers';

const session = withBrowser();

// Long journey against one app: generous, so a cold first compile of a page does not fail it.
const JOURNEY_MS = 420_000;
/** How long a poll waits for the page to catch up (a save, a refetch, a navigation). */
const eventually = { timeout: 60_000, interval: 200 };

/** A design file with lamps for the demo's 90 × 45 × 45 cm gecko tank, as a user would upload it. */
function lampsFile(uvbAt30: unknown = 35) {
  return {
    format: 'baskwell.design',
    version: 2,
    enclosure: { width: 90, height: 45, depth: 45, roomTempC: 22 },
    objects: [
      { type: 'screen', id: 'lid', x1: 0, y1: 45, x2: 90, y2: 45, uvbTransmission: 0.6 },
      { type: 'ledge', id: 'rock', x: 55, y: 0, width: 25, height: 12 },
      { type: 'lamp', id: 'uv', tech: 't5', form: 'tube', x: 60, y: 47, length: 40, uvbAt30 },
      { type: 'lamp', id: 'heat', tech: 'halogen', form: 'bulb', x: 68, y: 47, uvbAt30: 0, watts: 50 },
    ],
  };
}
const asFile = (name: string, json: unknown) => ({
  name,
  mimeType: 'application/json',
  buffer: Buffer.from(JSON.stringify(json, null, 2)),
});

describe('variants, comparison and share links', () => {
  it(
    'creates two variants, compares them, shares one and downloads its report without a session',
    async () => {
      const page = await signInAsDemo(session.page(), 'staff', { timeoutMs: 60_000 });

      // A customer's enclosure from the demo scenario.
      await openEnclosureByName(page, 'Gecko tank');
      const enclosurePath = new URL(page.url()).pathname;

      const suffix = Date.now().toString(36);
      const designName = `Night set-up ${suffix}`;
      const variantName = `Warm rock ${suffix}`;
      const card = await newDesignOnPage(page, designName);

      // Rename it, then duplicate it: two variants.
      await card.getByRole('button', { name: 'Rename variant Variant A' }).click();
      await card.getByLabel('New name for variant Variant A').fill(variantName);
      await card.getByLabel('New name for variant Variant A').press('Enter');
      await expect.poll(() => card.getByText(variantName, { exact: true }).count(), eventually).toBe(1);
      await card.getByRole('button', { name: 'Duplicate' }).first().click();
      await expect
        .poll(() => card.locator('[data-testid=variant-row][aria-busy=false]').count(), eventually)
        .toBe(2);
      await expect
        .poll(() => card.getByText(`Copy of ${variantName}`, { exact: true }).count(), eventually)
        .toBe(1);
      await screenshot(page, 'variants-enclosure-designs');

      // Upload design files on the design's own page: a broken one first, refused with the field named.
      await card.getByRole('link', { name: 'Sharing & export' }).click();
      await page.getByRole('heading', { name: designName, level: 1 }).waitFor();
      const litName = `Lamps fitted ${suffix}`;
      await page
        .getByLabel('Design file', { exact: true })
        .setInputFiles(asFile('broken.json', lampsFile('sixty')));
      await page.getByRole('button', { name: 'Upload as new variant' }).click();
      const refusal = page.getByRole('alert').filter({ hasText: 'objects[2].uvbAt30' });
      await refusal.waitFor();
      expect(await refusal.textContent()).toContain('objects[2].uvbAt30: expected number, received string');
      await screenshot(page, 'variants-upload-refused');
      await page.getByLabel('Design file', { exact: true }).setInputFiles(asFile('lit.json', lampsFile()));
      await page.getByLabel('Name of the uploaded variant').fill(litName);
      await page.getByRole('button', { name: 'Upload as new variant' }).click();
      await page.getByTestId('variant-panel').filter({ hasText: litName }).waitFor();
      expect(await page.getByRole('alert').filter({ hasText: 'objects[2]' }).count()).toBe(0);
      const designPath = new URL(page.url()).pathname;

      // Compare the empty variant with the lit one side by side.
      await page.goto(enclosurePath);
      const card2 = page.getByTestId('design-card').filter({ hasText: designName });
      await expect
        .poll(() => card2.locator('[data-testid=variant-row][aria-busy=false]').count(), eventually)
        .toBe(3);
      await card2.getByLabel(`Compare ${variantName}`, { exact: true }).check();
      await card2.getByLabel(`Compare ${litName}`, { exact: true }).check();
      await page.getByRole('link', { name: 'Compare side by side' }).click();
      await page.waitForURL(/\/compare\?a=\d+&b=\d+/);
      for (const side of ['compare-a', 'compare-b']) {
        await page.getByTestId(side).getByRole('img').waitFor();
      }
      // The empty side says why its field is flat; the table lists the lamps and the rock as added.
      await page.getByTestId('compare-a').getByText('No lamps yet', { exact: false }).waitFor();
      expect(await page.getByTestId('compare-b').getByText('No lamps yet', { exact: false }).count()).toBe(0);
      expect(await page.getByText('The two variants are the same design.').count()).toBe(0);
      await expect
        .poll(() => page.getByRole('table').getByText('Added', { exact: true }).count(), eventually)
        .toBeGreaterThanOrEqual(3);
      // Changes read in words with their units; temperatures follow the °C/°F choice.
      await page.getByText('room temperature: not set (default) → 22 °C', { exact: true }).waitFor();
      await page.getByRole('group', { name: 'Temperature unit' }).getByRole('button', { name: '°F' }).click();
      await page
        .getByRole('row', { name: /Cool end/ })
        .getByText('71.6 °F', { exact: true })
        .waitFor();
      await page.getByRole('group', { name: 'Temperature unit' }).getByRole('button', { name: '°C' }).click();
      await page.getByRole('radio', { name: 'Temperature' }).click();
      await page.waitForURL(/field=tempC/);
      await page
        .getByTestId('compare-b')
        .getByRole('img', { name: /Surface temperature/ })
        .waitFor();
      await screenshot(page, 'variants-compare');

      // Share the lit variant from its design's page.
      await page.goto(designPath);
      const panel = page.getByTestId('variant-panel').filter({ hasText: litName }).first();
      await panel.getByRole('button', { name: 'Create share link' }).click();
      const url = await panel.getByLabel('New share link').inputValue();
      expect(url).toMatch(/\/s\/[A-Za-z0-9_-]{43}$/);
      await screenshot(page, 'variants-share-created');

      // A fresh browser context: no cookies, no session.
      const anonymous = await newContext(session.browser());
      try {
        const visitor = await anonymous.newPage();
        visitor.setDefaultTimeout(60_000);
        const sharePath = new URL(url).pathname;
        const res = await visitor.goto(sharePath);
        expect(res?.status()).toBe(200);
        await visitor.getByRole('heading', { name: litName, level: 1 }).waitFor();
        await visitor.getByRole('img', { name: `UV Index of ${litName}` }).waitFor();
        const picture = await visitor
          .getByRole('img', { name: `UV Index of ${litName}` })
          .getAttribute('src');
        expect(picture).toMatch(/\/picture\/\d+\/uvi\.svg$/);
        expect(await visitor.getByText('estimate', { exact: false }).count()).toBeGreaterThan(0);
        // The cautions of a design with a UV tube and a heat lamp, and figures in both unit systems.
        for (const caution of [
          'UV can injure eyes and skin',
          'Lamps within reach burn',
          'Heat sources can start fires',
          'Control each lamp the way its type allows',
        ]) {
          await visitor
            .getByRole('region', { name: 'Safety', exact: true })
            .getByText(caution)
            .first()
            .waitFor();
        }
        await visitor.getByText('90 × 45 × 45 cm (35.4 × 17.7 × 17.7 in)', { exact: false }).waitFor();
        expect(await visitor.getByText(/°C \([\d.]+ °F\)/).count()).toBeGreaterThan(0);
        // Read-only: no form control of any kind, and nothing else of the organisation.
        expect(await visitor.locator('main').locator('button, input, select, textarea, form').count()).toBe(
          0,
        );
        expect(await visitor.getByText(`Copy of ${variantName}`).count()).toBe(0);
        expect(await visitor.getByText(variantName, { exact: true }).count()).toBe(0);
        await screenshot(visitor, 'variants-shared-page');

        const [download] = await Promise.all([
          visitor.waitForEvent('download'),
          visitor.getByRole('link', { name: 'Download the report (PDF)' }).click(),
        ]);
        const file = await download.path();
        const bytes = new Uint8Array(readFileSync(file));
        expect(bytes.byteLength).toBeGreaterThan(10_000);
        expect(Buffer.from(bytes.subarray(0, 5)).toString('latin1')).toBe('%PDF-');
        expect((await PDFDocument.load(bytes)).getTitle()).toBe(litName);
        const text = pdfDrawnText(bytes);
        expect(text).toContain(litName);
        expect(text).toContain('verify with a meter and thermometer');
        expect(text).toContain('Control each lamp the way its type allows');

        // Revoked: the same link answers 404, page and report alike.
        await panel.getByRole('button', { name: 'Revoke' }).click();
        // The list shows "Revoked" at once (optimistic); wait for the server's answer itself.
        const [revoked] = await Promise.all([
          page.waitForResponse(
            (r) => r.request().method() === 'DELETE' && /\/api\/shares\/\d+$/.test(r.url()),
          ),
          panel.getByRole('button', { name: 'Yes, revoke' }).click(),
        ]);
        expect(revoked.status()).toBe(200);
        await expect.poll(() => panel.getByText('Revoked', { exact: true }).count(), eventually).toBe(1);
        expect((await visitor.goto(sharePath))?.status()).toBe(404);
        const report = await visitor.request.get(`${BASE_URL}${sharePath}/report?format=pdf`);
        expect(report.status()).toBe(404);
        // Its field pictures stop at once too, although a browser may keep the ones it has.
        expect((await visitor.request.get(`${BASE_URL}${picture}`)).status()).toBe(404);
      } finally {
        await anonymous.close();
      }
      expect(session.pageErrors()).toEqual([]);
    },
    JOURNEY_MS,
  );
});
