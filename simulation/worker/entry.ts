/// <reference lib="webworker" />
/**
 * Web Worker entry: thin. Messages go into a latest-wins queue; the next request runs on a fresh task so
 * that requests arriving meanwhile can replace it first. Field buffers are transferred, not copied, and the
 * page transfers those it no longer reads back with a later request, for the next fields to be computed into.
 */
import { FieldSolver } from '../fields/solver';
import { handleRequest, takeHandedBack } from './handle';
import { LatestRequestQueue } from './queue';
import { transferables, type SimRequest, type SimResponse } from './protocol';

interface WorkerScope {
  onmessage: ((e: MessageEvent<SimRequest>) => void) | null;
  postMessage(message: SimResponse, transfer: Transferable[]): void;
}

const scope = self as unknown as WorkerScope;
const queue = new LatestRequestQueue();
const solver = new FieldSolver();
let scheduled = false;

function runNext() {
  scheduled = false;
  const req = queue.take();
  if (!req) return;
  const res = handleRequest(req, solver);
  scope.postMessage(res, transferables(res));
}

scope.onmessage = (e) => {
  takeHandedBack(e.data, solver);
  const replaced = queue.push(e.data);
  if (replaced) scope.postMessage(replaced, []);
  if (!scheduled) {
    scheduled = true;
    setTimeout(runNext, 0);
  }
};
