import path from 'node:path';
import { defineConfig } from 'vitest/config';

// Browser journeys (tests/browser/*.browser.ts) against the app served by scripts/test.mjs.
const workers = Math.max(1, Number(process.env.BROWSER_WORKERS) || 1);

export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    // The journeys read the test database through the server modules: `server-only` is an empty module
    // outside Next, as in vitest.config.ts.
    alias: { 'server-only': path.join(import.meta.dirname, 'scripts', 'lib', 'server-only-empty.mjs') },
  },
  test: {
    include: ['tests/browser/**/*.browser.ts'],
    // Files a caller runs in a run of their own (comma-separated paths): `npm test` runs the journeys that
    // bound response times alone, after everything else (scripts/test.mjs).
    exclude: ['node_modules/**', ...(process.env.VITEST_BROWSER_EXCLUDE ?? '').split(',').filter(Boolean)],
    environment: 'node',
    // Files share one app and one test database. `npm test` runs them BROWSER_WORKERS at a time (each file
    // in its own Chromium), except the few that change what other files rely on, which it runs in a run of
    // their own (scripts/test.mjs); run directly, the files go one after another.
    fileParallelism: workers > 1,
    maxWorkers: workers,
    // Whole journeys (sign in, build a set-up, reload) on a 2-core CI machine: generous, never a speed check.
    testTimeout: 180_000,
    hookTimeout: 120_000,
  },
});
