import { describe, expect, it } from 'vitest';
import * as collection from '@/app/api/customers/route';
import * as item from '@/app/api/customers/[id]/route';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { CounterLamp, CounterReading, Customer, LampType, type User } from '@/models';
import { withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call, expectNoInternals } from './http';

withTestDatabase();

const world = freshWorld();

const list = (as: User | null, organisationId: number, extra = '') =>
  call(collection.GET, { path: `/api/customers?organisationId=${organisationId}${extra}`, as });
const add = (as: User | null, body: unknown) =>
  call(collection.POST, { method: 'POST', path: '/api/customers', as, body });
const get = (as: User | null, id: number) =>
  call(item.GET, { path: `/api/customers/${id}`, params: { id }, as });
const patch = (as: User | null, id: number, body: unknown) =>
  call(item.PATCH, { method: 'PATCH', path: `/api/customers/${id}`, params: { id }, as, body });
const remove = (as: User | null, id: number) =>
  call(item.DELETE, { method: 'DELETE', path: `/api/customers/${id}`, params: { id }, as });

const person = (over: Record<string, unknown> = {}) => ({
  organisationId: world.shop.id,
  name: 'Robin Example',
  email: 'robin@example.com',
  phone: '+44 1632 960000',
  notes: 'Keeps a bearded dragon.',
  reminderConsent: true,
  ...over,
});

describe('customers', () => {
  it('staff add, find, change and read a customer; consent is recorded with its date', async () => {
    const before = Date.now();
    const made = await add(world.staff, person());
    expect(made.status).toBe(201);
    const c = made.body.customer;
    expect(c).toMatchObject({ name: 'Robin Example', email: 'robin@example.com', phone: '+44 1632 960000' });
    expect(Date.parse(c.reminderConsentAt)).toBeGreaterThanOrEqual(before - 1000);
    await add(world.owner, person({ name: 'Sam Other', email: '', phone: null, reminderConsent: false }));

    const found = await list(world.staff, world.shop.id, '&q=robin');
    expect(found.status).toBe(200);
    expect(found.body.items.map((i: { name: string }) => i.name)).toEqual(['Robin Example']);
    expect((await list(world.staff, world.shop.id, '&q=1632')).body.items).toHaveLength(1);
    // A search for a LIKE wildcard means the character itself.
    expect((await list(world.staff, world.shop.id, '&q=%25')).body.items).toHaveLength(0);

    const withdrawn = await patch(world.staff, c.id, { reminderConsent: false });
    expect(withdrawn.status).toBe(200);
    expect(withdrawn.body.customer.reminderConsentAt).toBeNull();
    expect(withdrawn.body.customer.reminderConsentWithdrawnAt).not.toBeNull();

    const read = await get(world.owner, c.id);
    expect(read.status).toBe(200);
    expect(read.body.customer.name).toBe('Robin Example');
    expect(read.body.lamps).toEqual([]);
  });

  it('refuses consent without an e-mail address, naming the field', async () => {
    const r = await add(world.staff, person({ email: null }));
    expect(r.status).toBe(400);
    expect(JSON.stringify(r.body)).toContain('email');
    const c = (await add(world.staff, person())).body.customer;
    const cleared = await patch(world.staff, c.id, { email: '' });
    expect(cleared.status).toBe(400);
    expect(cleared.body.error.field).toBe('email');
    expect((await Customer.findByPk(c.id))!.email).toBe('robin@example.com');
  });

  it('refuses a malformed phone number and an empty name', async () => {
    expect((await add(world.staff, person({ phone: 'call me' }))).status).toBe(400);
    expect((await add(world.staff, person({ name: '  ' }))).status).toBe(400);
  });

  it('keepers, another organisation and nobody neither see nor change customers', async () => {
    const c = (await add(world.staff, person())).body.customer;
    for (const who of [world.keeper, world.outsider]) {
      expect((await list(who, world.shop.id)).status).toBe(404);
      expect((await get(who, c.id)).status).toBe(404);
      expect((await patch(who, c.id, { name: 'Changed' })).status).toBe(404);
      expect((await remove(who, c.id)).status).toBe(404);
      const made = await add(who, person({ name: 'Planted' }));
      expect(made.status).toBe(404);
      expectNoInternals(made);
    }
    expect((await list(null, world.shop.id)).status).toBe(401);
    expect((await get(null, c.id)).status).toBe(401);
    // The outsider sees an empty list of their own organisation, never the shop's people.
    const own = await list(world.outsider, world.otherOrg.id);
    expect(own.status).toBe(200);
    expect(own.text).not.toContain('Robin');
    const row = (await Customer.findByPk(c.id))!;
    expect(row.name).toBe('Robin Example');
    expect(await Customer.count({ where: { name: 'Planted' } })).toBe(0);
  });

  it('deleting a customer removes the person and keeps their lamps and readings, anonymous', async () => {
    await seedStartingCatalogue(world.shop.id);
    const type = (await LampType.findOne({ where: { organisationId: world.shop.id, tech: 't5' } }))!;
    const c = (await add(world.staff, person())).body.customer;
    const lamp = await CounterLamp.create({
      organisationId: world.shop.id,
      customerId: c.id,
      lampTypeId: type.id,
      label: 'Robin’s dragon tube',
      firstUsedOn: '2025-01-01',
      hoursPerDay: 12,
      createdById: world.staff.id,
    });
    await CounterReading.create({
      counterLampId: lamp.id,
      takenAt: new Date('2025-06-01T10:00:00Z'),
      distanceCm: 30,
      value: 60,
      unit: 'uvb',
      through: 'nothing',
      warmedUp: 'yes',
      verdict: 'keep',
      takenById: world.staff.id,
    });
    expect((await get(world.staff, c.id)).body.lamps).toHaveLength(1);

    expect((await remove(world.staff, c.id)).status).toBe(200);
    expect(await Customer.findByPk(c.id)).toBeNull();
    const kept = (await CounterLamp.findByPk(lamp.id))!;
    expect(kept.customerId).toBeNull();
    expect(kept.label).toBeNull();
    expect(await CounterReading.count({ where: { counterLampId: lamp.id } })).toBe(1);
    expect((await get(world.staff, c.id)).status).toBe(404);
  });
});
