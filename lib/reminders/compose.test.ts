import { describe, expect, it } from 'vitest';
import { addDays } from '@/lib/lamp-log/dates';
import { composeReminder, LISTED_LAMPS, MAX_BODY_CHARS } from './compose';
import type { DueItem } from './due';

const longText = (n: number) => 'Ω'.repeat(n);

/** `n` due lamps with the longest texts the database allows (labels and names of 120 characters). */
function manyItems(n: number, start = '2026-03-01'): DueItem[] {
  return Array.from({ length: n }, (_, k) => ({
    lampId: k + 1,
    label: `${k} ${longText(115)}`,
    enclosureName: longText(120),
    keeperId: 1,
    kind: k % 3 === 0 ? 'replace' : 'test',
    // Dates spread over a year, in no particular order.
    dueOn: addDays(start, (k * 37) % 365),
    basis: longText(400),
    dedupeKey: `lamp:${k + 1}`,
  }));
}

describe('composeReminder at any number of lamps', () => {
  it('stays within its bound at 10,000 lamps: the most urgent listed, counts for the rest, a link', () => {
    const items = manyItems(10_000);
    const { subject, text } = composeReminder(
      { name: longText(300) },
      items,
      'http://localhost:3000',
      longText(300),
    );
    expect(text.length).toBeLessThanOrEqual(MAX_BODY_CHARS);
    // Far inside the outbox's column (MEDIUMTEXT) and even the old 64 KB one, in bytes of UTF-8.
    expect(Buffer.byteLength(text, 'utf8')).toBeLessThan(65_535);
    expect(subject).toBe('Baskwell lamp log: 3,334 lamps to replace, 6,666 lamps to test');
    const listed = text.split('\n').filter((l) => /^- .*: (Replace|Test with a meter) by /.test(l));
    expect(listed).toHaveLength(LISTED_LAMPS);
    // The earliest dates come first: day 0 of the spread is lamp 0 (a replacement).
    expect(listed[0]).toMatch(/^- 0 Ω+… \(Ω+…\): Replace by 2026-03-01 — Ω+…\.$/);
    const dates = listed.map((l) => l.match(/by (\d{4}-\d{2}-\d{2})/)![1]!);
    expect([...dates].sort()).toEqual(dates);
    expect(text).toContain(`- and 9,985 more lamps (`);
    expect(text).toContain('http://localhost:3000/lamp-log?due=1');
    expect(text).toMatch(/10,000 UV lamps in Ω+…'s lamp log need attention/);
    expect(text).toMatch(/vet/);
  });

  it('counts the rest by kind and gives the span of their dates', () => {
    const items = manyItems(LISTED_LAMPS + 4);
    const { text } = composeReminder({ name: 'Ann' }, items, 'http://localhost:3000');
    const rest = text.split('\n').find((l) => l.startsWith('- and '))!;
    const sorted = [...items].sort((a, b) => a.dueOn.localeCompare(b.dueOn)).slice(LISTED_LAMPS);
    const replace = sorted.filter((i) => i.kind === 'replace').length;
    expect(rest).toContain('4 more lamps');
    expect(rest).toContain(replace ? `${replace} to replace` : `4 to test`);
    expect(rest).toContain(`to ${sorted[sorted.length - 1]!.dueOn}`);
  });

  it('lists every lamp and no "more" line when there are few', () => {
    const { text } = composeReminder({ name: 'Ann' }, manyItems(3), 'http://localhost:3000');
    expect(text).toMatch(/These UV lamps in your lamp log need attention/);
    expect(text.split('\n').filter((l) => l.startsWith('- '))).toHaveLength(3);
    expect(text).not.toContain('more lamp');
  });

  it('puts a replacement before a test due the same day', () => {
    const [a, b] = manyItems(2);
    const sameDay = [
      { ...a!, kind: 'test' as const, dueOn: '2026-05-01', label: 'A tube' },
      { ...b!, kind: 'replace' as const, dueOn: '2026-05-01', label: 'B tube' },
    ];
    const { text } = composeReminder({ name: 'Ann' }, sameDay, 'http://localhost:3000');
    expect(text.indexOf('B tube')).toBeLessThan(text.indexOf('A tube'));
  });

  it('ends a reason that has its own full stop with one full stop, not two', () => {
    const [a] = manyItems(1);
    const item = { ...a!, label: 'UV tube', basis: 'A new reading is due on 2026-12-07.' };
    const { text } = composeReminder({ name: 'Ann' }, [item], 'http://localhost:3000');
    expect(text).toContain('A new reading is due on 2026-12-07.\n');
    expect(text).not.toContain('..');
  });
});
