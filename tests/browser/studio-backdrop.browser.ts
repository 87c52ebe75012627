// The photo backdrop in Chromium: staff make a new enclosure (the demo's own are left alone) with a
// design; its studio first says there is no photo and links to the lamps page; a photo uploaded there
// (through the upload route) is chosen in the studio's Fields tab, drawn under the design (read from the
// canvas pixels) and stretched by a corner while adjusting — one undo step, no new field computation —
// kept across a reload, and shown as "photo not available" once it is deleted.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { screenshot, signInAsDemo, withBrowser } from './harness';
import { api, demoKeeperEnclosure, readVariant } from './journey-helpers';
import {
  LAYER,
  canUndo,
  drag,
  eventually,
  fieldsSettled,
  keys,
  layerPixel,
  paperDistance,
  openStudio,
  waitSaved,
} from './studio-helpers';

const session = withBrowser();

/** The photo's one colour (a PNG keeps it exact). */
const PHOTO_RGB: [number, number, number] = [200, 40, 160];

/** Uploads a PNG of one colour, drawn by Chromium, as the enclosure's photo; its upload id. */
async function uploadPhoto(page: Page, enclosureId: number): Promise<number> {
  const r = await page.evaluate(
    async ({ enclosureId, rgb }) => {
      const c = document.createElement('canvas');
      c.width = 240;
      c.height = 120;
      const g = c.getContext('2d')!;
      g.fillStyle = `rgb(${rgb.join(',')})`;
      g.fillRect(0, 0, 240, 120);
      const blob = await new Promise<Blob>((res) => c.toBlob((b) => res(b!), 'image/png'));
      const res = await fetch(`/api/uploads?kind=backdrop&enclosureId=${enclosureId}&name=front.png`, {
        method: 'POST',
        headers: { 'content-type': 'image/png' },
        body: blob,
      });
      return { status: res.status, body: (await res.json()) as { upload?: { id: number } } };
    },
    { enclosureId, rgb: PHOTO_RGB },
  );
  expect(r.status).toBe(201);
  return r.body.upload!.id;
}

const backdropReading = (page: Page) => page.getByTestId('backdrop-reading').textContent();
const near = (a: number, b: number, tol: number) => Math.abs(a - b) <= tol;

