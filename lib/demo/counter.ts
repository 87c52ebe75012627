import 'server-only';
import type { Transaction } from 'sequelize';
import { assessCounterLamp } from '@/lib/counter/assess';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { lampFacts, needOfSheet, readingFacts } from '@/lib/lamp-log/facts';
import { toDto as lampTypeDto } from '@/lib/lamp-types/queries';
import { CounterLamp, CounterReading, Customer, LampType, Organisation, SpeciesSheet } from '@/models';
import { DEMO_SHOP } from './scenario';

/**
 * Invented customers of the demo shop and the lamps it tested for them at the counter over the last months,
 * so the customer list, the counter's lamp pages and its figures have something to show on first start.
 * The high-output T5 tubes are tested often enough (seven lamps, over a year of lamp age) that the lamp
 * type's page shows the shop's own measured curve. Every name,
 * address and reading here is invented example data (the shop is marked as such). Each verdict is the one
 * the counter computes for the readings up to that day. Seeded only while the shop has no customers.
 */

type DemoTest = { daysAgo: number; value: number; unit?: 'uvb' | 'uvi'; distanceCm?: number };
type DemoCounterLamp = {
  presetKey: string;
  label: string;
  startedDaysAgo: number;
  hoursPerDay: number;
  /** The species sheet's starting key and basking distance at home, when the customer gave them. */
  home?: { seedKeyLike: string; distanceCm: number };
  tests: DemoTest[];
};
type DemoCustomer = {
  name: string;
  email: string | null;
  phone: string | null;
  consentDaysAgo: number | null;
  lamps: DemoCounterLamp[];
};

const T = (daysAgo: number, value: number, unit: 'uvb' | 'uvi' = 'uvb'): DemoTest => ({
  daysAgo,
  value,
  unit,
});

export const DEMO_CUSTOMERS: readonly DemoCustomer[] = [
  {
    name: 'Wren Tallowmere',
    email: 'wren.tallowmere@example.com',
    phone: '+44 1632 960101',
    consentDaysAgo: 150,
    lamps: [
      {
        presetKey: 't5-high',
        label: 'Dragon tube',
        startedDaysAgo: 300,
        hoursPerDay: 12,
        home: { seedKeyLike: 'pogona', distanceCm: 30 },
        tests: [T(150, 34), T(90, 30), T(20, 26)],
      },
    ],
  },
  {
    name: 'Osric Fenwhistle',
    email: 'osric.fenwhistle@example.com',
    phone: null,
    consentDaysAgo: 120,
    lamps: [
      {
        presetKey: 't5-medium',
        label: 'Gecko tube',
        startedDaysAgo: 200,
        hoursPerDay: 12,
        tests: [T(120, 21), T(40, 18)],
      },
      {
        presetKey: 't5-high',
        label: 'Spare basking tube',
        startedDaysAgo: 400,
        hoursPerDay: 12,
        tests: [T(300, 35), T(180, 28), T(60, 22)],
      },
    ],
  },
  {
    name: 'Imelda Quarrington',
    email: null,
    phone: '+44 1632 960102',
    consentDaysAgo: null,
    lamps: [
      { presetKey: 't8-medium', label: 'Old T8', startedDaysAgo: 420, hoursPerDay: 12, tests: [T(60, 9)] },
    ],
  },
  {
    name: 'Bastian Ollerby',
    email: 'bastian.ollerby@example.com',
    phone: null,
    consentDaysAgo: 100,
    lamps: [
      {
        presetKey: 'mercury-vapour-160',
        label: 'Tortoise table lamp',
        startedDaysAgo: 240,
        hoursPerDay: 10,
        tests: [T(100, 170), T(30, 150)],
      },
    ],
  },
  {
    name: 'Perpetua Mossgrove',
    email: 'perpetua.mossgrove@example.com',
    phone: '+44 1632 960103',
    consentDaysAgo: null,
    lamps: [
      { presetKey: 't5-high', label: 'Spare tube', startedDaysAgo: 60, hoursPerDay: 12, tests: [T(10, 40)] },
    ],
  },
  {
    name: 'Caspian Thistlewood',
    email: 'caspian.thistlewood@example.com',
    phone: null,
    consentDaysAgo: 80,
    lamps: [
      {
        presetKey: 't5-very-high',
        label: 'Uromastyx tube',
        home: { seedKeyLike: 'uromastyx', distanceCm: 30 },
        startedDaysAgo: 380,
        hoursPerDay: 13,
        tests: [T(80, 40), T(25, 33)],
      },
      { presetKey: 'led-uvb', label: 'Side spot', startedDaysAgo: 150, hoursPerDay: 12, tests: [T(25, 52)] },
    ],
  },
  {
    name: 'Marigold Ashcombe',
    email: null,
    phone: null,
    consentDaysAgo: null,
    lamps: [
      { presetKey: 't5-low', label: 'Frog tube', startedDaysAgo: 180, hoursPerDay: 11, tests: [T(45, 4.4)] },
      {
        presetKey: 't5-high',
        label: 'Bearded dragon tube',
        startedDaysAgo: 260,
        hoursPerDay: 12,
        tests: [T(200, 38), T(110, 32), T(15, 26)],
      },
    ],
  },
  {
    name: 'Lysander Pebbleworth',
    email: 'lysander.pebbleworth@example.com',
    phone: '+44 1632 960104',
    consentDaysAgo: 60,
    lamps: [
      {
        presetKey: 't5-high',
        label: 'Basking tube',
        startedDaysAgo: 500,
        hoursPerDay: 12,
        tests: [T(60, 22), T(5, 17)],
      },
    ],
  },
  {
    name: 'Henrietta Sorrelby',
    email: 'henrietta.sorrelby@example.com',
    phone: null,
    consentDaysAgo: null,
    lamps: [
      {
        presetKey: 'compact',
        label: 'Compact bulb',
        startedDaysAgo: 260,
        hoursPerDay: 12,
        tests: [T(35, 9)],
      },
      {
        presetKey: 't5-high',
        label: 'Vivarium tube',
        startedDaysAgo: 350,
        hoursPerDay: 10,
        tests: [T(250, 36), T(90, 28)],
      },
    ],
  },
  {
    name: 'Theobald Crane-Whitlock',
    email: 'theo.cranewhitlock@example.com',
    phone: '+44 1632 960105',
    consentDaysAgo: 40,
    lamps: [
      {
        presetKey: 't5-medium',
        label: 'Chameleon tube',
        home: { seedKeyLike: 'chamaeleo', distanceCm: 25 },
        startedDaysAgo: 110,
        hoursPerDay: 12,
        tests: [T(40, 23), T(3, 21)],
      },
    ],
  },
  {
    name: 'Ottilie Brackenfield',
    email: null,
    phone: '+44 1632 960106',
    consentDaysAgo: null,
    lamps: [
      {
        presetKey: 'metal-halide-70',
        label: 'Monitor flood',
        startedDaysAgo: 330,
        hoursPerDay: 10,
        tests: [T(70, 760), T(12, 690)],
      },
    ],
  },
  {
    name: 'Rufus Lanternby',
    email: 'rufus.lanternby@example.com',
    phone: null,
    consentDaysAgo: 20,
    lamps: [
      {
        presetKey: 't5-high',
        label: 'New tube, baseline',
        startedDaysAgo: 30,
        hoursPerDay: 12,
        tests: [T(20, 43)],
      },
    ],
  },
];

