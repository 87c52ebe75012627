import { describe, expect, it } from 'vitest';
import { baskingNeed, pairedRatio } from './need';
import { photoperiodAdvice } from './photoperiod';

// Zone 3: the basking spot needs UV Index 2.9 (the lower end of the zone's maximum range, Ferguson et al.
// 2010, Zoo Biology 29:317–334). The sheet's 115–235 µW/cm² is a shop rule of thumb (common practice, no
// published source).
const sheet = {
  name: 'Test skink',
  uvZone: 3,
  uvbTargetUw: { min: 115, max: 235 },
  photoperiodH: { min: 12, max: 14 },
};

describe('the basking need', () => {
  it('is the zone’s UV Index, turned into µW/cm² through the lamp’s ratio, never the sheet’s range', () => {
    const n = baskingNeed(sheet, 'uvb', { value: 0.12, from: 'lamp type' });
    if (!n.ok) throw new Error(n.missing);
    expect(n.threshold).toBeCloseTo(2.9 / 0.12, 6);
    expect(n.judgedBy).toMatch(/UV Index 2\.9/);
    expect(n.label).toMatch(/this lamp type’s 0\.12 UVI per µW\/cm²/);
    expect(n.ruleOfThumb).toMatch(/shop rule of thumb, 115–235 µW\/cm², is shown for reference only/);
    expect(n.cautions.join(' ')).toMatch(/spectral response/);
    expect(n.cautions.join(' ')).toMatch(/photokeratoconjunctivitis/);
    const uvi = baskingNeed(sheet, 'uvi', { value: 0.04, from: 'lamp type' });
    expect(uvi.ok && uvi.threshold).toBe(2.9);
    expect(uvi.ok && uvi.cautions).toEqual([]);
  });

  it('prefers the keeper’s own paired readings for the ratio', () => {
    const at = (h: number) => new Date(Date.UTC(2026, 0, 10, h));
    const r = pairedRatio([
      { takenAt: at(12), distanceCm: 30, value: 50, unit: 'uvb' },
      { takenAt: at(12), distanceCm: 30, value: 2.5, unit: 'uvi' },
      { takenAt: at(18), distanceCm: 30, value: 3, unit: 'uvi' }, // no broadband reading beside it
    ]);
    expect(r).toEqual({ value: 0.05, from: 'paired readings', pairs: 1 });
    const n = baskingNeed(sheet, 'uvb', r!);
    expect(n.ok && n.threshold).toBeCloseTo(58, 6);
    expect(n.ok && n.label).toMatch(/from your 1 paired reading/);
    expect(pairedRatio([{ takenAt: at(12), distanceCm: 30, value: 50, unit: 'uvb' }])).toBeNull();
  });
});

describe('hours a day against the sheet’s day length', () => {
  it('advises a timer, in the lamp-control table’s words, when the hours do not fit', () => {
    const t = photoperiodAdvice({ hoursPerDay: 16, type: { tech: 't5' } }, sheet)!;
    expect(t).toMatch(/on 16 hours a day, longer than the 12–14 hour day/);
    expect(t).toMatch(/by a timer only \(on for the sheet’s 12–14 hour day\)/);
    expect(photoperiodAdvice({ hoursPerDay: 13, type: { tech: 't5' } }, sheet)).toBeNull();
    expect(
      photoperiodAdvice({ hoursPerDay: 16, type: { tech: 't5' } }, { ...sheet, photoperiodH: null }),
    ).toBeNull();
  });
});
