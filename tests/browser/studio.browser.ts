// The design studio in Chromium — the whole signed-in journey: a staff member signs in, creates
// a design on an enclosure, places a tube lamp, a screen lid, a perch and a hide, moves the perch under
// the lamp with a real mouse drag, sees the UV Index at the perch top rise and fall back with undo, reloads
// and finds the design as it was; one screenshot per field. Then the studio without an account on the
// demo design ("Try the studio" from the landing page), where the engine's round trip while dragging is
// measured and printed (not asserted as a time).
import { describe, expect, it } from 'vitest';
import { screenshot, signInAsDemo, withBrowser } from './harness';
import {
  click,
  drag,
  dragRoundTrips,
  eventually,
  fieldsSettled,
  keys,
  median,
  probeUvi,
  setField,
  studioReady,
  summary,
  waitSaved,
} from './studio-helpers';
import { newDesignOnPage, openEnclosureByName } from './journey-helpers';

const session = withBrowser();

describe('design studio, signed in (the whole journey)', () => {
  it('builds a set-up, moves the perch under the lamp, undoes, and finds it all after a reload', async () => {
    const page = await signInAsDemo(session.page(), 'staff', { timeoutMs: 60_000 });

    // Create a design on a customer's enclosure from the demo scenario, and open it in the studio.
    // A 120 × 60 × 60 cm vivarium: the positions below are in its centimetres.
    await openEnclosureByName(page, 'Desert vivarium');
    const designName = `Studio journey ${Date.now().toString(36)}`;
    const card = await newDesignOnPage(page, designName);
    await card.getByRole('link', { name: 'Open in studio' }).click();
    await page.waitForURL(/\/studio\/\d+$/);
    const variantId = Number(/\/studio\/(\d+)$/.exec(page.url())![1]);
    await studioReady(page);
    expect(await page.getByRole('toolbar', { name: 'Studio commands' }).textContent()).toContain(designName);

    // Start from an empty enclosure (a new design has a mesh lid), then place each object from the
    // keyboard: its tool key, then Enter places it in the middle of the view.
    await keys(page, 'Control+A', 'Delete');
    await expect.poll(() => summary(page), eventually).toMatch(/; 0 objects/);
    for (const key of ['l', 's', 'd', 'p']) await keys(page, key, 'Enter');
    await expect.poll(() => summary(page), eventually).toMatch(/; 4 objects/);
    const placed = await summary(page);
    expect(placed).toMatch(/Lamp: T5 fluorescent tube, 55 cm long/);
    expect(placed).toMatch(/Screen: from \(0 cm, 60 cm\) to \(120 cm, 60 cm\)/);
    expect(placed).toMatch(/Hide: 25 cm wide/);
    expect(placed).toMatch(/Perch: from/);

    // The perch (selected after placing) goes to the right, low, away from the tube.
    await expect
      .poll(() => page.getByTestId('inspector-object').getAttribute('data-object-id'), eventually)
      .toBe('perch-1');
    await setField(page, 'field-x1', 90);
    await setField(page, 'field-y1', 8);
    await setField(page, 'field-x2', 116);
    await setField(page, 'field-y2', 14);

    // Pin a probe on the perch's top (4 cm thick: its top is ~2 cm above the axis).
    await keys(page, 'i');
    await click(page, 103, 13.2);
    await page.getByTestId('tab-fields').click();
    const low = await probeUvi(page, 'probe-1');

    // Select perch and probe together, and drag them under the tube with the mouse.
    await keys(page, 'v');
    await click(page, 95, 9.2);
    await click(page, 103, 13.2, ['Shift']);
    await drag(page, { x: 95, y: 9.2 }, { x: 50, y: 34.2 });
    await expect.poll(() => summary(page), eventually).toMatch(/Perch: from \(45 cm, 33 cm\)/);
    const high = await probeUvi(page, 'probe-1');
    expect(high).toBeGreaterThan(low * 1.5);

    // Undo puts both back in one step, and the reading falls back.
    await keys(page, 'Control+Z');
    await expect.poll(() => summary(page), eventually).toMatch(/Perch: from \(90 cm, 8 cm\)/);
    await expect.poll(() => probeUvi(page, 'probe-1'), eventually).toBeCloseTo(low, 6);

    // Saved to the server; everything is there after a reload (the selection is not part of the design).
    await keys(page, 'Escape');
    await waitSaved(page);
    const before = await summary(page);
    const stored = await page.evaluate(async (id) => {
      const res = await fetch(`/api/variants/${id}`);
      return (await res.json()) as { variant: { design: { objects: { type: string }[] } } };
    }, variantId);
    expect(stored.variant.design.objects.map((o) => o.type).sort()).toEqual([
      'hide',
      'lamp',
      'perch',
      'screen',
    ]);
    await page.reload();
    await studioReady(page);
    await expect(page.getByTestId('restore-banner').count()).resolves.toBe(0);
    expect(await summary(page)).toBe(before);
    await page.getByTestId('tab-fields').click();
    expect(await probeUvi(page, 'probe-1')).toBeCloseTo(low, 6);

    // One screenshot of the studio per field, with its legend.
    for (const [key, name, title] of [
      ['1', 'uvb', 'UVB irradiance'],
      ['2', 'uvi', 'UV Index'],
      ['3', 'temperature', 'Surface temperature'],
    ] as const) {
      await keys(page, key);
      await expect
        .poll(() => page.getByTestId('legend').getAttribute('aria-label'), eventually)
        .toBe(`Legend, ${title}`);
      await fieldsSettled(page);
      await screenshot(page, `studio-field-${name}`);
    }
    expect(session.pageErrors()).toEqual([]);
  });
});

