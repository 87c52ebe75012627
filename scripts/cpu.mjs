#!/usr/bin/env node
// `npm run cpu -- [URL …] [--routes /a,/b] [--requests N] [--rounds N] [--warm N] [--owner] [--pid PID]`:
// the server's own CPU time a request, route by route, on a running production server (`npm start`, or
// `next start` on a build). It signs in (the demo staff member, `--owner` the demo owner, or LOAD_EMAIL /
// LOAD_PASSWORD), asks each route `--warm` times (default 50) so the measure meets warm code, then for
// each round and each route sends N requests one after another (no compression asked, as the scale bench
// asks) and reads the server's user + system time from /proc/<pid>/stat before and after: CPU ms a
// request, wall ms a request, and the bytes (and status, when not 200) of one answer. The server is the
// process listening on the URL's port (or --pid) with the processes it started (the web processes when
// several share the port); their engine threads count with them, MariaDB does not.
// Several URLs (builds of the app, each started on a port of its own against the same database) are
// measured in turn, route by route, alternating which goes first each round, so a machine whose load
// drifts weighs on all alike; each is printed with its ratio to the first (A). Two processes of one and
// the same build can differ by a fifth (how long each has run, where its code was optimised): start the
// builds together, and give each build two processes before reading a difference into a ratio.
// Figures, not a test: the machine's load average is printed before and after.
import { readFileSync, readdirSync, readlinkSync } from 'node:fs';
import http from 'node:http';
import { loadEnv } from './lib/env.mjs';
import { loadAverage, printColumns, signIn } from './load.mjs';

const DEMO = {
  staff: { email: 'idris.penhallow@example.com', password: 'demo-staff-pass' },
  owner: { email: 'maren.tollfield@example.com', password: 'demo-owner-pass' },
};
const DEFAULT_ROUTES = ['/api/health', '/account', '/enclosures', '/lamp-log'];

function parseArgs(argv, env) {
  const opts = {
    urls: [],
    routes: DEFAULT_ROUTES,
    requests: 40,
    rounds: 4,
    warm: 50,
    who: 'staff',
    pid: null,
  };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    const value = () => (a.includes('=') ? a.slice(a.indexOf('=') + 1) : argv[++i]);
    const count = () => {
      const v = Number(value());
      if (!Number.isInteger(v) || v <= 0) throw new Error(`${a} needs a positive whole number`);
      return v;
    };
    if (a.startsWith('--routes')) opts.routes = value().split(',').filter(Boolean);
    else if (a.startsWith('--requests')) opts.requests = count();
    else if (a.startsWith('--rounds')) opts.rounds = count();
    else if (a.startsWith('--pid')) opts.pid = count();
    else if (a.startsWith('--warm')) opts.warm = count();
    else if (a === '--owner') opts.who = 'owner';
    else if (a === '--help' || a === '-h') opts.help = true;
    else if (!a.startsWith('-')) opts.urls.push(a.replace(/\/+$/, ''));
    else throw new Error(`unknown option ${a}`);
  }
  if (opts.urls.length === 0)
    opts.urls.push((env.APP_URL || `http://localhost:${env.PORT}`).replace(/\/+$/, ''));
  if (opts.pid && opts.urls.length > 1) throw new Error('--pid names one server: give one URL with it');
  return opts;
}

/** The inodes of the sockets listening on `port` (IPv4 and IPv6), from /proc/net. */
function listeningInodes(port) {
  const inodes = new Set();
  for (const file of ['/proc/net/tcp', '/proc/net/tcp6']) {
    let text = '';
    try {
      text = readFileSync(file, 'utf8');
    } catch {
      continue;
    }
    for (const line of text.split('\n').slice(1)) {
      const f = line.trim().split(/\s+/);
      // local address "ADDR:PORT" in hex; state 0A is LISTEN.
      if (f.length > 9 && f[3] === '0A' && parseInt(f[1].split(':')[1], 16) === port) inodes.add(f[9]);
    }
  }
  return inodes;
}

/** The process listening on `port`: one of this user's, found through its open sockets. */
function pidListeningOn(port) {
  const inodes = listeningInodes(port);
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    let fds = [];
    try {
      fds = readdirSync(`/proc/${entry}/fd`);
    } catch {
      continue;
    }
    for (const fd of fds) {
      try {
        const m = /^socket:\[(\d+)\]$/.exec(readlinkSync(`/proc/${entry}/fd/${fd}`));
        if (m && inodes.has(m[1])) return Number(entry);
      } catch {
        /* closed meanwhile */
      }
    }
  }
  throw new Error(`no process of yours listens on port ${port}: start the app, or give --pid`);
}

const TICK_MS = 1000 / 100; // USER_HZ is 100 on Linux

/** A process's stat fields after the command's closing parenthesis (the 3rd field of the line on). */
function statFields(pid) {
  const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
  return stat.slice(stat.lastIndexOf(')') + 2).split(' ');
}

/** The process and everything it started, by their parent ids (several server processes in a cluster). */
function processTree(pid) {
  const parentOf = new Map();
  for (const entry of readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      parentOf.set(Number(entry), Number(statFields(entry)[1]));
    } catch {
      /* ended meanwhile */
    }
  }
  const tree = [pid];
  for (let i = 0; i < tree.length; i++) {
    for (const [child, parent] of parentOf) if (parent === tree[i]) tree.push(child);
  }
  return tree;
}

