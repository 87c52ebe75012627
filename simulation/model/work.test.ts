import { describe, expect, it } from 'vitest';
import { benchDesign, emptyDesign, heaviestAllowedDesign } from '../testing/fixtures';
import { parseDesign } from './parse';
import { computableDesignSchema, designSchema, TOO_COMPLEX } from './schema';
import { designWork, MAX_DESIGN_WORK, reportCellCm } from './work';

describe('design work bound', () => {
  it('counts grid cells × lamps × (barrier edges + 1) on the server’s grid', () => {
    // 120 × 60 cm at 0.5 cm: 240 × 120 cells; 3 lamps; 3 segments (1 edge) and 9 four-sided barriers.
    expect(designWork(benchDesign(1, 1))).toEqual({
      cells: 28_800,
      lamps: 3,
      barrierEdges: 39,
      work: 28_800 * 3 * 40,
    });
    // A room-sized enclosure gets coarser cells: at most 240 along the longer side.
    expect(reportCellCm({ width: 1000, height: 400 })).toBe(4.2);
    expect(designWork(emptyDesign(1000, 1000)).cells).toBeLessThanOrEqual(240 * 240);
    expect(designWork(emptyDesign()).work).toBe(0);
  });

  it('accepts the heaviest allowed design and refuses one more copy of its lamps or barriers, naming the limit', () => {
    const heaviest = heaviestAllowedDesign();
    expect(designWork(heaviest).work).toBeLessThanOrEqual(MAX_DESIGN_WORK);
    expect(designWork(heaviest).work).toBeGreaterThan(0.9 * MAX_DESIGN_WORK);
    expect(computableDesignSchema.safeParse(heaviest).success).toBe(true);
    for (const over of [benchDesign(10, 9), benchDesign(9, 10)]) {
      const r = parseDesign(over, undefined, { computable: true });
      expect(r.ok).toBe(false);
      if (r.ok) continue;
      expect(r.error.path).toBe('objects');
      expect(r.error.code).toBe(TOO_COMPLEX);
      expect(r.error.message).toContain('the limit is 300 million');
      expect(r.error.message).toMatch(/28,800 grid cells × 30 lamps|28,800 grid cells × 27 lamps × \(390/);
    }
  });

  it('the design of 100 lamps and 100 barriers that held a server for seconds is refused', () => {
    const objects: ReturnType<typeof emptyDesign>['objects'] = [];
    for (let i = 0; i < 100; i++) {
      objects.push({ type: 'lamp', id: `l${i}`, tech: 'halogen', form: 'bulb', x: i + 10, y: 59, watts: 50 });
      objects.push({ type: 'ledge', id: `b${i}`, x: i, y: (i % 5) * 10, width: 1, height: 1 });
    }
    const r = parseDesign({ ...emptyDesign(), objects }, undefined, { computable: true });
    expect(r.ok).toBe(false);
    expect(r.ok ? null : r.error.code).toBe(TOO_COMPLEX);
  });

  it('reading is not bounded: a stored design over the bound still opens, to be simplified', () => {
    const over = benchDesign(10, 10);
    expect(designSchema.safeParse(over).success).toBe(true);
    expect(parseDesign(over).ok).toBe(true);
  });
});