describe('design studio without an account', () => {
  it('opens from the landing page on the demo design, keeps work in this browser, and stays live while dragging', async () => {
    const page = session.page();
    page.setDefaultTimeout(60_000);
    const apiCalls: string[] = [];
    page.on('request', (r) => {
      if (new URL(r.url()).pathname.startsWith('/api/variants')) apiCalls.push(r.url());
    });
    await page.goto('/');
    await page.getByRole('link', { name: /Try the studio/ }).click();
    await page.waitForURL(/\/studio-scratch$/);
    await studioReady(page);
    expect(await page.getByTestId('scratch-note').textContent()).toMatch(/Kept only in this browser/);

    // The demo design: the example set-up of the design file description.
    const demo = await summary(page);
    expect(demo).toMatch(/; 8 objects/);
    expect(demo).toMatch(/Perch: from \(20 cm, 20 cm\) to \(70 cm, 38 cm\)/);

    // The engine's round trip while the perch is dragged: printed for the record, not asserted as a time.
    await keys(page, 'v');
    await click(page, 45, 29);
    await expect
      .poll(() => page.getByTestId('inspector-object').getAttribute('data-object-id'), eventually)
      .toBe('b1');
    const { roundTrips, computeMs } = await dragRoundTrips(page, { x: 45, y: 29 }, 20);
    // The field kept answering during the drag (latest request wins, so some moves are skipped).
    expect(roundTrips.length).toBeGreaterThan(3);
    console.log(
      `studio worker round trip while dragging the perch on the demo design: median ${median(roundTrips).toFixed(1)} ms ` +
        `over ${roundTrips.length} answers (engine compute median ${median(computeMs).toFixed(1)} ms; target ≤ 50 ms)`,
    );

    // A change (the dragged perch, still selected, deleted) is kept in this browser only, and survives a reload.
    await keys(page, 'Delete');
    await expect.poll(() => summary(page), eventually).toMatch(/; 7 objects/);
    await waitSaved(page);
    expect(await page.getByTestId('save-state').textContent()).toMatch(/Saved in this browser only/);
    await page.reload();
    await studioReady(page);
    expect(await summary(page)).toMatch(/; 7 objects/);
    expect(await summary(page)).not.toMatch(/Perch/);
    await screenshot(page, 'studio-scratch');
    expect(apiCalls).toEqual([]);
    expect(session.pageErrors()).toEqual([]);
  });
});
