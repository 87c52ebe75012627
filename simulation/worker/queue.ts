/**
 * Latest-wins queue of the worker: at most one request waits; a newer one replaces it and the replaced
 * request is answered "superseded" at once. The request being computed is never interrupted.
 */
import type { SimRequest, SimResponse } from './protocol';

export class LatestRequestQueue {
  private waiting: SimRequest | null = null;

  /** Queue a request; returns the response for the request it replaces, if any. */
  push(req: SimRequest): SimResponse | null {
    const old = this.waiting;
    this.waiting = req;
    return old ? { id: old.id, kind: 'superseded' } : null;
  }

  /** The request to compute next (and empties the queue). */
  take(): SimRequest | null {
    const r = this.waiting;
    this.waiting = null;
    return r;
  }

  get size(): number {
    return this.waiting ? 1 : 0;
  }
}
