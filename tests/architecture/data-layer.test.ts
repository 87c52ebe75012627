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

/** The route pipeline: the only lib/ files that speak HTTP errors (statuses, ApiError). */
const PIPELINE = new Set(
  [
    'errors',
    'route',
    'request',
    'session',
    'index',
    'pagination',
    'schemas',
    'text',
    'like',
    'csv-import',
  ].map((f) => `lib/api/${f}.ts`),
);
const HTTP_ERROR_NAMES = ['ApiError', 'badRequest', 'unauthenticated', 'forbidden', 'notFound', 'conflict'];

/**
 * How a file reaches the pipeline's HTTP errors: importing one of them from `@/lib/api` (or its errors
 * module, or `./errors` beside it), or naming ApiError at all.
 */
function httpErrorUses(src: string): string[] {
  const found: string[] = [];
  for (const m of src.matchAll(
    /import\s*(?:type\s*)?\{([^}]*)\}\s*from\s*'(@\/lib\/api(?:\/errors)?|\.\/errors)'/g,
  )) {
    for (const name of m[1]!.split(',').map(
      (n) =>
        n
          .trim()
          .replace(/^type\s+/, '')
          .split(/\s+as\s+/)[0]!,
    )) {
      if (HTTP_ERROR_NAMES.includes(name)) found.push(`imports ${name} from ${m[2]}`);
    }
  }
  if (/\bApiError\b/.test(src.replace(/^import[^;]*;$/gm, ''))) found.push('names ApiError');
  return found;
}

describe('domain errors', () => {
  it('finds a planted HTTP error in a domain module, and passes the typed domain errors', () => {
    expect(httpErrorUses("import { badRequest, page } from '@/lib/api';")).toEqual([
      'imports badRequest from @/lib/api',
    ]);
    expect(
      httpErrorUses("import { ApiError } from '@/lib/api/errors';\nthrow new ApiError(404, 'x', 'y');"),
    ).toEqual(['imports ApiError from @/lib/api/errors', 'names ApiError']);
    expect(httpErrorUses("import { notFound as nf } from './errors';")).toEqual([
      'imports notFound from ./errors',
    ]);
    expect(
      httpErrorUses("import { invalid, notFound } from '@/lib/errors';\nthrow notFound('The lamp');"),
    ).toEqual([]);
  });

  it('no lib/ module outside the route pipeline throws or imports an HTTP error', () => {
    const found = sourceFiles()
      .filter((f) => f.startsWith('lib/') && !PIPELINE.has(f) && !/\.test\.tsx?$/.test(f))
      .flatMap((f) => httpErrorUses(readFileSync(f, 'utf8')).map((use) => `${f}: ${use}`));
    expect(found).toEqual([]);
  });
});
