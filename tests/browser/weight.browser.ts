// Weight of the pages that do not draw: the landing, sign-in and share pages must not carry Konva or the
// simulation engine, neither in the first-load chunks the build lists for them nor in any script Chromium
// actually fetches while opening them. The figures (kB) are printed, never asserted: the build decides.
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import {
  MARKERS,
  filesWithMarker,
  findDistDir,
  measurePages,
  type Marker,
} from '../../scripts/lib/weight.mjs';
import { newContext, withBrowser } from './harness';
import { createDesign, createShare, enclosureIdByName, staffPage } from './journey-helpers';
import { DEMO_SHOP } from '@/lib/demo/scenario';

const ROOT = path.resolve(import.meta.dirname, '..', '..');
const session = withBrowser();

function dist(): string {
  const dir = findDistDir(ROOT, process.env.NEXT_DIST_DIR);
  if (!dir) throw new Error('no production build (npm test builds one before the browser tests)');
  return dir;
}

describe('page weight', () => {
  it('finds Konva and the engine in the build, so the checks below can fail', () => {
    for (const m of Object.keys(MARKERS) as Marker[])
      expect(filesWithMarker(dist(), m).length, m).toBeGreaterThan(0);
  });

  it('keeps Konva and the engine out of the first-load chunks of pages that do not draw', () => {
    const rows = measurePages(dist());
    const kB = (n: number) => (n / 1024).toFixed(1);
    console.log(
      rows
        .map(
          (r) =>
            `first-load JS ${r.name}: ${kB(r.firstLoad.raw)} kB raw, ${kB(r.firstLoad.gzip)} kB gzip (${r.files.length} files)` +
            (r.lazyFiles.length
              ? `; Konva and engine later: ${kB(r.lazy.raw)} kB raw, ${kB(r.lazy.gzip)} kB gzip`
              : ''),
        )
        .join('\n'),
    );
    for (const r of rows.filter((p) => !p.draws)) expect(r.markers, r.name).toEqual([]);
    expect(rows.map((r) => r.name)).toEqual(['landing', 'sign-in', 'share', 'studio']);
  });

  it('fetches no script with Konva or the engine while opening the landing, sign-in and share pages', async () => {
    const staff = await staffPage(session.browser());
    const keeper = DEMO_SHOP.people.find((p) => p.role === 'keeper')!;
    const enclosureId = await enclosureIdByName(staff, keeper.enclosures![0]!.name);
    const { variantId } = await createDesign(staff, enclosureId, `Weight check ${Date.now().toString(36)}`);
    const sharePath = await createShare(staff, variantId);
    await staff.context().close();

    const context = await newContext(session.browser());
    try {
      for (const [name, pagePath] of [
        ['landing', '/'],
        ['sign-in', '/sign-in'],
        ['share', sharePath],
      ] as const) {
        const page = await context.newPage();
        const scripts: Promise<{ url: string; text: string }>[] = [];
        page.on('response', (res) => {
          if (res.request().resourceType() === 'script' || res.url().endsWith('.js')) {
            scripts.push(
              res.text().then(
                (text) => ({ url: res.url(), text }),
                () => ({ url: res.url(), text: '' }),
              ),
            );
          }
        });
        expect((await page.goto(pagePath))?.status(), name).toBe(200);
        await page.waitForLoadState('networkidle', { timeout: 15_000 }).catch(() => undefined);
        const loaded = await Promise.all(scripts);
        const bytes = loaded.reduce((n, s) => n + Buffer.byteLength(s.text), 0);
        console.log(
          `${name}: Chromium fetched ${loaded.length} scripts, ${(bytes / 1024).toFixed(1)} kB uncompressed`,
        );
        expect(loaded.length, name).toBeGreaterThan(0);
        for (const [marker, text] of Object.entries(MARKERS)) {
          const carriers = loaded.filter((s) => s.text.includes(text)).map((s) => s.url);
          expect(carriers, `${name} loads ${marker}`).toEqual([]);
        }
        await page.close();
      }
    } finally {
      await context.close();
    }
  });
});
