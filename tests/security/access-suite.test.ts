// The access-control suite, generated from the route files (every handler of app/api/**/route.ts and the
// share report): each is called with a well-formed request aimed at organisation A's things
//   - by nobody (no session), by the owner of another organisation, and by a keeper of A who does not
//     own the enclosure — none succeeds, and the database is byte-for-byte unchanged after each;
//   - with a foreign id and with an id that does not exist — the same 404 body;
//   - with forged and random ids from fast-check (fixed seed; FUZZ_SEED to change, printed on failure).
// The control: A's owner gets past the same requests, so the refusals come from the access check and
// not from a malformed request. Routes that legitimately answer these people (their own account, a new
// organisation of their own, public routes, lists narrowed to what they may see) are listed with why,
// and their answers are searched for any of A's things.
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { settleMail } from '@/lib/auth/mail-soon';
import { closeDatabase } from '../helpers/db';
import { ORIGIN } from '../api/http';
import { REQUESTS, idFor } from './access-requests';
import { MARK, cookieOf, fingerprint, outsiderOwns, worldAndRoutes, type World } from './access-world';
import { fill, type RouteEntry } from './route-modules';

const SEED = Number(process.env.FUZZ_SEED ?? 20_251_202);
const RUNS = Number(process.env.ACCESS_FUZZ_RUNS ?? 12);

type Actor = 'nobody' | 'outsider' | 'otherKeeper';
const ACTORS: Actor[] = ['nobody', 'outsider', 'otherKeeper'];
const REFUSED = [401, 403, 404];

/**
 * Handlers that do answer some of these people, and why that is right. `markers` are the names of A's
 * things the answer must still not contain.
 */
const LEGITIMATE: Record<string, { who: Actor[]; why: string; markers?: (keyof typeof MARK)[] }> = {
  'GET /api/health': {
    who: ACTORS,
    why: 'a probe: answers { ok } and when each background job last ran; no organisation’s data',
  },
  'POST /api/sign-up': { who: ACTORS, why: 'creates a new account with its own new organisation' },
  'POST /api/sign-up/resend': {
    who: ACTORS,
    why: 'answers everyone the same; the link goes only to the address, never in the answer',
  },
  'POST /api/password-reset': {
    who: ACTORS,
    why: 'answers everyone the same; the link goes only to the address, never in the answer',
  },
  'POST /api/organisations': { who: ['outsider', 'otherKeeper'], why: 'a new organisation of their own' },
  'PUT /api/account/password': { who: ['outsider', 'otherKeeper'], why: 'their own account only' },
  'DELETE /api/account/sessions': { who: ['outsider', 'otherKeeper'], why: 'their own sessions only' },
  'PUT /api/current-organisation': {
    who: ['otherKeeper'],
    why: 'keeper 2 is a member of A: choosing it as the working organisation is theirs to do',
  },
  'GET /api/species': { who: ['otherKeeper'], why: 'members read their organisation’s species sheets' },
  'GET /api/species/[id]': { who: ['otherKeeper'], why: 'members read their organisation’s species sheets' },
  'GET /api/lamp-types': { who: ['otherKeeper'], why: 'members read their organisation’s lamp catalogue' },
  'GET /api/lamp-types/[id]': {
    who: ['otherKeeper'],
    why: 'members read their organisation’s lamp catalogue',
  },
  'GET /api/lamps': {
    who: ['otherKeeper'],
    why: 'a keeper’s lamp list, narrowed to their own enclosures',
    markers: ['lamp', 'enclosure', 'reading'],
  },
};

let world: World;
let routes: RouteEntry[] = [];
const cookies: Partial<Record<Actor | 'owner', string>> = {};

async function cookieFor(actor: Actor | 'owner'): Promise<string | undefined> {
  if (actor === 'nobody') return undefined;
  const id = { owner: world.ownerA, outsider: world.ownerB, otherKeeper: world.keeper2 }[actor];
  // Fresh each time: an earlier request may have ended this person's sessions (their own account routes).
  cookies[actor] = await cookieOf(id);
  return cookies[actor];
}

const keyOf = (r: RouteEntry) => `${r.method} ${r.pattern}`;

type Reply = { status: number; text: string; body: { error?: { code?: string } } | null };

