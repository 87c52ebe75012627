// The studio and the pages a shop uses at the counter, on a phone (390 × 844) and a tablet (820 × 1180)
// with a touch screen: the canvas comes first and fills the width, the field is drawn, two fingers
// pinch to zoom and move the view together, a tap selects, a long press offers the actions of what it
// rests on, the findings are read in the sheet under the canvas, and a phone opens the design for
// viewing until Edit is switched on. Fingers are sent through the DevTools protocol as a touch screen
// sends them. Screenshots of every size land in test-results/screenshots/.
import type { BrowserContext, CDPSession, Page } from 'playwright-core';
import { afterEach, describe, expect, it } from 'vitest';
import { newContext, screenshot, signInAsDemo, watchPageErrors, withBrowser } from './harness';
import { JOURNEY_MS, createShare } from './journey-helpers';
import {
  LAYER,
  at,
  camera,
  eventually,
  fieldsSettled,
  inspected,
  layerPixel,
  paperDistance,
  openStudio,
  summary,
} from './studio-helpers';

const session = withBrowser();
// The scratch design's perch and hide, selected, as the canvas summary writes them.
const PERCH_SELECTED =
  /Perch: from \(20 cm, 20 cm\) to \(70 cm, 38 cm\), 53\.1 cm long at 20°, 4 cm thick \(selected\)/;
const HIDE_SELECTED = /Hide: 25 cm wide, 14 cm high, left edge at 5 cm, bottom at 0 cm \(selected\)/;
const PHONE = { width: 390, height: 844 };
const TABLET = { width: 820, height: 1180 };

let context: BrowserContext | undefined;
let current: Page | undefined;
afterEach(async (ctx) => {
  if (ctx.task.result?.state === 'fail' && current) {
    await screenshot(current, `FAILED-touch-${ctx.task.name}`).catch(() => undefined);
  }
  current = undefined;
  await context?.close();
  context = undefined;
});

async function touchPage(viewport: { width: number; height: number }) {
  context = await newContext(session.browser(), { viewport, hasTouch: true });
  const page = await context.newPage();
  current = page;
  page.setDefaultTimeout(60_000);
  const errors = watchPageErrors(page);
  const cdp = await context.newCDPSession(page);
  return { page, cdp, errors };
}

type Finger = { x: number; y: number; id: number };
const send = (cdp: CDPSession, type: 'touchStart' | 'touchMove' | 'touchEnd', touchPoints: Finger[]) =>
  cdp.send('Input.dispatchTouchEvent', { type, touchPoints });

/** Two fingers about `mid`, `half` px either side, moved from (half0, no shift) to (half1, shifted). */
async function twoFingers(
  cdp: CDPSession,
  mid: { x: number; y: number },
  half0: number,
  half1: number,
  shift = { x: 0, y: 0 },
) {
  const fingers = (half: number, k: number) => [
    { x: mid.x - half + shift.x * k, y: mid.y + shift.y * k, id: 1 },
    { x: mid.x + half + shift.x * k, y: mid.y + shift.y * k, id: 2 },
  ];
  await send(cdp, 'touchStart', fingers(half0, 0));
  const steps = 12;
  for (let i = 1; i <= steps; i++) {
    await send(cdp, 'touchMove', fingers(half0 + ((half1 - half0) * i) / steps, i / steps));
  }
  await send(cdp, 'touchEnd', []);
}

async function tap(cdp: CDPSession, p: { x: number; y: number }) {
  await send(cdp, 'touchStart', [{ ...p, id: 1 }]);
  await send(cdp, 'touchEnd', []);
}

/** Whether anything on the page is wider than the screen (a page a thumb would have to scroll sideways). */
const overflowsSideways = (page: Page) =>
  page.evaluate(() => document.documentElement.scrollWidth > window.innerWidth + 1);

/** The canvas fills the screen's width and most of its height; the field is drawn under the tube. */
async function canvasFirst(page: Page, viewport: { width: number; height: number }) {
  const box = await page.getByTestId('studio-canvas').boundingBox();
  expect(box).not.toBeNull();
  expect(box!.x).toBeLessThanOrEqual(1);
  expect(box!.width).toBeGreaterThanOrEqual(viewport.width - 2);
  expect(box!.height).toBeGreaterThan(viewport.height * 0.5);
  expect(await overflowsSideways(page)).toBe(false);
  await fieldsSettled(page);
  // The fitted view is readable, not a speck: the enclosure (120 cm wide) spans most of the width.
  expect((await camera(page)).zoom * 120).toBeGreaterThan(viewport.width * 0.8);
  await expect
    .poll(async () => paperDistance(await layerPixel(page, LAYER.backdrop, 60, 45)), eventually)
    .toBeGreaterThan(30);
}

