// The studio's canvas with a real mouse (and wheel, pinch and keys) in Chromium, on the scratch studio's
// demo design (tests/browser/studio.browser.ts describes it): resizing and turning with the selection
// handles, placing from the palette by drag and drop and by click with snapping, zoom (wheel, trackpad
// pinch, touch pinch, buttons, fit) and pan, box selection moved and deleted together, the ruler in cm
// and inches, a finding shown where it applies, and the field's opacity. Each drag must be one undo step.
// What the canvas draws is read from the screen-reader summary, the inspector and the canvas pixels.
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { screenshot, withBrowser } from './harness';
import {
  LAYER,
  at,
  camera,
  canUndo,
  click,
  designAt,
  drag,
  eventually,
  fieldsSettled,
  inspected,
  keys,
  layerColourCount,
  layerPixel,
  openStudio,
  summary,
} from './studio-helpers';

const session = withBrowser();

const objectCount = async (page: Page) => Number(/; (\d+) objects/.exec(await summary(page))?.[1] ?? NaN);
const zoomOf = async (page: Page) => (await camera(page)).zoom;

// The demo design's perch and hide, as the summary writes them.
const PERCH_START = /Perch: from \(20 cm, 20 cm\) to \(70 cm, 38 cm\), 53\.1 cm long at 20°/;

