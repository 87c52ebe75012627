// Shared steps of the studio journeys (tests/browser/studio*.browser.ts): open the studio, point at a
// design position through the studio's camera, read the screen-reader summary and the probe, wait for
// the save. Every wait is for a state of the page, never a fixed sleep.
import type { Page } from 'playwright-core';
import { expect } from 'vitest';
import { pagePoint, probeUvi, studioReady } from './journey-helpers';

export { probeUvi, studioReady };

/** How long a poll waits for the page to catch up (the engine, a save, a navigation) on a busy machine. */
export const eventually = { timeout: 60_000, interval: 100 };

/** Opens the studio at `path` and waits until it has drawn and computed. */
export async function openStudio(page: Page, path: string) {
  await page.goto(path);
  await studioReady(page);
}

/** Page coordinates of a design point (cm, y up), from the studio's camera. */
export const at = pagePoint;

export async function click(page: Page, x: number, y: number, modifiers: 'Shift'[] = []) {
  const p = await at(page, x, y);
  for (const m of modifiers) await page.keyboard.down(m);
  await page.mouse.click(p.x, p.y);
  for (const m of modifiers) await page.keyboard.up(m);
}

/** Drags with the mouse from one design point to another in `steps` moves. */
export async function drag(
  page: Page,
  from: { x: number; y: number },
  to: { x: number; y: number },
  steps = 20,
) {
  const a = await at(page, from.x, from.y);
  const b = await at(page, to.x, to.y);
  await page.mouse.move(a.x, a.y);
  await page.mouse.down();
  for (let k = 1; k <= steps; k++) {
    await page.mouse.move(a.x + ((b.x - a.x) * k) / steps, a.y + ((b.y - a.y) * k) / steps);
  }
  await page.mouse.up();
}

/** Presses keys with the canvas focused (the studio's shortcuts work from anywhere but a text field). */
export async function keys(page: Page, ...presses: string[]) {
  await page.getByTestId('studio-canvas').focus();
  for (const k of presses) await page.keyboard.press(k);
}

/** Types a value into an inspector field and applies it. */
export async function setField(page: Page, testId: string, value: number) {
  const input = page.getByTestId(testId);
  await input.fill(String(value));
  await input.press('Enter');
  await expect.poll(() => input.inputValue(), eventually).toBe(String(value));
}

/** The engine has answered for the current design (no request in flight). */
export async function fieldsSettled(page: Page) {
  await expect.poll(() => page.getByTestId('worker-ms').textContent(), eventually).toMatch(/^Fields \d+ ms$/);
}

export async function waitSaved(page: Page) {
  await expect
    .poll(() => page.getByTestId('save-state').getAttribute('data-state'), eventually)
    .toBe('saved');
}

/** The canvas's text summary for screen readers: every object with its place and size. */
export async function summary(page: Page): Promise<string> {
  return (await page.getByTestId('object-summary').textContent()) ?? '';
}

export const median = (v: number[]) => {
  const s = [...v].sort((a, b) => a - b);
  return s.length ? (s[Math.floor((s.length - 1) / 2)]! + s[Math.ceil((s.length - 1) / 2)]!) / 2 : NaN;
};

/**
 * Drags an object left and right with the mouse (60 moves, one per animation frame) and returns the
 * engine worker's round trips (change → computed fields) that came in meanwhile. Printed, never asserted
 * as a time.
 */
export async function dragRoundTrips(
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
    // Pace the moves like a hand does: one per frame the page actually paints.
    await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => r(null))));
  }
  await page.mouse.up();
  await fieldsSettled(page);
  return page.evaluate((n) => {
    const m = window.__baskwellStudio!;
    return { roundTrips: m.roundTrips.slice(n), computeMs: m.computeMs.slice(n) };
  }, before);
}
