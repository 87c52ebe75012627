import mariadb from 'mariadb';
import { QueryTypes, Sequelize } from 'sequelize';
import { afterAll, beforeEach, describe, expect, it } from 'vitest';
import { z } from 'zod';
import * as enclosures from '@/app/api/enclosures/route';
import { route } from '@/lib/api';
import { errorResponse } from '@/lib/api/errors';
import { type Organisation, type User } from '@/models';
import { closeDatabase, createMember, resetDatabase, testDb } from '../helpers/db';
import { call, expectNoInternals, ORIGIN, sessionCookie, type Reply } from './http';

afterAll(closeDatabase);

let org: Organisation;
let staff: User;

beforeEach(async () => {
  await resetDatabase();
  ({ organisation: org, user: staff } = await createMember('staff'));
});

const body = () => ({ organisationId: org.id, name: 'Tank', widthCm: 60, heightCm: 40, depthCm: 40 });
const post = (o: Partial<Parameters<typeof call>[1]>) =>
  call(enclosures.POST, { method: 'POST', path: '/api/enclosures', as: staff, ...o });

async function replyOf(res: Response): Promise<Reply> {
  const text = await res.text();
  return { status: res.status, body: JSON.parse(text), text, res };
}

describe('transport checks on state-changing requests', () => {
  it('rejects a request from another site', async () => {
    const r = await post({ body: body(), headers: { origin: 'https://evil.example' } });
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('cross_site');
    const fetchMeta = await post({ body: body(), headers: { 'sec-fetch-site': 'cross-site' } });
    expect(fetchMeta.status).toBe(403);
  });

  it('accepts a same-origin request; refuses one without Origin that carries a session cookie', async () => {
    expect((await post({ body: body() })).status).toBe(201);
    const noOrigin = (cookie?: string) =>
      new Request(`${ORIGIN}/api/enclosures`, {
        method: 'POST',
        headers: { 'content-type': 'application/json', ...(cookie ? { cookie } : {}) },
        body: JSON.stringify(body()),
      });
    // Browsers send Origin with every POST: a cookie without one did not come from our pages.
    const withCookie = await enclosures.POST(noOrigin(await sessionCookie(staff)));
    expect(withCookie.status).toBe(403);
    expect(((await withCookie.json()) as { error: { code: string } }).error.code).toBe('cross_site');
    // A script without a session passes this check and meets the session check instead.
    expect((await enclosures.POST(noOrigin())).status).toBe(401);
  });

  it('accepts only application/json bodies', async () => {
    const r = await post({ rawBody: JSON.stringify(body()), headers: { 'content-type': 'text/plain' } });
    expect(r.status).toBe(415);
    expect(r.body.error.code).toBe('unsupported_media_type');
    const form = await post({
      rawBody: 'name=x',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
    });
    expect(form.status).toBe(415);
  });

  it('answers 400 for malformed JSON', async () => {
    const r = await post({ rawBody: '{"name": ', headers: { 'content-type': 'application/json' } });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('invalid_json');
    expectNoInternals(r);
  });

  it('caps the body at 1 MB (413), by declared length and by what actually arrives', async () => {
    const big = JSON.stringify({ ...body(), notes: 'x'.repeat(1_100_000) });
    const r = await post({ rawBody: big, headers: { 'content-type': 'application/json' } });
    expect(r.status).toBe(413);
    expect(r.body.error.code).toBe('payload_too_large');
    // A stream with no Content-Length is counted as it arrives.
    const stream = new ReadableStream<Uint8Array>({
      start(c) {
        for (let i = 0; i < 20; i++) c.enqueue(new TextEncoder().encode('x'.repeat(100_000)));
        c.close();
      },
    });
    const req = new Request(`${ORIGIN}/api/enclosures`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: ORIGIN },
      body: stream,
      duplex: 'half',
    } as RequestInit);
    expect((await enclosures.POST(req)).status).toBe(413);
  });
});

describe('errors never leak internals', () => {
  it('a real SQL error becomes a generic 500', async () => {
    let sqlError: unknown;
    try {
      await testDb().query('SELECT no_such_column FROM enclosures', { type: QueryTypes.SELECT });
    } catch (e) {
      sqlError = e;
    }
    expect(sqlError).toBeDefined();
    const quiet = console.error;
    console.error = () => {};
    try {
      const r = await replyOf(errorResponse(sqlError));
      expect(r.status).toBe(500);
      expect(r.body.error.code).toBe('internal');
      expect(r.text).not.toContain('no_such_column');
      expectNoInternals(r);
    } finally {
      console.error = quiet;
    }
  });

  it('a handler that throws answers 500 without a stack trace', async () => {
    const handler = route({
      query: z.object({}),
      auth: false,
      handler: async () => {
        throw new Error('secret internal detail at /work/main/lib/x.ts:1:1');
      },
    });
    const quiet = console.error;
    console.error = () => {};
    try {
      const r = await replyOf(await handler(new Request(`${ORIGIN}/x`)));
      expect(r.status).toBe(500);
      expect(r.text).not.toContain('secret internal detail');
      expectNoInternals(r);
    } finally {
      console.error = quiet;
    }
  });

  it('an unreachable database answers 503 with Retry-After', async () => {
    // A real driver error: a pool pointed at a port where nothing listens.
    const down = new Sequelize('baskwell_test', 'nobody', 'nothing', {
      host: '127.0.0.1',
      port: 9,
      dialect: 'mariadb',
      dialectModule: mariadb,
      logging: false,
      pool: { max: 1, acquire: 2_000 },
      dialectOptions: { connectTimeout: 1_000 },
    });
    let lost: unknown;
    try {
      await down.query('SELECT 1');
    } catch (e) {
      lost = e;
    } finally {
      await down.close();
    }
    const quiet = console.error;
    console.error = () => {};
    try {
      const r = await replyOf(errorResponse(lost));
      expect(r.status).toBe(503);
      expect(r.res.headers.get('retry-after')).toMatch(/^\d+$/);
      expect(r.body.error.code).toBe('unavailable');
      expect(r.text).not.toContain('127.0.0.1');
      expectNoInternals(r);
    } finally {
      console.error = quiet;
    }
  });
});
