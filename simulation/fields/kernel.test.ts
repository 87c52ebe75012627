import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { arbDesign } from '../testing/arbitraries';
import { compileScene } from './scene';
import { evalCell, prepareRow, RowData, Scratch } from './kernel';
import { fillLamp, Workspace } from './workspace';
import { gridSize } from './types';

const CELL = 2;

/** The shadow intervals of every barrier at a cell, by projecting all its corners (no shortcut). */
function wholeLampHidden(row: RowData, c: number, qx: number, s1: number, s2: number, tube: boolean) {
  let lo = Infinity;
  let hi = -Infinity;
  for (let v = row.vStart[c]!; v < row.vStart[c]! + row.vCount[c]!; v++) {
    const x = row.A[v]! + row.B[v]! * qx;
    lo = Math.min(lo, x);
    hi = Math.max(hi, x);
  }
  return tube ? lo <= s1 && hi >= s2 : lo < s1 && s1 < hi;
}

describe('shortcuts of the shadow kernel', () => {
  it("a barrier's whole-lamp range (fa, fb) holds only cells where its projected corners hide the whole lamp", () => {
    let seen = 0;
    fc.assert(
      fc.property(arbDesign({ maxObjects: 10 }), (design) => {
        const scene = compileScene(design);
        const row = new RowData(scene.occluders.length);
        const s = new Scratch(scene.occluders.length);
        const { nx, ny } = gridSize(design.enclosure.width, design.enclosure.height, CELL);
        let wrong = 0;
        let inside = 0;
        for (const lamp of scene.lamps) {
          for (let j = 0; j < ny; j++) {
            if (!prepareRow(lamp, scene.occluders, (j + 0.5) * CELL, row, s)) continue;
            for (let c = 0; c < row.count; c++) {
              for (let i = 0; i < nx; i++) {
                const qx = (i + 0.5) * CELL;
                if (!(qx > row.fa[c]! && qx < row.fb[c]!)) continue;
                inside++;
                if (!(qx > row.qa[c]! && qx < row.qb[c]!)) wrong++;
                else if (!wholeLampHidden(row, c, qx, lamp.s1, lamp.s2, lamp.tube)) wrong++;
              }
            }
          }
        }
        expect(wrong).toBe(0);
        seen += inside;
      }),
      { numRuns: 80 },
    );
    // The shortcut was taken at all (the check above is not empty).
    expect(seen).toBeGreaterThan(0);
  });

  it('the row sweep (whole pieces hidden at once) gives each cell the value evalCell gives it alone', () => {
    fc.assert(
      fc.property(arbDesign({ maxObjects: 10 }), (design) => {
        const scene = compileScene(design);
        const n = scene.occluders.length;
        const { nx, ny } = gridSize(design.enclosure.width, design.enclosure.height, CELL);
        const ws = new Workspace();
        ws.ensure(n);
        const row = new RowData(n);
        const s = new Scratch(n);
        let off = 0;
        for (const lamp of scene.lamps) {
          const uv = new Float64Array(nx * ny);
          const ir = new Float64Array(nx * ny);
          fillLamp(ws, lamp, scene.occluders, uv, ir, nx, ny, CELL);
          for (let j = 0; j < ny; j++) {
            const lit = prepareRow(lamp, scene.occluders, (j + 0.5) * CELL, row, s);
            for (let i = 0; i < nx; i++) {
              if (lit) evalCell(lamp, row, (i + 0.5) * CELL, s);
              const u = lit ? s.uv : 0;
              const r = lit ? s.ir : 0;
              // The beam test of the sweep leaves cells outside a heat-free bulb's beam at zero too.
              const c = j * nx + i;
              if (Math.abs(uv[c]! - u) > 1e-12 * Math.abs(u)) off++;
              if (Math.abs(ir[c]! - r) > 1e-12 * Math.abs(r)) off++;
            }
          }
        }
        expect(off).toBe(0);
      }),
      { numRuns: 60 },
    );
  });
});
