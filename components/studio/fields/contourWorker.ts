/// <reference lib="webworker" />
// Contour bands off the main thread, latest request wins (as in the engine's worker).
import { contourBands, defaultThresholds } from '@/simulation';
import { contourAnswer, type ContourRequest, type ContourResponse } from './contourProtocol';

const scope = self as unknown as {
  onmessage: ((e: MessageEvent<ContourRequest>) => void) | null;
  postMessage(m: ContourResponse): void;
};
let waiting: ContourRequest | null = null;
let scheduled = false;

function runNext() {
  scheduled = false;
  const req = waiting;
  waiting = null;
  if (req) scope.postMessage(contourAnswer(req, { contourBands, defaultThresholds } as never));
}

scope.onmessage = (e) => {
  if (waiting) scope.postMessage({ id: waiting.id, kind: 'superseded' });
  waiting = e.data;
  if (!scheduled) {
    scheduled = true;
    setTimeout(runNext, 0);
  }
};
