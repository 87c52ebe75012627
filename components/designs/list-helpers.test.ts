import { describe, expect, it } from 'vitest';
import type { DesignSummary } from '@/lib/variants/queries';
import { changedAgo, copyName, sortDesigns } from './list-helpers';

const d = (id: number, name: string, createdAt: string, updatedAt: string): DesignSummary => ({
  id,
  enclosureId: 1,
  name,
  createdAt,
  updatedAt,
  variants: [],
});

describe('copyName', () => {
  it('prefixes "Copy of" and numbers repeats', () => {
    expect(copyName('Low lamp', ['Low lamp'])).toBe('Copy of Low lamp');
    expect(copyName('Low lamp', ['Copy of Low lamp'])).toBe('Copy of Low lamp (2)');
    expect(copyName('Low lamp', ['Copy of Low lamp', 'Copy of Low lamp (2)'])).toBe('Copy of Low lamp (3)');
  });
  it('stays within the 120-character name limit', () => {
    const long = 'x'.repeat(120);
    expect(copyName(long, []).length).toBe(120);
    expect(copyName(long, [copyName(long, [])]).length).toBeLessThanOrEqual(120);
  });
});

describe('sortDesigns', () => {
  const list = [
    d(1, 'beta', '2026-01-01T00:00:00Z', '2026-03-01T00:00:00Z'),
    d(2, 'Alpha', '2026-02-01T00:00:00Z', '2026-02-01T00:00:00Z'),
    d(3, 'gamma', '2026-01-15T00:00:00Z', '2026-04-01T00:00:00Z'),
  ];
  it('sorts by last change, name (case-insensitive) or creation', () => {
    expect(sortDesigns(list, 'updated').map((x) => x.id)).toEqual([3, 1, 2]);
    expect(sortDesigns(list, 'name').map((x) => x.id)).toEqual([2, 1, 3]);
    expect(sortDesigns(list, 'created').map((x) => x.id)).toEqual([2, 3, 1]);
  });
  it('does not reorder the input', () => {
    sortDesigns(list, 'name');
    expect(list.map((x) => x.id)).toEqual([1, 2, 3]);
  });
});

describe('changedAgo', () => {
  const now = new Date('2026-06-10T12:00:00Z');
  it('reads naturally', () => {
    expect(changedAgo('2026-06-10T11:59:50Z', now, 'UTC')).toBe('just now');
    expect(changedAgo('2026-06-10T11:50:00Z', now, 'UTC')).toBe('10 min ago');
    expect(changedAgo('2026-06-10T09:00:00Z', now, 'UTC')).toBe('3 h ago');
    expect(changedAgo('2026-06-09T12:00:00Z', now, 'UTC')).toBe('yesterday');
    expect(changedAgo('2026-06-06T12:00:00Z', now, 'UTC')).toBe('4 days ago');
    expect(changedAgo('2026-01-02T12:00:00Z', now, 'UTC')).toBe('2 Jan 2026');
  });
  it("gives an older date in the viewer's zone: 03:00 UTC on 2 January is still 1 January in New York", () => {
    expect(changedAgo('2026-01-02T03:00:00Z', now, 'UTC')).toBe('2 Jan 2026');
    expect(changedAgo('2026-01-02T03:00:00Z', now, 'America/New_York')).toBe('1 Jan 2026');
  });
});