async function send(r: RouteEntry, actor: Actor | 'owner', params?: Record<string, string>): Promise<Reply> {
  const spec = REQUESTS[keyOf(r)];
  if (!spec) throw new Error(`no request for ${keyOf(r)} in access-requests.ts: add one`);
  const p = params ?? idFor(r.pattern, world);
  const headers = new Headers({ origin: ORIGIN });
  const cookie = await cookieFor(actor);
  if (cookie) headers.set('cookie', cookie);
  let body: BodyInit | undefined;
  if (spec.raw) {
    headers.set('content-type', spec.raw.contentType);
    body = spec.raw.bytes();
  } else if (spec.body) {
    headers.set('content-type', 'application/json');
    body = JSON.stringify(await spec.body(world));
  }
  const query = spec.query ? `?${spec.query(world)}` : '';
  const req = new Request(`${ORIGIN}${fill(r.pattern, p)}${query}`, { method: r.method, headers, body });
  const res = await r.handler(req, { params: Promise.resolve(p) });
  const text = await res.text();
  let parsed: Reply['body'] = null;
  try {
    parsed = JSON.parse(text);
  } catch {
    parsed = null;
  }
  return { status: res.status, text, body: parsed };
}

const ALL_MARKERS = Object.keys(MARK) as (keyof typeof MARK)[];
/** What each attacker must never see of A. Keeper 2 may see A's species and lamp catalogue. */
const hiddenFrom = (actor: Actor): (keyof typeof MARK)[] =>
  actor === 'otherKeeper' ? ALL_MARKERS.filter((m) => m !== 'species' && m !== 'lampType') : ALL_MARKERS;

beforeAll(async () => {
  ({ world, routes } = await worldAndRoutes());
}, 120_000);
afterAll(closeDatabase);

