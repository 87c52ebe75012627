import 'server-only';
import type { Transaction } from 'sequelize';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { Lamp, LampType, Reading } from '@/models';
import type { ReadingThrough, ReadingWarmedUp } from '@/shared/reading-setup';
import { findDemoEnclosure } from './find';
import { DEMO_HOUSEHOLD, DEMO_SHOP } from './scenario';

/**
 * Invented lamps and meter readings for the demo enclosures, so the lamp log has something to show: a
 * worn basking tube heading for replacement, a healthy one, a lamp with a single reading (uncertain),
 * a heat lamp with no UV. Dates are relative to the day of seeding; all values are invented demo data.
 * Only enclosures with no lamps at all get them, so nothing a user logged is touched.
 */

type DemoReading = {
  daysAgo: number;
  distanceCm: number;
  value: number;
  unit: 'uvb' | 'uvi';
  note?: string;
  /** How it was taken; left out: the bare lamp, warmed up. */
  setUp?: { through: ReadingThrough; throughTransmission: number | null; warmedUp: ReadingWarmedUp };
};

const BARE_WARM = { through: 'nothing', throughTransmission: null, warmedUp: 'yes' } as const;
type DemoLamp = {
  organisation: string;
  enclosure: string;
  label: string;
  /** The catalogue entry's preset (see lib/lamp-types/starting-lamp-types.ts). */
  presetKey: string;
  startedDaysAgo: number;
  hoursPerDay: number;
  baskingDistanceCm: number | null;
  baskingTransmission: number | null;
  designObjectId?: string;
  readings: DemoReading[];
};

const METER_UVB = 'Broadband UVB meter (shop)';
const METER_UVI = 'UV Index meter (shop)';

export const DEMO_LAMPS: readonly DemoLamp[] = [
  {
    organisation: DEMO_SHOP.name,
    enclosure: 'Desert vivarium',
    label: 'Basking tube',
    presetKey: 't5-high',
    startedDaysAgo: 330,
    hoursPerDay: 12,
    // A zone 4 basker: the perch sits close under the tube, where it reaches the zone's basking UV Index
    // (about 115 µW/cm² and up at this tube's ratio), and the worn tube is now just above that.
    baskingDistanceCm: 15,
    baskingTransmission: null,
    designObjectId: 'uv-lamp',
    readings: [
      { daysAgo: 330, distanceCm: 15, value: 188, unit: 'uvb', note: 'new, first evening' },
      { daysAgo: 330, distanceCm: 15, value: 7.5, unit: 'uvi' },
      { daysAgo: 270, distanceCm: 15, value: 170, unit: 'uvb' },
      { daysAgo: 200, distanceCm: 12, value: 181, unit: 'uvb', note: 'meter on the basking rock' },
      { daysAgo: 140, distanceCm: 15, value: 141, unit: 'uvb' },
      { daysAgo: 140, distanceCm: 15, value: 5.6, unit: 'uvi' },
      { daysAgo: 75, distanceCm: 15, value: 126, unit: 'uvb' },
      { daysAgo: 20, distanceCm: 15, value: 118, unit: 'uvb' },
    ],
  },
  {
    organisation: DEMO_SHOP.name,
    enclosure: 'Desert vivarium',
    label: 'Heat spot',
    // A guarded emitter over the basking spot: with the tube beside it, the pair the guided start's search
    // finds best for this vivarium.
    presetKey: 'ceramic-100',
    startedDaysAgo: 120,
    hoursPerDay: 10,
    baskingDistanceCm: null,
    baskingTransmission: null,
    designObjectId: 'heat-lamp',
    readings: [],
  },
  {
    organisation: DEMO_SHOP.name,
    enclosure: 'Gecko tank',
    label: 'UV tube',
    designObjectId: 'uv-lamp',
    presetKey: 't5-medium',
    startedDaysAgo: 100,
    hoursPerDay: 12,
    baskingDistanceCm: 20,
    baskingTransmission: 0.6,
    readings: [
      { daysAgo: 88, distanceCm: 20, value: 41.8, unit: 'uvb', note: 'straight below the tube, lid off' },
    ],
  },
  {
    organisation: DEMO_SHOP.name,
    enclosure: 'Tall mesh cage',
    label: 'Top tube',
    designObjectId: 'uv-lamp',
    presetKey: 't5-very-high',
    startedDaysAgo: 45,
    hoursPerDay: 12,
    baskingDistanceCm: 12,
    baskingTransmission: 0.6,
    readings: [
      { daysAgo: 45, distanceCm: 15, value: 149, unit: 'uvb', note: 'new' },
      { daysAgo: 45, distanceCm: 15, value: 6.1, unit: 'uvi' },
      { daysAgo: 21, distanceCm: 15, value: 146, unit: 'uvb' },
      { daysAgo: 3, distanceCm: 20, value: 104, unit: 'uvb' },
    ],
  },
  {
    organisation: DEMO_HOUSEHOLD.name,
    enclosure: 'Python vivarium',
    label: 'Low UV tube',
    designObjectId: 'uv-lamp',
    presetKey: 't5-low',
    startedDaysAgo: 400,
    hoursPerDay: 10,
    baskingDistanceCm: 35,
    baskingTransmission: null,
    // Logged before readings said how they were taken: the lamp page says it read them as bare.
    readings: [
      {
        daysAgo: 380,
        distanceCm: 30,
        value: 5.1,
        unit: 'uvb',
        setUp: { through: 'not-recorded', throughTransmission: null, warmedUp: 'not-recorded' },
      },
    ],
  },
];

export async function seedDemoLampLog(transaction: Transaction): Promise<number> {
  const today = todayIso();
  let created = 0;
  const done = new Set<number>();
  for (const demo of DEMO_LAMPS) {
    const found = await findDemoEnclosure(demo.organisation, demo.enclosure, transaction);
    if (!found) continue;
    const { organisation, enclosure } = found;
    if (!done.has(enclosure.id)) {
      if ((await Lamp.count({ where: { enclosureId: enclosure.id }, transaction })) > 0) continue;
      done.add(enclosure.id);
    }
    const type = await LampType.findOne({
      where: { organisationId: organisation.id, presetKey: demo.presetKey },
      transaction,
    });
    if (!type) continue;
    const lamp = await Lamp.create(
      {
        enclosureId: enclosure.id,
        lampTypeId: type.id,
        label: demo.label,
        designObjectId: demo.designObjectId ?? null,
        firstUsedOn: addDays(today, -demo.startedDaysAgo),
        hoursPerDay: demo.hoursPerDay,
        baskingDistanceCm: demo.baskingDistanceCm,
        baskingTransmission: demo.baskingTransmission,
        createdById: null,
      },
      { transaction },
    );
    created++;
    await Reading.bulkCreate(
      demo.readings.map((r) => ({
        lampId: lamp.id,
        takenAt: new Date(`${addDays(today, -r.daysAgo)}T${r.unit === 'uvi' ? '18:05' : '18:00'}:00Z`),
        distanceCm: r.distanceCm,
        value: r.value,
        unit: r.unit,
        ...(r.setUp ?? BARE_WARM),
        meter: r.unit === 'uvi' ? METER_UVI : METER_UVB,
        note: r.note ?? null,
        takenById: null,
      })),
      { transaction },
    );
  }
  return created;
}
