import type { BrowserContext, Locator, Page } from 'playwright-core';
import { afterEach, describe, expect, it } from 'vitest';
import { DEMO_SHOP } from '@/lib/demo/scenario';
import { Op } from 'sequelize';
import { CounterLamp, Customer, Enclosure, Lamp, Membership, Organisation, Reading, User } from '@/models';
import { newContext, screenshot, signInAsDemo, withBrowser } from './harness';
import { JOURNEY_MS, eventually } from './journey-helpers';

// A customer who became a keeper of the shop, on a phone (390 × 844, touch): staff link the customer to
// the keeper account on the customer page, see the keeper's enclosure lamps listed there, test one of them
// at the counter (the reading goes to that lamp in the lamp log, no counter copy is made), and unlink,
// which keeps every lamp and reading. The example keeper with the 'Tall mesh cage' is used, since no
// other journey counts that enclosure's readings; what the test adds is removed afterwards.
const session = withBrowser();
const PHONE = { width: 390, height: 844 };
const KEEPER_EMAIL = 'dev.okafor-hale@example.com';
let context: BrowserContext | undefined;
const cleanup: (() => Promise<unknown>)[] = [];

afterEach(async () => {
  await context?.close();
  context = undefined;
  for (const undo of cleanup.splice(0).reverse()) await undo();
});

/**
 * Fills the counter form for the keeper's own Top tube (whose lamp type the form does not ask for again)
 * with a reading of `value`, and adds it to the keeper's lamp log.
 */
async function addReadingToTopTube(page: Page, form: Locator, value: string) {
  expect(await form.getByLabel('Lamp type').count()).toBe(0);
  await form.getByLabel('Between lamp and meter').selectOption('nothing');
  await form.getByLabel('Lamp warmed up').selectOption('yes');
  await form.getByLabel('Meter value').fill(value);
  await page.getByRole('region', { name: 'Verdict' }).locator('[data-verdict]').waitFor();
  await form.getByRole('button', { name: 'Add this reading to the lamp log' }).tap();
  await page.getByText('The reading was added to Top tube in the lamp log.').waitFor();
}

describe('a customer linked to their keeper account, on a phone', () => {
  it(
    'lists the keeper’s lamps, adds a counter reading to one without copying it, and unlinks',
    { timeout: JOURNEY_MS },
    async () => {
      const shop = (await Organisation.findOne({ where: { name: DEMO_SHOP.name } }))!;
      const keeper = (await User.findOne({ where: { email: KEEPER_EMAIL } }))!;
      expect(
        await Membership.count({ where: { organisationId: shop.id, userId: keeper.id, role: 'keeper' } }),
      ).toBe(1);
      const enclosure = (await Enclosure.findOne({
        where: { organisationId: shop.id, name: 'Tall mesh cage' },
      }))!;
      const lamp = (await Lamp.findOne({ where: { enclosureId: enclosure.id, label: 'Top tube' } }))!;
      expect(enclosure.keeperId).toBe(keeper.id);
      const readingsBefore = await Reading.count({ where: { lampId: lamp.id } });
      // Counted for this customer and this enclosure alone: other journeys run beside this one.
      const lampsBefore = await Lamp.count({ where: { enclosureId: enclosure.id } });
      const started = new Date();
      cleanup.push(() => Reading.destroy({ where: { lampId: lamp.id, createdAt: { [Op.gte]: started } } }));

      context = await newContext(session.browser(), { viewport: PHONE, hasTouch: true });
      const page = await signInAsDemo(await context.newPage(), 'staff', { timeoutMs: 60_000 });

      // The customer is added through the form, as the shop would.
      await page.goto('/customers/new');
      const newCustomer = page.getByRole('form', { name: 'New customer' });
      await newCustomer.getByLabel('Name').fill('Dev at the counter (example)');
      await newCustomer.getByRole('button', { name: 'Add customer' }).tap();
      await page.waitForURL(/\/customers\/\d+$/);
      const customer = (await Customer.findByPk(Number(/\/customers\/(\d+)$/.exec(page.url())![1])))!;
      expect(customer.name).toBe('Dev at the counter (example)');
      cleanup.push(() => customer.destroy());

      const panel = page.getByRole('region', { name: 'Keeper account' });
      await panel.getByLabel('Their keeper account').selectOption(String(keeper.id));
      await panel.getByRole('button', { name: 'Link' }).tap();
      const lamps = page.getByRole('list', { name: 'Lamps in the keeper’s enclosures' });
      await expect
        .poll(() => lamps.innerText().catch(() => ''), eventually)
        .toMatch(new RegExp(`Top tube[\\s\\S]*${readingsBefore} readings in the lamp log`));
      expect(await panel.innerText()).toMatch(/Linked to Dev Okafor-Hale/);
      await screenshot(page, 'counter-keeper-linked');

      // Tested at the counter: the lamp log's own lamp, so no type or age is asked.
      await lamps
        .locator('li')
        .filter({ hasText: 'Top tube' })
        .getByRole('link', { name: 'Test at the counter' })
        .tap();
      await page.waitForURL(/\/counter\?enclosureLamp=\d+$/);
      const form = page.getByRole('form', { name: 'Counter test' });
      await expect
        .poll(() => form.innerText())
        .toMatch(/Testing Top tube in Tall mesh cage of Dev at the counter/);
      await addReadingToTopTube(page, form, '98');
      await screenshot(page, 'counter-keeper-saved');
      expect(await Reading.count({ where: { lampId: lamp.id } })).toBe(readingsBefore + 1);
      expect(await CounterLamp.count({ where: { customerId: customer.id } })).toBe(0);
      expect(await Lamp.count({ where: { enclosureId: enclosure.id } })).toBe(lampsBefore);

      // Found by name at the counter instead: the keeper's lamps are offered as "Which lamp?".
      await page.goto('/counter');
      const counter = page.getByRole('form', { name: 'Counter test' });
      await counter.getByRole('radio', { name: 'Find customer' }).tap();
      await counter.getByLabel('Search customers').fill('Dev at the counter');
      await counter.getByRole('button', { name: /Dev at the counter \(example\)/ }).tap();
      await counter.getByRole('radio', { name: 'Top tube · Tall mesh cage' }).tap();
      await addReadingToTopTube(page, counter, '97');
      expect(await Reading.count({ where: { lampId: lamp.id } })).toBe(readingsBefore + 2);
      expect(await CounterLamp.count({ where: { customerId: customer.id } })).toBe(0);

      // Unlinking keeps the reading in the lamp log; the keeper's lamps leave the customer page.
      await page.goto(`/customers/${customer.id}`);
      await expect
        .poll(() => lamps.innerText().catch(() => ''), eventually)
        .toMatch(new RegExp(`${readingsBefore + 2} readings in the lamp log`));
      await panel.getByRole('button', { name: 'Unlink the keeper account' }).tap();
      await panel.getByLabel('Their keeper account').waitFor();
      expect(await lamps.count()).toBe(0);
      expect(await Reading.count({ where: { lampId: lamp.id } })).toBe(readingsBefore + 2);
      expect((await customer.reload()).keeperUserId).toBeNull();
    },
  );
});
