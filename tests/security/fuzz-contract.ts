// What every reply keeps, whatever was sent: never a 5xx, JSON with an `error` object on 4xx, and no
// stack traces, SQL, driver names or server paths beyond what the request itself contained.
import fc from 'fast-check';
import { expect } from 'vitest';
import { expectNoInternals, type Reply } from '../api/http';
import { stringsIn } from './fuzz-arbitraries';

export const FUZZ_SEED = Number(process.env.FUZZ_SEED ?? 20_251_202);

// Beyond tests/api/http.ts's list: driver error codes and fields, file paths, "Error:" prefixes.
const MORE_LEAKS = [/\bER_[A-Z_]{3,}/, /sqlMessage|sqlState|errno/, /\/work\/|\/home\/|\/root\//, /\n\s+at /];

export function expectSafeReply(r: Reply, sent: unknown, what: string, { json = true } = {}) {
  const context = `${what} → ${r.status} ${r.text.slice(0, 400)}`;
  expect(r.status, context).toBeLessThan(500);
  if (json || r.status >= 400) {
    expect(r.res.headers.get('content-type') ?? '', context).toMatch(/^application\/json/);
    expect(r.body, context).not.toBeNull();
  }
  if (r.status >= 400) {
    expect(typeof r.body.error?.code, context).toBe('string');
    expect(typeof r.body.error?.message, context).toBe('string');
    expect(r.body.error.message.length, context).toBeGreaterThan(0);
  }
  // A reply may quote what was sent (a saved name); only what it adds on its own is checked.
  let own = r.text;
  for (const s of stringsIn(sent).sort((a, b) => b.length - a.length)) {
    if (s.length < 3) continue;
    own = own.split(JSON.stringify(s).slice(1, -1)).join('…');
  }
  expectNoInternals({ ...r, text: own });
  for (const leak of MORE_LEAKS) expect(own, `${context} leaks ${leak}`).not.toMatch(leak);
}

/** Runs a property with the fixed seed; on failure names the seed so the run can be repeated. */
export async function checkProperty<T>(
  label: string,
  arb: fc.Arbitrary<T>,
  predicate: (v: T) => Promise<void> | void,
  runs: number,
) {
  const property = fc.asyncProperty(arb, async (v) => {
    await predicate(v);
  });
  try {
    await fc.assert(property, { seed: FUZZ_SEED, numRuns: runs, endOnFailure: true });
  } catch (e) {
    throw new Error(
      `${label}: fuzz failure (FUZZ_SEED=${FUZZ_SEED}, runs ${runs})\n${e instanceof Error ? e.message : e}`,
      { cause: e },
    );
  }
}
