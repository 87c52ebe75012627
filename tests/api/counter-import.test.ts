import { beforeEach, describe, expect, it } from 'vitest';
import * as importRoute from '@/app/api/counter/import/route';
import { CounterLamp, CounterReading, Customer, LampType, type User } from '@/models';
import { withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call } from './http';
import { t5Of } from './counter.helpers';

// The import of past counter tests against the real test database.
withTestDatabase();

let tube: LampType;

const world = freshWorld({ catalogue: true });

beforeEach(async () => {
  tube = await t5Of(world.shop.id);
});

const send = (as: User | null, csv: string, commit: boolean, organisationId = world.shop.id) =>
  call(importRoute.POST, {
    method: 'POST',
    path: '/api/counter/import',
    as,
    body: { organisationId, csv, commit, tzOffsetMinutes: 0 },
  });

const HEADER = 'customer,lamp_type,first_use,date,distance,distance_unit,value,unit,meter';

describe('import of past counter tests', () => {
  it('previews without saving, then imports every row: customers found or added, one lamp per customer, type and first use, each with its verdict', async () => {
    const known = await Customer.create({
      organisationId: world.shop.id,
      name: 'Kim Invented',
      createdById: null,
    });
    const csv = [
      HEADER,
      `kim invented,"${tube.name}",2025-01-10,2025-03-01,30,cm,60,uvb,broadband`,
      `Kim Invented,"${tube.name}",2025-01-10,2025-09-01,30,cm,35,uvb,broadband`,
      `Lou Newcomer,${tube.id},2025-02-01,2025-05-01,12,in,50,uvb,`,
      `,"${tube.name}",2025-02-01,2025-05-02,30,cm,20,uvb,`,
    ].join('\n');
    const preview = await send(world.staff, csv, false);
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ ok: true, total: 4, newCustomers: ['Lou Newcomer'] });
    expect(await CounterReading.count()).toBe(0);

    const r = await send(world.staff, csv, true);
    expect(r.status).toBe(201);
    expect(r.body).toEqual({ imported: 4, customersAdded: 1, lampsAdded: 3 });
    const kimLamps = await CounterLamp.findAll({ where: { customerId: known.id } });
    expect(kimLamps).toHaveLength(1);
    const kimReadings = await CounterReading.findAll({
      where: { counterLampId: kimLamps[0]!.id },
      order: [['takenAt', 'ASC']],
    });
    expect(kimReadings.map((x) => x.value)).toEqual([60, 35]);
    for (const x of kimReadings) expect(['keep', 'test-again', 'replace', 'no-verdict']).toContain(x.verdict);
    const lou = (await Customer.findOne({ where: { organisationId: world.shop.id, name: 'Lou Newcomer' } }))!;
    expect(lou.reminderConsentAt).toBeNull();
    const louLamp = (await CounterLamp.findOne({ where: { customerId: lou.id } }))!;
    expect((await CounterReading.findOne({ where: { counterLampId: louLamp.id } }))!.distanceCm).toBe(30.5);
    expect(await CounterLamp.count({ where: { organisationId: world.shop.id, customerId: null } })).toBe(1);

    // The same lamp tested again later (a second file) gets the new reading, not a second lamp.
    const later = [HEADER, `Kim Invented,"${tube.name}",2025-01-10,2025-11-01,30,cm,30,uvb,`].join('\n');
    expect((await send(world.staff, later, true)).body).toEqual({
      imported: 1,
      customersAdded: 0,
      lampsAdded: 0,
    });
    expect(await CounterReading.count({ where: { counterLampId: kimLamps[0]!.id } })).toBe(3);
  });

  it('imports nothing when any line is wrong, and names each line and column', async () => {
    const csv = [
      HEADER,
      `Kim Invented,"${tube.name}",2025-01-10,2025-03-01,30,cm,60,uvb,`,
      `Kim Invented,No such lamp,2025-01-10,2025-03-01,30,cm,60,uvb,`,
      `Kim Invented,"${tube.name}",2025-01-10,2025-03-01,30,cm,sixty,uvb,`,
    ].join('\n');
    const r = await send(world.staff, csv, true);
    expect(r.status).toBe(400);
    expect(r.body.error.field).toBe('rows[3].lamp_type');
    expect(r.body.error.issues.map((i: { field: string }) => i.field)).toEqual([
      'rows[3].lamp_type',
      'rows[4].value',
    ]);
    expect(r.body.error.message).toMatch(/^Nothing was imported: 2 rows have a problem\. Row 3: /);
    expect(await Customer.count()).toBe(0);
    expect(await CounterReading.count()).toBe(0);
  });

  it('keepers, another organisation and nobody can neither preview nor import', async () => {
    const csv = [HEADER, `Kim Invented,"${tube.name}",2025-01-10,2025-03-01,30,cm,60,uvb,`].join('\n');
    for (const who of [world.keeper, world.outsider]) {
      expect((await send(who, csv, false)).status).toBe(404);
      expect((await send(who, csv, true)).status).toBe(404);
    }
    expect((await send(null, csv, true)).status).toBe(401);
    expect(await CounterReading.count()).toBe(0);
  });
});
