// The studio opens with the field already on screen: the page's HTML carries the design's field as a
// picture (no script needed to see it), the `field-visible` mark is set while the engine worker has not
// answered yet, the canvas draws the same bands (the legend is there before the first answer and does
// not change with it), and a scratch design of this browser's own is never shown the example's field.
// The workers' answers are held back by wrapping the page's Worker, so "before the worker answers" is a
// state of the page, not a race. No timing is asserted (npm run bench:studio prints the times).
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import type { BrowserContext, Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { exampleDesign } from '@/simulation';
import { BASE_URL, newContext, screenshot, signInCookie, withBrowser, watchPageErrors } from './harness';
import { demoSignIn } from '@/lib/demo/scenario';
import { demoKeeperEnclosure } from './journey-helpers';
import { eventually, studioReady } from './studio-helpers';

const session = withBrowser();

declare global {
  interface Window {
    __releaseWorkers?: () => void;
    __heldWorkerAnswers?: number;
    __pictureAtFirstFrame?: 'absent' | 'hidden' | 'shown';
  }
}

/** Every Worker of the page keeps its answers until `window.__releaseWorkers()` is called. */
async function holdWorkerAnswers(context: BrowserContext) {
  await context.addInitScript(() => {
    const Native = window.Worker;
    const held: (() => void)[] = [];
    let holding = true;
    window.__heldWorkerAnswers = 0;
    window.__releaseWorkers = () => {
      holding = false;
      held.splice(0).forEach((deliver) => deliver());
    };
    class HeldWorker extends Native {
      override set onmessage(handler: ((e: MessageEvent) => void) | null) {
        super.onmessage = handler
          ? (e: MessageEvent) => {
              if (!holding) return handler.call(this, e);
              window.__heldWorkerAnswers = (window.__heldWorkerAnswers ?? 0) + 1;
              held.push(() => handler.call(this, e));
            }
          : null;
      }
      override get onmessage() {
        return super.onmessage;
      }
    }
    window.Worker = HeldWorker;
  });
}

const fieldVisibleMarks = (page: Page) =>
  page.evaluate(() => performance.getEntriesByName('field-visible', 'mark').length);
const roundTrips = (page: Page) => page.evaluate(() => window.__baskwellStudio?.roundTrips.length ?? 0);

/**
 * Notes what the page's first frame held of the picture: its first animation frame callback runs in that
 * frame, before it is painted (and not before a render-blocking script has run).
 */
async function notePictureAtFirstFrame(context: BrowserContext) {
  await context.addInitScript(() => {
    requestAnimationFrame(() => {
      const s = document.querySelector('[data-testid="studio-first-field"]');
      window.__pictureAtFirstFrame = !s ? 'absent' : s.hasAttribute('data-pending') ? 'hidden' : 'shown';
    });
  });
}

/** Opens `path` with the workers held; checks the HTML carries the picture; returns the page. */
async function openHeld(context: BrowserContext, path: string): Promise<{ page: Page; html: string }> {
  await holdWorkerAnswers(context);
  await notePictureAtFirstFrame(context);
  const page = await context.newPage();
  page.setDefaultTimeout(60_000);
  const res = await page.goto(path);
  expect(res?.status()).toBe(200);
  return { page, html: (await res?.text()) ?? '' };
}

/** The picture is on screen, the mark is set, and no engine answer has been applied yet. */
async function expectPictureBeforeWorker(page: Page, html: string, field = 'uvi') {
  // In the HTML itself: in the first paint, shown by its own inline script before the page's code loads.
  expect(html).toContain('data-testid="studio-first-field"');
  expect(html).toMatch(/data-testid="studio-first-field"[^>]*>[\s\S]*?<path[^>]+d="M/);
  // Nothing in the picture holds the parser (a classic inline script would wait for the stylesheet), and
  // it ends with the element whose parsing lets it be shown.
  const opening = html.slice(html.indexOf('data-testid="studio-first-field"'));
  expect(opening.slice(0, opening.indexOf('</svg>'))).not.toContain('<script');
  expect(opening.slice(opening.indexOf('</svg>'))).toMatch(
    /^<\/svg><span id="studio-first-field-end" data-picture-end=""/,
  );
  // It is shown by a module script in the head that keeps the browser from rendering until it has run,
  // so no frame is painted with the picture parsed but still hidden.
  const head = html.slice(0, html.indexOf('<body'));
  expect(head).toMatch(/<script[^>]* type="module" async="" blocking="render"[^>]*>[^<]*studio-first-field/);
  // And a link that holds the first frame until the picture's last element is parsed, when the HTML
  // comes in parts.
  expect(head).toMatch(/<link rel="expect" href="#studio-first-field-end" blocking="render"\/?>/);
  expect(await page.evaluate(() => window.__pictureAtFirstFrame)).not.toBe('hidden');
  const picture = page.getByTestId('studio-first-field').first();
  await expect.poll(() => picture.isVisible(), eventually).toBe(true);
  expect(await picture.getAttribute('data-field')).toBe(field);
  expect(await picture.locator('path').count()).toBeGreaterThan(1);
  await expect.poll(() => fieldVisibleMarks(page), eventually).toBe(1);
  expect(await roundTrips(page)).toBe(0);
  // The mark says the field is on screen: never before the page's first paint was presented.
  const order = await page.evaluate(() => ({
    mark: performance.getEntriesByName('field-visible', 'mark')[0]!.startTime,
    firstPaint: performance.getEntriesByName('first-contentful-paint', 'paint')[0]?.startTime ?? NaN,
  }));
  expect(order.mark).toBeGreaterThanOrEqual(order.firstPaint);
}

describe('studio: the field in the first paint', () => {
  it('a saved design: picture and mark before the worker answers, the same legend after', async () => {
    // Signed in by a cookie (the form is not what this test is about, and is slow on a busy machine).
    const staffSignIn = demoSignIn('staff');
    const context = await newContext(session.browser());
    const cookie = await signInCookie(staffSignIn.email, staffSignIn.password);
    const [name, value] = cookie.split(/=(.*)/s) as [string, string];
    await context.addCookies([{ name, value, url: BASE_URL }]);
    const staff = await context.newPage();
    staff.setDefaultTimeout(60_000);
    await staff.goto('/enclosures');
    const { enclosureId } = await demoKeeperEnclosure(staff, 'First field');
    const r = await staff.evaluate(
      async ({ id, design }) => {
        const res = await fetch(`/api/enclosures/${id}/designs`, {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify({ name: 'First field example', design }),
        });
        return { status: res.status, body: (await res.json()) as { variant?: { id: number } } };
      },
      { id: enclosureId, design: exampleDesign() },
    );
    expect(r.status).toBe(201);
    const variantId = r.body.variant!.id;
    await staff.close();
    const { page, html } = await openHeld(context, `/studio/${variantId}`);
    const errors = watchPageErrors(page);
    await expectPictureBeforeWorker(page, html);

    // The canvas draws the page's bands before the worker answers: the legend is already there.
    await page.waitForSelector('[data-testid=studio-canvas] canvas');
    const legend = page.getByTestId('canvas-legend');
    await expect.poll(() => legend.isVisible(), eventually).toBe(true);
    const before = await legend.textContent();
    expect(before).toMatch(/\d/);
    expect(await roundTrips(page)).toBe(0);
    await screenshot(page, 'studio-first-field-before-worker');

    await page.evaluate(() => window.__releaseWorkers?.());
    await studioReady(page);
    // The engine's answer has the same thresholds: nothing on the legend changes.
    await expect.poll(() => legend.textContent(), eventually).toBe(before);
    expect(await fieldVisibleMarks(page)).toBe(1);
    expect(errors()).toEqual([]);
    await context.close();
  });

  it('the scratch studio: the example field before the worker answers', async () => {
    const context = await newContext(session.browser());
    const { page, html } = await openHeld(context, '/studio-scratch');
    const errors = watchPageErrors(page);
    await expectPictureBeforeWorker(page, html);
    await page.evaluate(() => window.__releaseWorkers?.());
    await studioReady(page);
    expect(errors()).toEqual([]);
    await context.close();
  });

  it("the scratch studio with this browser's own design: no example field; the mark once computed", async () => {
    const context = await newContext(session.browser());
    // The example without its first lamp: another field than the example's.
    const example = exampleDesign();
    const firstLamp = example.objects.find((o) => o.type === 'lamp')!;
    const own = { ...example, objects: example.objects.filter((o) => o !== firstLamp) };
    await context.addInitScript((design) => {
      if (!localStorage.getItem('baskwell.studio.local.scratch'))
        localStorage.setItem('baskwell.studio.local.scratch', JSON.stringify({ version: 3, design }));
    }, own);
    const { page } = await openHeld(context, '/studio-scratch');
    await page.waitForSelector('[data-testid=studio-canvas] canvas');
    // Hidden from the first paint on (the page's own inline check), and never marked as the field.
    expect(await page.getByTestId('studio-first-field').first().isVisible()).toBe(false);
    expect(await fieldVisibleMarks(page)).toBe(0);
    expect(await page.getByTestId('canvas-legend').isVisible()).toBe(false);
    await page.evaluate(() => window.__releaseWorkers?.());
    await studioReady(page);
    await expect.poll(() => fieldVisibleMarks(page), eventually).toBe(1);
    await context.close();
  });

  it('a field chosen in this browser is drawn by the server on the next visit', async () => {
    const context = await newContext(session.browser());
    const { page } = await openHeld(context, '/studio-scratch');
    await page.evaluate(() => window.__releaseWorkers?.());
    await studioReady(page);
    // The studio copies its field choice to a cookie the server reads.
    expect(await page.evaluate(() => document.cookie)).toContain('baskwell.studio.view=uvi.75');
    await context.addCookies([{ name: 'baskwell.studio.view', value: 'tempC.60', url: page.url() }]);
    await page.evaluate(() =>
      localStorage.setItem('baskwell.studio.prefs', JSON.stringify({ field: 'tempC', fieldOpacity: 0.6 })),
    );
    const again = await context.newPage();
    const res = await again.goto('/studio-scratch');
    const html = (await res?.text()) ?? '';
    await expectPictureBeforeWorker(again, html, 'tempC');
    await context.close();
  });

  it('HTML that arrives in two parts: the first frame still holds the picture', async () => {
    // A busy server flushes what it has: the page's HTML cut just before the picture's last element,
    // the rest 400 ms later, from a small server in front of the app (everything else passes through).
    // Without the link that expects that element the browser painted the page meanwhile without the
    // picture; and when the rest came with the end of the document, the picture was never shown by the
    // head's script (DOMContentLoaded stopped its observer before the observer's callback ran).
    const html = await (await fetch(`${BASE_URL}/studio-scratch`)).text();
    const cut = html.lastIndexOf('<', html.indexOf('data-picture-end'));
    expect(cut).toBeGreaterThan(0);
    const proxy = http.createServer((req, res) => {
      if (req.url?.startsWith('/studio-scratch')) {
        res.writeHead(200, { 'content-type': 'text/html; charset=utf-8' });
        res.write(html.slice(0, cut));
        setTimeout(() => res.end(html.slice(cut)), 400);
        return;
      }
      void fetch(`${BASE_URL}${req.url}`, { headers: { accept: req.headers.accept ?? '*/*' } })
        .then(async (r) => {
          res.writeHead(r.status, { 'content-type': r.headers.get('content-type') ?? 'text/plain' });
          res.end(Buffer.from(await r.arrayBuffer()));
        })
        .catch(() => res.writeHead(502).end());
    });
    await new Promise<void>((done) => proxy.listen(0, '127.0.0.1', done));
    try {
      const { port } = proxy.address() as AddressInfo;
      for (let i = 0; i < 3; i++) {
        const context = await newContext(session.browser());
        await holdWorkerAnswers(context);
        await notePictureAtFirstFrame(context);
        const page = await context.newPage();
        await page.goto(`http://127.0.0.1:${port}/studio-scratch`);
        await expect.poll(() => page.evaluate(() => window.__pictureAtFirstFrame), eventually).toBeDefined();
        expect(await page.evaluate(() => window.__pictureAtFirstFrame)).toBe('shown');
        await context.close();
      }
    } finally {
      await new Promise((done) => proxy.close(done));
    }
  });
});
