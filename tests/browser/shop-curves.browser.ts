import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_SHOP } from '@/lib/demo/scenario';
import { LampType, Organisation } from '@/models';
import { newContext, screenshot, signInAsDemo, withBrowser } from './harness';
import { JOURNEY_MS, createDesign, enclosureIdByName } from './journey-helpers';
import { eventually, keys, studioReady } from './studio-helpers';

// What the shop learns from its tests, in Chromium at desktop and phone size: the example shop's
// high-output T5 type shows its measured curve with its band, counts and table against the catalogue's,
// staff adopt it, give a lamp in a design the adopted curve from the studio's lamp inspector and go back
// to the catalogue, and the counter's figures show their plots and tables.
const session = withBrowser();
const SIZES = [
  { name: 'desktop', viewport: { width: 1280, height: 900 }, touch: false },
  { name: 'phone', viewport: { width: 390, height: 844 }, touch: true },
] as const;

async function demoTube(): Promise<LampType> {
  const shop = (await Organisation.findOne({ where: { name: DEMO_SHOP.name } }))!;
  return (await LampType.findOne({ where: { organisationId: shop.id, presetKey: 't5-high' } }))!;
}

/**
 * A new design on the example customer's vivarium, with one lamp: the studio's lamp inspector offers the
 * adopted type, applies it in one undoable step and names the curve the lamp ages by.
 */
async function lampFromCatalogue(page: Page, typeName: string, lamps: number) {
  const enclosureId = await enclosureIdByName(page, 'Desert vivarium');
  const { variantId } = await createDesign(page, enclosureId, `Adopted curve ${Date.now().toString(36)}`);
  await page.goto(`/studio/${variantId}`);
  await studioReady(page);
  // One generic lamp, placed from the keyboard and selected: it ages by its technology's curve.
  await keys(page, 'Control+A', 'Delete', 'l', 'Enter');
  await expect
    .poll(() => page.getByTestId('inspector-object').getAttribute('data-object-id'), eventually)
    .toBe('lamp-1');
  expect(await page.getByTestId('lamp-measured-curve').count()).toBe(0);
  await page.getByTestId('lamp-catalogue').selectOption({ label: typeName });
  const note = `Ageing: your shop’s measured curve for ${typeName}, ${lamps} lamps.`;
  await expect.poll(() => page.getByTestId('lamp-measured-curve').textContent(), eventually).toBe(note);
  expect(await page.getByTestId('lamp-catalogue').inputValue()).not.toBe('');
  await screenshot(page, 'studio-adopted-curve-desktop');
  // One undo takes the whole type off again.
  await keys(page, 'Control+Z');
  await expect.poll(() => page.getByTestId('lamp-measured-curve').count(), eventually).toBe(0);
}

async function staffPage(size: (typeof SIZES)[number]): Promise<Page> {
  const context = await newContext(session.browser(), { viewport: size.viewport, hasTouch: size.touch });
  const page = await signInAsDemo(await context.newPage(), 'staff', { timeoutMs: 60_000 });
  return page;
}

describe('what the shop learns', () => {
  for (const size of SIZES) {
    it(
      `shows the example shop’s measured curve and its counter figures (${size.name})`,
      { timeout: JOURNEY_MS },
      async () => {
        const page = await staffPage(size);
        try {
          const tube = await demoTube();
          const id = tube.id;
          await page.goto(`/lamp-catalogue/${id}`);
          const section = page.getByTestId('population');
          await section.getByTestId('population-curve').waitFor();
          await expect
            .poll(() => section.getByTestId('population-band').count(), { timeout: 30_000 })
            .toBe(1);
          expect(await section.getByTestId('catalogue-curve').count()).toBe(1);
          // Counts behind the curve, and the example-data mark of the demo shop.
          expect(await section.getByTestId('population-counts').textContent()).toMatch(
            /\d+ readings of \d+ lamps \(\d+ in enclosures, \d+ at the counter\)/,
          );
          expect(await section.getByTestId('example-data').count()).toBe(1);
          // The table beside the chart has the same months, with a measured share and a band.
          const rows = section.getByTestId('population-table').locator('tbody tr');
          expect(await rows.count()).toBeGreaterThan(4);
          expect(await rows.nth(1).locator('td').nth(1).textContent()).toMatch(/\d+ %–\d+ %/);
          await screenshot(page, `shop-curve-${size.name}`);

          if (size.name === 'desktop') {
            // Adopt, see it in force, and go back to the catalogue's curve.
            await section.getByTestId('adopt-curve').click();
            await expect
              .poll(() => section.getByTestId('curve-in-force').textContent(), { timeout: 90_000 })
              .toContain('your shop’s measured curve');
            await screenshot(page, 'shop-curve-adopted-desktop');
            const lamps = Number(
              /\((\d+) lamps,/.exec((await section.getByTestId('curve-in-force').textContent())!)![1],
            );
            await lampFromCatalogue(page, tube.name, lamps);
            await page.goto(`/lamp-catalogue/${id}`);
            await section.getByTestId('withdraw-curve').click();
            await expect
              .poll(() => section.getByTestId('curve-in-force').textContent(), { timeout: 90_000 })
              .toContain('In force for your lamps of this type: the catalogue’s curve.');
            expect(await section.getByText('Adoptions of this type').count()).toBe(1);
          }

          // The counter's figures, from the counter page's link.
          await page.goto('/counter');
          await page.locator('main').getByRole('link', { name: 'Counter figures' }).click();
          await page.waitForURL('**/counter/dashboard');
          for (const id of ['tests-per-week', 'replace-by-technology', 'replace-by-age']) {
            const block = page.getByTestId(id);
            await block.waitFor();
            expect(await block.locator('svg[role=img]').count()).toBe(1);
            expect(await block.locator('tbody tr').count()).toBeGreaterThan(0);
          }
          expect(await page.getByTestId('tests-total').textContent()).toMatch(/^[1-9]\d* counter tests/);
          expect(await page.getByTestId('example-data').count()).toBe(1);
          await screenshot(page, `counter-figures-${size.name}`);
        } finally {
          await page.context().close();
        }
      },
    );
  }
});
