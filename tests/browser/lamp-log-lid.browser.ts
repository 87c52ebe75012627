import { describe, expect, it } from 'vitest';
import { screenshot, signInAsDemo, withBrowser } from './harness';
import { firstUvTube, localDateTime } from './journey-helpers';

// The lid counted once, through the forms a keeper uses: two lamps of one type behind the same mesh lid,
// one measured bare and one measured through the lid (passing 60 %, so every value is 0.6 of the bare
// one), give the same basking estimate. The 60 % is the form's own "fine mesh lid" choice.
const session = withBrowser();

const READINGS = [
  { daysAgo: 90, bare: 62 },
  { daysAgo: 60, bare: 58 },
  { daysAgo: 30, bare: 55 },
];

describe('lamp log: readings through the lid', () => {
  it('gives the same basking estimate for a lamp measured through its lid as measured bare', async () => {
    const page = await signInAsDemo(session.page(), 'staff', { timeoutMs: 90_000 });
    await page.goto('/lamp-log');
    await page.getByRole('link', { name: 'Desert vivarium' }).first().click();
    await page.waitForURL(/\/enclosures\/\d+\/lamps$/);
    const lampsPage = page.url();

    const basking: string[] = [];
    for (const how of ['nothing', 'lid'] as const) {
      await page.goto(lampsPage);
      const addLamp = page.getByRole('form', { name: 'Add a lamp' });
      const name = how === 'lid' ? 'Lid check, through the lid' : 'Lid check, bare';
      await addLamp.getByLabel('Name').fill(name);
      await addLamp.getByLabel('Lamp type').selectOption(await firstUvTube(addLamp));
      await addLamp.getByLabel('First switched on').fill(localDateTime(120).slice(0, 10));
      await addLamp.getByLabel(/Lamp to basking spot/).fill('25');
      await addLamp.getByLabel('Between lamp and basking spot').selectOption('0.6');
      await addLamp.getByRole('button', { name: 'Add lamp' }).click();
      const link = page.getByRole('link', { name });
      await link.waitFor({ timeout: 60_000 });
      await link.click();
      await page.waitForURL(/\/lamp-log\/\d+$/);

      const form = page.getByRole('form', { name: 'Add a reading' });
      const points = page.getByTestId('reading-point');
      for (const r of READINGS) {
        const before = await points.count();
        await form.getByLabel('Taken at').fill(localDateTime(r.daysAgo));
        await form.getByLabel(/Distance below the lamp/).fill('30');
        await form.getByLabel('Meter value').fill(String(how === 'lid' ? r.bare * 0.6 : r.bare));
        await form.getByLabel('Between lamp and meter').selectOption(how);
        if (how === 'lid') {
          // The lid's share comes from the lamp's own setting.
          expect(await form.getByLabel('Share of UVB it passes (0–1)').inputValue()).toBe('0.6');
        }
        await form.getByLabel('Lamp warmed up').selectOption('yes');
        await form.getByRole('button', { name: 'Add reading' }).click();
        await expect.poll(() => points.count(), { timeout: 60_000 }).toBe(before + 1);
      }
      const value = page.locator('dt', { hasText: /^Basking spot/ }).locator('xpath=following-sibling::dd');
      await expect.poll(() => value.innerText(), { timeout: 30_000 }).toMatch(/µW\/cm²/);
      basking.push(await value.innerText());
      await screenshot(page, `lamp-log-lid-${how === 'lid' ? 'through-lid' : 'bare'}`);
      if (how === 'lid') {
        await page.setViewportSize({ width: 390, height: 844 });
        await screenshot(page, 'lamp-log-lid-through-lid-phone');
        await page.setViewportSize({ width: 1280, height: 800 });
      }
    }
    expect(basking[1]).toBe(basking[0]);

    // A set-up recorded wrongly is corrected beside the reading: said to be bare, the same values now
    // describe a weaker lamp, and the basking estimate falls.
    const newest = page.getByTestId('readings-table').locator('tbody tr').first();
    await newest.getByText('Change set-up').click();
    const edit = newest.getByRole('form', { name: /^Set-up of the reading of / });
    await edit.getByLabel('Between lamp and meter').selectOption('nothing');
    await edit.getByRole('button', { name: 'Save set-up' }).click();
    await expect
      .poll(() => newest.getByTestId('reading-setup').innerText(), { timeout: 30_000 })
      .toBe('bare lamp, warmed up');
    const value = page.locator('dt', { hasText: /^Basking spot/ }).locator('xpath=following-sibling::dd');
    await expect.poll(() => value.innerText(), { timeout: 30_000 }).not.toBe(basking[1]);
    expect(parseFloat(await value.innerText())).toBeLessThan(parseFloat(basking[1]!));
    await screenshot(page, 'lamp-log-lid-setup-corrected');
    expect(session.pageErrors()).toEqual([]);
  });
});
