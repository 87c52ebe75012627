// A staff member's whole working day in Chromium, as one journey: sign in, plan an enclosure for a keeper
// with the guided start, refine it in the studio (move the UV lamp and see the reading under it change),
// make a second variant, compare the two, share one, download its PDF report, and log two meter readings
// of a lamp to see its replacement date. A screenshot of every page on the way.
import { readFileSync } from 'node:fs';
import { PDFDocument } from 'pdf-lib';
import { describe, expect, it } from 'vitest';
import { DEMO_SHOP } from '@/lib/demo/scenario';
import { pdfDrawnText } from '../api/variants.helpers';
import { screenshot, signInAsDemo, withBrowser } from './harness';
import {
  JOURNEY_MS,
  eventually,
  localDateTime,
  pagePoint,
  probeUvi,
  readVariant,
  studioReady,
  type DesignObjectJson,
} from './journey-helpers';

const session = withBrowser();
const keeper = DEMO_SHOP.people.find((p) => p.role === 'keeper')!;
const shot = (page: Parameters<typeof screenshot>[0], name: string) =>
  screenshot(page, `journey-staff-${name}`);

/** Sets a numeric inspector field and waits until the studio shows the value. */
async function setField(page: Parameters<typeof screenshot>[0], testId: string, value: number) {
  const input = page.getByTestId(testId);
  await input.fill(String(value));
  await input.press('Enter');
  await expect.poll(() => input.inputValue(), eventually).toBe(String(value));
}

async function waitSaved(page: Parameters<typeof screenshot>[0]) {
  await expect
    .poll(() => page.getByTestId('save-state').getAttribute('data-state'), eventually)
    .toBe('saved');
}

const isUvLamp = (o: DesignObjectJson) => o.type === 'lamp' && Number(o.uvbAt30 ?? 0) > 0;

