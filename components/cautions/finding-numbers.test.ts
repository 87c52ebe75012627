import { describe, expect, it } from 'vitest';
import { numberLines, sourcesFor } from './finding-numbers';

/** A passed finding with only the numbers these lines are made from. */
const passed = (id: string, numbers: Record<string, number>) => ({
  id,
  status: 'pass' as const,
  title: '',
  message: '',
  numbers,
});

describe('finding numbers', () => {
  it('labels the numbers and joins ranges with their unit', () => {
    const lines = numberLines(passed('hot-spot', { hotC: 43.83, targetLo: 40, targetHi: 45 }));
    expect(lines).toEqual([
      { key: 'hotC', label: 'Hottest reachable surface', value: '43.8 °C' },
      { key: 'targetLo', label: 'Target on the species sheet', value: '40–45 °C' },
    ]);
  });

  it('shows shares as percentages and zone ranges in UV Index', () => {
    const lines = numberLines(
      passed('basking-uvi', { maxUvi: 4.7, zone: 4, zoneMaxLo: 4.5, zoneMaxHi: 9.5 }),
    );
    expect(lines.map((l) => l.value)).toEqual(['4.7', '4.5–9.5 UVI']);
    const share = numberLines(passed('uv-refuge', { refugeShare: 0.44 }));
    expect(share[0]!.value).toBe('44 %');
  });

  it('finds the sheet source behind a finding', () => {
    const sources = [
      { citation: 'A', confidence: 'x', covers: ['uvZone' as const] },
      { citation: 'B', confidence: 'y', covers: ['baskingSurfaceC' as const] },
    ];
    expect(sourcesFor('hot-spot', sources).map((s) => s.citation)).toEqual(['B']);
    expect(sourcesFor('basking-uvi', sources).map((s) => s.citation)).toEqual(['A']);
    expect(sourcesFor('lamp-in-reach', sources)).toEqual([]);
  });
});
