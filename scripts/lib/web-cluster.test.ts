import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { afterEach, describe, expect, it } from 'vitest';
import { freePort } from './proc.mjs';
import { webProcesses } from './web-cluster.mjs';

const ROOT = path.resolve(import.meta.dirname, '..', '..');
const CLUSTER = path.join(ROOT, 'scripts', 'lib', 'web-cluster.mjs');
const WORKER = path.join(ROOT, 'tests', 'fixtures', 'web-cluster-worker.mjs');

describe('webProcesses', () => {
  it('is one a core when unset, else the whole number given', () => {
    expect(webProcesses(undefined, 4)).toBe(4);
    expect(webProcesses('', 2)).toBe(2);
    expect(webProcesses(undefined, 0)).toBe(1);
    expect(webProcesses('3', 2)).toBe(3);
    expect(() => webProcesses('0', 2)).toThrow(/whole number/);
    expect(() => webProcesses('1.5', 2)).toThrow(/whole number/);
    expect(() => webProcesses('two', 2)).toThrow(/whole number/);
  });
});

const started: ChildProcess[] = [];
afterEach(() => {
  for (const c of started.splice(0)) if (c.exitCode === null && c.signalCode === null) c.kill('SIGKILL');
});

function startCluster(processes: number, port: number, mode: 'serve' | 'crash') {
  const child = spawn(process.execPath, [CLUSTER, String(processes), WORKER, String(port), mode], {
    stdio: ['ignore', 'ignore', 'pipe'],
  });
  started.push(child);
  let stderr = '';
  child.stderr!.on('data', (d) => (stderr += String(d)));
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  return { child, exited, stderr: () => stderr };
}

/** The process id that answered, or null while nothing listens. */
async function pidAt(port: number, p = '/'): Promise<number | null> {
  try {
    const res = await fetch(`http://127.0.0.1:${port}${p}`, { signal: AbortSignal.timeout(2000) });
    return Number(await res.text());
  } catch {
    return null;
  }
}

/** The distinct processes answering `tries` fresh connections. */
async function answering(port: number, tries = 12): Promise<Set<number>> {
  const pids = new Set<number>();
  for (let i = 0; i < tries; i++) {
    const pid = await pidAt(port);
    if (pid) pids.add(pid);
  }
  return pids;
}

async function until<T>(what: string, get: () => Promise<T>, ok: (v: T) => boolean, ms = 20_000) {
  const end = Date.now() + ms;
  for (;;) {
    const v = await get();
    if (ok(v)) return v;
    if (Date.now() > end) throw new Error(`${what}: not within ${ms} ms (last ${String(v)})`);
    await new Promise((r) => setTimeout(r, 100));
  }
}

const alive = (pid: number) => {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
};

describe('web-cluster', () => {
  it('serves one port from several processes, replaces one that ends and stops them all on SIGTERM', async () => {
    const port = await freePort(39_000 + Math.floor(Math.random() * 2000));
    const cluster = startCluster(2, port, 'serve');
    const first = await until(
      'both processes answering',
      () => answering(port),
      (s) => s.size === 2,
    );

    // One ends on its own: another takes its place, and the port keeps answering meanwhile.
    const [gone] = [...first];
    await until(
      'the chosen process',
      () => pidAt(port, '/exit'),
      (pid) => pid === gone,
      10_000,
    );
    await until(
      'the process to end',
      async () => alive(gone!),
      (a) => !a,
    );
    const after = await until(
      'a replacement answering',
      () => answering(port),
      (s) => s.size === 2 && !s.has(gone!),
    );
    expect(cluster.stderr()).toMatch(/ended \(3\); starting another/);

    cluster.child.kill('SIGTERM');
    expect(await cluster.exited).toBe(0);
    for (const pid of after)
      await until(
        `process ${pid} to end`,
        async () => alive(pid),
        (a) => !a,
        5000,
      );
    expect(await pidAt(port)).toBeNull();
  }, 60_000);

  it('gives up with status 1 when its processes keep ending', async () => {
    const port = await freePort(41_000 + Math.floor(Math.random() * 2000));
    const cluster = startCluster(1, port, 'crash');
    expect(await cluster.exited).toBe(1);
    expect(cluster.stderr()).toMatch(/times within 60 s; stopping/);
  }, 60_000);
});
