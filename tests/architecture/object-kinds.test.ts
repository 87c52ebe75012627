import { existsSync, readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { OBJECT_TYPES } from '@/shared/object-kinds';

/**
 * A kind of design object is one record (shared/object-kinds/<kind>.ts) in one registry: nothing
 * outside the records chooses what to do by listing kinds. This finds, in the app's own code, a
 * `case '<kind>':`, a condition that names two kinds (`o.type === 'screen' || o.type === 'glass'`),
 * or a literal list of three or more kinds — each a place a new kind would have to be added by hand.
 * A single `o.type === 'lamp'` stays allowed: lamps carry their own data (calibration, depth, the
 * lamp log), and that code is about lamps, not about every kind.
 */
const ROOTS = ['app', 'components', 'lib', 'shared'];
// The records: the pure half every side uses, and the studio's half (canvas shape) beside the canvas.
const HOMES = ['shared/object-kinds/', 'components/studio/object-kinds/'];
// Files whose strings happen to be kind names but mean something else.
const OTHER_MEANINGS: Record<string, string> = {
  // What stood between the lamp and the meter at a reading ('screen', 'glass', 'lid'), not an object.
  'shared/reading-setup.ts': 'a reading’s barrier',
  // The kinds of thing a permission is about ('lamp' is a logged lamp, not a design object).
  'lib/permissions.ts': 'a permission’s resource',
};

const KIND = `(?:${OBJECT_TYPES.join('|')})`;
const RULES: { name: string; pattern: RegExp }[] = [
  { name: 'a case on a kind', pattern: new RegExp(`case '${KIND}'\\s*:`) },
  {
    name: 'a condition naming two kinds',
    // Two different kinds: `a.type === 'lamp' && b.type === 'lamp'` is about lamps alone.
    pattern: new RegExp(
      `type\\s*===\\s*'(${KIND})'\\s*(?:\\|\\||&&|\\?)[^;]{0,80}?type\\s*===\\s*'(?!\\1')${KIND}'`,
    ),
  },
  { name: 'a list of kinds', pattern: new RegExp(`'${KIND}'\\s*,\\s*'${KIND}'\\s*,\\s*'${KIND}'`) },
];

export function kindListings(file: string, source: string): string[] {
  const flat = source.replace(/\s+/g, ' ');
  return RULES.filter((r) => r.pattern.test(flat)).map((r) => `${file}: ${r.name}`);
}

function sources(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    if (e.isDirectory()) return sources(p);
    return /\.tsx?$/.test(e.name) && !/\.test\.tsx?$/.test(e.name) ? [p.split(path.sep).join('/')] : [];
  });
}

describe('one record per object kind', () => {
  it('finds each way of listing kinds by hand in a planted file', () => {
    expect(kindListings('p.ts', "switch (o.type) { case 'perch': return 1; }")).toEqual([
      'p.ts: a case on a kind',
    ]);
    expect(kindListings('p.ts', "if (o.type === 'screen' ||\n  o.type === 'glass') x();")).toEqual([
      'p.ts: a condition naming two kinds',
    ]);
    expect(kindListings('p.ts', "const T = ['lamp', 'screen', 'glass'];")).toEqual(['p.ts: a list of kinds']);
    expect(kindListings('p.ts', "if (o.type === 'lamp') calibrate(o);")).toEqual([]);
    expect(kindListings('p.ts', "a.type === 'lamp' && b.type === 'lamp' ? f(a, b) : b;")).toEqual([]);
  });

  it('leaves no switch, chain or list of kinds outside the registry', () => {
    const found = ROOTS.flatMap(sources)
      .filter((f) => !HOMES.some((h) => f.startsWith(h)) && !(f in OTHER_MEANINGS))
      .flatMap((f) => kindListings(f, readFileSync(f, 'utf8')));
    expect(found).toEqual([]);
  });
});

/**
 * The studio's records import panels (the inspector's forms), so a module those panels reach must not
 * import the studio registry back: the bundle would then read a record before its module has run, and
 * the studio page fails to load ("cannot access … before initialization") though every unit test passes.
 */
const STUDIO_RECORDS = 'components/studio/object-kinds/';
const REGISTRY_IMPORT = /from '(?:@\/components\/studio|\.\.?(?:\/\.\.)*)\/object-kinds(?:\/index)?'/;

function resolveImport(from: string, spec: string): string | null {
  const base = spec.startsWith('@/')
    ? spec.slice(2)
    : spec.startsWith('.')
      ? path.join(path.dirname(from), spec)
      : null;
  if (base === null) return null;
  const found = ['.ts', '.tsx', '/index.ts', '/index.tsx'].map((e) => base + e).find((f) => existsSync(f));
  return found ? found.split(path.sep).join('/') : null;
}

/** Every module the given ones load when they run (type-only imports are erased, so they do not count). */
export function runtimeImports(start: string[], read: (f: string) => string): Set<string> {
  const seen = new Set<string>();
  const todo = [...start];
  while (todo.length) {
    const f = todo.pop()!;
    if (seen.has(f)) continue;
    seen.add(f);
    for (const m of read(f).matchAll(/^(?:import|export)\s+(?!type\b)[^;]*?from\s+'([^']+)'/gms)) {
      const r = resolveImport(f, m[1]!);
      if (r) todo.push(r);
    }
  }
  return seen;
}

describe('the studio records load without a cycle', () => {
  const read = (f: string) => readFileSync(f, 'utf8');
  const records = readdirSync(STUDIO_RECORDS)
    .filter((f) => /\.tsx?$/.test(f) && !/^index\.|\.test\./.test(f))
    .map((f) => STUDIO_RECORDS + f);

  it('finds a planted panel that imports the registry', () => {
    expect(REGISTRY_IMPORT.test("import { studioKindOf } from '../object-kinds';")).toBe(true);
    expect(REGISTRY_IMPORT.test("import { lampBody } from '../object-kinds/lamp';")).toBe(false);
  });

  it('no module a record loads imports the studio registry', () => {
    const back = [...runtimeImports(records, read)].filter(
      (f) => !f.startsWith(STUDIO_RECORDS) && REGISTRY_IMPORT.test(read(f)),
    );
    expect(back).toEqual([]);
  });
});
