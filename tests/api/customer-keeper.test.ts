import { beforeEach, describe, expect, it } from 'vitest';
import * as assess from '@/app/api/counter/assess/route';
import * as tests from '@/app/api/counter/tests/route';
import * as customerRoute from '@/app/api/customers/[id]/route';
import * as keeperRoute from '@/app/api/customers/[id]/keeper/route';
import {
  CounterLamp,
  CounterReading,
  Customer,
  Lamp,
  LampType,
  Membership,
  Reading,
  type Enclosure,
  type User,
} from '@/models';
import { addMember, createEnclosure, createUser, withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call, send } from './http';
import { t5Of } from './counter.helpers';

withTestDatabase();

let otherKeeper: User;
let customer: Customer;
let enclosure: Enclosure;
let enclosureLamp: Lamp;
let tubeId: number;

const world = freshWorld({ catalogue: true });

beforeEach(async () => {
  otherKeeper = (await createUser()).user;
  await addMember(world.shop, otherKeeper, 'keeper');
  tubeId = (await t5Of(world.shop.id)).id;
  customer = await Customer.create({
    organisationId: world.shop.id,
    name: 'Robin Invented',
    createdById: world.staff.id,
  });
  enclosure = await createEnclosure(world.shop, world.keeper, { name: 'Robin’s vivarium' });
  enclosureLamp = await Lamp.create({
    enclosureId: enclosure.id,
    lampTypeId: tubeId,
    label: 'Basking tube',
    firstUsedOn: '2025-01-10',
    hoursPerDay: 12,
    createdById: world.keeper.id,
  });
});

const link = (as: User | null, id: number, keeperId: number) =>
  send(keeperRoute.PUT, 'PUT /api/customers/[id]/keeper', { id, as, body: { keeperId } });
const unlink = (as: User | null, id: number) =>
  call(keeperRoute.DELETE, { method: 'DELETE', path: `/api/customers/${id}/keeper`, params: { id }, as });
const show = (as: User | null, id: number) =>
  call(customerRoute.GET, { path: `/api/customers/${id}`, params: { id }, as });
const reading = (value: number) => ({
  distance: 30,
  value,
  unit: 'uvb',
  through: 'nothing',
  warmedUp: 'yes',
});
const save = (as: User | null, body: unknown) =>
  call(tests.POST, { method: 'POST', path: '/api/counter/tests', as, body });
const ask = (as: User | null, body: unknown) =>
  call(assess.POST, { method: 'POST', path: '/api/counter/assess', as, body });

