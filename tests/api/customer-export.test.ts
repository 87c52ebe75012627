import { beforeEach, describe, expect, it } from 'vitest';
import * as customerRoute from '@/app/api/customers/[id]/route';
import * as exportRoute from '@/app/api/customers/[id]/export/route';
import * as slip from '@/app/api/counter/lamps/[id]/slip/route';
import { settleMail } from '@/lib/auth/mail-soon';
import { CounterLamp, CounterReading, Customer, type User } from '@/models';
import { withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call, send } from './http';
import { postCounterTest, t5Of } from './counter.helpers';

// A customer's own data on request, and what stays when the customer is deleted.
withTestDatabase();

let tubeId: number;

const world = freshWorld({ catalogue: true });

beforeEach(async () => {
  tubeId = (await t5Of(world.shop.id)).id;
});

const test = (body: Record<string, unknown>) => postCounterTest(world.staff, world.shop.id, body);
const exportOf = (as: User | null, id: number) =>
  call(exportRoute.GET, { path: `/api/customers/${id}/export`, params: { id }, as });

describe('a customer’s data export', () => {
  it('holds their record, consent and e-mails, lamps, readings and verdicts; after deletion only anonymous readings stay', async () => {
    const first = await test({
      lamp: { lampTypeId: tubeId, ageMonths: 6, hoursPerDay: 12, label: 'Tube of the big tank' },
      customer: {
        kind: 'new',
        name: 'Sam Invented',
        email: 'sam@example.com',
        phone: '+44 1632 960000',
        reminderConsent: true,
      },
    });
    expect(first.status).toBe(201);
    const { lampId, customerId } = first.body as { lampId: number; customerId: number };
    expect((await test({ counterLampId: lampId, lamp: null })).status).toBe(201);
    await send(slip.POST, 'POST /api/counter/lamps/[id]/slip', { id: lampId, as: world.staff });
    await settleMail();

    const r = await exportOf(world.staff, customerId);
    expect(r.status).toBe(200);
    expect(r.res.headers.get('content-disposition')).toMatch(
      /^attachment; filename="customer-\d+-sam-invented\.json"$/i,
    );
    const data = JSON.parse(r.text);
    expect(data.shop).toBe(world.shop.name);
    expect(data.customer).toMatchObject({
      id: customerId,
      name: 'Sam Invented',
      email: 'sam@example.com',
      phone: '+44 1632 960000',
    });
    expect(data.consent.reminderEmails).toBe(true);
    expect(Date.parse(data.consent.givenAt)).not.toBeNaN();
    expect(data.consent.emailsSent).toEqual([
      expect.objectContaining({ kind: 'test slip', to: 'sam@example.com' }),
    ]);
    expect(data.lamps).toHaveLength(1);
    expect(data.lamps[0]).toMatchObject({ id: lampId, label: 'Tube of the big tank' });
    expect(data.lamps[0].readings).toHaveLength(2);
    for (const reading of data.lamps[0].readings) {
      expect(reading).toMatchObject({ value: 30, unit: 'uvb', distanceCm: 30 });
      expect(['keep', 'test-again', 'replace', 'no-verdict']).toContain(reading.verdict);
    }

    // Deleted on their request: the person is gone (no export any more), the readings stay, nameless.
    const del = await send(customerRoute.DELETE, 'DELETE /api/customers/[id]', {
      id: customerId,
      as: world.staff,
    });
    expect(del.status).toBeLessThan(300);
    expect(await Customer.findByPk(customerId)).toBeNull();
    expect((await exportOf(world.staff, customerId)).status).toBe(404);
    const lamp = (await CounterLamp.findByPk(lampId))!;
    expect([lamp.customerId, lamp.label]).toEqual([null, null]);
    expect(await CounterReading.count({ where: { counterLampId: lampId } })).toBe(2);
  });

  it('is the shop’s owners’ and staff’s only: keepers, another organisation and nobody get nothing', async () => {
    const made = await test({
      lamp: { lampTypeId: tubeId, ageMonths: 6, hoursPerDay: 12 },
      customer: { kind: 'new', name: 'Pat Invented' },
    });
    const { customerId } = made.body as { customerId: number };
    for (const who of [world.keeper, world.outsider]) {
      const r = await exportOf(who, customerId);
      expect(r.status).toBe(404);
      expect(r.text).not.toContain('Pat Invented');
    }
    expect((await exportOf(null, customerId)).status).toBe(401);
  });
});