const METER = 'Broadband UVB meter (shop)';

export async function seedDemoCounter(transaction: Transaction): Promise<number> {
  const organisation = await Organisation.findOne({ where: { name: DEMO_SHOP.name }, transaction });
  if (!organisation) return 0;
  if ((await Customer.count({ where: { organisationId: organisation.id }, transaction })) > 0) return 0;
  const today = todayIso();
  const sheets = await SpeciesSheet.findAll({ where: { organisationId: organisation.id }, transaction });
  let lamps = 0;
  for (const demo of DEMO_CUSTOMERS) {
    const customer = await Customer.create(
      {
        organisationId: organisation.id,
        name: demo.name,
        email: demo.email,
        phone: demo.phone,
        notes: 'Invented example customer.',
        reminderConsentAt:
          demo.consentDaysAgo === null ? null : new Date(`${addDays(today, -demo.consentDaysAgo)}T11:00:00Z`),
        createdById: null,
      },
      { transaction },
    );
    for (const l of demo.lamps) {
      const type = await LampType.findOne({
        where: { organisationId: organisation.id, presetKey: l.presetKey },
        transaction,
      });
      if (!type) continue;
      const sheet = l.home
        ? sheets.find((s) => `${s.seedKey ?? ''} ${s.commonName}`.toLowerCase().includes(l.home!.seedKeyLike))
        : undefined;
      const lamp = await CounterLamp.create(
        {
          organisationId: organisation.id,
          customerId: customer.id,
          lampTypeId: type.id,
          label: l.label,
          firstUsedOn: addDays(today, -l.startedDaysAgo),
          firstUsedEstimated: true,
          hoursPerDay: l.hoursPerDay,
          speciesSheetId: sheet?.id ?? null,
          baskingDistanceCm: sheet ? l.home!.distanceCm : null,
          baskingTransmission: null,
          createdById: null,
        },
        { transaction },
      );
      lamps++;
      const facts = lampFacts({ ...lamp.get(), retiredOn: null, label: l.label }, lampTypeDto(type));
      const taken: CounterReading[] = [];
      for (const test of [...l.tests].sort((a, b) => b.daysAgo - a.daysAgo)) {
        const day = addDays(today, -test.daysAgo);
        const row = {
          counterLampId: lamp.id,
          takenAt: new Date(`${day}T10:30:00Z`),
          distanceCm: test.distanceCm ?? 30,
          value: test.value,
          unit: test.unit ?? 'uvb',
          through: 'nothing' as const,
          throughTransmission: null,
          warmedUp: 'yes' as const,
          meter: METER,
        };
        // The verdict the counter gave that day, from the readings up to then.
        const { verdict } = assessCounterLamp({
          lamp: facts,
          readings: [...taken.map(readingFacts), { ...row, id: 0 }],
          species: sheet ? needOfSheet(sheet) : null,
          today: day,
          ageEstimated: true,
        });
        taken.push(
          await CounterReading.create(
            { ...row, verdict: verdict.kind, testAgainOn: verdict.testAgainOn, takenById: null },
            { transaction },
          ),
        );
      }
    }
  }
  return lamps;
}