describe('staff journey', () => {
  it(
    'plans an enclosure for a keeper, refines, varies, compares, shares, exports and logs a lamp',
    async () => {
      // 1. Sign in: the enclosure list.
      const page = await signInAsDemo(session.page(), 'staff', { timeoutMs: 60_000 });
      const suffix = Date.now().toString(36);
      const enclosureName = `Journey vivarium ${suffix}`;
      await page.waitForURL((u) => u.pathname === '/enclosures');
      await page.getByRole('table', { name: 'Enclosures' }).waitFor();
      await shot(page, '01-enclosures');

      // 2. Guided start for the keeper's bearded dragon.
      await page.goto('/enclosures/new');
      const speciesValue = await page
        .locator('#gs-species option', { hasText: 'Bearded dragon' })
        .first()
        .getAttribute('value');
      expect(speciesValue).toMatch(/^\d+$/);
      await page.getByLabel('Species').selectOption(speciesValue!);
      // The keeper picker searches the organisation's people as one types.
      await page.getByRole('combobox', { name: 'Keeper' }).fill(keeper.name);
      await page
        .getByRole('option', { name: new RegExp(`^${keeper.name} \\(keeper\\)`) })
        .first()
        .click();
      await page.getByLabel('Enclosure name').fill(enclosureName);
      await page.getByLabel('Animal’s name (optional)').fill('Saffron');
      await page.getByRole('button', { name: 'Propose a set-up' }).click();
      await page.getByRole('heading', { name: 'Proposed set-up' }).waitFor({ timeout: 90_000 });
      // The proposal explains itself and carries the standing cautions.
      expect(await page.getByRole('region', { name: 'Proposed set-up' }).innerText()).toMatch(/thermometer/i);
      await shot(page, '02-guided-start-proposal');
      await page.getByRole('button', { name: 'Create the enclosure and open it in the studio' }).click();
      await page.waitForURL(/\/studio\/\d+$/, { timeout: 90_000 });
      const variantA = Number(/\/studio\/(\d+)$/.exec(page.url())![1]);
      await studioReady(page);
      await shot(page, '03-studio-new');

      // 3. Refine in the studio: a probe under the UV lamp, then the lamp moved away from it.
      const stored = (await readVariant(page, variantA)).variant!;
      const { width } = stored.design.enclosure;
      const uv = stored.design.objects.find(isUvLamp);
      if (!uv) throw new Error('the guided start placed no UV lamp');
      const uvX = Number(uv.x);
      const perch = stored.design.objects.find((o) => o.type === 'perch');
      const probeY = perch ? Math.max(Number(perch.y1), Number(perch.y2)) + 4 : 15;
      const canvas = page.getByTestId('studio-canvas');
      await canvas.focus();
      await page.keyboard.press('i');
      const at = await pagePoint(page, uvX, probeY);
      await page.mouse.click(at.x, at.y);
      await page.getByTestId('tab-fields').click();
      await page.getByTestId('probe-list').waitFor();
      const probeId = await page
        .locator('[data-testid^=probe-reading-]')
        .first()
        .getAttribute('data-testid')
        .then((t) => t!.replace('probe-reading-', ''));
      const under = await probeUvi(page, probeId);
      expect(under).toBeGreaterThan(0);

      await page.getByTestId('tab-inspect').click();
      await canvas.focus();
      await page.keyboard.press('Escape');
      await page.keyboard.press('v');
      await page
        .getByTestId('object-list')
        .getByRole('button', { name: `Lamp ${uv.name ?? uv.id}`, exact: true })
        .click();
      await expect
        .poll(() => page.getByTestId('inspector-object').getAttribute('data-object-id'), eventually)
        .toBe(uv.id);
      const awayX = uvX < width / 2 ? Math.round(width * 0.85) : Math.round(width * 0.15);
      await setField(page, 'field-x', awayX);
      await page.getByTestId('tab-fields').click();
      // The field follows the lamp: the spot it left gets much less UV.
      await expect.poll(() => probeUvi(page, probeId), eventually).toBeLessThan(under * 0.7);
      await shot(page, '04-studio-lamp-moved');
      await waitSaved(page);
      const saved = (await readVariant(page, variantA)).variant!;
      expect(saved.version).toBeGreaterThan(stored.version);
      expect(saved.design.objects.find((o) => o.id === uv.id)?.x).toBe(awayX);

      // 4. A second variant: a copy, then the lamp put back over the basking spot in the copy.
      const enclosureHref = await page
        .getByRole('link', { name: 'Enclosure', exact: true })
        .getAttribute('href');
      expect(enclosureHref).toMatch(/^\/enclosures\/\d+$/);
      await page.goto(enclosureHref!);
      await page.getByRole('heading', { name: enclosureName, level: 1 }).waitFor();
      const card = page.getByTestId('design-card').first();
      await expect
        .poll(() => card.locator('[data-testid=variant-row][aria-busy=false]').count(), eventually)
        .toBe(1);
      await card.getByRole('button', { name: 'Duplicate' }).click();
      await expect
        .poll(() => card.locator('[data-testid=variant-row][aria-busy=false]').count(), eventually)
        .toBe(2);
      const copyName = `Copy of ${saved.name}`;
      await expect.poll(() => card.getByText(copyName, { exact: true }).count(), eventually).toBe(1);
      await shot(page, '05-enclosure-two-variants');
      const copyRow = card.getByTestId('variant-row').filter({ hasText: copyName });
      await copyRow.getByRole('link', { name: 'Open in studio' }).click();
      await page.waitForURL(/\/studio\/\d+$/);
      const variantB = Number(/\/studio\/(\d+)$/.exec(page.url())![1]);
      expect(variantB).not.toBe(variantA);
      await studioReady(page);
      await page.getByTestId('studio-canvas').focus();
      await page
        .getByTestId('object-list')
        .getByRole('button', { name: `Lamp ${uv.name ?? uv.id}`, exact: true })
        .click();
      await setField(page, 'field-x', uvX);
      await waitSaved(page);
      expect((await readVariant(page, variantB)).variant!.design.objects.find((o) => o.id === uv.id)?.x).toBe(
        uvX,
      );
      await shot(page, '06-studio-second-variant');

      // 5. Compare the two: the difference is the lamp that moved.
      await page.goto(enclosureHref!);
      await card.getByLabel(`Compare ${saved.name}`, { exact: true }).check();
      await card.getByLabel(`Compare ${copyName}`, { exact: true }).check();
      await page.getByRole('link', { name: 'Compare side by side' }).click();
      await page.waitForURL(/\/compare\?/);
      for (const side of ['compare-a', 'compare-b'])
        await page.getByTestId(side).getByRole('img').first().waitFor();
      const diff = page.getByTestId('diff-row');
      await expect.poll(() => diff.count(), eventually).toBe(1);
      expect(await diff.first().innerText()).toContain(uv.name ?? uv.id);
      // With no species in the address, both sides are checked against the enclosure's bearded dragon.
      const speciesPicker = page.getByRole('combobox', { name: /^Species/ });
      expect(await speciesPicker.inputValue()).toBe(speciesValue);
      await page.getByRole('heading', { name: 'Species check: Bearded dragon' }).first().waitFor();
      // "None" is a choice of its own, kept in the address.
      await speciesPicker.selectOption('');
      await page.waitForURL(/species=none/);
      await expect
        .poll(() => page.getByRole('heading', { name: /^Species check/ }).count(), eventually)
        .toBe(0);
      await shot(page, '07-compare');

      // 6. Share the first variant, then download its PDF report.
      await page.goto(enclosureHref!);
      await card.getByRole('link', { name: 'Sharing & export' }).click();
      await page.waitForURL(/\/designs\/\d+$/);
      const panel = page.getByTestId('variant-panel').filter({ hasText: saved.name }).first();
      await panel.getByRole('button', { name: 'Create share link' }).click();
      const shareUrl = await panel.getByLabel('New share link').inputValue();
      expect(shareUrl).toMatch(/\/s\/[A-Za-z0-9_-]{43}$/);
      await shot(page, '08-design-shared');
      const [download] = await Promise.all([
        page.waitForEvent('download'),
        panel.getByRole('link', { name: 'Report (PDF)' }).click(),
      ]);
      const bytes = new Uint8Array(readFileSync(await download.path()));
      expect(bytes.byteLength).toBeGreaterThan(5_000);
      expect(Buffer.from(bytes.subarray(0, 5)).toString('latin1')).toBe('%PDF-');
      expect((await PDFDocument.load(bytes)).getPageCount()).toBeGreaterThan(0);
      expect(pdfDrawnText(bytes)).toContain(saved.name);

      // 7. The lamp log: a lamp switched on four months ago, two readings, a replacement date.
      await page.goto(enclosureHref!);
      await page.getByRole('link', { name: 'Lamps and readings' }).click();
      await page.waitForURL(/\/enclosures\/\d+\/lamps$/);
      await page.getByRole('heading', { name: `Lamps of ${enclosureName}` }).waitFor();
      await shot(page, '09-lamps-empty');
      const addLamp = page.getByRole('form', { name: 'Add a lamp' });
      await addLamp.getByLabel('Name').fill('Journey UV tube');
      const typeValue = await addLamp
        .locator('select[name=lampTypeId] option:not([disabled])')
        .filter({ hasNotText: '(no UV)' })
        .first()
        .getAttribute('value');
      await addLamp.getByLabel('Lamp type').selectOption(typeValue!);
      await addLamp.getByLabel('First switched on').fill(localDateTime(120).slice(0, 10));
      await addLamp.getByLabel(/Lamp to basking spot/).fill('30');
      await addLamp.getByRole('button', { name: 'Add lamp' }).click();
      const lampLink = page.getByRole('link', { name: 'Journey UV tube' });
      await lampLink.waitFor({ timeout: 60_000 });
      await shot(page, '10-lamps-one');
      await lampLink.click();
      await page.waitForURL(/\/lamp-log\/\d+$/);
      const readingForm = page.getByRole('form', { name: 'Add a reading' });
      const points = page.getByTestId('reading-point');
      for (const [daysAgo, value] of [
        [90, 70],
        [5, 52],
      ] as const) {
        const before = await points.count();
        await readingForm.getByLabel('Taken at').fill(localDateTime(daysAgo));
        await readingForm.getByLabel(/Distance below the lamp/).fill('30');
        await readingForm.getByLabel('Meter value').fill(String(value));
        await readingForm.getByLabel('Between lamp and meter').selectOption('nothing');
        await readingForm.getByLabel('Lamp warmed up').selectOption('yes');
        await readingForm.getByRole('button', { name: 'Add reading' }).click();
        await expect.poll(() => points.count(), eventually).toBe(before + 1);
      }
      expect(await page.getByTestId('readings-table').locator('tbody tr').count()).toBe(2);
      // The outlook names a replacement date (a day, month and year), not a dash.
      const replaceBy = page.locator('dt', { hasText: 'Replace by' }).locator('xpath=following-sibling::dd');
      await expect.poll(() => replaceBy.innerText(), eventually).toMatch(/^\d{1,2} [A-Z][a-z]+ \d{4}/);
      await shot(page, '11-lamp-two-readings');
      expect(session.pageErrors()).toEqual([]);
    },
    JOURNEY_MS,
  );
});
