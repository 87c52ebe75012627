import { describe, expect, it } from 'vitest';
import {
  EXAMPLE_DESIGN,
  FieldSolver,
  handleRequest,
  takeHandedBack,
  transferables,
  type Design,
  type FieldGrid,
  type SimRequest,
  type SimResult,
} from '@/simulation';
import { ShownFields } from './handBack';

function grid(cells = 4): FieldGrid {
  const all = new Float32Array(3 * cells);
  return {
    nx: cells,
    ny: 1,
    cellCm: 1,
    width: cells,
    height: 1,
    uvb: all.subarray(0, cells),
    uvi: all.subarray(cells, 2 * cells),
    tempC: all.subarray(2 * cells),
  };
}

describe('ShownFields', () => {
  it('hands back a grid once a later one is on screen, each buffer once, never the one shown', () => {
    const shown = new ShownFields();
    const [a, b, c] = [grid(), grid(), grid()];
    shown.committed(a);
    expect(shown.take()).toEqual([]);
    // An effect run again for the same grid (React's development double run) frees nothing.
    shown.committed(a);
    expect(shown.take()).toEqual([]);
    shown.committed(b);
    shown.committed(b);
    const back = shown.take();
    expect(back).toHaveLength(1);
    expect(back[0]).toBe(a.uvb.buffer);
    expect(shown.take()).toEqual([]);
    shown.committed(c);
    expect(shown.take()).toEqual([b.uvb.buffer]);
  });

  it('keeps at most two buffers, and none that is detached', () => {
    const shown = new ShownFields();
    const gs = [grid(), grid(), grid(), grid(), grid()];
    for (const g of gs) shown.committed(g);
    const back = shown.take();
    expect(back).toEqual([gs[2]!.uvb.buffer, gs[3]!.uvb.buffer]);
    shown.committed(grid());
    const gone = gs[4]!.uvb.buffer as ArrayBuffer;
    structuredClone(gone, { transfer: [gone] });
    expect(shown.take()).toEqual([]);
  });

  it('over a drag through the worker protocol, the grid on screen never changes or empties', () => {
    // The page and the worker as in the studio, each message cloned with its buffers transferred.
    const solver = new FieldSolver();
    const shown = new ShownFields();
    let design: Design = EXAMPLE_DESIGN;
    const lamp = design.objects.find((o) => o.type === 'lamp')!;
    let onScreen: FieldGrid | null = null;
    let values: Float32Array[] = [];
    let reused = 0;
    for (let id = 1; id <= 8; id++) {
      design = {
        ...design,
        objects: design.objects.map((o) =>
          o.id === lamp.id && o.type === 'lamp' ? { ...o, x: o.x + 1 } : o,
        ),
      };
      const recycle = shown.take();
      const sent: SimRequest = { id, kind: 'simulate', design, cellCm: 2, recycle };
      const arrived = structuredClone(sent, { transfer: recycle });
      takeHandedBack(arrived, solver);
      const res = handleRequest(arrived, solver) as SimResult;
      if (arrived.recycle?.some((b) => b === res.uvb.buffer)) reused++;
      const msg = structuredClone(res, { transfer: transferables(res) });
      // The grid shown until this commit still reads as it did, though buffers went back meanwhile.
      if (onScreen) expect([onScreen.uvb, onScreen.uvi, onScreen.tempC]).toEqual(values);
      onScreen = msg;
      values = [msg.uvb.slice(), msg.uvi.slice(), msg.tempC.slice()];
      shown.committed(onScreen);
    }
    // From the third request on, each result is computed into a buffer the page handed back.
    expect(reused).toBe(6);
  });
});
