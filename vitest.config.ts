import { readdirSync, readFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { defineConfig } from 'vitest/config';

// Two projects. "db": files that share one resource — the test database (and the fake mail and S3
// servers npm test starts) — run one after another, as before. "unit": everything else (the engine,
// pure lib code, components without a database) runs in parallel. A file is a "db" file when it lives
// under tests/ or imports the database (tests/helpers/db, lib/db) or a shared fake server, so a new
// database test lands in the right project without anyone listing it.

const ROOT = import.meta.dirname;
const SKIP_DIRS = new Set(['node_modules', '.next', '.data', '.git', 'test-results']);
const TEST_FILE = /\.test\.tsx?$/;
const SHARED_RESOURCE_IMPORT =
  /from\s+['"][^'"]*(?:tests\/helpers\/db|helpers\/db|@\/lib\/db|lib\/db|helpers\/fake-s3|helpers\/mail)['"]/;

function testFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    if (entry.isDirectory()) return SKIP_DIRS.has(entry.name) ? [] : testFiles(path.join(dir, entry.name));
    return TEST_FILE.test(entry.name) ? [path.relative(ROOT, path.join(dir, entry.name))] : [];
  });
}

const isDbFile = (file: string) =>
  file.split(path.sep)[0] === 'tests' ||
  SHARED_RESOURCE_IMPORT.test(readFileSync(path.join(ROOT, file), 'utf8'));

const dbFiles = testFiles(ROOT)
  .filter(isDbFile)
  .map((f) => f.split(path.sep).join('/'));

const excluded = ['node_modules/**', '.next/**', '.data/**', 'tests/browser/**'];
// Database files a caller runs in a vitest run of their own (comma-separated paths): `npm test` runs the
// files that bound response times alone, after everything else (scripts/test.mjs).
const dbExcluded = (process.env.VITEST_DB_EXCLUDE ?? '').split(',').filter(Boolean);

export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    // Server modules start with `import 'server-only'`, which Next checks at build time; outside Next the
    // package throws, so tests load an empty module in its place (scripts/lib/server-only.mjs does the
    // same for tsx).
    alias: { 'server-only': path.join(ROOT, 'scripts', 'lib', 'server-only-empty.mjs') },
  },
  test: {
    environment: 'node',
    testTimeout: 30_000,
    hookTimeout: 60_000,
    projects: [
      {
        extends: true,
        test: {
          name: 'unit',
          include: ['**/*.test.ts', '**/*.test.tsx'],
          exclude: [...excluded, ...dbFiles],
          // vitest's default (cores − 1) is a single worker on a 2-core machine: use every core.
          maxWorkers: Math.max(2, os.availableParallelism()),
          // Workers are reused with their module cache (the engine, zod, React are imported once a worker,
          // not once a file): these files keep no state between files (fake timers are reset after each).
          isolate: false,
        },
      },
      {
        extends: true,
        test: {
          name: 'db',
          include: dbFiles.length ? dbFiles : ['tests/**/*.test.ts'],
          exclude: [...excluded, ...dbExcluded],
          // One shared test database: one file at a time, after the unit group (its own group order).
          fileParallelism: false,
          sequence: { groupOrder: 1 },
          // One worker imports the app (Next, Sequelize, models) once for all these files instead of once
          // a file. Each file still empties the database first (tests/helpers/db) and closes its connection.
          isolate: false,
        },
      },
    ],
  },
});