describe('studio canvas with the mouse (no account)', () => {
  it('resizes a hide by a corner handle and turns the perch by its rotate handle, one undo step each', async () => {
    const page = session.page();
    page.setDefaultTimeout(60_000);
    await openStudio(page, '/studio-scratch');
    expect(await canUndo(page)).toBe(false);

    // The hide (25 × 14 cm at the bottom left): select it, drag its top-right handle from (30, 14) to (40, 20).
    await click(page, 15, 7);
    await expect.poll(() => inspected(page), eventually).toBe('h1');
    await drag(page, { x: 30, y: 14 }, { x: 40, y: 20 });
    await expect.poll(() => page.getByTestId('field-width').inputValue(), eventually).toBe('35');
    expect(await page.getByTestId('field-height').inputValue()).toBe('20');
    expect(await summary(page)).toMatch(/Hide: 35 cm wide, 20 cm high, left edge at 5 cm, bottom at 0 cm/);
    // One drag, one undo step: a single undo restores the size and empties the history.
    await keys(page, 'Control+Z');
    await expect.poll(() => page.getByTestId('field-width').inputValue(), eventually).toBe('25');
    expect(await page.getByTestId('field-height').inputValue()).toBe('14');
    expect(await canUndo(page)).toBe(false);

    // The perch (rising at 20°): select it and drag its rotate handle to straight above its middle.
    await click(page, 45, 29);
    await expect.poll(() => inspected(page), eventually).toBe('b1');
    const inspector = page.getByTestId('inspector-object');
    expect(await inspector.textContent()).toMatch(/Length 53\.1 cm, angle 20°/);
    // The handle sits 6 cm from the middle (45, 29), on the perch's upper normal.
    const len = Math.hypot(50, 18);
    const handle = { x: 45 - (18 / len) * 6, y: 29 + (50 / len) * 6 };
    await drag(page, handle, { x: 45, y: 45 });
    await expect.poll(() => inspector.textContent(), eventually).toMatch(/Length 53\.1 cm, angle 0°/);
    expect(await summary(page)).toMatch(
      /Perch: from \(18\.4 cm, 29 cm\) to \(71\.6 cm, 29 cm\), 53\.1 cm long at 0°/,
    );
    await screenshot(page, 'studio-canvas-rotated-perch');
    await keys(page, 'Control+Z');
    await expect.poll(() => summary(page), eventually).toMatch(PERCH_START);
    expect(await inspector.textContent()).toMatch(/angle 20°/);
    expect(await canUndo(page)).toBe(false);
    expect(session.pageErrors()).toEqual([]);
  });

  it('places a lamp dragged from the palette on the lid, and a hide by click on the floor', async () => {
    const page = session.page();
    page.setDefaultTimeout(60_000);
    await openStudio(page, '/studio-scratch');
    expect(await objectCount(page)).toBe(8);

    // Dropped 0.6 cm above the lamps' resting line on the lid (62 cm): it snaps there (the 1 cm grid
    // alone would put it at 63 cm).
    const cam = await camera(page);
    await page.getByTestId('tool-lamp').dragTo(page.getByTestId('studio-canvas'), {
      targetPosition: { x: cam.originX + 60 * cam.zoom, y: cam.originY - 62.6 * cam.zoom },
    });
    await expect.poll(() => objectCount(page), eventually).toBe(9);
    expect(await summary(page)).toMatch(
      /Lamp: T5 fluorescent tube, [\d.]+ cm long, at 60 cm from the left, 62 cm up, 30 cm from the front \(on the side view\) \(selected\)/,
    );
    expect(await inspected(page)).toMatch(/^lamp/);

    // Pick the hide in the palette, click 0.8 cm above the floor: it stands on the floor.
    await page.getByTestId('tool-hide').click();
    await expect
      .poll(() => page.getByTestId('tool-hide').getAttribute('aria-pressed'), eventually)
      .toBe('true');
    await click(page, 60, 0.8);
    await expect.poll(() => objectCount(page), eventually).toBe(10);
    expect(await summary(page)).toMatch(
      /Hide: 25 cm wide, 14 cm high, left edge at [\d.]+ cm, bottom at 0 cm \(selected\)/,
    );
    // Placed, the tool goes back to selecting.
    expect(await page.getByTestId('tool-select').getAttribute('aria-pressed')).toBe('true');
    await screenshot(page, 'studio-canvas-placed');

    // Each placement is one undo step.
    await keys(page, 'Control+Z');
    await expect.poll(() => objectCount(page), eventually).toBe(9);
    await keys(page, 'Control+Z');
    await expect.poll(() => objectCount(page), eventually).toBe(8);
    expect(await canUndo(page)).toBe(false);
    expect(session.pageErrors()).toEqual([]);
  });

  it('zooms with the wheel, a trackpad pinch, a touch pinch, the buttons and fit, and pans', async () => {
    const page = session.page();
    page.setDefaultTimeout(60_000);
    await openStudio(page, '/studio-scratch');
    const fitted = await camera(page);
    const zoomLabel = page.getByTestId('zoom-level');
    const before = await summary(page);

    // The wheel zooms in around the pointer: the design point under it stays under it.
    const p = await at(page, 60, 45);
    await page.mouse.move(p.x, p.y);
    await page.mouse.wheel(0, -240);
    await expect.poll(() => zoomOf(page), eventually).toBeGreaterThan(fitted.zoom * 1.05);
    let under = await designAt(page, p);
    expect(under.x).toBeCloseTo(60, 1);
    expect(under.y).toBeCloseTo(45, 1);
    expect(await zoomLabel.textContent()).toBe(`${Math.round((await zoomOf(page)) * 20)}%`);

    // A trackpad pinch reaches the page as a wheel event with ctrlKey: it zooms (out, here) much
    // faster per wheel step than the plain wheel, still around the pointer.
    let z = await zoomOf(page);
    await page.keyboard.down('Control');
    await page.mouse.wheel(0, 30);
    await page.keyboard.up('Control');
    await expect.poll(() => zoomOf(page), eventually).toBeLessThan(z * 0.85);
    under = await designAt(page, p);
    expect(under.x).toBeCloseTo(60, 1);
    expect(under.y).toBeCloseTo(45, 1);
    expect(await summary(page)).toBe(before);

    // Two fingers on a touch screen, spread from 80 to 200 px apart: zoom in 2.5×, around their middle.
    z = await zoomOf(page);
    const cdp = await session.context().newCDPSession(page);
    await cdp.send('Emulation.setTouchEmulationEnabled', { enabled: true, maxTouchPoints: 2 });
    const fingers = (half: number) => [
      { x: p.x - half, y: p.y, id: 1 },
      { x: p.x + half, y: p.y, id: 2 },
    ];
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchStart', touchPoints: fingers(40) });
    for (let half = 45; half <= 100; half += 5) {
      await cdp.send('Input.dispatchTouchEvent', { type: 'touchMove', touchPoints: fingers(half) });
    }
    await cdp.send('Input.dispatchTouchEvent', { type: 'touchEnd', touchPoints: [] });
    await expect.poll(() => zoomOf(page), eventually).toBeCloseTo(z * 2.5, 1);
    under = await designAt(page, p);
    expect(under.x).toBeCloseTo(60, 0);
    expect(under.y).toBeCloseTo(45, 0);
    // The fingers moved no object.
    expect(await summary(page)).toBe(before);
    await cdp.detach();

    // Fit shows the whole design as when it opened; the buttons zoom by 1.25 about the middle.
    await page.getByRole('button', { name: 'Fit to screen' }).click();
    await expect.poll(() => zoomOf(page), eventually).toBeCloseTo(fitted.zoom, 6);
    expect(await camera(page)).toEqual(fitted);
    await page.getByRole('button', { name: 'Zoom in' }).click();
    await expect.poll(() => zoomOf(page), eventually).toBeCloseTo(fitted.zoom * 1.25, 6);
    expect(await zoomLabel.textContent()).toBe(`${Math.round(fitted.zoom * 1.25 * 20)}%`);
    await page.getByRole('button', { name: 'Zoom out' }).click();
    await expect.poll(() => zoomOf(page), eventually).toBeCloseTo(fitted.zoom, 6);

    // The pan tool drags the view (not the objects) by exactly the pointer's movement.
    await keys(page, 'h');
    const c0 = await camera(page);
    const from = await at(page, 45, 29);
    await page.mouse.move(from.x, from.y);
    await page.mouse.down();
    for (let k = 1; k <= 10; k++) await page.mouse.move(from.x + 12 * k, from.y + 6 * k);
    await page.mouse.up();
    await expect.poll(async () => (await camera(page)).originX, eventually).toBeCloseTo(c0.originX + 120, 0);
    expect((await camera(page)).originY).toBeCloseTo(c0.originY + 60, 0);
    expect(await summary(page)).toBe(before);

    // With Space held the select tool pans too, even when the drag starts on the perch.
    await keys(page, 'v');
    const c1 = await camera(page);
    const onPerch = await at(page, 45, 29);
    await page.keyboard.down('Space');
    await page.mouse.move(onPerch.x, onPerch.y);
    await page.mouse.down();
    for (let k = 1; k <= 10; k++) await page.mouse.move(onPerch.x - 8 * k, onPerch.y);
    await page.mouse.up();
    await page.keyboard.up('Space');
    await expect.poll(async () => (await camera(page)).originX, eventually).toBeCloseTo(c1.originX - 80, 0);
    expect(await summary(page)).toBe(before);
    expect(await canUndo(page)).toBe(false);

    await keys(page, '0');
    await expect.poll(() => camera(page), eventually).toEqual(fitted);
    expect(session.pageErrors()).toEqual([]);
  });

  it('selects several objects with a box, moves and deletes them together, undoes each step, and measures', async () => {
    const page = session.page();
    page.setDefaultTimeout(60_000);
    await openStudio(page, '/studio-scratch');
    const start = await summary(page);
    expect(start).toMatch(/Ledge: 30 cm wide, 18 cm high, left edge at 75 cm, bottom at 0 cm/);
    expect(start).toMatch(/Foliage: 18 cm wide, 40 cm high, left edge at 100 cm, bottom at 0 cm/);

    // A box from empty space right of the perch down to the right floor corner: the ledge and the planting.
    await drag(page, { x: 73, y: 45 }, { x: 119, y: 2 });
    await expect.poll(() => summary(page), eventually).toMatch(/; 8 objects, 2 selected\./);
    const boxed = await summary(page);
    expect(boxed).toMatch(/Ledge: .* \(selected\)/);
    expect(boxed).toMatch(/Foliage: .* \(selected\)/);
    expect(boxed.match(/\(selected\)/g)).toHaveLength(2);
    expect(await page.getByTestId('inspector-multi').textContent()).toMatch(/2 selected/);

    // Drag the ledge 30 cm to the left: both go.
    await drag(page, { x: 90, y: 9 }, { x: 60, y: 9 });
    await expect
      .poll(() => summary(page), eventually)
      .toMatch(/Ledge: 30 cm wide, 18 cm high, left edge at 45 cm, bottom at 0 cm \(selected\)/);
    expect(await summary(page)).toMatch(
      /Foliage: 18 cm wide, 40 cm high, left edge at 70 cm, bottom at 0 cm \(selected\)/,
    );
    await screenshot(page, 'studio-canvas-box-selection-moved');

    // Delete removes both; undo brings them back where they were moved to, then back to the start.
    await keys(page, 'Delete');
    await expect.poll(() => objectCount(page), eventually).toBe(6);
    expect(await summary(page)).not.toMatch(/Ledge|Foliage/);
    await keys(page, 'Control+Z');
    await expect.poll(() => objectCount(page), eventually).toBe(8);
    expect(await summary(page)).toMatch(/Ledge: .*left edge at 45 cm/);
    expect(await summary(page)).toMatch(/Foliage: .*left edge at 70 cm/);
    await keys(page, 'Control+Z');
    await expect.poll(() => summary(page), eventually).toMatch(/Ledge: .*left edge at 75 cm/);
    expect(await summary(page)).toMatch(/Foliage: .*left edge at 100 cm/);
    expect(await canUndo(page)).toBe(false);

    // The ruler measures without changing the design: 30 cm across and 40 cm up is 50 cm.
    await keys(page, 'r');
    await drag(page, { x: 10, y: 10 }, { x: 40, y: 50 });
    const reading = page.getByTestId('ruler-reading');
    await expect
      .poll(() => reading.textContent(), eventually)
      .toBe('Ruler: 50 cm (30 cm across, 40 cm up), at 53°.');
    await screenshot(page, 'studio-canvas-ruler');
    await page.getByTestId('unit-in').click();
    // 50 cm = 19.69 in, 30 cm = 11.81 in, 40 cm = 15.75 in (1 in = 2.54 cm exactly).
    await expect
      .poll(() => reading.textContent(), eventually)
      .toBe('Ruler: 19.7 in (11.8 in across, 15.7 in up), at 53°.');
    // Measuring changed nothing in the design.
    expect(await canUndo(page)).toBe(false);
    // Escape puts the ruler away.
    await keys(page, 'Escape');
    await expect.poll(() => reading.count(), eventually).toBe(0);
    expect(session.pageErrors()).toEqual([]);
  });
});

