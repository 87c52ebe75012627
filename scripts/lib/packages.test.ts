import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { findProgram, nodeModulesProblem } from './packages.mjs';

let root: string;

function write(file: string, data: unknown) {
  mkdirSync(path.dirname(path.join(root, file)), { recursive: true });
  writeFileSync(path.join(root, file), JSON.stringify(data));
}

function lock(packages: Record<string, object>) {
  write('package-lock.json', { lockfileVersion: 3, packages: { '': { name: 'x' }, ...packages } });
}

beforeEach(() => {
  root = mkdtempSync(path.join(os.tmpdir(), 'pkgcheck-'));
  write('package.json', { name: 'x', dependencies: { a: '1.0.0' } });
});
afterEach(() => rmSync(root, { recursive: true, force: true }));

describe('nodeModulesProblem', () => {
  it('reports a missing node_modules', () => {
    lock({ 'node_modules/a': { version: '1.0.0' } });
    expect(nodeModulesProblem(root)).toBe('node_modules is missing');
  });

  it('is satisfied when every locked package is installed at its version', () => {
    lock({ 'node_modules/a': { version: '1.0.0' }, 'node_modules/a/node_modules/b': { version: '2.0.0' } });
    write('node_modules/a/package.json', { version: '1.0.0' });
    write('node_modules/a/node_modules/b/package.json', { version: '2.0.0' });
    expect(nodeModulesProblem(root)).toBeNull();
  });

  it('reports a package missing or at another version than the lockfile says', () => {
    lock({ 'node_modules/a': { version: '1.0.1' }, 'node_modules/c': { version: '1.0.0' } });
    write('node_modules/a/package.json', { version: '1.0.0' });
    expect(nodeModulesProblem(root)).toBe('a is not at the locked version 1.0.1');
    write('node_modules/a/package.json', { version: '1.0.1' });
    expect(nodeModulesProblem(root)).toBe('c is not installed');
  });

  it('ignores optional packages for other platforms', () => {
    lock({
      'node_modules/a': { version: '1.0.0' },
      'node_modules/@x/darwin-arm64': { version: '1.0.0', optional: true },
    });
    write('node_modules/a/package.json', { version: '1.0.0' });
    expect(nodeModulesProblem(root)).toBeNull();
  });

  it('without a lockfile, checks the packages package.json names', () => {
    mkdirSync(path.join(root, 'node_modules'));
    expect(nodeModulesProblem(root)).toBe('a is not installed');
  });
});

describe('findProgram', () => {
  it('finds programs on PATH and nothing for a made-up name', () => {
    expect(findProgram('node')).toMatch(/\/node$/);
    expect(findProgram('no-such-program-baskwell')).toBeNull();
  });
});
