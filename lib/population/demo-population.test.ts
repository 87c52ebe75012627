import { describe, expect, it } from 'vitest';
import { DEMO_CUSTOMERS } from '@/lib/demo/counter';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { CounterLamp, CounterReading, LampType } from '@/models';
import { seedDemoShop, withTestDatabase } from '@/tests/helpers/db';
import { counterFigures, weekOf, WEEKS } from './dashboard';
import { MIN_LAMPS, MIN_READINGS, populationCurve } from './fit';
import { populationInput } from './queries';

withTestDatabase();

describe('the example shop’s figures', () => {
  it('show a measured curve for its high-output T5 tubes on first start', async () => {
    const shop = await seedDemoShop();
    expect(shop.exampleData).toBe(true);
    const type = (await LampType.findOne({ where: { organisationId: shop.id, presetKey: 't5-high' } }))!;
    const curve = populationCurve(await populationInput(type));
    expect(curve.ok).toBe(true);
    expect(curve.lamps).toBeGreaterThanOrEqual(MIN_LAMPS);
    expect(curve.readings).toBeGreaterThanOrEqual(MIN_READINGS);
    expect(curve.counterLamps).toBe(
      DEMO_CUSTOMERS.flatMap((c) => c.lamps).filter((l) => l.presetKey === 't5-high').length,
    );
  });

  it('count the counter’s tests a week and the lamps it said to replace', async () => {
    const shop = await seedDemoShop();
    const today = todayIso();
    const figures = await counterFigures(shop.id, today);
    expect(figures.weeks).toHaveLength(WEEKS);
    expect(figures.weeks.at(-1)!.weekOf).toBe(weekOf(today));
    const from = addDays(weekOf(today), -7 * (WEEKS - 1));
    const readings = await CounterReading.findAll();
    const recent = readings.filter((r) => r.takenAt.toISOString().slice(0, 10) >= from);
    expect(figures.tests).toBe(recent.length);
    // Each lamp counts once, by its latest verdict.
    const lamps = await CounterLamp.count({ where: { organisationId: shop.id } });
    const latest = new Map<number, CounterReading>();
    for (const r of readings) {
      const had = latest.get(r.counterLampId);
      if (!had || had.takenAt < r.takenAt) latest.set(r.counterLampId, r);
    }
    const judged = [...latest.values()].filter((r) => r.verdict !== 'no-verdict');
    expect(latest.size).toBe(lamps);
    expect(figures.judged).toBe(judged.length);
    const sum = (rows: { lamps: number; replace: number }[], k: 'lamps' | 'replace') =>
      rows.reduce((s, r) => s + r[k], 0);
    expect(sum(figures.byTechnology, 'lamps')).toBe(judged.length);
    expect(sum(figures.byAge, 'lamps')).toBe(judged.length);
    const replace = judged.filter((r) => r.verdict === 'replace').length;
    expect(replace).toBeGreaterThan(0);
    expect(sum(figures.byTechnology, 'replace')).toBe(replace);
    expect(sum(figures.byAge, 'replace')).toBe(replace);
  });
});

describe('weeks', () => {
  it('start on Monday', () => {
    expect(weekOf('2026-12-04')).toBe('2026-11-30'); // a Friday
    expect(weekOf('2026-11-30')).toBe('2026-11-30');
    expect(weekOf('2026-12-06')).toBe('2026-11-30'); // a Sunday
  });
});
