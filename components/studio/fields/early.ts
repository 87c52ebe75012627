// Started as early as the page hydrates, before the studio's own code and Konva arrive: the engine's
// and the contour tracer's workers (each loads and compiles its code in parallel with the page), and
// the one performance mark that says the field is on screen. Kept tiny on purpose: the page's first
// chunk carries it, and the workers' code lives in their own files.

let engine: Worker | null = null;
let contour: Worker | null = null;

// The bundler finds a worker's file only in the literal form `new Worker(new URL('…', import.meta.url))`,
// so each worker is spelled out once here and nowhere else.
const newEngineWorker = () =>
  new Worker(new URL('../../../simulation/worker/entry.ts', import.meta.url), { type: 'module' });
const newContourWorker = () => new Worker(new URL('./contourWorker.ts', import.meta.url), { type: 'module' });

function start(make: () => Worker): Worker | null {
  try {
    return make();
  } catch {
    // The hooks try again and report the failure where the user sees it.
    return null;
  }
}

/** Starts both workers once; later calls do nothing until the studio has taken them. */
export function startStudioWorkers(): void {
  if (typeof window === 'undefined' || typeof Worker === 'undefined') return;
  engine ??= start(newEngineWorker);
  contour ??= start(newContourWorker);
}

/** The engine worker started early, or a new one. Each caller owns (and terminates) what it gets. */
export function takeEngineWorker(): Worker {
  const w = engine ?? newEngineWorker();
  engine = null;
  return w;
}

/** The contour worker started early, or a new one. */
export function takeContourWorker(): Worker {
  const w = contour ?? newContourWorker();
  contour = null;
  return w;
}

/** Ends workers started early that no studio took (the page was left before the studio loaded). */
export function stopUnusedStudioWorkers(): void {
  engine?.terminate();
  contour?.terminate();
  engine = contour = null;
}

/** The mark `npm run bench:studio` and the browser tests read: set once, when a field is first visible. */
export const FIELD_VISIBLE_MARK = 'field-visible';

export function markFieldVisible(): void {
  if (typeof performance === 'undefined' || !performance.mark) return;
  if (performance.getEntriesByName(FIELD_VISIBLE_MARK, 'mark').length === 0)
    performance.mark(FIELD_VISIBLE_MARK);
}

/** Set once, when the engine's first answer arrives (the field as the studio itself computed it). */
export const FIELD_COMPUTED_MARK = 'field-computed';

export function markFieldComputed(): void {
  if (typeof performance === 'undefined' || !performance.mark) return;
  if (performance.getEntriesByName(FIELD_COMPUTED_MARK, 'mark').length === 0)
    performance.mark(FIELD_COMPUTED_MARK);
}
