import { defineConfig } from 'vitest/config';

// Browser journeys (tests/browser/*.browser.ts) against the app served by scripts/test.mjs.
export default defineConfig({
  resolve: { tsconfigPaths: true },
  test: {
    include: ['tests/browser/**/*.browser.ts'],
    environment: 'node',
    // One app and one test database for every file: run them one after another.
    fileParallelism: false,
    // Whole journeys (sign in, build a set-up, reload) on a 2-core CI machine: generous, never a speed check.
    testTimeout: 180_000,
    hookTimeout: 120_000,
  },
});
