import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { arbDesign } from '../testing/arbitraries';
import { compileScene } from './scene';
import { evalCell, evalSpan, prepareRow, RowData, Scratch } from './kernel';
import { fillLamp, pickCorners, Workspace } from './workspace';
import { gridSize } from './types';
import { benchDesign } from '../testing/fixtures';
import type { Design } from '../model/schema';

const CELL = 2;

/** The interval of the lamp line barrier c hides from a cell, by projecting all its corners (no shortcut). */
function hidden(row: RowData, c: number, qx: number) {
  let lo = Infinity;
  let hi = -Infinity;
  for (let v = row.vStart[c]!; v < row.vStart[c]! + row.vCount[c]!; v++) {
    const x = row.A[v]! + row.B[v]! * qx;
    lo = Math.min(lo, x);
    hi = Math.max(hi, x);
  }
  return { lo, hi };
}

function wholeLampHidden(row: RowData, c: number, qx: number, s1: number, s2: number, tube: boolean) {
  const { lo, hi } = hidden(row, c, qx);
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

  it('the row sweep keeps the bits of evalCell with more barriers in a row than one mask word holds (32)', () => {
    // Forty screens of different heights, spans and transmissions under a tube and a bulb: rows below
    // them take all forty, so barriers past the 32nd are in range, hide part of a lamp or all of it.
    const objects: Design['objects'] = [
      { type: 'lamp', id: 't', tech: 't5', form: 'tube', x: 55, y: 62, length: 55 },
      { type: 'lamp', id: 'b', tech: 'halogen', form: 'bulb', x: 95, y: 61 },
    ];
    for (let k = 0; k < 40; k++) {
      const x1 = 5 + ((k * 37) % 90);
      const y = 20 + ((k * 13) % 35);
      objects.push({
        type: 'screen',
        id: `s${k}`,
        x1,
        y1: y,
        x2: x1 + 6 + (k % 5) * 3,
        y2: y + (k % 3),
        uvbTransmission: k % 4 === 0 ? 0 : 0.5 + (k % 7) / 20,
      });
    }
    const design: Design = {
      format: 'baskwell.design',
      version: 2,
      enclosure: { width: 120, height: 60, depth: 60 },
      objects,
    };
    const scene = compileScene(design);
    const n = scene.occluders.length;
    const { nx, ny } = gridSize(design.enclosure.width, design.enclosure.height, 1);
    const ws = new Workspace();
    ws.ensure(n);
    const row = new RowData(n);
    const s = new Scratch(n);
    let off = 0;
    let wide = 0;
    for (const lamp of scene.lamps) {
      const uv = new Float64Array(nx * ny);
      const ir = new Float64Array(nx * ny);
      fillLamp(ws, lamp, scene.occluders, uv, ir, nx, ny, 1);
      for (let j = 0; j < ny; j++) {
        const lit = prepareRow(lamp, scene.occluders, j + 0.5, row, s);
        if (lit && row.count > 32) wide++;
        for (let i = 0; i < nx; i++) {
          if (lit) evalCell(lamp, row, i + 0.5, s);
          if (!Object.is(uv[j * nx + i], lit ? s.uv : 0)) off++;
          if (!Object.is(ir[j * nx + i], lit ? s.ir : 0)) off++;
        }
      }
    }
    expect(wide).toBeGreaterThan(10);
    expect(off).toBe(0);
  });

  /** A design's scene and grid, row data and scratch for its barriers, and a row's two value buffers. */
  function rowSetup(design: Design, cell: number) {
    const scene = compileScene(design);
    const n = scene.occluders.length;
    const { nx, ny } = gridSize(design.enclosure.width, design.enclosure.height, cell);
    return {
      scene,
      nx,
      ny,
      row: new RowData(n),
      s: new Scratch(n),
      uv: new Float64Array(nx),
      ir: new Float64Array(nx),
    };
  }

  /** Cells of a whole-row span that differ in any bit from the same cells evaluated one at a time. */
  function spanOff(design: Design, cell: number): { off: number; pieces: number } {
    const { scene, nx, ny, row, s, uv, ir } = rowSetup(design, cell);
    let off = 0;
    let pieces = 0;
    for (const lamp of scene.lamps) {
      for (let j = 0; j < ny; j++) {
        if (!prepareRow(lamp, scene.occluders, (j + 0.5) * cell, row, s)) continue;
        evalSpan(lamp, row, 0, nx, cell, 0.5, uv, ir, s);
        for (let i = 0; i < nx; i++) {
          const qx = (i + 0.5) * cell;
          evalCell(lamp, row, qx, s);
          if (!Object.is(uv[i], s.uv) || !Object.is(ir[i], s.ir)) off++;
          if (!lamp.tube) continue;
          // Cells where a tube is partly hidden by two or more barriers at once: the runs kept from cell
          // to cell are for these.
          let partial = 0;
          for (let c = 0; c < row.count; c++) {
            const { lo, hi } = hidden(row, c, qx);
            if (Math.min(hi, lamp.s2) > Math.max(lo, lamp.s1) && (lo > lamp.s1 || hi < lamp.s2)) partial++;
          }
          if (partial >= 2) pieces++;
        }
      }
    }
    return { off, pieces };
  }

  it('a corner picked for a piece is the lowest (highest) projection at every cell of it, bit for bit', () => {
    /** Picks over pieces of the row cut every `step` cells; corners picked, and cells where one is wrong. */
    function check(design: Design, cell: number, step: number) {
      const scene = compileScene(design);
      const { nx, ny } = gridSize(design.enclosure.width, design.enclosure.height, cell);
      const row = new RowData(scene.occluders.length);
      const s = new Scratch(scene.occluders.length);
      let picked = 0;
      let wrong = 0;
      for (const lamp of scene.lamps) {
        for (let j = 0; j < ny; j++) {
          if (!prepareRow(lamp, scene.occluders, (j + 0.5) * cell, row, s)) continue;
          for (let from = 0; from < nx; from += step) {
            const to = Math.min(nx, from + step);
            for (let c = 0; c < row.count; c++) {
              pickCorners(row, c, from, to, cell);
              const vl = row.lv[c]!;
              const vh = row.hv[c]!;
              if (vl >= 0) picked++;
              if (vh >= 0) picked++;
              for (let i = from; i < to; i++) {
                const qx = (i + 0.5) * cell;
                const { lo, hi } = hidden(row, c, qx);
                if (vl >= 0 && !Object.is(lo, row.A[vl]! + row.B[vl]! * qx)) wrong++;
                if (vh >= 0 && !Object.is(hi, row.A[vh]! + row.B[vh]! * qx)) wrong++;
              }
            }
          }
        }
      }
      return { picked, wrong };
    }
    // The bench's design, in pieces as long as a row and as short as a few cells.
    for (const step of [3, 17, 1000]) {
      const r = check(benchDesign(), 0.5, step);
      expect(r.picked).toBeGreaterThan(1000);
      expect(r.wrong).toBe(0);
    }
    fc.assert(
      fc.property(arbDesign({ maxObjects: 10 }), fc.integer({ min: 3, max: 40 }), (design, step) => {
        expect(check(design, CELL, step).wrong).toBe(0);
      }),
      { numRuns: 60 },
    );
  });

  /**
   * A row cut into pieces as the row sweep cuts it (each barrier out of range, hiding the whole lamp, or
   * partly hiding it at every cell of a piece), each piece evaluated as one span, its corners picked for
   * the whole piece or not (`pick`); returns the cells whose values differ in any bit from the same cell evaluated alone with the same row
   * state, and the cells the spans evaluated in stretches (stretchEnd).
   */
  function stretchOff(design: Design, cell: number, pick: boolean): { off: number; stretched: number } {
    const { scene, nx, ny, row, s, uv, ir } = rowSetup(design, cell);
    const one = new Float64Array(nx);
    const oneIr = new Float64Array(nx);
    let off = 0;
    const status = (c: number, qx: number) =>
      !(qx > row.qa[c]! && qx < row.qb[c]!) ? 0 : qx > row.fa[c]! && qx < row.fb[c]! ? 2 : 1;
    for (const lamp of scene.lamps) {
      for (let j = 0; j < ny; j++) {
        if (!prepareRow(lamp, scene.occluders, (j + 0.5) * cell, row, s)) continue;
        const count = row.count;
        const key = (i: number) => {
          let k = '';
          for (let c = 0; c < count; c++) k += status(c, (i + 0.5) * cell);
          return k;
        };
        let from = 0;
        while (from < nx) {
          const k = key(from);
          let to = from + 1;
          while (to < nx && key(to) === k) to++;
          let na = 0;
          let gu = 1;
          let gi = 1;
          for (let c = 0; c < count; c++) {
            if (k[c] === '2') {
              gu *= lamp.tUv[row.occ[c]!]!;
              gi *= lamp.tIr[row.occ[c]!]!;
            } else if (k[c] === '1') row.act[na++] = c;
          }
          row.nAct = na;
          row.gu0 = gu;
          row.gi0 = gi;
          row.inRange = true;
          for (let t = 0; t < na; t++) {
            row.lv[row.act[t]!] = -1;
            row.hv[row.act[t]!] = -1;
            if (pick) pickCorners(row, row.act[t]!, from, to, cell);
          }
          evalSpan(lamp, row, from, to, cell, 0.5, uv, ir, s);
          for (let i = from; i < to; i++) {
            evalSpan(lamp, row, i, i + 1, cell, 0.5, one, oneIr, s);
            if (!Object.is(uv[i], one[i]) || !Object.is(ir[i], oneIr[i])) off++;
          }
          from = to;
        }
      }
    }
    return { off, stretched: s.stretched };
  }

  it("a row sweep's piece evaluated in stretches (the structure kept over cells) has the bits of each cell alone", () => {
    // The bench's design: thousands of partly hidden cells of its tubes are evaluated in stretches.
    // With corners picked for whole pieces (as for a bulb) and without (as the row sweep leaves a tube's).
    for (const pick of [true, false]) {
      for (const cell of [0.5, 0.25]) {
        const bench = stretchOff(benchDesign(), cell, pick);
        expect(bench.stretched).toBeGreaterThan(5000);
        expect(bench.off).toBe(0);
      }
    }
    let stretched = 0;
    fc.assert(
      fc.property(
        arbDesign({ maxObjects: 10 }),
        fc.constantFrom(0.5, CELL),
        fc.boolean(),
        (design, cell, pick) => {
          const r = stretchOff(design, cell, pick);
          expect(r.off).toBe(0);
          stretched += r.stretched;
        },
      ),
      { numRuns: 60 },
    );
    expect(stretched).toBeGreaterThan(0);
  });

  it("a row evaluated as one span (a tube's runs kept from cell to cell) has the bits of each cell alone", () => {
    // The bench's design: thousands of cells see a tube partly hidden by two to five barriers.
    const bench = spanOff(benchDesign(), 0.5);
    expect(bench.pieces).toBeGreaterThan(1000);
    expect(bench.off).toBe(0);
    fc.assert(
      fc.property(arbDesign({ maxObjects: 10 }), (design) => {
        expect(spanOff(design, CELL).off).toBe(0);
      }),
      { numRuns: 60 },
    );
  });
});