/** A pinch zooms about the fingers' middle; a two-finger drag then moves the view without zooming. */
async function pinchAndPan(page: Page, cdp: CDPSession) {
  const before = await summary(page);
  const mid = await at(page, 60, 30);
  const z0 = (await camera(page)).zoom;
  await twoFingers(cdp, mid, 40, 100);
  await expect.poll(async () => (await camera(page)).zoom, eventually).toBeCloseTo(z0 * 2.5, 1);
  const c1 = await camera(page);
  await twoFingers(cdp, mid, 60, 60, { x: 50, y: 40 });
  await expect.poll(async () => (await camera(page)).originX, eventually).toBeCloseTo(c1.originX + 50, 0);
  const c2 = await camera(page);
  expect(c2.originY).toBeCloseTo(c1.originY + 40, 0);
  expect(c2.zoom).toBeCloseTo(c1.zoom, 6);
  // The fingers moved the view only, never an object.
  expect(await summary(page)).toBe(before);
  await page.getByRole('button', { name: 'Fit to screen' }).click();
  await expect.poll(async () => (await camera(page)).zoom, eventually).toBeCloseTo(z0, 6);
}

/** Opens the check in the panels, for a bearded dragon, and reads the hot-spot finding with its figures. */
async function readFinding(page: Page) {
  await page.getByTestId('tab-assess').click();
  await page.getByTestId('species-select').selectOption({ label: 'Bearded dragon' });
  const finding = page.getByTestId('finding-hot-spot');
  await finding.waitFor({ state: 'visible' });
  expect(await finding.innerText()).toMatch(/\d/);
  return finding;
}

describe('the studio on a phone (390 × 844, touch)', () => {
  it(
    'shows the canvas first, pinches, pans, taps, long-presses, reads a finding, and edits once switched on',
    async () => {
      const { page, cdp, errors } = await touchPage(PHONE);
      await openStudio(page, '/studio-scratch');
      await canvasFirst(page, PHONE);
      // Opened for viewing: the Edit switch is off and only looking and measuring tools are offered.
      const edit = page.getByTestId('edit-switch');
      expect(await edit.getAttribute('aria-checked')).toBe('false');
      expect(await page.getByTestId('tool-lamp').isVisible()).toBe(false);
      expect(await page.getByTestId('tool-probe').isVisible()).toBe(true);
      expect(await page.getByTestId('side-panel').getAttribute('data-open')).toBe('false');
      await screenshot(page, 'studio-phone-390-view');

      await pinchAndPan(page, cdp);

      // A tap on the perch selects it; a finger dragged over it moves the view, not the perch.
      await tap(cdp, await at(page, 45, 29));
      await expect.poll(() => summary(page), eventually).toMatch(PERCH_SELECTED);
      const cam = await camera(page);
      const from = await at(page, 45, 29);
      await send(cdp, 'touchStart', [{ ...from, id: 1 }]);
      for (let k = 1; k <= 8; k++) await send(cdp, 'touchMove', [{ x: from.x + 5 * k, y: from.y, id: 1 }]);
      await send(cdp, 'touchEnd', []);
      await expect
        .poll(async () => (await camera(page)).originX, eventually)
        .toBeCloseTo(cam.originX + 40, 0);
      expect(await summary(page)).toMatch(/Perch: from \(20 cm, 20 cm\) to \(70 cm, 38 cm\)/);

      // A long press on the hide selects it and offers its actions; changing ones wait for Edit.
      const menu = page.getByTestId('actions-menu');
      const hide = await at(page, 15, 7);
      await send(cdp, 'touchStart', [{ ...hide, id: 1 }]);
      await menu.waitFor({ state: 'visible' });
      await send(cdp, 'touchEnd', []);
      expect(await summary(page)).toMatch(HIDE_SELECTED);
      expect(await menu.getByRole('menuitem', { name: 'Delete' }).isDisabled()).toBe(true);
      expect(await menu.innerText()).toMatch(/turn on Edit/);
      const mb = await menu.boundingBox();
      expect(mb!.x + mb!.width).toBeLessThanOrEqual(PHONE.width);
      await screenshot(page, 'studio-phone-390-actions');
      await menu.getByRole('menuitem', { name: 'Properties' }).click();
      await expect.poll(() => inspected(page), eventually).toBe('h1');
      expect(await page.getByTestId('side-panel').getAttribute('data-open')).toBe('true');
      await expect.poll(() => menu.count(), eventually).toBe(0);

      // The check in the sheet: a finding with its figures, readable on the phone.
      const finding = await readFinding(page);
      const fb = await finding.boundingBox();
      expect(fb!.x).toBeGreaterThanOrEqual(0);
      expect(fb!.x + fb!.width).toBeLessThanOrEqual(PHONE.width);
      expect(await overflowsSideways(page)).toBe(false);
      await screenshot(page, 'studio-phone-390-check');
      // The canvas still shows above the open sheet.
      expect((await page.getByTestId('studio-canvas').boundingBox())!.height).toBeGreaterThan(250);
      await page.getByTestId('sheet-toggle').click();
      expect(await page.getByTestId('side-panel').getAttribute('data-open')).toBe('false');

      // Edit on: the object tools come back and the long-pressed hide can be deleted, then undone.
      await edit.click();
      expect(await edit.getAttribute('aria-checked')).toBe('true');
      await page.getByTestId('tool-lamp').waitFor({ state: 'visible' });
      await send(cdp, 'touchStart', [{ ...(await at(page, 15, 7)), id: 1 }]);
      await menu.waitFor({ state: 'visible' });
      await send(cdp, 'touchEnd', []);
      await menu.getByRole('menuitem', { name: 'Delete' }).click();
      await expect.poll(() => summary(page), eventually).not.toMatch(/Hide:/);
      await page.getByRole('button', { name: 'Undo' }).click();
      await expect.poll(() => summary(page), eventually).toMatch(/Hide:/);
      await screenshot(page, 'studio-phone-390-edit');
      expect(errors()).toEqual([]);
    },
    JOURNEY_MS,
  );
});

