// Which field buffers the studio may hand back to its engine worker, for later fields to be computed into
// instead of allocated (a drag step then allocates no grid-sized buffer). A buffer handed back is
// transferred, so here it is detached and reads as empty: a grid is handed back only once a later one has
// been committed to the screen, when nothing on the page reads it any more (the contours copy the grid
// they trace in the effect after its commit, the pointer readout samples the grid it was rendered with).
import type { FieldGrid } from '@/simulation';

/** Buffers kept for the next request: one a drag step, at most one more across a change of cell size. */
const MAX_FREE = 2;

export class ShownFields {
  private shown: FieldGrid | null = null;
  private free: ArrayBuffer[] = [];

  /** The grid the page now shows: call it after the commit that put it on screen (an effect). */
  committed(grid: FieldGrid | null): void {
    if (grid === this.shown) return;
    const old = this.shown;
    this.shown = grid;
    const buffer = old?.uvb.buffer;
    if (!(buffer instanceof ArrayBuffer) || buffer.byteLength === 0) return;
    // A grid sharing a buffer with the one on screen stays (the engine never hands out such a pair).
    if (grid && [grid.uvb, grid.uvi, grid.tempC].some((a) => a.buffer === buffer)) return;
    if (this.free.includes(buffer)) return;
    this.free.push(buffer);
    if (this.free.length > MAX_FREE) this.free.shift();
  }

  /** The buffers to transfer with the next request; each is handed out once. */
  take(): ArrayBuffer[] {
    // A detached buffer cannot be transferred (the request would fail to post).
    return this.free.splice(0).filter((b) => b.byteLength > 0);
  }
}
