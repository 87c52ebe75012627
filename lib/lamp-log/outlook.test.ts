import { describe, expect, it } from 'vitest';
import { dayNumber, isoDay } from './dates';
import { distanceFactor } from './geometry';
import { lampOutlook } from './outlook';
import { readingsOf, t5Lamp } from '@/tests/fixtures/lamp-log';

const zone3 = { name: 'Test lizard', uvZone: 3, uvbTargetUw: null };

describe('lampOutlook', () => {
  const lamp = t5Lamp();
  const tau = 520;
  const at30 = (d: number) => 48 * Math.exp(-d / tau);
  const readings = readingsOf(lamp, at30, [0, 40, 80, 120, 160, 200], 20);

  it('brings readings at 20 cm to 30 cm and recovers the output today within 5 %', () => {
    const o = lampOutlook(lamp, readings, zone3, '2025-09-01');
    expect(o.unit).toBe('uvb');
    expect(o.fit.kind).toBe('exponential');
    const age = dayNumber('2025-09-01') - dayNumber('2025-01-01');
    expect(o.ageDays).toBe(age);
    expect(Math.abs((o.nowAt30 as number) / at30(age) - 1)).toBeLessThan(0.05);
    expect(o.remainingFraction).toBeCloseTo(Math.exp(-age / tau), 3);
  });

  it('finds the day the basking spot falls below the zone’s need (Ferguson et al. 2010: zone 3 ≥ UVI 2.9)', () => {
    const o = lampOutlook(lamp, readings, zone3, '2025-07-01');
    // Need in µW/cm² at the basking spot: 2.9 / 0.04; at 30 cm that is divided by the geometry factor.
    const k = distanceFactor(lamp.type, 30, 15);
    const threshold30 = 2.9 / 0.04 / k;
    const crossDay = -tau * Math.log(threshold30 / 48);
    const expected = isoDay(dayNumber('2025-01-01') + crossDay);
    expect(o.basking?.threshold).toBeCloseTo(72.5, 6);
    expect(Math.abs(dayNumber(o.fallsBelowOn as string) - dayNumber(expected))).toBeLessThanOrEqual(2);
    expect(o.replaceDueOn).toBe(o.fallsBelowOn);
    expect(o.replaceBasis).toBe('readings');
    // The band's lower edge crosses first.
    expect(dayNumber(o.fallsBelowEarliestOn as string)).toBeLessThanOrEqual(
      dayNumber(o.fallsBelowOn as string),
    );
  });

  it('says "replace" once the basking spot is below the need, "test soon" when a reading is overdue', () => {
    expect(lampOutlook(lamp, readings, zone3, '2026-06-01').status).toBe('replace');
    const o = lampOutlook(lamp, readings.slice(0, 3), { ...zone3, uvZone: 1 }, '2025-06-20');
    expect(o.status).toBe('test-soon');
    expect(o.testDueOn).toBe(isoDay(dayNumber('2025-03-22') + 91));
  });

  it('says what is missing without a species sheet, and falls back to the typical interval', () => {
    const o = lampOutlook(lamp, readings, null, '2025-03-01');
    expect(o.missing).toContain('a species sheet for this enclosure');
    expect(o.fallsBelowOn).toBeNull();
    expect(o.replaceBasis).toBe('typical interval');
    expect(o.replaceDueOn).toBe(isoDay(dayNumber('2025-01-01') + Math.round(12 * (365.25 / 12))));
  });

  it('asks for a first reading of a new lamp', () => {
    const o = lampOutlook(lamp, [], zone3, '2025-01-05');
    expect(o.status).toBe('test-soon');
    expect(o.missing).toContain('a meter reading');
    expect(o.fit.kind).toBe('none');
  });

  it('reports retired and heat-only lamps as such', () => {
    expect(lampOutlook(t5Lamp({ retiredOn: '2025-05-01' }), readings, zone3, '2025-09-01').status).toBe(
      'retired',
    );
    const heat = t5Lamp({
      type: { ...lamp.type, tech: 'halogen', form: 'bulb', lengthCm: null, uvbAt30: 0 },
    });
    expect(lampOutlook(heat, [], zone3, '2025-09-01').status).toBe('heat-only');
  });

  it('uses the basking transmission (a mesh lid) in the basking value', () => {
    const bare = lampOutlook(lamp, readings, zone3, '2025-03-01');
    const mesh = lampOutlook(t5Lamp({ baskingTransmission: 0.5 }), readings, zone3, '2025-03-01');
    expect((mesh.basking?.valueNow as number) / (bare.basking?.valueNow as number)).toBeCloseTo(0.5, 9);
    expect(dayNumber(mesh.fallsBelowOn as string)).toBeLessThan(dayNumber(bare.fallsBelowOn as string));
  });
});