describe('studio canvas: what is drawn (no account)', () => {
  it('marks where a finding applies, and draws the field at the chosen opacity or not at all', async () => {
    const page = session.page();
    page.setDefaultTimeout(60_000);
    await openStudio(page, '/studio-scratch');
    await fieldsSettled(page);

    // A finding with a place: clicking it marks that place on the canvas (the overlay layer gains the
    // highlight colour, sand-400 #dfa845) and says so in the canvas's text summary.
    const sand400: [number, number, number] = [0xdf, 0xa8, 0x45];
    const marked = () => layerColourCount(page, LAYER.overlay, sand400);
    expect(await marked()).toBe(0);
    await page.getByTestId('tab-assess').click();
    await page.getByTestId('species-select').selectOption({ label: 'Bearded dragon' });
    // The findings shown until the species' own assessment arrives are another list (a busy machine can
    // take a while): read a finding only from the dragon's, which names the dragon in its basking one.
    await expect
      .poll(() => page.getByTestId('finding-hot-spot').textContent(), { timeout: 60_000 })
      .toContain('Bearded dragon');
    const placed = page.locator('[data-testid^=finding-]:has(button)').first();
    await placed.waitFor({ state: 'visible', timeout: 60_000 });
    const findingId = ((await placed.getAttribute('data-testid')) ?? '').replace(/^finding-/, '');
    // The list may still be reordered by the species' own assessment arriving: keep to the finding read.
    const button = page.getByTestId(`finding-${findingId}`).getByRole('button');
    await button.click();
    await expect.poll(() => button.getAttribute('aria-pressed'), eventually).toBe('true');
    const canvasSummary = page.getByTestId('object-summary');
    await expect.poll(() => canvasSummary.getAttribute('data-highlight'), eventually).toBe(findingId);
    expect(await summary(page)).toMatch(/Shown on the canvas: .+ — (the surface from|Lamp|Perch|Ledge|Hide)/);
    await expect.poll(marked, eventually).toBeGreaterThan(50);
    await screenshot(page, `studio-canvas-finding-${findingId}`);
    // Clicked again, the mark goes.
    await button.click();
    await expect.poll(() => canvasSummary.getAttribute('data-highlight'), eventually).toBe('');
    await expect.poll(marked, eventually).toBe(0);
    expect(await summary(page)).not.toMatch(/Shown on the canvas/);

    // The field under the tube (60, 45), drawn at full opacity, at 10 %, and hidden.
    await page.getByTestId('tab-fields').click();
    const opacity = page.getByRole('slider', { name: /Opacity/ });
    const pixel = () => layerPixel(page, LAYER.backdrop, 60, 45);
    const distance = (a: number[], b: number[]) => a.reduce((s, v, i) => s + Math.abs(v - b[i]!), 0);
    await opacity.fill('100');
    await expect.poll(() => page.getByText('Opacity 100 %').count(), eventually).toBe(1);
    await expect.poll(async () => distance(await pixel(), [0, 0, 0, 0]), eventually).toBeGreaterThan(0);
    const full = await pixel();
    await opacity.fill('10');
    await expect.poll(async () => distance(await pixel(), full), eventually).toBeGreaterThan(40);
    const faint = await pixel();
    expect(await page.getByTestId('canvas-legend').count()).toBe(1);
    await page.getByRole('checkbox', { name: 'Show the field on the canvas' }).uncheck();
    await expect.poll(() => page.getByTestId('canvas-legend').count(), eventually).toBe(0);
    await expect.poll(async () => distance(await pixel(), faint), eventually).toBeGreaterThan(0);
    const none = await pixel();
    // The fainter the field, the closer to the bare enclosure.
    expect(distance(faint, none)).toBeLessThan(distance(full, none));
    // Hidden, what is left is the enclosure's paper-coloured back (#fbfaf6, under the faint grid).
    const paper = [0xfb, 0xfa, 0xf6];
    expect(distance(none.slice(0, 3), paper)).toBeLessThan(30);
    expect(distance(full.slice(0, 3), paper)).toBeGreaterThan(distance(none.slice(0, 3), paper));
    expect(session.pageErrors()).toEqual([]);
  });
});
