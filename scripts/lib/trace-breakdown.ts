/**
 * Where the processor went while a page waited for its first paint, read from a Chromium performance
 * trace (`browser.startTracing`): each thread's CPU time (the trace's thread duration, not wall time)
 * between two moments of the navigation, grouped by what the thread does. On a shared machine the wall
 * time between the HTML's last byte and the first paint mixes the page's own work with waiting for a
 * core; the CPU time is the page's work alone.
 */

export type TraceEvent = {
  name: string;
  ph: string;
  ts: number;
  dur?: number;
  tdur?: number;
  pid: number;
  tid: number;
  args?: { name?: string; data?: { isLoadingMainFrame?: boolean; documentLoaderURL?: string } };
};

export type CpuBreakdown = {
  /** The page's main thread: parsing, style, layout, paint, script. */
  main: number;
  /** The page's other threads: raster, script streaming and compiling, its compositor. */
  pageWorkers: number;
  /** Every other process of the browser (its network and UI threads, the display compositor). */
  browser: number;
};

/** The page's navigation start: the main frame's navigation to an http(s) document. */
function navigationOf(events: TraceEvent[]): TraceEvent | undefined {
  return events.find(
    (e) =>
      e.name === 'navigationStart' &&
      e.args?.data?.isLoadingMainFrame === true &&
      /^https?:/.test(e.args.data.documentLoaderURL ?? ''),
  );
}

/**
 * CPU milliseconds each group of threads spent from `fromMs` to `toMs` after the navigation started
 * (times as the page's performance timeline gives them). Only outermost complete events count, so nested
 * ones are not counted twice; an event that straddles a bound counts in proportion.
 */
export function cpuBetween(events: TraceEvent[], fromMs: number, toMs: number): CpuBreakdown | null {
  const nav = navigationOf(events);
  if (!nav) return null;
  const from = nav.ts + fromMs * 1000;
  const to = nav.ts + toMs * 1000;
  const out: CpuBreakdown = { main: 0, pageWorkers: 0, browser: 0 };
  const busyUntil = new Map<string, number>();
  const complete = events
    .filter((e) => e.ph === 'X' && e.dur !== undefined && e.tdur !== undefined)
    .sort((a, b) => a.ts - b.ts || b.dur! - a.dur!);
  for (const e of complete) {
    const thread = `${e.pid}:${e.tid}`;
    const end = e.ts + e.dur!;
    if ((busyUntil.get(thread) ?? -Infinity) > e.ts) continue;
    busyUntil.set(thread, end);
    const inside = Math.min(end, to) - Math.max(e.ts, from);
    if (inside <= 0) continue;
    const cpu = (e.tdur! * (e.dur! > 0 ? inside / e.dur! : 1)) / 1000;
    if (e.pid !== nav.pid) out.browser += cpu;
    else if (e.tid === nav.tid) out.main += cpu;
    else out.pageWorkers += cpu;
  }
  return out;
}
