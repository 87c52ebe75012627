// What the counter tests share: the shop's T5 tube from its starting catalogue, and a counter test
// recorded through the route with an invented reading.
import { expect } from 'vitest';
import * as tests from '@/app/api/counter/tests/route';
import { LampType, type User } from '@/models';
import { send } from './http';

/** A T5 tube of the organisation's starting catalogue (the first one stored). */
export const t5Of = async (organisationId: number) =>
  (await LampType.findOne({ where: { organisationId, tech: 't5' } }))!;

/** The reading a counter test here takes unless it names its own: invented example values. */
export const COUNTER_READING = { distance: 30, value: 30, unit: 'uvb', through: 'nothing', warmedUp: 'yes' };

/** `POST /api/counter/tests` as `as` for the organisation, with COUNTER_READING unless `body` has a reading. */
export const postCounterTest = (as: User | null, organisationId: number, body: Record<string, unknown>) =>
  send(tests.POST, 'POST /api/counter/tests', {
    as,
    body: { organisationId, reading: COUNTER_READING, ...body },
  });

/**
 * A counter test of a six-month-old lamp of `lampTypeId` for a new customer, made by `as` and stored
 * (the test fails here otherwise); `lamp` and `customer` add to or replace the defaults.
 */
export async function testedLamp(
  as: User,
  organisationId: number,
  lampTypeId: number,
  { lamp = {}, customer = {} }: { lamp?: Record<string, unknown>; customer?: Record<string, unknown> } = {},
) {
  const r = await postCounterTest(as, organisationId, {
    lamp: { lampTypeId, ageMonths: 6, hoursPerDay: 12, ...lamp },
    customer: { kind: 'new', name: 'Jules Invented', ...customer },
  });
  expect(r.status).toBe(201);
  return r.body as { lampId: number; customerId: number };
}