/**
 * User + system CPU time so far, in ms, of the server's processes (their threads included): the one
 * listening, and the processes it started (the web processes when several share the port; finished
 * ones no longer count, so a process that ends during a measurement spoils it).
 */
function cpuMs(pid) {
  let ms = 0;
  for (const p of processTree(pid)) {
    try {
      // utime and stime are the 14th and 15th fields of the line.
      const f = statFields(p);
      ms += (Number(f[11]) + Number(f[12])) * TICK_MS;
    } catch {
      /* ended meanwhile */
    }
  }
  return ms;
}

const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });

/** One GET, its body read whole; resolves its status and byte count. */
function getOnce(url, cookie) {
  return new Promise((resolve, reject) => {
    const req = http.get(
      url,
      { agent, headers: { cookie, 'accept-encoding': 'identity' }, timeout: 30_000 },
      (res) => {
        let bytes = 0;
        res.on('data', (d) => (bytes += d.length));
        res.on('end', () => resolve({ status: res.statusCode, bytes }));
        res.on('error', reject);
      },
    );
    req.on('timeout', () => req.destroy(new Error(`${url} took over 30 s`)));
    req.on('error', reject);
  });
}

/**
 * A GET, asked again once when the kept-alive connection was closed under it: the server closes one that
 * stayed idle past its keep-alive timeout (while the other servers were measured), and a request can
 * cross that close. A reset request never reached the page's code.
 */
async function get(url, cookie) {
  try {
    return await getOnce(url, cookie);
  } catch (e) {
    if (e?.code !== 'ECONNRESET' && e?.code !== 'EPIPE') throw e;
    return getOnce(url, cookie);
  }
}

/** N sequential requests of one route; the server's CPU and the wall time a request, and the bytes. */
async function measure(server, route, n) {
  const url = `${server.url}${route}`;
  const cpu0 = cpuMs(server.pid);
  const t0 = performance.now();
  let last = { status: 0, bytes: 0 };
  for (let i = 0; i < n; i++) {
    last = await get(url, server.cookie);
    // A redirect or a 404 is measured like any answer (its status is printed); a failure ends the run.
    if (last.status >= 500) throw new Error(`${route} answered ${last.status} on ${server.url}`);
  }
  return { cpu: (cpuMs(server.pid) - cpu0) / n, wall: (performance.now() - t0) / n, ...last };
}

const mean = (xs) => xs.reduce((a, b) => a + b, 0) / xs.length;

async function main() {
  const env = loadEnv();
  const opts = parseArgs(process.argv.slice(2), env);
  if (opts.help) {
    console.log(
      'npm run cpu -- [URL …] [--routes /a,/b] [--requests N] [--rounds N] [--warm N] [--owner] [--pid PID]',
    );
    return;
  }
  const account = env.LOAD_EMAIL ? { email: env.LOAD_EMAIL, password: env.LOAD_PASSWORD } : DEMO[opts.who];
  const servers = [];
  for (const url of opts.urls) {
    const pid = opts.pid ?? pidListeningOn(Number(new URL(url).port || 80));
    const { jar } = await signIn(url, account.email, account.password);
    servers.push({ url, pid, cookie: jar.header(), runs: new Map(opts.routes.map((r) => [r, []])) });
  }
  const started = new Date();
  const loadBefore = loadAverage();
  console.error(
    `Server CPU a request: ${opts.rounds} rounds × ${opts.requests} sequential requests a route, as ` +
      `${account.email}; ${servers.map((s) => `${s.url} (pid ${s.pid})`).join(', ')}; load ${loadBefore}`,
  );
  for (const s of servers)
    for (const route of opts.routes)
      for (let i = 0; i < opts.warm; i++) await get(`${s.url}${route}`, s.cookie);
  for (let round = 0; round < opts.rounds; round++) {
    for (const route of opts.routes) {
      // Alternate which build goes first, so neither always meets the machine's load right after the other.
      const order = round % 2 ? [...servers].reverse() : servers;
      for (const s of order) s.runs.get(route).push(await measure(s, route, opts.requests));
    }
    console.error(`round ${round + 1}/${opts.rounds} done, load ${loadAverage()}`);
  }
  const letter = (i) => String.fromCharCode(65 + i);
  const header = ['route', 'server', 'CPU ms', 'each round', 'wall ms', 'bytes', '× A', ''];
  const fixed = (x) => x.toFixed(1);
  const lines = opts.routes.flatMap((route) => {
    const first = mean(servers[0].runs.get(route).map((r) => r.cpu));
    return servers.map((s, i) => {
      const runs = s.runs.get(route);
      const cpu = mean(runs.map((r) => r.cpu));
      const { status, bytes } = runs.at(-1);
      return [
        i === 0 ? route : '',
        letter(i),
        fixed(cpu),
        runs.map((r) => fixed(r.cpu)).join(' '),
        fixed(mean(runs.map((r) => r.wall))),
        status === 200 ? String(bytes) : `${bytes} (${status})`,
        i === 0 ? '' : (cpu / first).toFixed(2),
        '',
      ];
    });
  });
  console.log(
    `\n${started.toISOString()}; load average ${loadBefore} before, ${loadAverage()} after; ` +
      servers.map((s, i) => `${letter(i)} = ${s.url}`).join(', '),
  );
  printColumns(header, lines);
  agent.destroy();
}

main().catch((e) => {
  console.error(e instanceof Error ? e.message : e);
  process.exitCode = 1;
});
