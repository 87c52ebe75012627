// Undo/redo of the document. Generic over the document type and immutable, so the React
// binding only swaps references. A gesture (one drag) is a transaction: the document moves
// live while dragging, but only one undo step is recorded when the gesture ends.

export interface History<T> {
  past: T[];
  present: T;
  future: T[];
  /** The document as it was when the current gesture began; null outside gestures. */
  gestureBase: T | null;
}

export const HISTORY_LIMIT = 200;

export function createHistory<T>(present: T): History<T> {
  return { past: [], present, future: [], gestureBase: null };
}

/** Records a finished change as one undo step. Identical references are not recorded. */
export function commit<T>(h: History<T>, next: T): History<T> {
  if (h.gestureBase !== null) return { ...h, present: next };
  if (next === h.present) return h;
  const past = [...h.past, h.present];
  if (past.length > HISTORY_LIMIT) past.splice(0, past.length - HISTORY_LIMIT);
  return { past, present: next, future: [], gestureBase: null };
}

/** Starts a gesture: later commits update the present without new undo steps. */
export function beginGesture<T>(h: History<T>): History<T> {
  if (h.gestureBase !== null) return h;
  return { ...h, gestureBase: h.present };
}

/** Ends a gesture with a single undo step (none if nothing changed). */
export function endGesture<T>(h: History<T>): History<T> {
  const base = h.gestureBase;
  if (base === null) return h;
  if (base === h.present) return { ...h, gestureBase: null };
  const past = [...h.past, base];
  if (past.length > HISTORY_LIMIT) past.splice(0, past.length - HISTORY_LIMIT);
  return { past, present: h.present, future: [], gestureBase: null };
}

/** Abandons a gesture (Escape while dragging): back to where it began, no undo step. */
export function cancelGesture<T>(h: History<T>): History<T> {
  if (h.gestureBase === null) return h;
  return { ...h, present: h.gestureBase, gestureBase: null };
}

export function canUndo<T>(h: History<T>): boolean {
  return h.gestureBase === null && h.past.length > 0;
}

export function canRedo<T>(h: History<T>): boolean {
  return h.gestureBase === null && h.future.length > 0;
}

export function undo<T>(h: History<T>): History<T> {
  if (!canUndo(h)) return h;
  const past = h.past.slice(0, -1);
  const previous = h.past[h.past.length - 1] as T;
  return { past, present: previous, future: [h.present, ...h.future], gestureBase: null };
}

export function redo<T>(h: History<T>): History<T> {
  if (!canRedo(h)) return h;
  const [next, ...future] = h.future as [T, ...T[]];
  return { past: [...h.past, h.present], present: next, future, gestureBase: null };
}

/** Replaces the document without an undo step and forgets the history (loading, restoring a copy). */
export function reset<T>(present: T): History<T> {
  return createHistory(present);
}
