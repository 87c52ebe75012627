import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';

/** Every TypeScript file git tracks (or would: untracked, not ignored), from the repository's root. */
function sourceFiles(): string[] {
  const out = execFileSync(
    'git',
    ['ls-files', '--cached', '--others', '--exclude-standard', '--', '*.ts', '*.tsx'],
    {
      encoding: 'utf8',
    },
  );
  return out.split('\n').filter((f) => f && !f.startsWith('node_modules/'));
}

/**
 * Lines that call `getSequelize()` only for its side effect. The models register when lib/db.ts loads
 * (and `@/models` loads it), so such a line is either dead or hides code that would break without it.
 */
function bareSequelizeCalls(src: string): number[] {
  return src
    .split('\n')
    .flatMap((line, i) => (/^\s*(?:void\s+)?getSequelize\(\)\s*;?\s*(?:\/\/.*)?$/.test(line) ? [i + 1] : []));
}

describe('model registration', () => {
  it('finds a planted bare getSequelize() call and passes one whose value is used', () => {
    expect(bareSequelizeCalls('import x;\n  getSequelize();\n  return Lamp.findAll();')).toEqual([2]);
    expect(bareSequelizeCalls('  void getSequelize(); // register')).toEqual([1]);
    expect(
      bareSequelizeCalls('  const sequelize = getSequelize();\n  await getSequelize().transaction(f);'),
    ).toEqual([]);
  });

  it('no file calls getSequelize() only to register the models (lib/db.ts registers them as it loads)', () => {
    const found = sourceFiles()
      .filter((f) => f !== 'tests/architecture/data-layer.test.ts')
      .flatMap((f) => bareSequelizeCalls(readFileSync(f, 'utf8')).map((line) => `${f}:${line}`));
    expect(found).toEqual([]);
  });
});
