// Hostile request bodies for the fuzz tests: arbitrary JSON, and valid bodies with a few mutations
// (a field removed, retyped, set to an edge value, an unknown or prototype-ish key added). Mutations are
// recipes applied to a body built at run time, so a body that depends on the database (a variant's
// current version) is still fresh when it is mutated.
import fc from 'fast-check';

export type Json = null | boolean | number | string | Json[] | { [k: string]: Json };

/** Values that break naive code: limits, wrong types, odd strings, SQL and markup. */
export const EDGE_VALUES: readonly Json[] = [
  null,
  true,
  false,
  0,
  -0,
  -1,
  0.5,
  2 ** 31,
  2 ** 53 + 2,
  1e308,
  -1e308,
  5e-324,
  '',
  ' ',
  '0',
  '1',
  '-1',
  '1e999',
  'NaN',
  'Infinity',
  'null',
  'true',
  '\u0000',
  '\uD800',
  '🦎'.repeat(50),
  'x'.repeat(70_000),
  "'; DROP TABLE users; --",
  '" OR 1=1 --',
  '<script>alert(1)</script>',
  '../../etc/passwd',
  '2025-02-30',
  '0000-00-00',
  '9999-12-31T23:59:59Z',
  'not-a-date',
  'owner',
  'a@b',
  'x@example.com',
  [],
  [null],
  [[[[[]]]]],
  {},
  { min: 1, max: 0 },
];

/** Keys worth adding: unknown ones and the names prototype pollution relies on. */
const ODD_KEYS = ['__proto__', 'constructor', 'prototype', 'toString', 'hasOwnProperty', 'id', ''];

export type Mutation = {
  /** Which child to descend into at each level (index modulo the number of children). */
  path: number[];
  op: 'delete' | 'replace-json' | 'replace-edge' | 'add-key' | 'wrap-array' | 'duplicate';
  json: Json;
  edge: Json;
  key: string;
};

export const mutationArb: fc.Arbitrary<Mutation> = fc.record({
  path: fc.array(fc.nat(), { maxLength: 6 }),
  op: fc.constantFrom('delete', 'replace-json', 'replace-edge', 'add-key', 'wrap-array', 'duplicate'),
  json: fc.jsonValue({ maxDepth: 3 }) as fc.Arbitrary<Json>,
  edge: fc.constantFrom(...EDGE_VALUES),
  key: fc.oneof(fc.constantFrom(...ODD_KEYS), fc.string({ maxLength: 12 })),
});

/** Sets an own, enumerable property even for "__proto__" (which plain assignment would not create). */
function setOwn(target: Record<string, Json>, key: string, value: Json) {
  Object.defineProperty(target, key, { value, enumerable: true, writable: true, configurable: true });
}

const isContainer = (v: Json): v is Json[] | { [k: string]: Json } => typeof v === 'object' && v !== null;

/**
 * Applies one mutation to a deep copy of `body`. Returns undefined when the root itself was deleted
 * (the request is then sent without a body).
 */
export function mutate(body: Json | undefined, m: Mutation): Json | undefined {
  if (body === undefined) return m.op === 'delete' ? undefined : structuredClone(m.json);
  const root: { v: Json } = { v: structuredClone(body) };
  let parent: Json[] | { [k: string]: Json } | { v: Json } = root;
  let key: string | number = 'v';
  for (const step of m.path) {
    const here: Json = (parent as Record<string | number, Json>)[key]!;
    if (!isContainer(here)) break;
    const keys: (string | number)[] = Array.isArray(here) ? here.map((_, i) => i) : Object.keys(here);
    if (keys.length === 0) break;
    parent = here;
    key = keys[step % keys.length]!;
  }
  const slot = parent as Record<string | number, Json>;
  const current = slot[key]!;
  switch (m.op) {
    case 'delete':
      if (parent === root) return undefined;
      if (Array.isArray(parent)) parent.splice(Number(key), 1);
      else delete slot[key];
      break;
    case 'replace-json':
      slot[key] = structuredClone(m.json);
      break;
    case 'replace-edge':
      slot[key] = structuredClone(m.edge);
      break;
    case 'add-key':
      if (isContainer(current) && !Array.isArray(current)) setOwn(current, m.key, structuredClone(m.json));
      else if (Array.isArray(current)) current.push(structuredClone(m.json));
      else slot[key] = { [m.key || 'k']: current };
      break;
    case 'wrap-array':
      slot[key] = [current];
      break;
    case 'duplicate':
      if (Array.isArray(current) && current.length > 0) {
        for (let i = 0; i < 50; i++) current.push(structuredClone(current[0]!));
      } else slot[key] = [current, current];
      break;
  }
  return root.v;
}

/** What one fuzz case sends. */
export type BodyCase =
  { kind: 'json'; value: Json } | { kind: 'mutated'; mutations: Mutation[] } | { kind: 'raw'; text: string };

/** Mostly mutated valid bodies (they get past the first checks), some arbitrary JSON, a few non-JSON. */
export const bodyCaseArb: fc.Arbitrary<BodyCase> = fc.oneof(
  {
    weight: 3,
    arbitrary: fc
      .array(mutationArb, { minLength: 0, maxLength: 3 })
      .map((mutations) => ({ kind: 'mutated' as const, mutations })),
  },
  {
    weight: 2,
    arbitrary: (fc.jsonValue({ maxDepth: 4 }) as fc.Arbitrary<Json>).map((value) => ({
      kind: 'json' as const,
      value,
    })),
  },
  {
    weight: 1,
    arbitrary: fc
      .oneof(
        fc.string({ maxLength: 40 }),
        fc.constantFrom('{', '{"a":', '[1,]', "{'a':1}", '\u0000', 'null x'),
      )
      .map((text) => ({ kind: 'raw' as const, text })),
  },
);

/** Every string inside a JSON value (so a reply that echoes input is not mistaken for a leak). */
export function stringsIn(value: unknown, out: string[] = []): string[] {
  if (typeof value === 'string') out.push(value);
  else if (Array.isArray(value)) for (const v of value) stringsIn(v, out);
  else if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      out.push(k);
      stringsIn(v, out);
    }
  }
  return out;
}
