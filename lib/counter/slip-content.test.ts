import { describe, expect, it } from 'vitest';
import type { CounterVerdict } from './assess';
import type { CounterLampView } from './queries';
import { slipContent, slipText } from './slip-content';

/** The fields of a counter lamp the slip reads, for a lamp judged "replace". */
const lampWith = (verdict: Partial<CounterVerdict>) =>
  ({
    label: 'Dragon tube',
    lampTypeName: 'Invented T5 tube',
    firstUsedOn: '2026-02-08',
    firstUsedEstimated: true,
    readings: [{ value: 2.5, unit: 'uvi', distanceCm: 30, takenAt: '2026-06-01T10:00:00Z' }],
    answer: {
      verdict: {
        kind: 'replace',
        headline: 'Replace it: the basking spot at home gets less UV than the species needs.',
        testAgainOn: null,
        output: null,
        basking: null,
        replacement: null,
        cautions: ['Every figure here is an estimate.'],
        ...verdict,
      },
    },
  }) as unknown as CounterLampView;

describe('the test slip', () => {
  it('carries what a new lamp would give at the same spot, when the verdict says it needs saying', () => {
    const note =
      'A new lamp of this type would give about UVI 9 at the basking spot (30 cm from the lamp), above the top of the zone’s basking range (UVI 7.4): fit the new lamp farther from the basking spot, or lower the spot, and measure before the animal uses it.';
    const c = slipContent({
      shop: 'Invented shop',
      customerName: null,
      lamp: lampWith({ replacement: note }),
    });
    expect(c.rows.find(([label]) => label === 'New lamp at the same spot')?.[1]).toBe(
      note.replace(/\.$/, ''),
    );
    expect(slipText(c, 'https://example.com/u').text).toContain('farther from the basking spot');
  });

  it('has no such line otherwise', () => {
    const c = slipContent({ shop: 'Invented shop', customerName: null, lamp: lampWith({}) });
    expect(c.rows.map(([label]) => label)).toEqual(['Lamp', 'Reading']);
  });
});
