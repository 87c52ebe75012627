// Input fuzzing of the real route handlers (with a real staff session on the test database) and of the
// engine's design parser. Whatever arrives: never a 5xx, never an uncaught error, JSON replies with an
// `error` object on 4xx, and no stack traces, SQL or driver names in any reply.
//
// Reproducible: FUZZ_SEED (default in fuzz-contract.ts) fixes the cases; FUZZ_RUNS sets the cases per route. A failure
// prints the seed and fast-check's counterexample path; rerun with FUZZ_SEED=<seed> to get it back.
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as designVariants from '@/app/api/designs/[id]/variants/route';
import * as enclosureDesigns from '@/app/api/enclosures/[id]/designs/route';
import * as enclosureItem from '@/app/api/enclosures/[id]/route';
import * as enclosures from '@/app/api/enclosures/route';
import * as invitations from '@/app/api/invitations/route';
import * as lampTypeItem from '@/app/api/lamp-types/[id]/route';
import * as lampTypes from '@/app/api/lamp-types/route';
import * as lampReadings from '@/app/api/lamps/[id]/readings/route';
import * as readingItem from '@/app/api/readings/[id]/route';
import * as speciesItem from '@/app/api/species/[id]/route';
import * as species from '@/app/api/species/route';
import * as variantShares from '@/app/api/variants/[id]/shares/route';
import * as variantItem from '@/app/api/variants/[id]/route';
import { DEMO_SHOP } from '@/lib/demo/scenario';
import { Enclosure, Lamp, LampType, Organisation, Reading, SpeciesSheet, User, Variant } from '@/models';
import { parseDesign } from '@/simulation';
import { arbDesign } from '@/simulation/testing/arbitraries';
import { EXAMPLE_DESIGN } from '@/simulation/testing/fixtures';
import { closeDatabase, resetDatabase, seedDemo } from '../helpers/db';
import { call, sessionCookie } from '../api/http';
import { bodyCaseArb, mutate, mutationArb, type BodyCase, type Json } from './fuzz-arbitraries';
import { checkProperty, expectSafeReply } from './fuzz-contract';
import { LAMP_TYPE_BODY, READING_BODY, SPECIES_BODY } from './valid-bodies';

/** Strings a database or a JSON layer may choke on: a lone surrogate, NUL, 4-byte characters, a huge one. */
const NASTIES: Json[] = ['\uD800', 'a\u0000b', '🦎🦎', 'x'.repeat(70_000), 1e308, -0];

const RUNS = Number(process.env.FUZZ_RUNS ?? 100);

type Handler = Parameters<typeof call>[0];
type Target = {
  name: string;
  handler: Handler;
  method: 'POST' | 'PUT' | 'PATCH';
  path: () => string;
  params?: () => Record<string, number>;
  /** A body the route accepts, built afresh for each case. */
  valid: () => Json | Promise<Json>;
};

let cookie: string;
const ids = {
  org: 0,
  keeper: 0,
  enclosure: 0,
  design: 0,
  variant: 0,
  lamp: 0,
  reading: 0,
  species: 0,
  lampType: 0,
};

/** Runs a property with the fixed seed; on failure names the seed so the run can be repeated. */
const check = <T>(label: string, arb: fc.Arbitrary<T>, predicate: (v: T) => Promise<void> | void) =>
  checkProperty(label, arb, predicate, RUNS);

async function send(t: Target, c: BodyCase) {
  let body: Json | undefined;
  let rawBody: string | undefined;
  if (c.kind === 'json') body = c.value;
  else if (c.kind === 'raw') rawBody = c.text;
  else {
    body = await t.valid();
    for (const m of c.mutations) body = mutate(body, m);
  }
  const reply = await call(t.handler, {
    method: t.method,
    path: t.path(),
    params: t.params?.(),
    cookie,
    ...(body === undefined ? {} : { body }),
    ...(rawBody === undefined ? {} : { rawBody, headers: { 'content-type': 'application/json' } }),
  });
  const sent = body ?? rawBody ?? null;
  expectSafeReply(reply, sent, `${t.method} ${t.path()} with ${JSON.stringify(sent)?.slice(0, 300)}`);
  return reply;
}

