import { describe, expect, it } from 'vitest';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { LEAD_DAYS } from '@/lib/reminders/due';
import { summarise } from '@/lib/lamp-log/queries';
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

  it('tells its story on the day of seeding: the worn tube is due for a reminder, no date is long past', async () => {
    await seedDemo();
    const today = todayIso();
    const shop = (await summarise(await Lamp.findAll(), today)).filter((s) => s.label !== 'Low UV tube');
    const worn = shop.find((s) => s.label === 'Basking tube')!;
    // The reminder the demo shows goes out a little ahead of the replacement date.
    expect(worn.replaceDueOn).not.toBeNull();
    expect(worn.replaceDueOn! <= addDays(today, LEAD_DAYS.replace)).toBe(true);
    expect(worn.replaceDueOn! >= addDays(today, -7)).toBe(true);
    // The shop's other lamps are looked after: nothing of theirs was due months ago (the baseline of the
    // gecko tank's tube was taken after its burn-in, not inside it).
    for (const s of shop) {
      for (const d of [s.testDueOn, s.replaceDueOn]) {
        if (d) expect(d >= addDays(today, -7), `${s.label} due ${d}`).toBe(true);
      }
    }
  });
});
