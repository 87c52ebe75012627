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

export type Camera = { zoom: number; originX: number; originY: number };

/** The studio's camera (pixels per cm and the stage position of the design origin). */
export function camera(page: Page): Promise<Camera> {
  return page.evaluate(() => window.__baskwellStudio!.camera!());
}

/** The design point (cm, y up) under a page point, through the studio's camera. */
export async function designAt(page: Page, p: { x: number; y: number }): Promise<{ x: number; y: number }> {
  const cam = await camera(page);
  const box = await page.getByTestId('studio-canvas').boundingBox();
  if (!box) throw new Error('the studio canvas is not on screen');
  return { x: (p.x - box.x - cam.originX) / cam.zoom, y: (cam.originY - (p.y - box.y)) / cam.zoom };
}

/** The canvas layers, bottom up: backdrop and fields, objects, overlay (selection, highlight, ruler). */
export const LAYER = { backdrop: 0, objects: 1, overlay: 2 } as const;

/** How far a pixel is from the enclosure back's paper colour (#fbfaf6), summed over the three channels. */
export const paperDistance = (px: number[]) =>
  Math.abs(px[0]! - 0xfb) + Math.abs(px[1]! - 0xfa) + Math.abs(px[2]! - 0xf6);

/** RGBA of one layer's canvas at a design point (cm, y up). */
export function layerPixel(page: Page, layer: number, x: number, y: number): Promise<number[]> {
  return page.evaluate(
    ({ layer, x, y }) => {
      const cam = window.__baskwellStudio!.camera!();
      const canvas = document.querySelectorAll<HTMLCanvasElement>('[data-testid=studio-canvas] canvas')[
        layer
      ];
      if (!canvas) throw new Error(`no canvas for layer ${layer}`);
      const ratio = canvas.width / canvas.clientWidth;
      const sx = Math.round((cam.originX + x * cam.zoom) * ratio);
      const sy = Math.round((cam.originY - y * cam.zoom) * ratio);
      return [...canvas.getContext('2d')!.getImageData(sx, sy, 1, 1).data];
    },
    { layer, x, y },
  );
}

/** How many pixels of one layer are drawn in a colour (within a tolerance per channel). */
export function layerColourCount(page: Page, layer: number, rgb: [number, number, number], tol = 24) {
  return page.evaluate(
    ({ layer, rgb, tol }) => {
      const canvas = document.querySelectorAll<HTMLCanvasElement>('[data-testid=studio-canvas] canvas')[
        layer
      ];
      if (!canvas) throw new Error(`no canvas for layer ${layer}`);
      const { data } = canvas.getContext('2d')!.getImageData(0, 0, canvas.width, canvas.height);
      let n = 0;
      for (let i = 0; i < data.length; i += 4) {
        if (
          data[i + 3]! > 40 &&
          Math.abs(data[i]! - rgb[0]) <= tol &&
          Math.abs(data[i + 1]! - rgb[1]) <= tol &&
          Math.abs(data[i + 2]! - rgb[2]) <= tol
        )
          n++;
      }
      return n;
    },
    { layer, rgb, tol },
  );
}

/** The id of the object the inspector shows ('' when none or several are selected). */
export async function inspected(page: Page): Promise<string> {
  const el = page.getByTestId('inspector-object');
  return (await el.count()) ? ((await el.getAttribute('data-object-id')) ?? '') : '';
}

/** Whether the toolbar's Undo is offered (false once the history is back at its start). */
export async function canUndo(page: Page): Promise<boolean> {
  return page.locator('[role=toolbar] [data-command="edit.undo"]').isEnabled();
}
