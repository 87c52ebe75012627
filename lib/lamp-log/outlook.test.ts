import { describe, expect, it } from 'vitest';
import { dayNumber, isoDay } from './dates';
import { distanceFactor } from './geometry';
import { fitDecay } from './fit';
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

  it('when it says "replace", also says whether a new lamp of the type would meet the need at the spot', () => {
    // The type new: 42.5 µW/cm² at 30 cm, brought to the 15 cm basking spot the way the readings are.
    const spot = 42.5 * distanceFactor(lamp.type, 30, 15);
    // Ferguson et al. 2010: zone 3 needs UVI 2.9 (72.5 µW/cm² through 0.04), zone 4 UVI 4.5 (112.5).
    expect(spot).toBeGreaterThan(72.5);
    expect(spot).toBeLessThan(112.5);
    const zone3Replace = lampOutlook(lamp, readings, zone3, '2026-06-01');
    expect(zone3Replace.status).toBe('replace');
    expect(zone3Replace.reasons.join(' ')).not.toMatch(/new lamp of this type would/);
    const zone4 = lampOutlook(lamp, readings, { ...zone3, uvZone: 4 }, '2026-06-01');
    expect(zone4.status).toBe('replace');
    expect(zone4.reasons.join(' ')).toMatch(
      new RegExp(
        `A new lamp of this type would give about ${Math.round(spot)} µW/cm² at the basking spot \\(15 cm from the lamp\\): still below the need`,
      ),
    );
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

  describe('how a reading was taken', () => {
    // A lamp behind a fine mesh lid that passes 60 % of its UVB; the basking spot is under the lid too.
    // The share is our own test value (a 1.0 mm / 0.25 mm wire cloth has an ISO 9044 open area of 0.64).
    const lidded = t5Lamp({ baskingTransmission: 0.6 });
    const days = [10, 40, 80, 120, 160, 200];
    const bare = readingsOf(lidded, at30, days, 20).map((r) => ({ ...r, through: 'nothing' as const }));
    const throughLid = bare.map((r) => ({
      ...r,
      value: r.value * 0.6,
      through: 'lid' as const,
      throughTransmission: 0.6,
    }));

    it('gives the same basking estimate through a lid passing 60 % as for the bare lamp', () => {
      const a = lampOutlook(lidded, bare, zone3, '2025-07-01');
      const b = lampOutlook(lidded, throughLid, zone3, '2025-07-01');
      expect(b.basking?.valueNow).toBeCloseTo(a.basking?.valueNow as number, 9);
      expect(b.fallsBelowOn).toBe(a.fallsBelowOn);
      // The lid is applied once, at the basking spot: 60 % of the bare lamp there.
      const age = dayNumber('2025-07-01') - dayNumber('2025-01-01');
      const expected = at30(age) * distanceFactor(lidded.type, 30, 15) * 0.6;
      expect(Math.abs((b.basking?.valueNow as number) / expected - 1)).toBeLessThan(0.03);
      expect(b.readingNotes).toEqual([]);
    });

    it('reads a reading without its set-up as the bare lamp, and says so', () => {
      const old = bare.map(({ through: _t, ...r }) => r);
      const o = lampOutlook(lidded, old, zone3, '2025-07-01');
      expect(o.basking?.valueNow).toBeCloseTo(
        lampOutlook(lidded, bare, zone3, '2025-07-01').basking?.valueNow as number,
        9,
      );
      expect(o.points.every((p) => p.assumedBare)).toBe(true);
      expect(o.readingNotes[0]).toMatch(
        /6 readings do not say what was between lamp and meter: taken as the bare lamp/,
      );
    });

    it('keeps but does not fit readings through glass of unknown share or of a cold lamp', () => {
      const extra = [
        { ...bare[2]!, value: 0.5, through: 'glass' as const, throughTransmission: null },
        { ...bare[3]!, value: bare[3]!.value * 0.4, warmedUp: 'no' as const },
      ];
      const o = lampOutlook(lidded, [...bare, ...extra], zone3, '2025-07-01');
      expect(o.points.filter((p) => p.use === 'excluded')).toHaveLength(2);
      expect(o.fit.n).toBe(bare.length);
      expect(o.basking?.valueNow).toBeCloseTo(
        lampOutlook(lidded, bare, zone3, '2025-07-01').basking?.valueNow as number,
        9,
      );
      expect(o.readingNotes.join(' ')).toMatch(/through glass of unknown UVB share/);
      expect(o.readingNotes.join(' ')).toMatch(/before the lamp warmed up/);
    });
  });

  describe('burn-in', () => {
    // 12 hours a day: the first 100 hours (common practice, no published source) end after 8⅓ days.
    const working = readingsOf(lamp, at30, [20, 60, 100, 140, 180, 220], 20).map((r, i) => ({
      ...r,
      // ±3 % meter scatter, so the fit has an uncertainty of its own.
      value: r.value * (1 + 0.03 * Math.sin(i * 2.1)),
    }));
    // A new lamp reads well above its working-life curve (here 30 % above) on its first evening.
    const firstEvening = readingsOf(lamp, (d) => at30(d) * 1.3, [0.3], 20)[0]!;

    it('leaves the fitted start unchanged within the fit’s own uncertainty', () => {
      const without = lampOutlook(lamp, working, zone3, '2025-09-01');
      const withBurnIn = lampOutlook(lamp, [firstEvening, ...working], zone3, '2025-09-01');
      if (without.fit.kind !== 'exponential' || withBurnIn.fit.kind !== 'exponential')
        throw new Error('expected exponential fits');
      expect(Math.abs(withBurnIn.fit.e0 - without.fit.e0)).toBeLessThanOrEqual(without.fit.e0Se as number);
      expect(withBurnIn.points[0]).toMatchObject({ use: 'burn-in' });
      expect(withBurnIn.readingNotes).toContain(
        '1 reading taken during burn-in: shown, not used for the decay.',
      );
      // Fitted with the others, the burn-in reading would drag the start upward by more than that.
      const naive = fitDecay(
        withBurnIn.points.map((p) => ({ days: p.days, value: p.value })),
        () => 1,
      );
      if (naive.kind !== 'exponential') throw new Error('expected an exponential fit');
      expect(naive.e0 - without.fit.e0).toBeGreaterThan(without.fit.e0Se as number);
    });

    it('says when the baseline reading is due, and asks for it after the burn-in', () => {
      const fresh = lampOutlook(lamp, [firstEvening], zone3, '2025-01-03');
      expect(fresh.burnIn).toEqual({ baselineOn: '2025-01-10', baselineTaken: false, inBurnIn: true });
      expect(fresh.testDueOn).toBe('2025-01-10');
      expect(fresh.reasons).toContain('Burning in: take the baseline reading on or after 2025-01-10.');
      expect(fresh.fit.note).toMatch(/Only burn-in readings so far/);
      const later = lampOutlook(lamp, [firstEvening], zone3, '2025-01-12');
      expect(later.reasons).toContain('The burn-in is over: take the baseline reading now.');
      // Fewer hours a day make a longer burn-in: 100 hours at 6 hours a day is 17 days.
      const slow = lampOutlook(t5Lamp({ hoursPerDay: 6 }), [], zone3, '2025-01-03');
      expect(slow.burnIn.baselineOn).toBe('2025-01-18');
    });
  });
});
