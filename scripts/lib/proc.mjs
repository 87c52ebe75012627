// Child processes for the start and test scripts: run to completion, run as a service, stop, wait for.
import { spawn } from 'node:child_process';
import { createWriteStream, existsSync, mkdirSync } from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import { BIN, ROOT } from './env.mjs';

const useColour = process.stdout.isTTY && !process.env.NO_COLOR && process.env.CI !== 'true';
const paint = (code) => (s) => (useColour ? `\x1b[${code}m${s}\x1b[0m` : String(s));
export const bold = paint('1');
export const green = paint('32');
export const red = paint('31');
export const yellow = paint('33');
export const dim = paint('2');

export function log(msg) {
  console.log(`${dim('[baskwell]')} ${msg}`);
}

/** Path of a project binary (node_modules/.bin) when present, else the bare name for PATH. */
export function bin(name) {
  const p = path.join(BIN, name);
  return existsSync(p) ? p : name;
}

/** Commands started by run() that have not finished: stopped by stopForeground() on Ctrl-C. */
const foreground = new Set();

/**
 * Runs a command to completion, in its own process group (so a stop reaches what it spawns).
 * `capture` collects stdout/stderr instead of showing them.
 * Resolves { code, stdout, stderr }; with `check` (the default) a non-zero exit rejects.
 */
/**
 * Runs a command to its end. `capture` keeps its output (and shows none); `logFile` with `capture` also
 * writes the output to that file as it comes, so a long run can be followed while it is held back here.
 */
export function run(cmd, args = [], { env, cwd = ROOT, capture = false, check = true, input, logFile } = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, {
      cwd,
      env: env ?? process.env,
      detached: true,
      stdio: [
        input === undefined ? 'ignore' : 'pipe',
        capture ? 'pipe' : 'inherit',
        capture ? 'pipe' : 'inherit',
      ],
    });
    foreground.add(child);
    child.exited = new Promise((r) => child.on('close', () => r()));
    child.on('close', () => foreground.delete(child));
    let stdout = '';
    let stderr = '';
    child.stdout?.on('data', (d) => (stdout += d));
    child.stderr?.on('data', (d) => (stderr += d));
    if (capture && logFile) {
      mkdirSync(path.dirname(logFile), { recursive: true });
      const out = createWriteStream(logFile);
      child.stdout.pipe(out, { end: false });
      child.stderr.pipe(out, { end: false });
      child.on('close', () => out.end());
    }
    if (input !== undefined) child.stdin.end(input);
    child.on('error', reject);
    child.on('close', (code, signal) => {
      const result = { code: code ?? 128, signal, stdout, stderr };
      if (check && result.code !== 0) {
        const detail = capture ? `\n${(stderr || stdout).trim().split('\n').slice(-30).join('\n')}` : '';
        reject(new Error(`${path.basename(cmd)} ${args.join(' ')} exited with ${signal ?? code}${detail}`));
      } else resolve(result);
    });
  });
}

/**
 * Starts a long-running process in its own process group (so stopping it also stops what it spawned).
 * Output goes to `logFile` when given, else to this terminal prefixed with `name`.
 */
export function service(name, cmd, args, { env, cwd = ROOT, logFile } = {}) {
  const child = spawn(cmd, args, {
    cwd,
    env: env ?? process.env,
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  if (logFile) {
    // A fresh clone has no test-results/ yet; the stream would fail only after the service started.
    mkdirSync(path.dirname(logFile), { recursive: true });
    const out = createWriteStream(logFile, { flags: 'a' });
    child.stdout.pipe(out);
    child.stderr.pipe(out);
  } else {
    const prefix = dim(`[${name}] `);
    const relay = (stream) => (d) =>
      stream.write(
        String(d)
          .split('\n')
          .map((l, i, all) => (i === all.length - 1 && l === '' ? '' : prefix + l))
          .join('\n'),
      );
    child.stdout.on('data', relay(process.stdout));
    child.stderr.on('data', relay(process.stderr));
  }
  child.serviceName = name;
  child.exited = new Promise((resolve) => child.on('exit', (code, signal) => resolve({ code, signal })));
  child.on('error', (e) => log(red(`${name} could not start: ${e.message}`)));
  return child;
}

function alive(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/** Stops every command run() is waiting for. */
export async function stopForeground() {
  await Promise.all([...foreground].map((c) => stopProcess(c, 3000)));
}

/** Stops a process (and its group): SIGTERM, then SIGKILL after `graceMs`. */
export async function stopProcess(child, graceMs = 8000) {
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const signalGroup = (sig) => {
    try {
      process.kill(-child.pid, sig);
    } catch {
      try {
        child.kill(sig);
      } catch {
        /* already gone */
      }
    }
  };
  signalGroup('SIGTERM');
  const timer = setTimeout(() => signalGroup('SIGKILL'), graceMs);
  await child.exited;
  clearTimeout(timer);
  // Grandchildren that ignored SIGTERM would keep the group alive: make sure it is gone.
  if (alive(-child.pid)) signalGroup('SIGKILL');
}

export const sleep = (ms) => new Promise((r) => setTimeout(r, ms));

/** Resolves when something accepts TCP connections on host:port. */
export function canConnect(port, host = '127.0.0.1') {
  return new Promise((resolve) => {
    const socket = net.connect({ port, host });
    socket.setTimeout(1000);
    socket.once('connect', () => {
      socket.destroy();
      resolve(true);
    });
    socket.once('error', () => resolve(false));
    socket.once('timeout', () => {
      socket.destroy();
      resolve(false);
    });
  });
}

/** True when nothing listens on the port and we can bind it. */
export function portFree(port, host = '127.0.0.1') {
  return new Promise((resolve) => {
    const srv = net.createServer();
    srv.once('error', () => resolve(false));
    srv.listen({ port, host, exclusive: true }, () => srv.close(() => resolve(true)));
  });
}

/** The first free port at or above `start`. */
export async function freePort(start, host = '127.0.0.1') {
  for (let p = start; p < start + 200; p++) if (await portFree(p, host)) return p;
  throw new Error(`no free port between ${start} and ${start + 199}`);
}

/**
 * Polls `check` until it returns true. Fails early if `child` exits, and after `timeoutMs`.
 */
export async function waitFor(what, check, { timeoutMs = 60_000, intervalMs = 200, child } = {}) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (child && (child.exitCode !== null || child.signalCode !== null)) {
      throw new Error(
        `${what}: the process exited (${child.signalCode ?? child.exitCode}) before it was ready`,
      );
    }
    if (await check().catch(() => false)) return;
    await sleep(intervalMs);
  }
  throw new Error(`${what}: not ready after ${Math.round(timeoutMs / 1000)} s`);
}

/** True once an HTTP server answers at `url` (any status). */
export async function httpAnswers(url) {
  const res = await fetch(url, { redirect: 'manual', signal: AbortSignal.timeout(5000) });
  await res.body?.cancel();
  return res.status > 0;
}

/** Formats a duration in ms as "1m 23.4s" / "4.2s". */
export function duration(ms) {
  const s = ms / 1000;
  return s >= 60 ? `${Math.floor(s / 60)}m ${(s % 60).toFixed(1)}s` : `${s.toFixed(1)}s`;
}
