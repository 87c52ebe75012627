// The real start path (`next start` on the production build that the browser tests use) refuses to run
// without a strong NEXTAUTH_SECRET: it exits with the reason before answering a single request.
// The server the other browser tests use is the control: same build, strong secret, answering.
import { spawn } from 'node:child_process';
import { createServer } from 'node:net';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { BASE_URL } from './harness';

const ROOT = path.resolve(import.meta.dirname, '..', '..');
const NEXT_BIN = path.join(ROOT, 'node_modules', '.bin', 'next');

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const port = (srv.address() as { port: number }).port;
      srv.close(() => resolve(port));
    });
  });
}

/** Starts `next start` with the given secret; resolves when it exits or after `waitMs` (then stops it). */
async function startWith(secret: string | undefined, waitMs = 60_000) {
  const port = await freePort();
  const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: 'production', PORT: String(port) };
  if (secret === undefined) delete env.NEXTAUTH_SECRET;
  else env.NEXTAUTH_SECRET = secret;
  // Its own reminder schedule would only add noise.
  env.REMINDERS_INTERVAL_MINUTES = '0';
  const child = spawn(NEXT_BIN, ['start', '-p', String(port)], { cwd: ROOT, env, stdio: 'pipe' });
  let output = '';
  child.stdout.on('data', (d) => (output += String(d)));
  child.stderr.on('data', (d) => (output += String(d)));
  let answered = false;
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  const deadline = Date.now() + waitMs;
  let code: number | null | 'running' = 'running';
  while (Date.now() < deadline) {
    const done = await Promise.race([
      exited,
      new Promise<'running'>((r) => setTimeout(() => r('running'), 500)),
    ]);
    if (done !== 'running') {
      code = done;
      break;
    }
    answered ||= await fetch(`http://127.0.0.1:${port}/api/health`)
      .then((r) => r.status > 0)
      .catch(() => false);
  }
  if (code === 'running') {
    child.kill('SIGTERM');
    await exited;
  }
  return { code, output, answered };
}

describe('start-up secret check', () => {
  it('the running test server (strong secret) answers', async () => {
    const res = await fetch(`${BASE_URL}/api/health`);
    expect(res.status).toBe(200);
  });

  for (const [label, secret] of [
    ['no NEXTAUTH_SECRET', undefined],
    ['a 12-character NEXTAUTH_SECRET', 'short-secret'],
  ] as const) {
    it(`next start exits with the reason when given ${label}`, async () => {
      const r = await startWith(secret);
      expect(r.code, r.output.slice(-2000)).toBe(1);
      expect(r.output).toMatch(/cannot start: NEXTAUTH_SECRET must be set .* at least 32 characters/);
      expect(r.answered).toBe(false);
    });
  }
});
