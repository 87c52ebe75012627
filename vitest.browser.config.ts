import path from 'node:path';
import { defineConfig } from 'vitest/config';
import { BaseSequencer, type TestSpecification } from 'vitest/node';

// Browser journeys (tests/browser/*.browser.ts) against the app served by scripts/test.mjs.
const workers = Math.max(1, Number(process.env.BROWSER_WORKERS) || 1);
const ROOT = import.meta.dirname;

// The journeys that take longest, with their seconds in a full `npm test` on the 2-core machine (load
// average 11-16): they start first, so that the two workers end together instead of one running a long
// file alone at the end. A fresh clone has no timings of its own (vitest would order by file size, and the
// accessibility file, one test a page, is short on disk and the longest by far). Unlisted files follow in
// vitest's own order; figures only order, they never limit.
const LONGEST: Record<string, number> = {
  'tests/browser/a11y.browser.ts': 227,
  'tests/browser/account-security.browser.ts': 90,
  'tests/browser/lamp-log.browser.ts': 76,
  'tests/browser/husbandry.browser.ts': 63,
  'tests/browser/studio-canvas.browser.ts': 58,
  'tests/browser/journey-staff.browser.ts': 34,
  'tests/browser/studio.browser.ts': 31,
  'tests/browser/studio-touch.browser.ts': 29,
};

class LongestFirst extends BaseSequencer {
  override async sort(files: TestSpecification[]): Promise<TestSpecification[]> {
    const seconds = (f: TestSpecification) =>
      LONGEST[path.relative(ROOT, f.moduleId).split(path.sep).join('/')] ?? 0;
    // Array sort is stable: files of equal weight keep vitest's order.
    return (await super.sort(files)).sort((a, b) => seconds(b) - seconds(a));
  }
}

export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    // The journeys read the test database through the server modules: `server-only` is an empty module
    // outside Next, as in vitest.config.ts.
    alias: { 'server-only': path.join(ROOT, 'scripts', 'lib', 'server-only-empty.mjs') },
  },
  test: {
    include: ['tests/browser/**/*.browser.ts'],
    // Files a caller runs in a run of their own (comma-separated paths): `npm test` runs the journeys that
    // bound response times alone, after everything else (scripts/test.mjs).
    exclude: ['node_modules/**', ...(process.env.VITEST_BROWSER_EXCLUDE ?? '').split(',').filter(Boolean)],
    environment: 'node',
    // Files share one app and one test database. `npm test` runs them BROWSER_WORKERS at a time (each file
    // with contexts of its own in its worker's Chromium), except the few that change what other files rely
    // on, which it runs in a run of their own (scripts/test.mjs); run directly, the files go one after
    // another.
    fileParallelism: workers > 1,
    maxWorkers: workers,
    // Workers are reused with their module cache: playwright, the harness and the server modules some files
    // read are imported once a worker instead of once a file (about 4 s a file on a busy 2-core machine),
    // and the harness keeps one Chromium a worker (tests/browser/harness.ts). The files keep their state in
    // their own closures and browser contexts, which each file closes.
    isolate: false,
    sequence: { sequencer: LongestFirst },
    // Whole journeys (sign in, build a set-up, reload) on a 2-core CI machine: generous, never a speed check.
    testTimeout: 180_000,
    hookTimeout: 120_000,
  },
});
