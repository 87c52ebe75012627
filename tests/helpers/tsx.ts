import path from 'node:path';

/** Root of the repository, for child processes that run its scripts. */
export const ROOT = path.resolve(import.meta.dirname, '..', '..');
export const TSX = path.join(ROOT, 'node_modules', '.bin', 'tsx');

/**
 * tsx's arguments for running `file` with the server modules: their `import 'server-only'` resolves to
 * nothing outside Next (scripts/lib/server-only.mjs), as it does for npm start's scripts.
 */
export function tsxArgs(file: string, ...args: string[]): string[] {
  return ['--import', path.join(ROOT, 'scripts', 'lib', 'server-only.mjs'), file, ...args];
}
