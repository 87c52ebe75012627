import { describe, expect, it } from 'vitest';
import { cellSizeFor, CELLS_AT_REST, CELLS_WHILE_DRAGGING } from './studio-cell-size';

describe('cellSizeFor', () => {
  it('keeps the cell count within budget, finer at rest than while dragging', () => {
    for (const [w, h] of [
      [120, 60],
      [60, 45],
      [240, 120],
      [1000, 1000],
    ] as const) {
      const rest = cellSizeFor(w, h, false);
      const drag = cellSizeFor(w, h, true);
      expect(Math.ceil(w / rest) * Math.ceil(h / rest)).toBeLessThanOrEqual(CELLS_AT_REST * 1.1);
      expect(Math.ceil(w / drag) * Math.ceil(h / drag)).toBeLessThanOrEqual(CELLS_WHILE_DRAGGING * 1.1);
      expect(rest).toBeLessThanOrEqual(drag);
    }
    expect(cellSizeFor(30, 30, false)).toBe(0.5); // never finer than the engine's default
  });
});