/**
 * `method` of a route module at `pattern`; the `[id]` in it is the thing `idOf` names (none: no id). `note`
 * tells two uses of one route apart in the test's name.
 */
const target = (
  method: Target['method'],
  route: Partial<Record<Target['method'], Handler>>,
  pattern: string,
  idOf: keyof typeof ids | null,
  valid: Target['valid'],
  note = '',
): Target => ({
  name: `${method} ${pattern}${note}`,
  handler: route[method]!,
  method,
  path: () => (idOf ? pattern.replace('[id]', String(ids[idOf])) : pattern),
  ...(idOf ? { params: () => ({ id: ids[idOf] }) } : {}),
  valid,
});

const targets: Target[] = [
  target('POST', enclosures, '/api/enclosures', null, () => ({
    organisationId: ids.org,
    keeperId: ids.keeper,
    name: 'Fuzz vivarium',
    widthCm: 120,
    heightCm: 60,
    depthCm: 60,
    speciesName: 'Bearded dragon',
    notes: 'Made by the fuzz test.',
  })),
  target('PATCH', enclosureItem, '/api/enclosures/[id]', 'enclosure', () => ({
    name: 'Desert vivarium',
    widthCm: 120,
    animalName: 'Sable',
    keeperId: ids.keeper,
  })),
  target(
    'PUT',
    variantItem,
    '/api/variants/[id]',
    'variant',
    async () => ({
      design: structuredClone(EXAMPLE_DESIGN) as unknown as Json,
      baseVersion: (await Variant.findByPk(ids.variant))!.version,
    }),
    ' (design JSON)',
  ),
  target(
    'POST',
    designVariants,
    '/api/designs/[id]/variants',
    'design',
    () => ({ name: 'Fuzz variant', design: structuredClone(EXAMPLE_DESIGN) as unknown as Json }),
    ' (design JSON)',
  ),
  target('POST', variantShares, '/api/variants/[id]/shares', 'variant', () => ({ expiresInDays: 30 })),
  target('POST', species, '/api/species', null, () => SPECIES_BODY(ids.org, 'Fuzz skink')),
  target('PATCH', speciesItem, '/api/species/[id]', 'species', () => ({
    notes: 'Edited by the fuzz test.',
    coolAirC: { min: 22, max: 26 },
  })),
  target('POST', lampTypes, '/api/lamp-types', null, () => LAMP_TYPE_BODY(ids.org, 'Fuzz tube')),
  target('PATCH', lampTypeItem, '/api/lamp-types/[id]', 'lampType', () => ({
    notes: 'Edited by the fuzz test.',
    watts: 30,
  })),
  // Yesterday: after the demo lamp's first use, not in the future.
  target('POST', lampReadings, '/api/lamps/[id]/readings', 'lamp', () => READING_BODY('fuzz')),
  target('PATCH', readingItem, '/api/readings/[id]', 'reading', () => ({
    value: 42,
    unit: 'uvb',
    distance: 12,
    distanceUnit: 'in',
  })),
  target('POST', invitations, '/api/invitations', null, () => ({
    organisationId: ids.org,
    email: 'fuzz.keeper@example.com',
    role: 'keeper',
  })),
];

beforeAll(async () => {
  await resetDatabase();
  await seedDemo();
  const shop = await Organisation.findOne({ where: { name: DEMO_SHOP.name } });
  const staffEmail = DEMO_SHOP.people.find((p) => p.role === 'staff')!.email;
  const keeperEmail = DEMO_SHOP.people.find((p) => p.role === 'keeper' && p.enclosures?.length)!.email;
  const staff = await User.findOne({ where: { email: staffEmail } });
  const keeper = await User.findOne({ where: { email: keeperEmail } });
  const enclosure = await Enclosure.findOne({ where: { organisationId: shop!.id, keeperId: keeper!.id } });
  const lamp = await Lamp.findOne({ where: { enclosureId: enclosure!.id }, order: [['id', 'ASC']] });
  const reading = await Reading.findOne({ where: { lampId: lamp!.id } });
  const sheet = await SpeciesSheet.findOne({ where: { organisationId: shop!.id } });
  const lampType = await LampType.findOne({ where: { organisationId: shop!.id } });
  cookie = await sessionCookie(staff!);
  Object.assign(ids, {
    org: shop!.id,
    keeper: keeper!.id,
    enclosure: enclosure!.id,
    lamp: lamp!.id,
    reading: reading!.id,
    species: sheet!.id,
    lampType: lampType!.id,
  });
  const design = await call(enclosureDesigns.POST, {
    method: 'POST',
    path: `/api/enclosures/${ids.enclosure}/designs`,
    params: { id: ids.enclosure },
    cookie,
    body: { name: 'Fuzz plan', design: EXAMPLE_DESIGN },
  });
  expect(design.status, design.text).toBe(201);
  ids.design = design.body.design.id;
  ids.variant = design.body.variant.id;
}, 120_000);

