// Every zod schema a route handler uses, fuzzed through the real handler: for each handler (found from
// the route files) the well-formed request of access-requests.ts is mutated and replaced by arbitrary
// JSON and non-JSON (bodies), and its query string is filled with hostile values — sent by organisation
// A's owner, who gets past the access check, so the cases reach the schemas and the code behind them.
// Never a 5xx, never an uncaught error, never internals in a reply. Size caps answer 413, whether the
// request declares its length or streams it.
//
// Reproducible: FUZZ_SEED fixes the cases (printed on failure); FUZZ_ALL_RUNS sets the cases per handler.
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MAX_JSON_BODY_BYTES } from '@/lib/api/request';
import { MAX_CSV_IMPORT_BODY_BYTES, MAX_IMAGE_BYTES } from '@/lib/uploads/limits';
import { closeDatabase } from '../helpers/db';
import { ORIGIN, type Reply } from '../api/http';
import { REQUESTS, idFor } from './access-requests';
import { cookieOf, worldAndRoutes, type World } from './access-world';
import { EDGE_VALUES, bodyCaseArb, mutate, type BodyCase, type Json } from './fuzz-arbitraries';
import { checkProperty, expectSafeReply } from './fuzz-contract';
import { fill, type RouteEntry } from './route-modules';

const RUNS = Number(process.env.FUZZ_ALL_RUNS ?? 25);

let world: World;
let routes: RouteEntry[] = [];
const keyOf = (r: RouteEntry) => `${r.method} ${r.pattern}`;

beforeAll(async () => {
  ({ world, routes } = await worldAndRoutes());
}, 120_000);
afterAll(closeDatabase);

type Sent = { query?: string; body?: BodyInit; contentType?: string; length?: number };

async function send(r: RouteEntry, s: Sent): Promise<Reply> {
  const params = idFor(r.pattern, world);
  const headers = new Headers({ origin: ORIGIN, cookie: await cookieOf(world.ownerA) });
  if (s.contentType) headers.set('content-type', s.contentType);
  if (s.length !== undefined) headers.set('content-length', String(s.length));
  const url = `${ORIGIN}${fill(r.pattern, params)}${s.query ? `?${s.query}` : ''}`;
  const init: RequestInit & { duplex?: 'half' } = { method: r.method, headers, body: s.body };
  if (s.body instanceof ReadableStream) init.duplex = 'half';
  const res = await r.handler(new Request(url, init), { params: Promise.resolve(params) });
  const text = await res.text();
  let body: unknown = null;
  try {
    body = JSON.parse(text);
  } catch {
    body = null;
  }
  return { status: res.status, body, text, res };
}

/** Query values a schema may trip over, beside random strings. */
const queryValueArb = fc.oneof(
  fc.string({ maxLength: 20 }),
  fc.constantFrom(...EDGE_VALUES.filter((v) => typeof v !== 'object').map((v) => String(v).slice(0, 2000))),
  fc.integer().map(String),
);

/** The handler's own query with values replaced, keys dropped or added. */
function queryArb(base: string): fc.Arbitrary<string> {
  const keys = [...new URLSearchParams(base).keys(), 'cursor', 'limit', 'organisationId', '__proto__'];
  return fc
    .dictionary(fc.constantFrom(...keys), queryValueArb, { maxKeys: 5 })
    .map((d) => new URLSearchParams(d as Record<string, string>).toString());
}

const hasBody = (r: RouteEntry) => Boolean(REQUESTS[keyOf(r)]?.body);
// The export route answers files (PDF/PNG) with a 200; the share report too.
const answersFiles = (r: RouteEntry) => /\/export$|\/report$|^\/api\/uploads\/\[id\]$/.test(r.pattern);