describe('every route handler refuses people who may not', () => {
  it('has a request for every handler, and no request for a handler that is gone', () => {
    const keys = routes.map(keyOf);
    console.info(
      `access suite: ${routes.length} handlers in ${new Set(routes.map((r) => r.file)).size} files`,
    );
    expect(keys.filter((k) => !REQUESTS[k])).toEqual([]);
    expect(Object.keys(REQUESTS).filter((k) => !keys.includes(k))).toEqual([]);
    expect(routes.length).toBeGreaterThan(60);
  });

  for (const actor of ACTORS) {
    it(
      `as ${actor}: no handler succeeds on A's things, and nothing is written`,
      { timeout: 300_000 },
      async () => {
        const wrong: string[] = [];
        for (const r of routes) {
          const legit = LEGITIMATE[keyOf(r)];
          const before = await fingerprint();
          const reply = await send(r, actor);
          if (legit?.who.includes(actor)) {
            if (reply.status >= 500) wrong.push(`${keyOf(r)} → ${reply.status}`);
            const leaked = (legit.markers ?? hiddenFrom(actor)).filter((m) => reply.text.includes(MARK[m]));
            if (leaked.length) wrong.push(`${keyOf(r)} leaks ${leaked.join(', ')}`);
            // Sign-up e-mails a confirmation link after answering: let the outbox finish before the next
            // handler's fingerprint, or its delivery would look like that handler writing.
            await settleMail();
            continue;
          }
          if (!REFUSED.includes(reply.status))
            wrong.push(`${keyOf(r)} → ${reply.status} ${reply.text.slice(0, 160)}`);
          else if (
            actor === 'nobody' &&
            reply.status !== 401 &&
            !r.pattern.startsWith('/s/') &&
            r.pattern !== '/api/invitations/accept' &&
            r.pattern !== '/api/password-reset/complete' &&
            r.pattern !== '/api/sign-up/confirm' &&
            r.pattern !== '/api/unsubscribe'
          )
            wrong.push(`${keyOf(r)} → ${reply.status} for nobody (expected 401)`);
          const leaked = hiddenFrom(actor).filter((m) => reply.text.includes(MARK[m]));
          if (leaked.length) wrong.push(`${keyOf(r)} reply leaks ${leaked.join(', ')}`);
          if ((await fingerprint()) !== before) wrong.push(`${keyOf(r)} changed the database while refusing`);
        }
        expect(wrong).toEqual([]);
      },
    );
  }

  describe('ids', () => {
    const withId = () => routes.filter((r) => r.paramNames.includes('id'));
    // Far beyond any row this test makes, still a valid id.
    const MISSING = String(2_000_000_000);

    for (const actor of ['outsider', 'otherKeeper'] as const) {
      it(
        `as ${actor}: a foreign id and a missing id get the same 404 body`,
        { timeout: 300_000 },
        async () => {
          const wrong: string[] = [];
          for (const r of withId()) {
            const foreign = await send(r, actor);
            if (LEGITIMATE[keyOf(r)]?.who.includes(actor)) continue;
            // Keeper 2 may see the organisation's catalogue: changing it is a 403 there, not a secret.
            if (foreign.status === 403 && actor === 'otherKeeper') continue;
            const missing = await send(r, actor, { id: MISSING });
            if (foreign.status !== 404 || missing.status !== 404 || foreign.text !== missing.text)
              wrong.push(
                `${keyOf(r)}: foreign ${foreign.status} ${foreign.text} / missing ${missing.status} ${missing.text}`,
              );
          }
          expect(wrong).toEqual([]);
        },
      );
    }

    it(
      `forged and random ids never succeed, never fail on our side (seed ${SEED})`,
      { timeout: 300_000 },
      async () => {
        const forged = fc.oneof(
          fc.integer({ min: -(2 ** 31), max: 2 ** 31 }).map(String),
          fc.bigInt({ min: 2n ** 31n, max: 2n ** 70n }).map(String),
          fc.string({ maxLength: 30 }),
          fc.constantFrom(
            '0',
            '-1',
            '1e3',
            '0x10',
            ' 1',
            '1 ',
            '1.0',
            '01',
            '1;DROP TABLE users',
            '../1',
            '%00',
            'NaN',
            '',
            '١',
          ),
          // A's real ids in disguise.
          fc
            .constantFrom('enclosure', 'design', 'variant', 'lamp', 'reading', 'share', 'upload')
            .map((k) => `${world[k as keyof World]} `),
        );
        const target = fc.tuple(fc.constantFrom(...withId()), fc.constantFrom<Actor>(...ACTORS), forged);
        const before = await fingerprint();
        try {
          await fc.assert(
            fc.asyncProperty(target, async ([r, actor, id]) => {
              if (LEGITIMATE[keyOf(r)]?.who.includes(actor)) return;
              // A "forged" id that names something of the outsider's own is no forgery: theirs to reach.
              if (actor === 'outsider' && (await outsiderOwns(r.pattern, id, world.ownerB))) return;
              const reply = await send(r, actor, { id });
              expect(
                reply.status,
                `${keyOf(r)} as ${actor} with id ${JSON.stringify(id)}: ${reply.text}`,
              ).toBeGreaterThanOrEqual(400);
              expect(
                reply.status,
                `${keyOf(r)} as ${actor} with id ${JSON.stringify(id)}: ${reply.text}`,
              ).toBeLessThan(500);
            }),
            { seed: SEED, numRuns: RUNS * withId().length, endOnFailure: true },
          );
        } catch (e) {
          throw new Error(`access fuzz failure (FUZZ_SEED=${SEED})\n${e instanceof Error ? e.message : e}`, {
            cause: e,
          });
        }
        expect(await fingerprint()).toBe(before);
      },
    );

    it('share report and picture links: random tokens all get the same 404', async () => {
      for (const pattern of ['/s/[token]/report', '/s/[token]/picture/[version]/[file]']) {
        const route = routes.find((r) => r.pattern === pattern)!;
        const bodies = new Set<string>();
        await fc.assert(
          fc.asyncProperty(
            fc.oneof(fc.string({ maxLength: 60 }), fc.base64String({ minLength: 40, maxLength: 48 })),
            async (token) => {
              const reply = await send(route, 'nobody', { token, version: '1', file: 'uvi.svg' });
              expect(reply.status).toBe(404);
              bodies.add(reply.text);
            },
          ),
          { seed: SEED, numRuns: RUNS * 4 },
        );
        expect(bodies.size, pattern).toBe(1);
      }
    });
  });

  it('the control: A’s owner gets past every one of these requests', { timeout: 300_000 }, async () => {
    const refused: string[] = [];
    // Destructive ones last, children before parents, so each still finds its thing.
    const order = (r: RouteEntry) => (r.method === 'DELETE' ? 1 : 0);
    const deleteOrder = [
      'counter',
      'customers',
      'readings',
      'shares',
      'uploads',
      'invitations',
      'lamps',
      'variants',
      'designs',
      'enclosures',
      'species',
      'lamp-types',
      'organisations',
      'account',
    ];
    const rank = (r: RouteEntry) => deleteOrder.findIndex((s) => r.pattern.startsWith(`/api/${s}`));
    const sorted = [...routes].sort((a, b) => order(a) - order(b) || (order(a) ? rank(a) - rank(b) : 0));
    for (const r of sorted) {
      // Public routes with a made-up token answer 404 to everyone; that is their refusal, not the owner's.
      if (
        r.pattern === '/api/invitations/accept' ||
        r.pattern === '/api/password-reset/complete' ||
        r.pattern === '/api/sign-up/confirm' ||
        r.pattern === '/api/unsubscribe' ||
        r.pattern.startsWith('/s/')
      )
        continue;
      const reply = await send(r, 'owner');
      if (REFUSED.includes(reply.status) || reply.status >= 500)
        refused.push(`${keyOf(r)} → ${reply.status} ${reply.text.slice(0, 160)}`);
    }
    expect(refused).toEqual([]);
  });
});