describe('studio photo backdrop', () => {
  it('chooses the enclosure’s photo, draws it under the design, stretches it by a corner and keeps it', async () => {
    const page = await signInAsDemo(session.page(), 'staff', { timeoutMs: 60_000 });
    const { enclosureId, variantId } = await demoKeeperEnclosure(page, 'Traced');

    // No photo yet: the Fields tab says so and links to where photos are uploaded.
    await openStudio(page, `/studio/${variantId}`);
    await page.getByTestId('tab-fields').click();
    const none = page.getByTestId('photo-none');
    await expect.poll(() => none.textContent(), eventually).toMatch(/No photo of this enclosure yet/);
    expect(await none.getByRole('link').getAttribute('href')).toBe(`/enclosures/${enclosureId}/lamps`);

    const uploadId = await uploadPhoto(page, enclosureId);
    await openStudio(page, `/studio/${variantId}`);
    await page.getByTestId('tab-fields').click();
    // The field bands would cover the photo's colour: hide them to read the photo alone.
    await page.getByRole('checkbox', { name: 'Show the field on the canvas' }).uncheck();
    const inside = { x: 61.3, y: 31.7 };
    const outside = { x: 125.3, y: 31.7 };
    // The enclosure's paper-coloured back, once the layer has drawn it without the field: read too early,
    // the layer is still empty (the expected mix below would be the photo's colour alone) or, with another
    // journey slowing the page, still holds the field's bands from before the box was unchecked.
    let bg: number[] = [];
    await expect
      .poll(async () => {
        bg = Array.from(await layerPixel(page, LAYER.backdrop, inside.x, inside.y));
        return bg[3]! > 0 && paperDistance(bg) <= 12;
      }, eventually)
      .toBe(true);
    await page.getByLabel('Photo of the enclosure').selectOption(String(uploadId));
    await expect
      .poll(() => backdropReading(page), eventually)
      .toBe(
        'Photo backdrop “front.png” under the design at 60 % opacity: 120 cm wide, 60 cm high, left edge at 0 cm, bottom at 0 cm.',
      );
    // Drawn at 60 % over the enclosure's paper-coloured back: the mix of the two, channel by channel.
    const a = bg[3]! / 255;
    const expected = PHOTO_RGB.map((p, i) => (0.6 * p + 0.4 * a * bg[i]!) / (0.6 + 0.4 * a));
    await expect
      .poll(async () => {
        const px = await layerPixel(page, LAYER.backdrop, inside.x, inside.y);
        return expected.every((e, i) => near(px[i]!, e, 8));
      }, eventually)
      .toBe(true);
    // Stretched over the enclosure only: nothing of it beyond the right wall yet.
    expect((await layerPixel(page, LAYER.backdrop, outside.x, outside.y))[3]).toBeLessThan(100);

    // Adjust: drag the top-right corner from (120, 60) to (130, 66). The engine is asked nothing new.
    await fieldsSettled(page);
    const trips = await page.evaluate(() => window.__baskwellStudio!.roundTrips.length);
    // The help lists the photo's commands here (the scratch studio's does not: studio-keys.browser.ts).
    await keys(page, '?');
    const help = page.getByTestId('help-dialog');
    await help.waitFor({ state: 'visible' });
    expect(await help.textContent()).toMatch(
      /Show the photo backdropB.*Adjust the photo \(drag it, or its corners\)Shift\+B/s,
    );
    await page.keyboard.press('Escape');
    await help.waitFor({ state: 'hidden' });
    await page.getByRole('button', { name: 'Adjust the photo (drag it, or its corners)' }).click();
    await drag(page, { x: 120, y: 60 }, { x: 130, y: 66 });
    await expect
      .poll(() => backdropReading(page), eventually)
      .toMatch(/130 cm wide, 66 cm high, left edge at 0 cm/);
    const px = await layerPixel(page, LAYER.backdrop, outside.x, outside.y);
    expect(PHOTO_RGB.every((p, i) => near(px[i]!, p, 8)) && near(px[3]!, 153, 8)).toBe(true);
    expect(await page.evaluate(() => window.__baskwellStudio!.roundTrips.length)).toBe(trips);
    await screenshot(page, 'studio-backdrop-adjusted');

    // One drag, one undo step (after choosing the photo, which is one too).
    await keys(page, 'Control+Z');
    await expect.poll(() => backdropReading(page), eventually).toMatch(/120 cm wide, 60 cm high/);
    await keys(page, 'Control+Z');
    await expect.poll(() => page.getByTestId('backdrop-reading').count(), eventually).toBe(0);
    expect(await canUndo(page)).toBe(false);
    await keys(page, 'Control+Shift+Z', 'Control+Shift+Z');
    await expect.poll(() => backdropReading(page), eventually).toMatch(/130 cm wide, 66 cm high/);
    await waitSaved(page);
    const stored = await readVariant(page, variantId);
    expect((stored.variant?.design as { backdrop?: unknown }).backdrop).toEqual({
      uploadId,
      x: 0,
      y: 0,
      width: 130,
      height: 66,
      opacity: 0.6,
      visible: true,
    });

    // Kept: a reload draws it where it was left.
    await openStudio(page, `/studio/${variantId}`);
    await expect
      .poll(() => backdropReading(page), eventually)
      .toMatch(/“front\.png” under the design.*130 cm wide, 66 cm high/);

    // Deleted on the lamps page's route: the studio says the photo is not available, and still works.
    expect((await api(page, 'DELETE', `/api/uploads/${uploadId}`)).status).toBe(200);
    await openStudio(page, `/studio/${variantId}`);
    await page.getByTestId('tab-fields').click();
    await expect
      .poll(() => page.getByTestId('photo-problem').textContent(), eventually)
      .toMatch(/^Photo not available/);
    expect(await backdropReading(page)).toBe('Photo backdrop: photo not available.');
    expect(session.pageErrors()).toEqual([]);
  });
});
