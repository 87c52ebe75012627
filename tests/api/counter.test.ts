import { beforeEach, describe, expect, it } from 'vitest';
import * as assess from '@/app/api/counter/assess/route';
import * as lampRoute from '@/app/api/counter/lamps/[id]/route';
import * as tests from '@/app/api/counter/tests/route';
import { CounterLamp, CounterReading, Customer, LampType, SpeciesSheet, type User } from '@/models';
import { withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call } from './http';
import { t5Of } from './counter.helpers';

withTestDatabase();

let tubeId: number;
let otherTubeId: number;

const world = freshWorld({ catalogue: true });

beforeEach(async () => {
  tubeId = (await t5Of(world.shop.id)).id;
  otherTubeId = (await t5Of(world.otherOrg.id)).id;
});

const reading = (value: number, over: Record<string, unknown> = {}) => ({
  distance: 30,
  value,
  unit: 'uvb',
  through: 'nothing',
  warmedUp: 'yes',
  ...over,
});
const lamp = (over: Record<string, unknown> = {}) => ({
  lampTypeId: tubeId,
  ageMonths: 6,
  hoursPerDay: 12,
  ...over,
});
const ask = (as: User | null, body: unknown) =>
  call(assess.POST, { method: 'POST', path: '/api/counter/assess', as, body });
const save = (as: User | null, body: unknown) =>
  call(tests.POST, { method: 'POST', path: '/api/counter/tests', as, body });
const view = (as: User | null, id: number) =>
  call(lampRoute.GET, { path: `/api/counter/lamps/${id}`, params: { id }, as });

describe('the counter', () => {
  it('answers a walk-in test at once, without writing anything', async () => {
    const type = (await LampType.findByPk(tubeId))!;
    const r = await ask(world.staff, {
      organisationId: world.shop.id,
      lamp: lamp(),
      reading: reading(type.uvbAt30),
    });
    expect(r.status).toBe(200);
    expect(r.body.answer.verdict.kind).toBe('keep');
    expect(r.body.answer.verdict.output.share).toBeCloseTo(1, 2);
    expect(r.body.answer.verdict.cautions.join(' ')).toMatch(/vet/);
    expect(await CounterLamp.count()).toBe(0);
  });

  it('judges against the species at home when given', async () => {
    const sheet = (await SpeciesSheet.findOne({ where: { organisationId: world.shop.id, uvZone: 3 } }))!;
    const r = await ask(world.owner, {
      organisationId: world.shop.id,
      lamp: lamp({ speciesSheetId: sheet.id, baskingDistance: 30 }),
      reading: reading(1, { unit: 'uvi' }),
    });
    expect(r.status).toBe(200);
    // UVI 1 at the basking spot is below zone 3's 2.9 (Ferguson et al. 2010).
    expect(r.body.answer.verdict.kind).toBe('replace');
    expect(r.body.answer.verdict.basking.threshold).toBe(2.9);
    expect(r.body.answer.speciesName).toBe(sheet.commonName);
  });

  it('saves a test for a new customer, then a retest adds a reading and gives the lamp its own fit', async () => {
    const first = await save(world.staff, {
      organisationId: world.shop.id,
      lamp: lamp({ ageMonths: 4 }),
      reading: reading(80),
      customer: { kind: 'new', name: 'Alex Invented', email: 'alex@example.com', reminderConsent: true },
    });
    expect(first.status).toBe(201);
    const customer = (await Customer.findByPk(first.body.customerId))!;
    expect(customer.name).toBe('Alex Invented');
    expect(customer.reminderConsentAt).not.toBeNull();
    const kept = (await CounterLamp.findByPk(first.body.lampId))!;
    expect(kept.customerId).toBe(customer.id);
    expect(kept.firstUsedEstimated).toBe(true);
    const stored = await CounterReading.findAll({ where: { counterLampId: kept.id } });
    expect(stored.map((x) => x.verdict)).toEqual([first.body.answer.verdict.kind]);

    // A month later the same lamp reads lower.
    await CounterReading.update(
      { takenAt: new Date(Date.now() - 30 * 86_400_000) },
      { where: { counterLampId: kept.id } },
    );
    const again = await save(world.staff, {
      organisationId: world.shop.id,
      counterLampId: kept.id,
      reading: reading(70),
    });
    expect(again.status).toBe(201);
    expect(again.body.lampId).toBe(kept.id);
    expect(again.body.answer.fit.kind).toBe('exponential');
    expect(await CounterReading.count({ where: { counterLampId: kept.id } })).toBe(2);
    expect(await CounterLamp.count()).toBe(1);

    const seen = await view(world.owner, kept.id);
    expect(seen.status).toBe(200);
    expect(seen.body.lamp.customer.name).toBe('Alex Invented');
    expect(seen.body.lamp.readings).toHaveLength(2);
    expect(seen.body.lamp.answer.fit.kind).toBe('exponential');
  });

  it('keeps a walk-in’s lamp without a customer', async () => {
    const r = await save(world.staff, { organisationId: world.shop.id, lamp: lamp(), reading: reading(40) });
    expect(r.status).toBe(201);
    expect(r.body.customerId).toBeNull();
    expect((await CounterLamp.findByPk(r.body.lampId))!.customerId).toBeNull();
    expect(await Customer.count()).toBe(0);
  });

  it('refuses another organisation’s lamp type, naming the field, and writes nothing', async () => {
    const r = await save(world.staff, {
      organisationId: world.shop.id,
      lamp: lamp({ lampTypeId: otherTubeId }),
      reading: reading(40),
      customer: { kind: 'new', name: 'Not Saved' },
    });
    expect(r.status).toBe(400);
    expect(r.body.error.field).toBe('lamp.lampTypeId');
    expect(await Customer.count()).toBe(0);
    expect(await CounterLamp.count()).toBe(0);
  });

  it('asks for either a date or an age, and for the screen’s share', async () => {
    const both = await ask(world.staff, {
      organisationId: world.shop.id,
      lamp: lamp({ firstUsedOn: '2025-01-01' }),
      reading: reading(40),
    });
    expect(both.status).toBe(400);
    const screen = await ask(world.staff, {
      organisationId: world.shop.id,
      lamp: lamp(),
      reading: reading(40, { through: 'screen' }),
    });
    expect(screen.status).toBe(400);
    expect(screen.body.error.field).toBe('reading.throughTransmission');
  });

  it('keepers, another organisation and nobody get nowhere', async () => {
    const kept = await save(world.staff, {
      organisationId: world.shop.id,
      lamp: lamp(),
      reading: reading(40),
    });
    const lampId = kept.body.lampId;
    for (const who of [world.keeper, world.outsider]) {
      expect(
        (await ask(who, { organisationId: world.shop.id, lamp: lamp(), reading: reading(40) })).status,
      ).toBe(404);
      expect(
        (await save(who, { organisationId: world.shop.id, lamp: lamp(), reading: reading(40) })).status,
      ).toBe(404);
      expect((await view(who, lampId)).status).toBe(404);
    }
    // The outsider, working in their own organisation, cannot add a reading to the shop's lamp.
    const planted = await save(world.outsider, {
      organisationId: world.otherOrg.id,
      counterLampId: lampId,
      reading: reading(1),
    });
    expect(planted.status).toBe(404);
    expect(
      (await ask(null, { organisationId: world.shop.id, lamp: lamp(), reading: reading(40) })).status,
    ).toBe(401);
    expect(await CounterReading.count({ where: { counterLampId: lampId } })).toBe(1);
  });
});
