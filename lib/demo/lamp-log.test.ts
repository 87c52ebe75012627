import { describe, expect, it } from 'vitest';
import { todayIso } from '@/lib/lamp-log/dates';
import { summarise } from '@/lib/lamp-log/outlook-store';
import { Lamp, Reading } from '@/models';
import { seedDemo, withTestDatabase } from '@/tests/helpers/db';
import { DEMO_LAMPS } from './lamp-log';

withTestDatabase();

describe('demo lamp log', () => {
  it('adds the demo lamps and readings once, with a mix of statuses to show', async () => {
    await seedDemo();
    expect(await Lamp.count()).toBe(DEMO_LAMPS.length);
    expect(await Reading.count()).toBe(DEMO_LAMPS.reduce((n, l) => n + l.readings.length, 0));
    await seedDemo();
    expect(await Lamp.count()).toBe(DEMO_LAMPS.length);
    const statuses = (await summarise(await Lamp.findAll(), todayIso())).map((s) => [s.label, s.status]);
    expect(statuses).toContainEqual(['Heat spot', 'heat-only']);
    expect(new Set(statuses.map(([, s]) => s)).size).toBeGreaterThanOrEqual(3);
  });
});
