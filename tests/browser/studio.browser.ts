// The design studio in Chromium: build a set-up from the keyboard, move the perch under the lamp with a
// real mouse drag, watch the UV Index at the perch top rise and fall back with undo, reload and find the
// design as it was; screenshots of each field; the engine's round trip while dragging (printed, not timed).
import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { DEMO_PASSWORDS, demoSignIn } from '@/lib/demo/scenario';
import { screenshot, signIn, withBrowser } from './harness';

const session = withBrowser();

type Camera = { zoom: number; originX: number; originY: number };

/** Opens the studio and waits for the canvas and the first computed fields. */
async function openStudio(page: Page, path: string) {
  await page.goto(path);
  await page.waitForSelector('[data-testid=studio-canvas] canvas', { timeout: 60_000 });
  await page.waitForFunction(() => (window.__baskwellStudio?.roundTrips.length ?? 0) > 0, null, {
    timeout: 60_000,
  });
}

/** Page coordinates of a design point (cm, y up), from the studio's camera. */
async function at(page: Page, x: number, y: number): Promise<{ x: number; y: number }> {
  const cam = await page.evaluate(() => window.__baskwellStudio!.camera!() as Camera);
  const box = (await page.getByTestId('studio-canvas').boundingBox())!;
  return { x: box.x + cam.originX + x * cam.zoom, y: box.y + cam.originY - y * cam.zoom };
}

async function click(page: Page, x: number, y: number, modifiers: 'Shift'[] = []) {
  const p = await at(page, x, y);
  for (const m of modifiers) await page.keyboard.down(m);
  await page.mouse.click(p.x, p.y);
  for (const m of modifiers) await page.keyboard.up(m);
}

/** Types a value into an inspector field and applies it. */
async function setField(page: Page, testId: string, value: number) {
  const input = page.getByTestId(testId);
  await input.fill(String(value));
  await input.press('Enter');
  await expect.poll(() => input.inputValue()).toBe(String(value));
}

/** The engine's UV Index at a pinned probe, once the answer for the current design is in. */
async function probeUvi(page: Page, probeId: string): Promise<number> {
  const reading = page.getByTestId(`probe-reading-${probeId}`);
  await expect.poll(() => reading.textContent(), { timeout: 30_000 }).toMatch(/^UVI /);
  await expect.poll(() => page.getByTestId('worker-ms').textContent(), { timeout: 30_000 }).not.toMatch(/…$/);
  const m = /UVI (-?\d+(?:\.\d+)?)/.exec((await reading.textContent()) ?? '');
  if (!m) throw new Error('no UVI in the probe reading');
  return Number(m[1]);
}

async function waitSaved(page: Page) {
  await expect
    .poll(() => page.getByTestId('save-state').getAttribute('data-state'), { timeout: 30_000 })
    .toBe('saved');
}

async function summary(page: Page): Promise<string> {
  return (await page.getByTestId('object-summary').textContent()) ?? '';
}

/** Median round trip (change → computed fields) of the engine worker while the perch is dragged. */
async function dragBenchmark(
  page: Page,
  from: { x: number; y: number },
  dxCm: number,
): Promise<{ roundTrips: number[]; computeMs: number[] }> {
  const before = await page.evaluate(() => window.__baskwellStudio!.roundTrips.length);
  const a = await at(page, from.x, from.y);
  const zoom = await page.evaluate(() => window.__baskwellStudio!.camera!().zoom);
  await page.mouse.move(a.x, a.y);
  await page.mouse.down();
  for (let k = 1; k <= 60; k++) {
    const t = Math.sin((k / 60) * Math.PI * 2);
    await page.mouse.move(a.x + t * dxCm * zoom, a.y);
    await page.waitForTimeout(16);
  }
  await page.mouse.up();
  await page.waitForTimeout(500);
  return page.evaluate((n) => {
    const m = window.__baskwellStudio!;
    return { roundTrips: m.roundTrips.slice(n), computeMs: m.computeMs.slice(n) };
  }, before);
}

const median = (v: number[]) => {
  const s = [...v].sort((a, b) => a - b);
  return s.length ? (s[Math.floor((s.length - 1) / 2)]! + s[Math.ceil((s.length - 1) / 2)]!) / 2 : NaN;
};

