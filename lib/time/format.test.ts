import { describe, expect, it } from 'vitest';
import { dayInZone, formatMoment, knownZone } from './format';

describe('formatMoment', () => {
  const moment = '2026-12-04T02:30:00Z';
  it('shows a moment in the zone it is given, the same on every machine', () => {
    expect(formatMoment(moment, 'UTC', 'datetime')).toBe('4 Dec 2026, 02:30');
    expect(formatMoment(moment, 'America/New_York', 'datetime')).toBe('3 Dec 2026, 21:30');
    expect(formatMoment(moment, 'Asia/Kolkata', 'time')).toBe('08:00');
    expect(formatMoment(moment, 'America/New_York', 'day')).toBe('3 Dec 2026');
  });
  it('falls back to UTC for a zone it does not know, and says nothing for no moment', () => {
    expect(formatMoment(moment, 'Mars/Olympus', 'day')).toBe('4 Dec 2026');
    expect(formatMoment(null, 'UTC', 'day')).toBe('—');
    expect(formatMoment('not a date', 'UTC', 'day')).toBe('not a date');
  });
});

describe('knownZone', () => {
  it('accepts IANA names and refuses anything else', () => {
    expect(knownZone('America/New_York')).toBe('America/New_York');
    expect(knownZone('UTC')).toBe('UTC');
    expect(knownZone('Mars/Olympus')).toBeNull();
    expect(knownZone('x; path=/')).toBeNull();
    expect(knownZone(undefined)).toBeNull();
  });
});

describe('dayInZone', () => {
  it('is the calendar day where the viewer is', () => {
    const late = new Date('2026-12-04T02:30:00Z');
    expect(dayInZone(late, 'UTC')).toBe('2026-12-04');
    expect(dayInZone(late, 'America/New_York')).toBe('2026-12-03');
    expect(dayInZone(new Date('2026-12-03T20:00:00Z'), 'Pacific/Auckland')).toBe('2026-12-04');
  });
});
