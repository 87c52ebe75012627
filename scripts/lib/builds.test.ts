import { existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { BUILD_DIRS, emptyMainBuild } from './builds.mjs';

// `npm start` empties .next before its build the way `next build` would, but keeps the folders of the
// builds `npm test` and the benches serve from (a plain `next build` deletes them with the rest).
let dir: string;
afterEach(() => rmSync(dir, { recursive: true, force: true }));

describe('emptying the main build', () => {
  it('removes the old build and keeps the other builds and what Next keeps', () => {
    dir = mkdtempSync(path.join(os.tmpdir(), 'baskwell-next-'));
    for (const d of [
      'server',
      'static',
      'types',
      'cache',
      'trace',
      ...Object.values(BUILD_DIRS).map((b) => path.basename(b)),
    ]) {
      mkdirSync(path.join(dir, d, 'inner'), { recursive: true });
    }
    writeFileSync(path.join(dir, 'BUILD_ID'), 'old');
    writeFileSync(path.join(dir, 'test-build', 'BUILD_ID'), 'test');
    const removed = emptyMainBuild(dir);
    expect(removed.sort()).toEqual(['BUILD_ID', 'server', 'static', 'types']);
    expect(readdirSync(dir).sort()).toEqual(['bench-build', 'cache', 'scale-build', 'test-build', 'trace']);
    expect(existsSync(path.join(dir, 'test-build', 'BUILD_ID'))).toBe(true);
  });

  it('does nothing where there is no build yet', () => {
    dir = path.join(os.tmpdir(), `baskwell-none-${process.pid}`);
    expect(emptyMainBuild(dir)).toEqual([]);
  });
});