describe('design studio (scratch, saved in the browser)', () => {
  it('builds a set-up, moves the perch under the lamp, undoes, and survives a reload', async () => {
    const page = session.page();
    await openStudio(page, '/studio-scratch');
    const canvas = page.getByTestId('studio-canvas');
    await canvas.focus();

    // Start from an empty enclosure, then place each object from the keyboard (tool key, Enter).
    await page.keyboard.press('Control+A');
    await page.keyboard.press('Delete');
    await expect.poll(() => summary(page)).toMatch(/0 objects/);
    for (const key of ['l', 's', 'd', 'p']) {
      await canvas.focus();
      await page.keyboard.press(key);
      await page.keyboard.press('Enter');
    }
    await expect.poll(() => summary(page)).toMatch(/4 objects/);
    const text = await summary(page);
    expect(text).toMatch(/Lamp: T5 fluorescent tube, 55 cm long/);
    expect(text).toMatch(/Screen: from \(0 cm, 60 cm\) to \(120 cm, 60 cm\)/);
    expect(text).toMatch(/Hide: 25 cm wide/);

    // The perch (selected after placing) goes to the right, low, away from the tube.
    await expect
      .poll(() => page.getByTestId('inspector-object').getAttribute('data-object-id'))
      .toBe('perch-1');
    await setField(page, 'field-x1', 90);
    await setField(page, 'field-y1', 8);
    await setField(page, 'field-x2', 116);
    await setField(page, 'field-y2', 14);

    // Pin a probe on the perch's top (4 cm thick: its top is ~2 cm above the axis).
    await canvas.focus();
    await page.keyboard.press('i');
    await click(page, 103, 13.2);
    await page.getByTestId('tab-fields').click();
    const low = await probeUvi(page, 'probe-1');

    // Select perch and probe together, and drag them under the tube with the mouse.
    await canvas.focus();
    await page.keyboard.press('v');
    await click(page, 95, 9.2);
    await click(page, 103, 13.2, ['Shift']);
    const start = await at(page, 95, 9.2);
    const end = await at(page, 50, 34.2);
    await page.mouse.move(start.x, start.y);
    await page.mouse.down();
    for (let k = 1; k <= 20; k++) {
      await page.mouse.move(start.x + ((end.x - start.x) * k) / 20, start.y + ((end.y - start.y) * k) / 20);
    }
    await page.mouse.up();
    await expect.poll(() => summary(page)).toMatch(/Perch: from \(45 cm, 33 cm\)/);
    const high = await probeUvi(page, 'probe-1');
    expect(high).toBeGreaterThan(low * 1.5);

    // Undo puts both back in one step, and the reading falls back.
    await canvas.focus();
    await page.keyboard.press('Control+Z');
    await expect.poll(() => summary(page)).toMatch(/Perch: from \(90 cm, 8 cm\)/);
    await expect.poll(() => probeUvi(page, 'probe-1'), { timeout: 30_000 }).toBeCloseTo(low, 6);

    // Everything is kept on reload (the selection is not part of the design).
    await page.keyboard.press('Escape');
    await waitSaved(page);
    const before = await summary(page);
    await page.reload();
    await openStudio(page, '/studio-scratch');
    expect(await summary(page)).toBe(before);
    await page.getByTestId('tab-fields').click();
    expect(await probeUvi(page, 'probe-1')).toBeCloseTo(low, 6);

    // One screenshot per field.
    for (const [key, name] of [
      ['1', 'uvb'],
      ['2', 'uvi'],
      ['3', 'temperature'],
    ] as const) {
      await canvas.focus();
      await page.keyboard.press(key);
      await page.getByTestId('legend').waitFor({ state: 'visible' });
      await page.waitForTimeout(300);
      await screenshot(page, `studio-scratch-field-${name}`);
    }

    // The engine's round trip while dragging: printed for the benchmark, not asserted as a time.
    await canvas.focus();
    await page.keyboard.press('Escape');
    await click(page, 95, 9.2);
    const { roundTrips, computeMs } = await dragBenchmark(page, { x: 95, y: 9.2 }, 20);
    expect(roundTrips.length).toBeGreaterThan(3);
    console.log(
      `studio worker round trip while dragging: median ${median(roundTrips).toFixed(1)} ms over ${roundTrips.length} answers ` +
        `(engine compute median ${median(computeMs).toFixed(1)} ms; target ≤ 50 ms)`,
    );
    await page.keyboard.press('Control+Z');
    expect(session.pageErrors()).toEqual([]);
  });

  it('lists every shortcut in the help panel, switches units, and shows findings with cautions', async () => {
    const page = session.page();
    await openStudio(page, '/studio-scratch');
    await page.getByTestId('studio-canvas').focus();
    await page.keyboard.press('?');
    const help = page.getByTestId('help-dialog');
    await help.waitFor({ state: 'visible' });
    expect(await help.textContent()).toContain('Duplicate');
    expect(await help.textContent()).toContain('Ctrl+Shift+Z');
    await page.keyboard.press('Escape');
    await help.waitFor({ state: 'hidden' });

    // Nothing selected: the enclosure's width, in cm then in inches.
    const width = page.getByTestId('enclosure-width');
    expect(await width.inputValue()).toBe('120');
    await page.getByTestId('unit-in').click();
    await expect.poll(() => width.inputValue()).toBe('47.244');
    await page.getByTestId('unit-cm').click();

    await page.getByTestId('tab-assess').click();
    await page.getByTestId('species-select').selectOption({ label: 'Bearded dragon' });
    await page.locator('[data-testid^=finding-]').first().waitFor({ state: 'visible', timeout: 30_000 });
    expect(await page.getByTestId('months-until-unmet').textContent()).toMatch(/month|even with new lamps/);
    expect(await page.getByTestId('cautions').textContent()).toContain('thermostat');
    await page.getByTestId('ageing-slider').fill('12');
    await page.getByText('With lamps 12 months older than set.').waitFor({ state: 'visible' });
    await screenshot(page, 'studio-scratch-assessment');
    expect(session.pageErrors()).toEqual([]);
  });
});

