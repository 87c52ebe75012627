// The production builds the scripts make beside `npm start`'s own (.next): each in a folder of its own
// under .next, so a running `npm start` keeps serving its build while `npm test` builds, and the other way
// round.
//
// `next build` empties its folder before it builds, keeping only a few entries of its own, so a plain
// build into .next (`npm start`) would delete the others' builds with everything else: a test run
// serving .next/test-build at that moment would lose the files its server loads as pages are first
// asked for. `npm start` therefore empties .next itself, keeping those builds, and tells Next not to
// (NEXT_KEEP_DIST, read by next.config.ts).
import { readdirSync, rmSync } from 'node:fs';
import path from 'node:path';

/** The folders of the other builds (relative to the project), by who makes them. */
export const BUILD_DIRS = {
  test: '.next/test-build',
  scale: '.next/scale-build',
  bench: '.next/bench-build',
};

/** What `next build` itself keeps when it empties its folder. */
const KEPT_BY_NEXT = ['cache', 'dev', 'diagnostics', 'lock', 'trace'];

/**
 * Empties `dir` (the main build's folder) as `next build` would, but keeps the other builds' folders.
 * Returns the names removed. A missing folder is nothing to do.
 */
export function emptyMainBuild(dir) {
  const kept = new Set([...KEPT_BY_NEXT, ...Object.values(BUILD_DIRS).map((d) => path.basename(d))]);
  let names;
  try {
    names = readdirSync(dir);
  } catch (e) {
    if (e && e.code === 'ENOENT') return [];
    throw e;
  }
  const removed = names.filter((n) => !kept.has(n));
  for (const n of removed) rmSync(path.join(dir, n), { recursive: true, force: true });
  return removed;
}
