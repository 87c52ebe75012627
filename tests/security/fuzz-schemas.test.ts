// Every exported zod schema of the modules route handlers and server actions parse with, under
// arbitrary JSON: safeParse never throws (a refine or transform that crashes on an odd shape would
// surface as a 500), and a failure always names a message. Found by value: any export that is a zod
// schema is checked, so a new one is covered without listing it. FUZZ_SEED fixes the cases.
import fc from 'fast-check';
import { ZodType } from 'zod';
import { describe, expect, it } from 'vitest';
import * as account from '@/lib/account/mutations';
import * as pagination from '@/lib/api/pagination';
import * as apiSchemas from '@/lib/api/schemas';
import * as enclosureList from '@/lib/enclosures/queries';
import * as enclosures from '@/lib/enclosures/schemas';
import * as password from '@/lib/auth/password';
import * as signUp from '@/lib/auth/sign-up';
import * as guidedStart from '@/lib/guided-start/input';
import * as lampLog from '@/lib/lamp-log/schemas';
import * as lampTypes from '@/lib/lamp-types/schema';
import * as people from '@/lib/people/queries';
import * as species from '@/lib/species/schema';
import * as variants from '@/lib/variants/schemas';
import * as compare from '@/shared/designs/compare-params';
import { EDGE_VALUES, type Json } from './fuzz-arbitraries';
import { checkProperty } from './fuzz-contract';

const MODULES: Record<string, Record<string, unknown>> = {
  'lib/account/mutations': account,
  'lib/api/pagination': pagination,
  'lib/api/schemas': apiSchemas,
  'lib/auth/password': password,
  'lib/auth/sign-up': signUp,
  'lib/enclosures/queries': enclosureList,
  'lib/enclosures/schemas': enclosures,
  'lib/guided-start/input': guidedStart,
  'lib/lamp-log/schemas': lampLog,
  'lib/lamp-types/schema': lampTypes,
  'lib/people/queries': people,
  'lib/species/schema': species,
  'lib/variants/schemas': variants,
  'lib/variants/compare-params': compare,
};

const RUNS = Number(process.env.FUZZ_RUNS ?? 100);

/** Arbitrary JSON, edge values, and objects whose values are edge values (to pass shape checks). */
const inputArb: fc.Arbitrary<unknown> = fc.oneof(
  fc.jsonValue({ maxDepth: 4 }),
  fc.constantFrom(...EDGE_VALUES),
  fc.dictionary(
    fc.constantFrom(
      'name',
      'organisationId',
      'id',
      'design',
      'min',
      'max',
      'email',
      'role',
      'cursor',
      'limit',
      'offset',
      'q',
      'sort',
      'dir',
      '__proto__',
    ),
    fc.oneof(fc.constantFrom(...EDGE_VALUES), fc.jsonValue({ maxDepth: 2 }) as fc.Arbitrary<Json>),
  ),
);

const schemas = Object.entries(MODULES).flatMap(([file, mod]) =>
  Object.entries(mod)
    .filter(([, v]) => v instanceof ZodType)
    .map(([name, v]) => ({ label: `${file}#${name}`, schema: v as ZodType })),
);

describe('zod schemas under arbitrary input', () => {
  it('finds the schemas', () => {
    console.info(`fuzz-schemas: ${schemas.length} schemas`);
    expect(schemas.length).toBeGreaterThan(20);
  });

  for (const { label, schema } of schemas) {
    it(`${label}: safeParse never throws`, async () => {
      await checkProperty(
        label,
        inputArb,
        (input) => {
          const r = schema.safeParse(input);
          if (!r.success) expect(r.error.issues[0]?.message.length ?? 0).toBeGreaterThan(0);
        },
        RUNS,
      );
    });
  }
});
