#!/usr/bin/env node
// Several web server processes sharing one port (node:cluster), the way a production server uses more
// than one core: `npm start` runs `next start` through this when WEB_PROCESSES (default: the machine's
// cores) is more than 1.
//
// Why: one Node process renders one page at a time on its event loop, so a cheap request (the health
// check, an API call) that arrives while a page is rendering waits for it; with a process a core, the
// operating system runs two renders at once and a request waits behind at most its own process's work.
// Nothing the app keeps in a process's memory has to be shared for this to be correct: sessions are
// signed cookies checked against the database, rate limits and the job schedule live in the database,
// and the in-memory caches are keyed by what they were computed from (see README, "Scaling").
//
// The primary process serves nothing: it accepts connections and hands each to a worker in turn, starts
// a worker again when one ends on its own (after `pauseMs`), and stops them all on SIGTERM/SIGINT. A
// worker that keeps dying (more than `maxRestarts` within `restartWindowMs`) ends the primary with
// status 1, so whoever started it sees the failure instead of an endless loop.
//
//   node scripts/lib/web-cluster.mjs <processes> <script> [args...]
import cluster from 'node:cluster';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';

/** WEB_PROCESSES as a count (a whole number ≥ 1), or the machine's cores when unset or empty. */
export function webProcesses(value, cores = availableParallelism()) {
  if (value === undefined || value === '') return Math.max(1, cores);
  const n = Number(value);
  if (!Number.isInteger(n) || n < 1) throw new Error(`WEB_PROCESSES needs a whole number ≥ 1, not ${value}`);
  return n;
}

/**
 * Runs `exec` (with `args`) in `processes` cluster workers. Resolves with the primary's exit status
 * once it has stopped (0 after a signal, 1 when workers kept dying).
 */
export function runCluster({
  processes,
  exec,
  args = [],
  pauseMs = 2000,
  maxRestarts = 5,
  restartWindowMs = 60_000,
  log = (msg) => console.error(`[web-cluster] ${msg}`),
}) {
  cluster.setupPrimary({ exec, args });
  let stopping = false;
  let restarts = [];
  let finish;
  const done = new Promise((resolve) => (finish = resolve));
  const live = new Set();

  const fork = () => {
    const worker = cluster.fork();
    live.add(worker);
    worker.on('exit', (code, signal) => {
      live.delete(worker);
      if (stopping) {
        if (live.size === 0) finish(stopping === 'failed' ? 1 : 0);
        return;
      }
      const now = Date.now();
      restarts = [...restarts.filter((t) => now - t < restartWindowMs), now];
      if (restarts.length > maxRestarts) {
        log(
          `a web process ended (${signal ?? code}) ${restarts.length} times within ${restartWindowMs / 1000} s; stopping`,
        );
        stop('failed');
        return;
      }
      log(
        `web process ${worker.process.pid} ended (${signal ?? code}); starting another in ${pauseMs / 1000} s`,
      );
      setTimeout(() => {
        if (!stopping) fork();
      }, pauseMs);
    });
  };

  const stop = (why = 'signal') => {
    if (stopping) return;
    stopping = why;
    if (live.size === 0) finish(why === 'failed' ? 1 : 0);
    for (const w of live) w.process.kill('SIGTERM');
  };

  for (let i = 0; i < processes; i++) fork();
  return { done, stop, workers: () => [...live] };
}

async function main() {
  const [count, exec, ...args] = process.argv.slice(2);
  if (!exec) throw new Error('usage: web-cluster.mjs <processes> <script> [args...]');
  const { done, stop } = runCluster({ processes: webProcesses(count), exec, args });
  for (const sig of ['SIGTERM', 'SIGINT', 'SIGHUP']) process.on(sig, () => stop());
  process.exit(await done);
}

if (cluster.isPrimary && process.argv[1] === fileURLToPath(import.meta.url)) {
  main().catch((e) => {
    console.error(`web-cluster: ${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  });
}