describe('the studio on a tablet (820 × 1180, touch)', () => {
  it(
    'shows the canvas across the width with a tool bar, edits by default, pinches, pans and reads a finding',
    async () => {
      const { page, cdp, errors } = await touchPage(TABLET);
      await openStudio(page, '/studio-scratch');
      await canvasFirst(page, TABLET);
      // A tablet edits from the start: no switch, every tool in the bar above the canvas.
      expect(await page.getByTestId('edit-switch').count()).toBe(0);
      await page.getByTestId('tool-lamp').waitFor({ state: 'visible' });
      const bar = await page.getByTestId('palette').boundingBox();
      const canvas = await page.getByTestId('studio-canvas').boundingBox();
      expect(bar!.y + bar!.height).toBeLessThanOrEqual(canvas!.y + 1);
      await screenshot(page, 'studio-tablet-820');

      await pinchAndPan(page, cdp);
      await tap(cdp, await at(page, 45, 29));
      await expect.poll(() => summary(page), eventually).toMatch(PERCH_SELECTED);
      await readFinding(page);
      await screenshot(page, 'studio-tablet-820-check');
      expect(errors()).toEqual([]);
    },
    JOURNEY_MS,
  );
});

describe('the counter pages on a phone (390 × 844)', () => {
  it(
    'the lamp page with its reading form, and a share page, fit the screen without sideways scrolling',
    async () => {
      const { page, errors } = await touchPage(PHONE);
      await signInAsDemo(page, 'staff');

      await page.goto('/lamp-log');
      await page.getByRole('link', { name: 'Basking tube' }).first().click();
      await page.waitForURL(/\/lamp-log\/\d+$/);
      const form = page.getByRole('form', { name: 'Add a reading' });
      await form.waitFor();
      expect(await overflowsSideways(page)).toBe(false);
      await screenshot(page, 'phone-390-lamp-page');
      await form.scrollIntoViewIfNeeded();
      // The form's fields and its button are thumb-sized and inside the screen.
      for (const control of await form.locator('input:visible, select:visible, button:visible').all()) {
        const b = await control.boundingBox();
        expect(b!.x).toBeGreaterThanOrEqual(0);
        expect(b!.x + b!.width).toBeLessThanOrEqual(PHONE.width);
        expect(b!.height).toBeGreaterThanOrEqual(36);
      }
      await screenshot(page, 'phone-390-reading-form');

      // A share link of the desert enclosure's design, opened on the phone by someone signed out.
      await page.goto('/enclosures');
      await page
        .getByTestId('first-design-hint')
        .getByRole('link', { name: 'Open the desert enclosure’s design' })
        .click();
      await page.waitForURL(/\/designs\/\d+$/);
      const studioHref = await page
        .getByRole('link', { name: /Open in studio/ })
        .first()
        .getAttribute('href');
      const variantId = Number(/\/studio\/(\d+)/.exec(studioHref ?? '')?.[1]);
      expect(variantId).toBeGreaterThan(0);
      const sharePath = await createShare(page, variantId);
      const visitor = await (
        await newContext(session.browser(), { viewport: PHONE, hasTouch: true })
      ).newPage();
      const visitorErrors = watchPageErrors(visitor);
      await visitor.goto(sharePath);
      await visitor.getByRole('img').first().waitFor();
      expect(await overflowsSideways(visitor)).toBe(false);
      await screenshot(visitor, 'phone-390-share-page');
      await visitor.context().close();
      expect(visitorErrors()).toEqual([]);
      expect(errors()).toEqual([]);
    },
    JOURNEY_MS,
  );
});
