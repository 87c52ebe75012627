// Shared fixtures for the lamp-log unit tests (invented lamp and readings; not product data).
import type { LampFacts, ReadingFacts } from './outlook';
import { dayNumber, DAY_MS } from './dates';
import { toReference } from './geometry';

export function t5Lamp(over: Partial<LampFacts> = {}): LampFacts {
  return {
    id: 1,
    label: 'Test tube',
    firstUsedOn: '2025-01-01',
    hoursPerDay: 12,
    retiredOn: null,
    baskingDistanceCm: 15,
    baskingTransmission: null,
    type: {
      name: 'T5 test',
      tech: 't5',
      form: 'tube',
      lengthCm: 55,
      uvbAt30: 42.5,
      uviPerUvb: 0.04,
      halfLifeMonths: 12,
      decayPoints: null,
      replaceAfterMonths: 12,
    },
    ...over,
  };
}

/** Readings at `distanceCm` of a lamp whose 30 cm output follows `at30(days)`, taken at noon. */
export function readingsOf(
  lamp: LampFacts,
  at30: (days: number) => number,
  days: number[],
  distanceCm: number,
  unit: 'uvb' | 'uvi' = 'uvb',
): ReadingFacts[] {
  const start = dayNumber(lamp.firstUsedOn);
  const back = 1 / toReference(lamp.type, 1, distanceCm);
  return days.map((d) => ({
    takenAt: new Date((start + d + 0.5) * DAY_MS),
    distanceCm,
    value: at30(d) * back,
    unit,
  }));
}