describe('every route handler under hostile input', () => {
  it('covers the handlers that take a body or a query', () => {
    const withBody = routes.filter(hasBody);
    const withQuery = routes.filter((r) => REQUESTS[keyOf(r)]?.query);
    console.info(
      `fuzz-all-routes: ${withBody.length} handlers with a body, ${withQuery.length} with a query, ${RUNS} cases each`,
    );
    expect(withBody.length).toBeGreaterThan(25);
    expect(withQuery.length).toBeGreaterThan(10);
  });

  it(`JSON bodies: ${RUNS} cases per handler, no 5xx, safe errors`, { timeout: 600_000 }, async () => {
    for (const r of routes.filter(hasBody)) {
      const valid = async () => (await REQUESTS[keyOf(r)]!.body!(world)) as Json;
      await checkProperty(
        keyOf(r),
        bodyCaseArb,
        async (c: BodyCase) => {
          let body: Json | undefined;
          let raw: string | undefined;
          if (c.kind === 'json') body = c.value;
          else if (c.kind === 'raw') raw = c.text;
          else {
            body = await valid();
            for (const m of c.mutations) body = mutate(body, m);
          }
          const text = raw ?? (body === undefined ? undefined : JSON.stringify(body));
          const reply = await send(r, {
            query: REQUESTS[keyOf(r)]!.query?.(world),
            body: text,
            contentType: text === undefined ? undefined : 'application/json',
          });
          expectSafeReply(reply, body ?? raw ?? null, `${keyOf(r)} with ${text?.slice(0, 300)}`, {
            json: !answersFiles(r),
          });
        },
        RUNS,
      );
    }
  });

  it(`query strings: ${RUNS} cases per handler, no 5xx, safe errors`, { timeout: 600_000 }, async () => {
    for (const r of routes.filter((x) => REQUESTS[keyOf(x)]?.query)) {
      const spec = REQUESTS[keyOf(r)]!;
      await checkProperty(
        `${keyOf(r)} query`,
        queryArb(spec.query!(world)),
        async (query) => {
          const body = spec.body ? JSON.stringify(await spec.body(world)) : undefined;
          const reply = await send(r, {
            query,
            body: spec.raw ? spec.raw.bytes() : body,
            contentType: spec.raw?.contentType ?? (body ? 'application/json' : undefined),
          });
          expectSafeReply(reply, query, `${keyOf(r)}?${query}`, { json: !answersFiles(r) });
        },
        RUNS,
      );
    }
  });
});

describe('size caps', () => {
  // Routes with a body cap of their own (the readings and counter imports carry a whole CSV file).
  const OWN_CAPS: Record<string, number> = {
    'POST /api/readings/import': MAX_CSV_IMPORT_BODY_BYTES,
    'POST /api/counter/import': MAX_CSV_IMPORT_BODY_BYTES,
  };
  const oversized = (r: RouteEntry) =>
    JSON.stringify({ padding: 'x'.repeat(OWN_CAPS[keyOf(r)] ?? MAX_JSON_BODY_BYTES) });

  it(
    'every JSON route answers 413 to a body over the cap, declared or streamed',
    { timeout: 300_000 },
    async () => {
      const wrong: string[] = [];
      for (const r of routes.filter(hasBody)) {
        const text = oversized(r);
        const declared = await send(r, { body: text, contentType: 'application/json', length: text.length });
        const bytes = new TextEncoder().encode(text);
        // No Content-Length: the cap must hold while the bytes stream in.
        const streamed = await send(r, {
          contentType: 'application/json',
          body: new ReadableStream<Uint8Array>({
            start(controller) {
              for (let i = 0; i < bytes.length; i += 64 * 1024)
                controller.enqueue(bytes.slice(i, i + 64 * 1024));
              controller.close();
            },
          }),
        });
        for (const [how, reply] of [
          ['declared', declared],
          ['streamed', streamed],
        ] as const) {
          const body = reply.body as { error?: { code?: string } } | null;
          if (reply.status !== 413 || body?.error?.code !== 'payload_too_large')
            wrong.push(`${keyOf(r)} (${how}) → ${reply.status} ${reply.text.slice(0, 120)}`);
        }
      }
      expect(wrong).toEqual([]);
    },
  );

  it('the photo upload answers 413 over its own cap', async () => {
    const r = routes.find((x) => keyOf(x) === 'POST /api/uploads')!;
    const reply = await send(r, {
      query: REQUESTS['POST /api/uploads']!.query!(world),
      contentType: 'image/png',
      body: new Uint8Array(MAX_IMAGE_BYTES + 1),
    });
    expect(reply.status).toBe(413);
    expect((reply.body as { error: { code: string } }).error.code).toBe('payload_too_large');
  });
});