describe('linking a customer to a keeper account', () => {
  it('lists the keeper’s enclosure lamps beside the counter lamps, as references', async () => {
    const r = await link(world.staff, customer.id, world.keeper.id);
    expect(r.status).toBe(200);
    expect(r.body.customer.keeperUserId).toBe(world.keeper.id);
    const seen = await show(world.owner, customer.id);
    expect(seen.body.keeper.id).toBe(world.keeper.id);
    expect(seen.body.keeper.isKeeper).toBe(true);
    expect(seen.body.keeper.lamps).toEqual([
      expect.objectContaining({
        id: enclosureLamp.id,
        label: 'Basking tube',
        enclosureId: enclosure.id,
        enclosureName: 'Robin’s vivarium',
        readings: 0,
      }),
    ]);
    // Nothing was copied: still one lamp in the lamp log and none at the counter.
    expect(await Lamp.count()).toBe(1);
    expect(await CounterLamp.count()).toBe(0);
  });

  it('refuses a member who is not a keeper and a keeper already linked, naming the field', async () => {
    const notKeeper = await link(world.owner, customer.id, world.staff.id);
    expect(notKeeper.status).toBe(400);
    expect(notKeeper.body.error.field).toBe('keeperId');
    const foreign = await link(world.owner, customer.id, world.outsider.id);
    expect(foreign.status).toBe(400);
    expect(foreign.body.error.field).toBe('keeperId');

    expect((await link(world.owner, customer.id, world.keeper.id)).status).toBe(200);
    const second = await Customer.create({
      organisationId: world.shop.id,
      name: 'Sam Invented',
      createdById: world.staff.id,
    });
    const twice = await link(world.owner, second.id, world.keeper.id);
    expect(twice.status).toBe(409);
    expect(twice.body.error.code).toBe('keeper_linked');
    expect(twice.body.error.message).toMatch(/Robin Invented/);
    expect((await second.reload()).keeperUserId).toBeNull();
  });

  it('is for owners and staff alone: nobody, another organisation and a keeper are refused', async () => {
    for (const who of [null, world.outsider, world.keeper, otherKeeper]) {
      const r = await link(who, customer.id, world.keeper.id);
      expect([401, 403, 404]).toContain(r.status);
      expect(r.text).not.toMatch(/Robin/);
    }
    expect((await customer.reload()).keeperUserId).toBeNull();
    await link(world.staff, customer.id, world.keeper.id);
    for (const who of [null, world.outsider, world.keeper, otherKeeper]) {
      const r = await unlink(who, customer.id);
      expect([401, 403, 404]).toContain(r.status);
      // The linked keeper sees no customer record either.
      expect((await show(who, customer.id)).status).toBeGreaterThanOrEqual(401);
    }
    expect((await customer.reload()).keeperUserId).toBe(world.keeper.id);
  });

  it('adds a counter test of the keeper’s lamp to that lamp instead of making a counter copy', async () => {
    await link(world.staff, customer.id, world.keeper.id);
    const type = (await LampType.findByPk(tubeId))!;
    const body = {
      organisationId: world.shop.id,
      enclosureLampId: enclosureLamp.id,
      reading: reading(type.uvbAt30 * 0.7),
      customer: { kind: 'existing', id: customer.id },
    };
    const answer = await ask(world.staff, { ...body, customer: undefined });
    expect(answer.status).toBe(200);
    expect(answer.body.answer.lampTypeName).toBe(type.name);
    expect(answer.body.answer.firstUsedOn).toBe('2025-01-10');

    const r = await save(world.staff, body);
    expect(r.status).toBe(201);
    expect(r.body.lampId).toBeNull();
    expect(r.body.enclosureLamp).toEqual({
      id: enclosureLamp.id,
      enclosureId: enclosure.id,
      label: 'Basking tube',
    });
    expect(r.body.customerId).toBe(customer.id);
    expect(await CounterLamp.count()).toBe(0);
    expect(await CounterReading.count()).toBe(0);
    const stored = await Reading.findAll({ where: { lampId: enclosureLamp.id } });
    expect(stored).toHaveLength(1);
    expect(stored[0]!.value).toBeCloseTo(type.uvbAt30 * 0.7, 6);
    expect(stored[0]!.takenById).toBe(world.staff.id);
    expect(stored[0]!.note).toMatch(/counter/);
    expect((await show(world.staff, customer.id)).body.keeper.lamps[0].readings).toBe(1);
  });

  it('offers no lamp of a keeper who is not linked, nor one sent with another lamp', async () => {
    const base = { organisationId: world.shop.id, enclosureLampId: enclosureLamp.id, reading: reading(40) };
    const unlinked = await save(world.staff, base);
    expect(unlinked.status).toBe(400);
    expect(unlinked.body.error.field).toBe('enclosureLampId');

    await link(world.staff, customer.id, world.keeper.id);
    const neighbour = await createEnclosure(world.shop, otherKeeper);
    const notTheirs = await Lamp.create({
      enclosureId: neighbour.id,
      lampTypeId: tubeId,
      label: 'Neighbour tube',
      firstUsedOn: '2025-01-10',
      hoursPerDay: 12,
      createdById: otherKeeper.id,
    });
    const other = await save(world.staff, { ...base, enclosureLampId: notTheirs.id });
    expect(other.status).toBe(400);
    expect(other.body.error.field).toBe('enclosureLampId');

    const both = await save(world.staff, {
      ...base,
      lamp: { lampTypeId: tubeId, ageMonths: 3, hoursPerDay: 12 },
    });
    expect(both.status).toBe(400);
    expect(both.body.error.field).toBe('enclosureLampId');

    const wrongCustomer = await Customer.create({
      organisationId: world.shop.id,
      name: 'Sam',
      createdById: world.staff.id,
    });
    const mismatch = await save(world.staff, {
      ...base,
      customer: { kind: 'existing', id: wrongCustomer.id },
    });
    expect(mismatch.status).toBe(400);
    expect(mismatch.body.error.field).toBe('customer.id');

    // A keeper never reaches the counter, even for their own lamp.
    expect((await save(world.keeper, base)).status).toBe(404);
    expect(await Reading.count()).toBe(0);
    expect(await CounterLamp.count()).toBe(0);
  });

  it('unlinking keeps every lamp and reading, counter and enclosure alike', async () => {
    await link(world.staff, customer.id, world.keeper.id);
    const counterLamp = await CounterLamp.create({
      organisationId: world.shop.id,
      customerId: customer.id,
      lampTypeId: tubeId,
      firstUsedOn: '2025-02-01',
      hoursPerDay: 12,
      createdById: world.staff.id,
    });
    await save(world.staff, {
      organisationId: world.shop.id,
      counterLampId: counterLamp.id,
      reading: reading(50),
    });
    await save(world.staff, {
      organisationId: world.shop.id,
      enclosureLampId: enclosureLamp.id,
      reading: reading(60),
      customer: { kind: 'existing', id: customer.id },
    });
    const r = await unlink(world.owner, customer.id);
    expect(r.status).toBe(200);
    expect(r.body.customer.keeperUserId).toBeNull();
    expect((await customer.reload()).keeperUserId).toBeNull();
    expect(await CounterLamp.count({ where: { customerId: customer.id } })).toBe(1);
    expect(await CounterReading.count({ where: { counterLampId: counterLamp.id } })).toBe(1);
    expect(await Reading.count({ where: { lampId: enclosureLamp.id } })).toBe(1);
    expect(await Lamp.count()).toBe(1);
    const seen = await show(world.staff, customer.id);
    expect(seen.body.keeper).toBeNull();
    expect(seen.body.lamps).toHaveLength(1);
  });

  it('keeps a link whose keeper left the organisation, without listing their lamps', async () => {
    await link(world.staff, customer.id, world.keeper.id);
    await Membership.update(
      { role: 'staff' },
      { where: { organisationId: world.shop.id, userId: world.keeper.id } },
    );
    const seen = await show(world.staff, customer.id);
    expect(seen.body.keeper.isKeeper).toBe(false);
    expect(seen.body.keeper.lamps).toEqual([]);
  });
});
