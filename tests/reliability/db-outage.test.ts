// A database outage answers 503 with Retry-After, quickly, in JSON without internals. The real route
// handlers run in a process of their own (db-outage.child.ts under tsx) whose DB_PORT points where no
// database answers: a closed port (refused at once) and a port that accepts but never speaks (a hung
// server, caught by the pool's 3 s acquire timeout).
import { execFile } from 'node:child_process';
import net from 'node:net';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { expectNoInternals, type Reply } from '../api/http';
import { freePort } from '../helpers/ports';
import { ROOT, TSX, tsxArgs } from '../helpers/tsx';

const run = promisify(execFile);
const CHILD = path.join(import.meta.dirname, 'db-outage.child.ts');

type Outcome = {
  name: string;
  ms: number;
  status?: number;
  retryAfter?: string | null;
  contentType?: string | null;
  text?: string;
  threw?: string;
};

async function handlersWithDatabaseAt(port: number): Promise<Outcome[]> {
  const { stdout } = await run(TSX, tsxArgs(CHILD), {
    cwd: ROOT,
    env: { ...process.env, DB_HOST: '127.0.0.1', DB_PORT: String(port) },
    // Each handler gives up within seconds (each outcome's own time is checked below); the rest is tsx
    // compiling the routes, which took over 40 s on a busy two-core machine. A child still busy after
    // this is itself the failure.
    timeout: 150_000,
  });
  return JSON.parse(stdout.trim().split('\n').pop()!) as Outcome[];
}

function expectUnavailable(o: Outcome, port: number, withinMs: number) {
  const context = `${o.name}: ${JSON.stringify(o).slice(0, 500)}`;
  expect(o.threw, context).toBeUndefined();
  expect(o.status, context).toBe(503);
  expect(Number(o.retryAfter), context).toBeGreaterThanOrEqual(1);
  expect(o.contentType, context).toMatch(/^application\/json/);
  const body = JSON.parse(o.text!);
  expect(body.error.code, context).toBe('unavailable');
  expect(body.error.message, context).toMatch(/try again/i);
  expectNoInternals({ status: o.status!, text: o.text!, body, res: new Response() } satisfies Reply);
  for (const leak of [/ECONN|ETIMEDOUT|ER_[A-Z_]+/, /127\.0\.0\.1|localhost/, new RegExp(`\\b${port}\\b`)]) {
    expect(o.text, `${context} leaks ${leak}`).not.toMatch(leak);
  }
  expect(o.ms, context).toBeLessThan(withinMs);
}

describe('database outage', () => {
  it('a closed database port: 503 with Retry-After within 3 s', { timeout: 180_000 }, async () => {
    const port = await freePort();
    const outcomes = await handlersWithDatabaseAt(port);
    expect(outcomes.map((o) => o.name)).toEqual([
      'GET /api/health',
      'GET /api/enclosures',
      'PUT /api/variants/1',
    ]);
    console.info(outcomes.map((o) => `${o.name}: ${o.status} in ${o.ms} ms`).join('\n'));
    for (const o of outcomes) expectUnavailable(o, port, 3_000);
  });

  // The driver's connectTimeout ends once TCP connects and Sequelize's first-connection version check
  // bypasses the pool's acquire timeout; lib/db.ts sets `databaseVersion` so a server that accepts but
  // never answers still gives a 503 in time. DB_OUTAGE_HUNG=0 skips this case.
  describe.skipIf(process.env.DB_OUTAGE_HUNG === '0')(
    'a database that accepts connections but never answers',
    () => {
      let hung: net.Server;
      const sockets = new Set<net.Socket>();
      beforeAll(async () => {
        hung = net.createServer((s) => {
          sockets.add(s);
          s.on('error', () => undefined);
        });
        await new Promise<void>((r) => hung.listen(0, '127.0.0.1', r));
      });
      afterAll(async () => {
        for (const s of sockets) s.destroy();
        await new Promise<void>((r) => hung.close(() => r()));
      });

      it('503 with Retry-After once the 3 s connection timeout passes', { timeout: 180_000 }, async () => {
        const { port } = hung.address() as net.AddressInfo;
        const outcomes = await handlersWithDatabaseAt(port);
        // lib/db.ts gives up after 3 s (connectTimeout and pool acquire); a little slack for a busy machine.
        for (const o of outcomes) expectUnavailable(o, port, 5_000);
        expect(sockets.size).toBeGreaterThan(0);
      });
    },
  );
});
