import { describe, expect, it } from 'vitest';
import { CounterLamp, CounterReading, Customer } from '@/models';
import { seedDemo, seedDemoShop, withTestDatabase } from '@/tests/helpers/db';
import { DEMO_CUSTOMERS } from './counter';

withTestDatabase();

describe('demo counter', () => {
  it('adds a dozen invented customers of the example shop with their counter tests, once', async () => {
    const shop = await seedDemoShop();
    expect(shop.exampleData).toBe(true);
    expect(DEMO_CUSTOMERS).toHaveLength(12);
    expect(await Customer.count({ where: { organisationId: shop.id } })).toBe(12);
    const lamps = DEMO_CUSTOMERS.reduce((n, c) => n + c.lamps.length, 0);
    const tests = DEMO_CUSTOMERS.reduce((n, c) => n + c.lamps.reduce((m, l) => m + l.tests.length, 0), 0);
    expect(await CounterLamp.count()).toBe(lamps);
    expect(await CounterReading.count()).toBe(tests);
    // Made-up addresses only, and consent dated where given.
    for (const c of await Customer.findAll()) {
      if (c.email) expect(c.email).toMatch(/@example\.com$/);
    }
    expect(await Customer.count({ where: { reminderConsentAt: null } })).toBe(
      DEMO_CUSTOMERS.filter((c) => c.consentDaysAgo === null).length,
    );
    // The verdicts the counter computed show all three outcomes.
    const verdicts = new Set((await CounterReading.findAll()).map((r) => r.verdict));
    expect(verdicts).toEqual(new Set(['keep', 'test-again', 'replace']));

    await seedDemo();
    expect(await Customer.count()).toBe(12);
    expect(await CounterReading.count()).toBe(tests);
  });
});
