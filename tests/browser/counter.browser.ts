import type { BrowserContext, Locator } from 'playwright-core';
import { afterEach, describe, expect, it } from 'vitest';
import { CounterReading } from '@/models';
import { newContext, screenshot, signInAsDemo, withBrowser } from './harness';
import { JOURNEY_MS, eventually, firstUvTube } from './journey-helpers';

// The counter on a phone (390 × 844, touch), one-handed: a walk-in's lamp tested to a verdict in under ten
// taps, saved for a new customer who agrees to e-mails, the test slip sent to them (read in the owner's
// mail viewer, its link followed signed out withdraws the consent), and the lamp tested again a month
// later, when it has its own decay fit.
// Taps are counted as a person would: a tap on a button or a field, two for a native picker (open it,
// choose); typing a number into a field is not a tap.
const session = withBrowser();
const PHONE = { width: 390, height: 844 };
let context: BrowserContext | undefined;

afterEach(async () => {
  await context?.close();
  context = undefined;
});

function tapCounter() {
  let taps = 0;
  return {
    count: () => taps,
    async tap(l: Locator) {
      taps += 1;
      await l.tap();
    },
    async type(l: Locator, text: string) {
      taps += 1;
      await l.tap();
      await l.fill(text);
    },
    async pick(l: Locator, value: string) {
      taps += 2;
      await l.selectOption(value);
    },
  };
}

/** The text of the slip sent to `email`, as the organisation's owner sees it in the mail viewer. */
async function slipInMailViewer(email: string): Promise<string> {
  const ownerContext = await newContext(session.browser());
  try {
    const ownerPage = await signInAsDemo(await ownerContext.newPage(), 'owner', { timeoutMs: 60_000 });
    await ownerPage.goto('/mail');
    const message = ownerPage.locator('main li').filter({ hasText: email });
    await expect
      .poll(async () => {
        if ((await message.count()) === 0) await ownerPage.reload();
        return message.count();
      }, eventually)
      .toBe(1);
    expect(await message.innerText()).toMatch(/test slip to a customer/);
    await screenshot(ownerPage, 'counter-mail-viewer-slip');
    return await message.locator('pre').innerText();
  } finally {
    await ownerContext.close();
  }
}

describe('the counter on a phone', () => {
  it(
    'tests a walk-in lamp to a verdict in under ten taps, saves it for a new customer, and retests it',
    { timeout: JOURNEY_MS },
    async () => {
      context = await newContext(session.browser(), { viewport: PHONE, hasTouch: true });
      const page = await signInAsDemo(await context.newPage(), 'staff', { timeoutMs: 60_000 });
      await page.goto('/counter');
      const form = page.getByRole('form', { name: 'Counter test' });
      await form.getByLabel('Lamp type').waitFor();
      const tube = await firstUvTube(page);

      const t = tapCounter();
      // "Walk-in" is chosen to start with; the distance starts at the counter's 30 cm and the meter kind
      // at a broadband UVB meter, so neither costs a tap.
      await t.pick(form.getByLabel('Lamp type'), tube);
      await t.type(form.getByLabel('Months in use'), '7');
      await t.pick(form.getByLabel('Between lamp and meter'), 'nothing');
      await t.pick(form.getByLabel('Lamp warmed up'), 'yes');
      await t.type(form.getByLabel('Meter value'), '38');
      const verdict = page.getByRole('region', { name: 'Verdict' });
      await verdict.locator('[data-verdict]').waitFor();
      const taps = t.count();
      console.info(`counter: walk-in test to a verdict in ${taps} taps`);
      expect(taps).toBeLessThan(10);
      const kind = await verdict.locator('[data-verdict]').getAttribute('data-verdict');
      expect(['keep', 'test-again', 'replace']).toContain(kind);
      await expect.poll(() => verdict.innerText()).toMatch(/of a new lamp of this type/);
      expect(await verdict.innerText()).toMatch(/vet/);
      await screenshot(page, 'counter-phone-verdict');

      // Saved for a new customer, named at the counter, who gives an address and agrees to e-mails.
      const email = `morgan.counterfield.${Date.now()}@example.test`;
      await form.getByRole('radio', { name: 'New customer' }).tap();
      await form.getByLabel('Customer’s name').fill('Morgan Counterfield');
      await form.getByLabel('E-mail (optional)').fill(email);
      await form.getByLabel(/agrees to reminder e-mails/).check();
      await form.getByRole('button', { name: 'Save for the new customer' }).tap();
      const open = page.getByRole('link', { name: 'Open the lamp and its readings' });
      await open.waitFor();
      await screenshot(page, 'counter-phone-saved');

      // The slip goes to them; the owner's mail viewer shows it as it left, with the verdict and the link.
      await page.getByRole('button', { name: 'E-mail the test slip' }).tap();
      await page.getByText(`The slip is on its way to ${email}.`).waitFor();
      const customerHref = await page.getByRole('link', { name: 'the customer' }).getAttribute('href');
      const lampHref = await open.getAttribute('href');
      const slip = await slipInMailViewer(email);
      expect(slip).toMatch(/Verdict: /);
      expect(slip).toMatch(/vet/);
      const unsubscribe = /https?:\/\/\S+\/api\/unsubscribe\?token=\S+/.exec(slip)?.[0];
      expect(unsubscribe, 'the slip carries the link that stops e-mails').toBeDefined();

      // Followed by the customer, signed out: e-mails stop, and the customer's page says so.
      const outside = await newContext(session.browser());
      try {
        const customerPage = await outside.newPage();
        await customerPage.goto(unsubscribe!);
        await expect
          .poll(() => customerPage.locator('main').innerText(), eventually)
          .toMatch(/E-mails stopped/);
        expect(await customerPage.locator('main').innerText()).not.toContain('Morgan');
        await screenshot(customerPage, 'counter-phone-unsubscribed');
      } finally {
        await outside.close();
      }
      await page.goto(customerHref!);
      await expect.poll(() => page.locator('main').innerText(), eventually).toMatch(/No: withdrawn on/);
      await page.goto(lampHref!);
      await page.waitForURL(/\/counter\/lamps\/\d+$/);
      const lampId = Number(/\/counter\/lamps\/(\d+)$/.exec(page.url())![1]);
      await expect.poll(() => page.locator('main').innerText()).toMatch(/Morgan Counterfield/);

      // A month later (the first reading moved back a month) the same lamp reads lower.
      await CounterReading.update(
        { takenAt: new Date(Date.now() - 31 * 86_400_000) },
        { where: { counterLampId: lampId } },
      );
      await page.getByRole('link', { name: 'Test again' }).tap();
      await page.waitForURL(/\/counter\?lamp=\d+$/);
      const again = page.getByRole('form', { name: 'Counter test' });
      await again.getByLabel('Between lamp and meter').selectOption('nothing');
      await again.getByLabel('Lamp warmed up').selectOption('yes');
      await again.getByLabel('Meter value').fill('33');
      await page.getByRole('region', { name: 'Verdict' }).locator('[data-verdict]').waitFor();
      await again.getByRole('button', { name: 'Save this reading' }).tap();
      await page.getByRole('link', { name: 'Open the lamp and its readings' }).tap();
      await page.waitForURL(/\/counter\/lamps\/\d+$/);
      const main = page.locator('main');
      await expect.poll(() => main.innerText()).toMatch(/this lamp’s own decay fit/);
      expect(await page.locator('tbody tr').count()).toBe(2);
      await screenshot(page, 'counter-phone-retest');
    },
  );
});