afterAll(closeDatabase);

describe('route handlers under hostile bodies', () => {
  for (const t of targets) {
    it(`${t.name}: ${RUNS} cases, no 5xx, safe JSON errors`, { timeout: 120_000 }, async () => {
      // The valid body itself is accepted: otherwise every mutated case would only test the first check.
      const ok = await send(t, { kind: 'mutated', mutations: [] });
      expect(ok.status, ok.text).toBeLessThan(300);
      // Each top-level field of the valid body set to each of a few known troublemakers, in turn.
      const base = await t.valid();
      for (const field of base && typeof base === 'object' && !Array.isArray(base) ? Object.keys(base) : []) {
        for (const nasty of NASTIES) {
          await send(t, {
            kind: 'json',
            value: { ...((await t.valid()) as object), [field]: nasty } as Json,
          });
        }
      }
      const statuses = new Map<number, number>();
      await check(t.name, bodyCaseArb, async (c) => {
        const r = await send(t, c);
        statuses.set(r.status, (statuses.get(r.status) ?? 0) + 1);
      });
      // Both outcomes were exercised: some bodies got through, many were refused.
      const codes = [...statuses.keys()];
      expect(codes.some((s) => s >= 400)).toBe(true);
      console.info(`${t.name}: ${JSON.stringify(Object.fromEntries([...statuses].sort()))}`);
    });
  }
});

describe('parseDesign under hostile input', () => {
  const expectResult = (input: unknown) => {
    let r: ReturnType<typeof parseDesign>;
    try {
      r = parseDesign(input);
    } catch (e) {
      throw new Error(`parseDesign threw on ${JSON.stringify(input)?.slice(0, 300)}: ${e}`, { cause: e });
    }
    if (r.ok) {
      // What it accepted, it accepts again unchanged (a saved design always loads).
      const again = parseDesign(structuredClone(r.design));
      expect(again.ok).toBe(true);
      return;
    }
    expect(typeof r.error.path).toBe('string');
    expect(typeof r.error.message).toBe('string');
    expect(r.error.message.length).toBeGreaterThan(0);
  };

  it('never throws on arbitrary JSON', async () => {
    await check('parseDesign(jsonValue)', fc.jsonValue({ maxDepth: 5 }), expectResult);
  });

  it('never throws on mutated valid designs, and accepts the unmutated ones', async () => {
    await check(
      'parseDesign(mutated design)',
      fc.tuple(arbDesign(), fc.array(mutationArb, { maxLength: 3 })),
      ([design, mutations]) => {
        if (mutations.length === 0) expect(parseDesign(design).ok).toBe(true);
        let doc: Json | undefined = design as unknown as Json;
        for (const m of mutations) doc = mutate(doc, m);
        expectResult(doc);
      },
    );
  });

  it('never throws on documents claiming other versions', async () => {
    await check(
      'parseDesign(other versions)',
      fc.record({
        format: fc.constantFrom('baskwell.design', 'other'),
        version: fc.oneof(
          fc.integer(),
          fc.double(),
          fc.constantFrom(0, -1, 2, 1e308, Number.MAX_SAFE_INTEGER),
        ),
        enclosure: fc.jsonValue({ maxDepth: 2 }),
        objects: fc.oneof(fc.jsonValue({ maxDepth: 3 }), fc.constant(EXAMPLE_DESIGN.objects)),
      }),
      expectResult,
    );
  });
});
