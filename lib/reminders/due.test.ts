import { describe, expect, it } from 'vitest';
import { composeReminder } from './compose';
import { byKeeper, dueItems, type LampDueInput } from './due';

const lamp = (over: Partial<LampDueInput>): LampDueInput => ({
  lampId: 1,
  label: 'Basking tube',
  enclosureName: 'Desert vivarium',
  keeperId: 10,
  status: 'fine',
  testDueOn: '2026-03-01',
  replaceDueOn: '2026-09-01',
  replaceBasis: 'readings',
  reasons: ['A new reading is due on 2026-03-01.'],
  ...over,
});

describe('dueItems', () => {
  it('reminds a week ahead of a test and two weeks ahead of a replacement', () => {
    expect(dueItems([lamp({})], '2026-02-21')).toHaveLength(0);
    const test = dueItems([lamp({})], '2026-02-22');
    expect(test).toMatchObject([
      { kind: 'test', dueOn: '2026-03-01', dedupeKey: 'lamp:1:due:2026-03-01:test' },
    ]);
    const replace = dueItems([lamp({ testDueOn: '2026-10-01' })], '2026-08-18');
    expect(replace).toMatchObject([{ kind: 'replace', dueOn: '2026-09-01' }]);
  });

  it('does not also ask to test a lamp that is due for replacement', () => {
    const items = dueItems([lamp({ replaceDueOn: '2026-03-01' })], '2026-03-01');
    expect(items.map((i) => i.kind)).toEqual(['replace']);
  });

  it('skips retired and heat-only lamps', () => {
    expect(dueItems([lamp({ status: 'retired' }), lamp({ status: 'heat-only' })], '2027-01-01')).toEqual([]);
  });

  it('groups by keeper in date order', () => {
    const items = dueItems(
      [
        lamp({ lampId: 1, keeperId: 2, testDueOn: '2026-03-05' }),
        lamp({ lampId: 2, keeperId: 1 }),
        lamp({ lampId: 3, keeperId: 2, testDueOn: '2026-03-01' }),
      ],
      '2026-03-01',
    );
    const groups = byKeeper(items);
    expect([...groups.keys()]).toEqual([1, 2]);
    expect(groups.get(2)!.map((i) => i.lampId)).toEqual([3, 1]);
  });
});

describe('composeReminder', () => {
  it('lists every due lamp with its date, a link and the cautions', () => {
    const items = dueItems(
      [lamp({ lampId: 1, replaceDueOn: '2026-03-02' }), lamp({ lampId: 2, label: 'Spot lamp' })],
      '2026-03-01',
    );
    const { subject, text } = composeReminder({ name: 'Test Keeper' }, items, 'http://localhost:3000');
    expect(subject).toBe('Baskwell lamp log: 1 lamp to replace, 1 lamp to test');
    expect(text).toContain('Basking tube (Desert vivarium): Replace by 2026-03-02');
    expect(text).toContain('Spot lamp (Desert vivarium): Test with a meter by 2026-03-01');
    expect(text).toContain('http://localhost:3000/lamp-log');
    expect(text).toMatch(/estimates/);
    expect(text).toMatch(/vet/);
  });
});
