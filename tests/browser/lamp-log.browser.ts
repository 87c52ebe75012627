import { describe, expect, it } from 'vitest';
import { DEMO_SHOP } from '@/lib/demo/scenario';
import { screenshot, signInAsDemo, withBrowser } from './harness';
import { api, demoKeeperEnclosure } from './journey-helpers';

// The lamp log in Chromium on the demo scenario: the table, a lamp's chart with its fitted curve,
// typing in a reading, a CSV with a bad row, and a backdrop photo served back through its own route.
const session = withBrowser();
const othersEnclosures = DEMO_SHOP.people
  .filter((p) => p.name !== 'Tomasz Wrenfield')
  .flatMap((p) => (p.enclosures ?? []).map((e) => e.name));

async function asStaff() {
  const page = session.page();
  // Generous waits: the machine running the tests may be busy; nothing here is a speed check.
  await signInAsDemo(page, 'staff', { timeoutMs: 90_000 });
  return page;
}

describe('lamp log', () => {
  it('filters by a keeper found by typing part of their name, and a new enclosure takes a keeper the same way', async () => {
    const page = await asStaff();
    // The list refetches after each choice; a busy machine answers slowly.
    const slow = { timeout: 60_000 };
    await page.goto('/lamp-log');
    const table = page.getByTestId('lamp-table');
    await table.waitFor();
    // The page carries no list of people: the picker asks the keepers API as one types.
    const keeper = page.getByRole('combobox', { name: 'Keeper' });
    await keeper.fill('wrenf');
    await page.getByRole('option', { name: /^Tomasz Wrenfield/ }).click();
    await page.waitForURL((u) => /^\d+$/.test(u.searchParams.get('keeper') ?? ''));
    expect(await keeper.inputValue()).toBe('Tomasz Wrenfield');
    await expect
      .poll(async () => {
        // Their demo enclosures, and none of another keeper's (files running alongside may give this keeper
        // enclosures of their own, so the list is not a fixed one).
        const rows = await table.locator('tbody tr').allInnerTexts();
        return (
          rows.some((r) => /Desert vivarium/.test(r)) &&
          rows.every((r) => !othersEnclosures.some((name) => r.includes(name)))
        );
      }, slow)
      .toBe(true);
    // Clearing it lists everyone's lamps again.
    await keeper.fill('');
    await keeper.blur();
    await page.waitForURL((u) => !u.searchParams.has('keeper'));
    await expect.poll(() => table.innerText(), slow).toContain('Tall mesh cage');

    await page.goto('/enclosures');
    await page.getByRole('button', { name: 'New enclosure' }).click();
    const form = page.getByRole('region', { name: 'New enclosure' });
    await form.getByRole('combobox', { name: 'Keeper' }).fill('lindm');
    await page.getByRole('option', { name: /^Aoife Lindmarr \(keeper\)/ }).click();
    const name = `Picked keeper tank ${Date.now().toString(36)}`;
    await form.getByLabel('Name', { exact: true }).fill(name);
    await form.getByLabel('Width').fill('60');
    await form.getByLabel('Height').fill('40');
    await form.getByLabel('Depth').fill('40');
    await form.getByRole('button', { name: 'Add enclosure' }).click();
    await page
      .getByRole('status')
      .filter({ hasText: `Added “${name}”` })
      .waitFor();
    await page.goto(`/enclosures?q=${encodeURIComponent(name)}`);
    const row = page.getByRole('row').filter({ hasText: name });
    await expect.poll(() => row.innerText(), slow).toContain('Aoife Lindmarr');
  }, 300_000);

  it('lists the demo lamps, most urgent first, and draws a lamp’s readings with the fitted curve', async () => {
    const page = await asStaff();
    await page.goto('/lamp-log');
    const table = page.getByTestId('lamp-table');
    await table.waitFor();
    await expect.poll(() => table.locator('tbody tr').count(), { timeout: 10_000 }).toBeGreaterThanOrEqual(3);
    await expect.poll(() => table.innerText()).toContain('Basking tube');
    // The demo's lamps and readings are invented, and the pages say so.
    expect(await page.getByTestId('example-data').innerText()).toMatch(/^Example data: invented/);
    await screenshot(page, 'lamp-log-table');

    await page.getByRole('link', { name: 'Basking tube' }).click();
    const chart = page.getByTestId('decay-chart');
    await chart.waitFor();
    const points = page.getByTestId('reading-point');
    expect(await points.count()).toBeGreaterThanOrEqual(5);
    expect(await page.getByTestId('fit-curve').getAttribute('d')).toMatch(
      /^M[\d.]+,[\d.]+(L[\d.]+,[\d.]+){10,}$/,
    );
    expect(await page.getByTestId('fit-band').count()).toBe(1);
    await expect.poll(() => chart.innerText()).toContain('Fitted decay');
    expect(await page.getByTestId('example-data').count()).toBe(2);
    // The tube's first-evening readings are its burn-in: drawn apart, and the outlook says so.
    expect(await chart.innerText()).toContain('During burn-in (fitted apart)');
    expect(await page.getByText(/taken during burn-in: shown, not used for the decay/).count()).toBe(1);
    await screenshot(page, 'lamp-log-chart');

    // At laptop width (the harness opens 1280 × 800) the readings fit their column, the delete
    // action included: no sideways scroll. Each delete button says which reading it deletes.
    const readings = page.getByTestId('readings-table');
    const overflow = await readings.evaluate(
      (t) => t.parentElement!.scrollWidth - t.parentElement!.clientWidth,
    );
    expect(overflow).toBe(0);
    const deletes = readings.getByRole('button', { name: /^Delete the reading of \d{1,2} \w+ \d{4} / });
    expect(await deletes.count()).toBe(await readings.locator('tbody tr').count());
    await deletes.first().focus();
    expect(
      await deletes
        .first()
        .evaluate((b) => b === document.activeElement && b.getBoundingClientRect().width > 0),
    ).toBe(true);

    // A reading typed in (in inches) joins the chart.
    const before = await points.count();
    await page.getByRole('button', { name: 'in', exact: true }).click();
    await page.getByLabel('Distance below the lamp (in)').fill('12');
    await page.getByLabel('Meter value').fill('24.5');
    // The set-up of the last reading is offered again; this one was through the lid. (Each reading in
    // the table has a set-up form of its own: these fields are the add form's.)
    const addForm = page.getByRole('form', { name: 'Add a reading' });
    expect(await addForm.getByLabel('Between lamp and meter').inputValue()).toBe('nothing');
    expect(await addForm.getByLabel('Lamp warmed up').inputValue()).toBe('yes');
    await addForm.getByLabel('Between lamp and meter').selectOption('lid');
    await addForm.getByLabel('Share of UVB it passes (0–1)').fill('0.6');
    await page.getByRole('button', { name: 'Add reading' }).click();
    await expect.poll(() => points.count(), { timeout: 60_000 }).toBe(before + 1);
    const newest = page.getByTestId('readings-table').locator('tbody tr').first();
    await expect.poll(() => newest.innerText(), { timeout: 10_000 }).toMatch(/24\.5 µW\/cm².*12 in/s);
    expect(await newest.getByTestId('reading-setup').innerText()).toBe('through the lid (60 %), warmed up');

    // Deleting it (after the confirmation) takes it off the chart; Undo puts it back as it was.
    page.once('dialog', (d) => void d.accept());
    await newest.getByRole('button', { name: /^Delete the reading of / }).click();
    await page.getByText('Reading deleted.').waitFor();
    await expect.poll(() => points.count(), { timeout: 60_000 }).toBe(before);
    await page.getByRole('button', { name: 'Undo' }).click();
    await expect.poll(() => points.count(), { timeout: 60_000 }).toBe(before + 1);
    await page.getByText('Reading deleted.').waitFor({ state: 'detached' });
    await expect.poll(() => newest.innerText(), { timeout: 10_000 }).toMatch(/24\.5 µW\/cm².*12 in/s);
    expect(await newest.getByTestId('reading-setup').innerText()).toBe('through the lid (60 %), warmed up');
    expect(session.pageErrors()).toEqual([]);
  });

  it('previews a CSV with a bad row, names the row, and imports nothing', async () => {
    const page = await asStaff();
    await page.goto('/lamp-log');
    await page.getByRole('link', { name: 'Desert vivarium' }).first().click();
    await page.getByRole('heading', { name: 'Import readings (CSV)' }).waitFor();
    // Dates relative to today, so both rows are after the demo lamp's first use whenever this runs.
    const day = (ago: number) => new Date(Date.now() - ago * 86_400_000).toISOString().slice(0, 10);
    const csv = [
      'lamp,taken_at,distance,distance_unit,value,unit,meter',
      `Basking tube,${day(2)},30,cm,40,uvb,test meter`,
      `Basking tube,${day(1)},thirty,cm,39,uvb,test meter`,
    ].join('\n');
    await page.getByLabel('CSV file of readings').setInputFiles({
      name: 'readings.csv',
      mimeType: 'text/csv',
      buffer: Buffer.from(csv),
    });
    const preview = page.getByTestId('csv-preview');
    await preview.waitFor();
    await expect.poll(() => preview.innerText(), { timeout: 10_000 }).toContain('1 problem found');
    expect(await preview.innerText()).toContain('“thirty” is not a number.');
    expect(await page.getByRole('button', { name: /^Import \d+ readings?$/ }).isDisabled()).toBe(true);
    await screenshot(page, 'lamp-log-csv-preview');
  });

  it('uploads a photo of the enclosure and shows it back from its own route', async () => {
    const page = await asStaff();
    await page.goto('/lamp-log');
    await page.getByRole('link', { name: 'Desert vivarium' }).first().click();
    const input = page.getByLabel(/Photo of the enclosure from the front/);
    await input.waitFor();
    // A real JPEG, encoded by Chromium itself.
    const bytes = await page.evaluate(async () => {
      const c = document.createElement('canvas');
      c.width = 320;
      c.height = 160;
      const g = c.getContext('2d')!;
      g.fillStyle = '#94561f';
      g.fillRect(0, 0, 320, 160);
      g.fillStyle = '#f9efd6';
      g.fillRect(20, 100, 120, 40);
      const blob = await new Promise<Blob>((r) => c.toBlob((b) => r(b!), 'image/jpeg', 0.9));
      return Array.from(new Uint8Array(await blob.arrayBuffer()));
    });
    const photos = page.getByRole('img', { name: /Enclosure photo/ });
    const before = await photos.count();
    await input.setInputFiles({ name: 'front.jpg', mimeType: 'image/jpeg', buffer: Buffer.from(bytes) });
    await expect.poll(() => photos.count(), { timeout: 60_000 }).toBe(before + 1);
    // Newest first.
    const img = photos.first();
    expect(await img.getAttribute('alt')).toBe('Enclosure photo front.jpg');
    await expect
      .poll(
        () =>
          img.evaluate((el) => (el as HTMLImageElement).complete && (el as HTMLImageElement).naturalWidth),
        {
          timeout: 60_000,
        },
      )
      .toBe(320);
    const src = await img.getAttribute('src');
    expect(src).toMatch(/^\/api\/uploads\/\d+$/);
    // Nobody signed in gets nothing.
    const anonymous = await page.context().browser()!.newContext();
    const res = await anonymous.request.get(new URL(src!, page.url()).toString());
    expect(res.status()).toBe(401);
    await anonymous.close();
    await screenshot(page, 'lamp-log-photo');
  });

  it('pages with Next and Previous from the rows shown (the cursor in the address), and Back returns', async () => {
    const page = await asStaff();
    const slow = { timeout: 60_000 };
    // An enclosure of this test's own with 55 lamps: three pages of 25, filtered to it.
    const { organisationId, enclosureId } = await demoKeeperEnclosure(page, 'Paged lamps');
    const types = await api(page, 'GET', `/api/lamp-types?organisationId=${organisationId}&limit=1`);
    const lampTypeId = (types.body.items as { id: number }[])[0]!.id;
    for (let i = 1; i <= 55; i++) {
      const made = await api(page, 'POST', `/api/enclosures/${enclosureId}/lamps`, {
        lampTypeId,
        label: `Paged lamp ${String(i).padStart(2, '0')}`,
        firstUsedOn: '2026-01-01',
        hoursPerDay: 12,
      });
      expect(made.status).toBe(201);
    }
    const table = page.getByTestId('lamp-table');
    const labels = async () =>
      (await table.locator('tbody tr').allInnerTexts()).map((r) => /Paged lamp \d+/.exec(r)?.[0]);
    const expectRows = (from: number, to: number) =>
      expect
        .poll(labels, slow)
        .toEqual(
          Array.from({ length: to - from + 1 }, (_, i) => `Paged lamp ${String(from + i).padStart(2, '0')}`),
        );
    await page.goto(`/lamp-log?enclosure=${enclosureId}&sort=lamp&dir=asc`);
    await expectRows(1, 25);
    const next = page.getByRole('button', { name: 'Next page' });
    const previous = page.getByRole('button', { name: 'Previous page' });
    await next.click();
    await page.waitForURL((u) => u.searchParams.get('page') === '2' && u.searchParams.has('after'));
    await expectRows(26, 50);
    await next.click();
    await page.waitForURL((u) => u.searchParams.get('page') === '3' && u.searchParams.has('after'));
    await expectRows(51, 55);
    // Previous seeks back from the first row shown.
    await previous.click();
    await page.waitForURL((u) => u.searchParams.get('page') === '2' && u.searchParams.has('before'));
    await expectRows(26, 50);
    // Back returns to the page the address names, and the same address opened afresh shows it too.
    await page.goBack();
    await page.waitForURL((u) => u.searchParams.get('page') === '3');
    await expectRows(51, 55);
    await page.reload();
    await expectRows(51, 55);
    await previous.click();
    await previous.click();
    await page.waitForURL((u) => !u.searchParams.has('page') && !u.searchParams.has('before'));
    await expectRows(1, 25);
  }, 300_000);
});
