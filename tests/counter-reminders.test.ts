import { beforeEach, describe, expect, it } from 'vitest';
import * as unsubscribe from '@/app/api/unsubscribe/route';
import { REMIND_DAYS_BEFORE, runCounterReminders, STALE_AFTER_DAYS } from '@/lib/counter/reminders';
import { updateCustomer } from '@/lib/customers/mutations';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import type { Mail } from '@/lib/mail';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { CounterLamp, CounterReading, Customer, LampType, MailMessage, type Organisation } from '@/models';
import { call } from './api/http';
import { createOrganisation, withTestDatabase } from './helpers/db';

// The re-test reminders to the shop's customers against the real test database; delivery is captured
// (the outbox's own delivery is tested with the fake SMTP server in reminders.test.ts).
withTestDatabase();

let shop: Organisation;
let tubeId: number;
const today = todayIso();

beforeEach(async () => {
  shop = await createOrganisation('Counter reminder shop');
  await seedStartingCatalogue(shop.id);
  tubeId = (await LampType.findOne({ where: { organisationId: shop.id, tech: 't5' } }))!.id;
});

async function customerWithLamp(o: { consent: boolean; testAgainOn: string | null; email?: string }) {
  const customer = await Customer.create({
    organisationId: shop.id,
    name: 'Robin Invented',
    email: o.email ?? 'robin@example.com',
    reminderConsentAt: o.consent ? new Date() : null,
    createdById: null,
  });
  const lamp = await lampOf(customer);
  await reading(lamp, -30, o.testAgainOn);
  return { customer, lamp };
}

const lampOf = (customer: Customer) =>
  CounterLamp.create({
    organisationId: shop.id,
    customerId: customer.id,
    lampTypeId: tubeId,
    firstUsedOn: addDays(today, -200),
    hoursPerDay: 12,
    createdById: null,
  });

const reading = (lamp: CounterLamp, daysAgo: number, testAgainOn: string | null) =>
  CounterReading.create({
    counterLampId: lamp.id,
    takenAt: new Date(`${addDays(today, daysAgo)}T12:00:00Z`),
    distanceCm: 30,
    value: 30,
    unit: 'uvb',
    verdict: testAgainOn ? 'test-again' : 'replace',
    testAgainOn,
    takenById: null,
  });

async function run() {
  const sent: Mail[] = [];
  const r = await runCounterReminders({ today, send: async (m) => void sent.push(m) });
  expect(r?.outcome).toBe('succeeded');
  return sent.filter((m) => m.tag?.kind === 'counter-reminder');
}

describe('re-test reminders to customers', () => {
  it('writes to nobody who has not agreed to e-mails', async () => {
    await customerWithLamp({ consent: false, testAgainOn: addDays(today, 2) });
    expect(await run()).toEqual([]);
    expect(await MailMessage.count()).toBe(0);
  });

  it('sends one reminder with the date and the link that stops them, and only once however often it runs', async () => {
    const due = addDays(today, 3);
    await customerWithLamp({ consent: true, testAgainOn: due });
    const first = await run();
    expect(first).toHaveLength(1);
    expect(first[0]!.to).toBe('robin@example.com');
    expect(first[0]!.text).toContain(`test it again by ${due}`);
    expect(first[0]!.text).toMatch(/\/api\/unsubscribe\?token=\d+\.[A-Za-z0-9_-]{43}/);
    expect(first[0]!.text).toMatch(/vet/);
    expect(first[0]!.tag).toEqual({ kind: 'counter-reminder', organisationId: shop.id });
    expect(await run()).toEqual([]);
    expect(await MailMessage.count({ where: { kind: 'counter-reminder' } })).toBe(1);
  });

  it('waits until the date is near, and forgets a date long past', async () => {
    await customerWithLamp({ consent: true, testAgainOn: addDays(today, REMIND_DAYS_BEFORE + 1) });
    await customerWithLamp({
      consent: true,
      testAgainOn: addDays(today, -STALE_AFTER_DAYS - 1),
      email: 'late@example.com',
    });
    await customerWithLamp({ consent: true, testAgainOn: null, email: 'replace@example.com' });
    expect(await run()).toEqual([]);
  });

  it('sends nothing after the unsubscribe link, nor what was queued before it was followed', async () => {
    const { customer } = await customerWithLamp({ consent: true, testAgainOn: addDays(today, 1) });
    const token = /token=(\S+)/.exec((await run())[0]!.text)![1]!;
    // A second lamp of theirs falls due, is queued, and the customer unsubscribes before it goes out.
    const lamp2 = await lampOf(customer);
    await reading(lamp2, -20, addDays(today, 2));
    const queued = await MailMessage.create({
      kind: 'counter-reminder',
      toEmail: 'robin@example.com',
      toUserId: null,
      organisationId: shop.id,
      subject: 'queued before the link was followed',
      body: 'queued before the link was followed',
      dedupeKey: `counter-reminder:lamp:${lamp2.id}:due:${addDays(today, 2)}`,
    });
    const opened = await call(unsubscribe.GET, { path: `/api/unsubscribe?token=${token}`, as: null });
    expect(opened.status).toBe(303);
    expect(await run()).toEqual([]);
    expect((await MailMessage.findByPk(queued.id))!.status).toBe('failed');
    // A third date after the withdrawal: still nothing.
    await reading(lamp2, -1, addDays(today, 5));
    expect(await run()).toEqual([]);
  });

  it('stops when the shop records the withdrawal on the customer page too', async () => {
    const { customer } = await customerWithLamp({ consent: true, testAgainOn: addDays(today, 1) });
    await updateCustomer(customer, { reminderConsent: false });
    expect(await run()).toEqual([]);
  });

  it('a retest that sets a new date earns a new reminder', async () => {
    const { lamp } = await customerWithLamp({ consent: true, testAgainOn: addDays(today, -5) });
    expect(await run()).toHaveLength(1);
    // Tested again today: the new verdict's date comes near a few days on.
    const next = addDays(today, 4);
    await reading(lamp, 0, next);
    const again = await run();
    expect(again).toHaveLength(1);
    expect(again[0]!.text).toContain(`test it again by ${next}`);
    expect(await MailMessage.count({ where: { kind: 'counter-reminder' } })).toBe(2);
  });
});