describe('design studio (stored variant, signed in)', () => {
  it('edits a stored variant and keeps the change on the server', async () => {
    const page = session.page();
    const who = demoSignIn('staff');
    await signIn(page, who.email, DEMO_PASSWORDS.staff);
    await page.goto('/enclosures');
    const href = await page.locator('a[href^="/enclosures/"]').first().getAttribute('href');
    const enclosureId = Number(/\/enclosures\/(\d+)/.exec(href ?? '')?.[1]);
    expect(enclosureId).toBeGreaterThan(0);
    const created = await page.evaluate(async (id) => {
      const res = await fetch(`/api/enclosures/${id}/designs`, {
        method: 'POST',
        headers: { 'content-type': 'application/json' },
        body: JSON.stringify({ name: 'Studio browser test' }),
      });
      return {
        status: res.status,
        body: (await res.json()) as { variant?: { id: number; version: number } },
      };
    }, enclosureId);
    expect(created.status).toBe(201);
    const variant = created.body.variant!;

    await openStudio(page, `/studio/${variant.id}`);
    const canvas = page.getByTestId('studio-canvas');
    await canvas.focus();
    await page.keyboard.press('l');
    await page.keyboard.press('Enter');
    await expect.poll(() => summary(page)).toMatch(/Lamp: T5 fluorescent tube/);
    await waitSaved(page);
    const stored = await page.evaluate(async (id) => {
      const res = await fetch(`/api/variants/${id}`);
      return (await res.json()) as { variant: { version: number; design: { objects: { type: string }[] } } };
    }, variant.id);
    expect(stored.variant.version).toBeGreaterThan(variant.version);
    expect(stored.variant.design.objects.some((o) => o.type === 'lamp')).toBe(true);

    // Offline: the change is kept and shown as such, then saved when the network is back.
    await session.context().setOffline(true);
    await canvas.focus();
    await page.keyboard.press('d');
    await page.keyboard.press('Enter');
    await expect
      .poll(() => page.getByTestId('save-state').getAttribute('data-state'), { timeout: 30_000 })
      .toBe('offline');
    await screenshot(page, 'studio-variant-offline');
    await session.context().setOffline(false);
    await waitSaved(page);
    const after = await page.evaluate(async (id) => {
      const res = await fetch(`/api/variants/${id}`);
      return (await res.json()) as { variant: { design: { objects: { type: string }[] } } };
    }, variant.id);
    expect(after.variant.design.objects.some((o) => o.type === 'hide')).toBe(true);

    await page.reload();
    await openStudio(page, `/studio/${variant.id}`);
    expect(await summary(page)).toMatch(/Lamp: T5 fluorescent tube/);
    expect(await summary(page)).toMatch(/Hide: 25 cm wide/);
    await screenshot(page, 'studio-variant');
    expect(session.pageErrors()).toEqual([]);
  });
});
