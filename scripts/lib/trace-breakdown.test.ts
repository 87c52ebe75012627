import { describe, expect, it } from 'vitest';
import { cpuBetween, type TraceEvent } from './trace-breakdown';

const PAGE = 10;
const MAIN = 1;
const nav: TraceEvent = {
  name: 'navigationStart',
  ph: 'R',
  ts: 1_000_000,
  pid: PAGE,
  tid: MAIN,
  args: { data: { isLoadingMainFrame: true, documentLoaderURL: 'http://localhost/studio/1' } },
};
/** A complete event `atMs` after the navigation, lasting `ms` of wall time and `cpuMs` of CPU. */
const task = (
  name: string,
  pid: number,
  tid: number,
  atMs: number,
  ms: number,
  cpuMs: number,
): TraceEvent => ({
  name,
  ph: 'X',
  ts: nav.ts + atMs * 1000,
  dur: ms * 1000,
  tdur: cpuMs * 1000,
  pid,
  tid,
});

describe('cpuBetween', () => {
  it('adds each group of threads’ CPU time inside the window, outermost events only', () => {
    const events = [
      nav,
      task('RunTask', PAGE, MAIN, 100, 40, 10),
      task('Layout', PAGE, MAIN, 105, 20, 6), // inside the task above: not counted again
      task('RasterTask', PAGE, 7, 120, 30, 12),
      task('RunTask', 99, 1, 130, 10, 4),
      task('RunTask', PAGE, MAIN, 10, 20, 20), // before the window
    ];
    expect(cpuBetween(events, 90, 200)).toEqual({ main: 10, pageWorkers: 12, browser: 4 });
  });

  it('counts an event that straddles a bound in proportion', () => {
    const events = [nav, task('RunTask', PAGE, MAIN, 80, 40, 20)];
    expect(cpuBetween(events, 100, 200)).toEqual({ main: 10, pageWorkers: 0, browser: 0 });
  });

  it('answers null for a trace without the page’s navigation', () => {
    expect(cpuBetween([task('RunTask', PAGE, MAIN, 0, 1, 1)], 0, 10)).toBeNull();
  });
});
