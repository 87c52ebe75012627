import { describe, expect, it } from 'vitest';
import { layoutBarLabels, shorten, textWidth, wrapWords } from './bar-labels';

// The lamp technologies the counter figures chart by (the generic presets' names).
const TECHNOLOGIES = [
  'T5 fluorescent tube',
  'Compact fluorescent UVB lamp',
  'Metal halide UVB lamp',
  'Self-ballasted mercury vapour lamp',
  'T8 fluorescent tube',
  'UVB LED panel',
];
/** The slot of one of six bars across the chart's 580 px of bars. */
const SIX = 580 / 6;

describe('layoutBarLabels', () => {
  it('keeps short labels level on one line each', () => {
    const l = layoutBarLabels(
      ['under 6 months', '6–12 months', '12–18 months', '18 months or more'],
      580 / 4,
      12,
    );
    expect(l.mode).toBe('flat');
    expect(l.lines).toEqual([['under 6 months'], ['6–12 months'], ['12–18 months'], ['18 months or more']]);
  });

  it('wraps long names onto lines that each fit their bar, so neighbours cannot run into each other', () => {
    const l = layoutBarLabels(TECHNOLOGIES, SIX, 12);
    expect(l.mode).toBe('wrapped');
    // Every word kept, in order.
    expect(l.lines.map((lines) => lines.join(' '))).toEqual(TECHNOLOGIES);
    for (const lines of l.lines) {
      expect(lines.length).toBeLessThanOrEqual(3);
      for (const line of lines) expect(textWidth(line, 12)).toBeLessThanOrEqual(SIX - 4);
    }
    // Room below the chart for the most lines any label has.
    const most = Math.max(...l.lines.map((x) => x.length));
    expect(most).toBeGreaterThan(1);
    expect(l.bottom).toBeGreaterThan(layoutBarLabels(['a'], SIX, 12).bottom + (most - 1) * 12);
  });

  it('slants labels when asked (many bars) or when a word is wider than its slot, shortening the longest', () => {
    const weeks = Array.from({ length: 26 }, (_, i) => `${i + 1} Nov 2026`);
    const w = layoutBarLabels(weeks, 580 / 26, 12, { forceSlant: true });
    expect(w.mode).toBe('slanted');
    expect(w.lines.flat()).toEqual(weeks);
    const narrow = layoutBarLabels(['Incandescent', 'Fluorescent'], 40, 12, { maxSlanted: 60 });
    expect(narrow.mode).toBe('slanted');
    for (const [line] of narrow.lines) expect(textWidth(line!, 12)).toBeLessThanOrEqual(60);
    expect(narrow.lines[0]![0]).toMatch(/…$/);
    // The room below grows with the longest slanted label, bounded by maxSlanted.
    expect(narrow.bottom).toBeLessThan(w.bottom + 1);
  });
});

describe('text helpers', () => {
  it('estimates wider text as wider, and capitals wider than small letters', () => {
    expect(textWidth('mercury vapour', 12)).toBeGreaterThan(textWidth('mercury', 12));
    expect(textWidth('UVB', 12)).toBeGreaterThan(textWidth('uvb', 12));
  });

  it('wraps at spaces only and refuses a word wider than the line', () => {
    expect(wrapWords('Metal halide UVB lamp', 80, 12)).toEqual(['Metal halide', 'UVB lamp']);
    expect(wrapWords('Self-ballasted', 30, 12)).toBeNull();
  });

  it('shortens with an ellipsis only what is too wide', () => {
    expect(shorten('UVB LED panel', 200, 12)).toBe('UVB LED panel');
    const s = shorten('Self-ballasted mercury vapour lamp', 90, 12);
    expect(s.endsWith('…')).toBe(true);
    expect(textWidth(s, 12)).toBeLessThanOrEqual(90);
  });
});
