// Every state-changing route handler (found from the route files) refuses, before it reads or changes
// anything: a cross-site Origin, a cookie-carrying request with no Origin, and the bodies an HTML form
// can send (text/plain, form-encoded, multipart) — each with a real session cookie. The same request as
// JSON from our own origin gets past these checks, so the refusals are not a blanket "no".
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { assertSameOriginHeaders } from '@/lib/api/request';
import { ApiError } from '@/lib/api/errors';
import { User } from '@/models';
import { closeDatabase, createMember, resetDatabase } from '../helpers/db';
import { ORIGIN, sessionCookie } from '../api/http';
import { WRITE_METHODS, fill, loadRoutes, type RouteEntry } from './route-modules';

let cookie: string;
let writes: RouteEntry[] = [];

beforeAll(async () => {
  await resetDatabase();
  const { user } = await createMember('owner');
  cookie = await sessionCookie((await User.findByPk(user.id))!);
  writes = (await loadRoutes()).filter((r) => WRITE_METHODS.includes(r.method));
}, 60_000);
afterAll(closeDatabase);

type Variant = { name: string; headers: Record<string, string>; body?: string; status: number; code: string };

const JSON_BODY = '{}';
const REFUSED: Variant[] = [
  {
    name: 'a cross-site Origin',
    headers: { origin: 'https://evil.example', 'content-type': 'application/json' },
    body: JSON_BODY,
    status: 403,
    code: 'cross_site',
  },
  {
    name: 'Sec-Fetch-Site: cross-site with our Origin',
    headers: { origin: ORIGIN, 'sec-fetch-site': 'cross-site', 'content-type': 'application/json' },
    body: JSON_BODY,
    status: 403,
    code: 'cross_site',
  },
  {
    name: 'the opaque Origin "null" (sandboxed frame)',
    headers: { origin: 'null', 'content-type': 'application/json' },
    body: JSON_BODY,
    status: 403,
    code: 'cross_site',
  },
  {
    name: 'no Origin with a session cookie',
    headers: { 'content-type': 'application/json' },
    body: JSON_BODY,
    status: 403,
    code: 'cross_site',
  },
  {
    name: 'a text/plain body',
    headers: { origin: ORIGIN, 'content-type': 'text/plain;charset=UTF-8' },
    body: JSON_BODY,
    status: 415,
    code: 'unsupported_media_type',
  },
  {
    name: 'a form-encoded body',
    headers: { origin: ORIGIN, 'content-type': 'application/x-www-form-urlencoded' },
    body: 'name=x&organisationId=1',
    status: 415,
    code: 'unsupported_media_type',
  },
  {
    name: 'a multipart form body',
    headers: { origin: ORIGIN, 'content-type': 'multipart/form-data; boundary=b' },
    body: '--b\r\nContent-Disposition: form-data; name="name"\r\n\r\nx\r\n--b--\r\n',
    status: 415,
    code: 'unsupported_media_type',
  },
];

async function send(r: RouteEntry, v: Omit<Variant, 'status' | 'code' | 'name'>) {
  const params = Object.fromEntries(r.paramNames.map((n) => [n, '1']));
  const headers = new Headers(v.headers);
  headers.set('cookie', cookie);
  const req = new Request(`${ORIGIN}${fill(r.pattern, params)}`, {
    method: r.method,
    headers,
    body: v.body,
  });
  const res = await r.handler(req, { params: Promise.resolve(params) });
  const text = await res.text();
  let body: { error?: { code?: string } } | null = null;
  try {
    body = JSON.parse(text);
  } catch {
    body = null;
  }
  return { status: res.status, body, text };
}

describe('state-changing route handlers refuse forged and form requests', () => {
  it('finds the write routes from the files', () => {
    console.info(`request guards: ${writes.length} write handlers`);
    expect(writes.length).toBeGreaterThan(25);
    expect(writes.map((w) => `${w.method} ${w.pattern}`)).toEqual(
      expect.arrayContaining(['PUT /api/variants/[id]', 'POST /api/uploads', 'DELETE /api/account/sessions']),
    );
  });

  for (const v of REFUSED) {
    it(`every write route refuses ${v.name} (${v.status})`, async () => {
      const wrong: string[] = [];
      for (const r of writes) {
        const reply = await send(r, v);
        if (reply.status !== v.status || reply.body?.error?.code !== v.code)
          wrong.push(`${r.method} ${r.pattern} → ${reply.status} ${reply.text.slice(0, 120)}`);
      }
      expect(wrong).toEqual([]);
    });
  }

  it('the same request as JSON from our origin passes these checks (control)', async () => {
    const stopped: string[] = [];
    for (const r of writes) {
      const reply = await send(r, {
        headers: { origin: ORIGIN, 'content-type': 'application/json' },
        body: JSON_BODY,
      });
      if (reply.body?.error?.code === 'cross_site' || reply.body?.error?.code === 'unsupported_media_type') {
        // The photo upload takes image bytes, not JSON: its refusal of a JSON body comes from its own check.
        if (r.pattern === '/api/uploads' && reply.status === 415) continue;
        stopped.push(`${r.method} ${r.pattern} → ${reply.status} ${reply.text.slice(0, 120)}`);
      }
    }
    expect(stopped).toEqual([]);
  });
});

describe('server actions use the same origin rule', () => {
  const check = (h: Record<string, string>) => {
    try {
      assertSameOriginHeaders(new Headers({ host: 'localhost:3000', ...h }));
      return 'ok';
    } catch (e) {
      return e instanceof ApiError ? `${e.status} ${e.code}` : String(e);
    }
  };

  it('refuses a foreign or missing Origin when a session cookie rides along', () => {
    const session = { cookie: 'next-auth.session-token=abc' };
    expect(check({ ...session, origin: 'http://localhost:3000' })).toBe('ok');
    expect(check({ ...session, origin: 'https://evil.example' })).toBe('403 cross_site');
    expect(check(session)).toBe('403 cross_site');
    expect(check({ cookie: '__Secure-next-auth.session-token.0=abc' })).toBe('403 cross_site');
    // Without a session there is nothing to forge: scripts may call public routes without an Origin.
    expect(check({ cookie: 'bw_org=1' })).toBe('ok');
  });
});
