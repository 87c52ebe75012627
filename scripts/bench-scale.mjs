#!/usr/bin/env node
// `npm run bench:scale -- [--scale=N] [--enclosures N --lamps N --readings N --designs N] [--growth=4]
//                          [--rate=20] [--duration=10] [--seed-only | --reuse] [--no-build] [--only=a,b]
//                          [--processes=N | --compare=1,2] [--arrivals=even|burst]`
// The signed-in area at the size of a zoo's reptile house or a busy shop. On databases of its own on the
// private MariaDB it seeds a generated organisation (default 2,000 enclosures, 8,000 lamps, 100,000
// readings, 200 designs with two variants each, times --scale) into `<DB_NAME>_scale`, and the same
// organisation grown to --growth times the size (default 4; 0 skips) into `<DB_NAME>_scale<growth>`:
// chunked INSERTs, then the outlooks by the app's own computation once per distinct lamp history
// (scripts/lib/scale-outlooks.ts). It builds the production app into .next/scale-build, starts it on a
// free port of its own on the 1× database, signs in as the owner, then drives every list page and list
// API of the signed-in area, one after another, at a fixed rate with autocannon (requests evenly spaced,
// one every 1000/rate ms: scripts/lib/paced.mjs; `--arrivals=burst` for autocannon's own overallRate,
// which sends each second's requests together) while /api/health is asked alongside. Prints per route:
// requests/s, p50/p99, bytes a response, p50/p99 as multiples of /api/health's alone (the baseline), and
// the slowest /api/health answer seen while it ran. Then it restarts the app on the grown database and
// measures the lists again: their cost should not follow the organisation's size.
// Seed ahead, measure later: `--seed-only` seeds both databases and stops (the machine's load only slows
// the seeding); `--reuse` measures the databases an earlier run seeded, without seeding (a run without
// it recreates them). Figures, not a pass/fail test: the date, the CPUs and the load average are
// printed beside them. `--only=/enclosures,/jobs` measures only the routes whose path contains one of the
// parts (and the baseline), for comparing one change before and after in the same conditions.
// `--processes=N` serves with N `next start` processes sharing the port, as `npm start` does
// (WEB_PROCESSES, else one a core); `--compare=1,2` starts a server of each count side by side and
// measures each route on each in turn (an A/B in one run, under the same load).
import autocannon from 'autocannon';
import os from 'node:os';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { BUILD_DIRS } from './lib/builds.mjs';
import { ensureSecret, loadEnv, ROOT, usesPrivateDb } from './lib/env.mjs';
import {
  adminSql,
  ensureDatabases,
  ensureMariaDB,
  recreateDatabase,
  refreshStatistics,
} from './lib/mariadb.mjs';
import { bin, duration, freePort, log, run, stopProcess } from './lib/proc.mjs';
import { Lifecycle, migrate, startNext } from './lib/stack.mjs';
import { bursts, paced } from './lib/paced.mjs';
import { webProcesses } from './lib/web-cluster.mjs';
import { api, codesText, loadAverage, printColumns, runConditions, signIn, warmUp } from './load.mjs';

const DEFAULT_SIZE = { enclosures: 2000, lamps: 8000, readings: 100_000, designs: 200 };

/** A whole factor names the grown database (`_scale4`); 0 or 1 measures the 1× organisation only. */
function growthOf(n) {
  if (!Number.isInteger(n)) throw new Error(`--growth needs a whole number, not ${n}`);
  return n;
}

function options() {
  const { values } = parseArgs({
    options: {
      scale: { type: 'string', default: '1' },
      enclosures: { type: 'string' },
      lamps: { type: 'string' },
      readings: { type: 'string' },
      designs: { type: 'string' },
      growth: { type: 'string', default: '4' },
      rate: { type: 'string', default: '20' },
      duration: { type: 'string', default: '10' },
      reuse: { type: 'boolean', default: false },
      'seed-only': { type: 'boolean', default: false },
      build: { type: 'boolean', default: true },
      'no-build': { type: 'boolean', default: false },
      only: { type: 'string', default: '' },
      processes: { type: 'string', default: '' },
      compare: { type: 'string', default: '' },
      arrivals: { type: 'string', default: 'even' },
      help: { type: 'boolean', default: false },
    },
  });
  const num = (name, min = 0) => {
    const v = Number(values[name]);
    if (!Number.isFinite(v) || v < min)
      throw new Error(`--${name} needs a number ≥ ${min}, not ${values[name]}`);
    return v;
  };
  const scale = num('scale', 0.001);
  const size = Object.fromEntries(
    Object.entries(DEFAULT_SIZE).map(([k, v]) => [
      k,
      values[k] === undefined ? Math.round(v * scale) : Math.round(num(k)),
    ]),
  );
  return {
    size,
    growth: growthOf(num('growth')),
    rate: num('rate', 1),
    duration: num('duration', 1),
    reuse: values.reuse,
    seedOnly: values['seed-only'],
    build: values.build && !values['no-build'],
    only: values.only.split(',').filter(Boolean),
    // `next start` processes sharing the port, as `npm start` runs them (WEB_PROCESSES, else one a core).
    processes: values.processes === '' ? undefined : webProcesses(values.processes),
    // `--compare=1,2`: servers of these process counts side by side, measured route by route in turn.
    compare: values.compare.split(',').filter(Boolean).map(webProcesses),
    arrivals: arrivalsOf(values.arrivals),
    help: values.help,
  };
}

/**
 * How the requests of a route arrive. `even` (the default): one every 1000/rate ms (scripts/lib/paced.mjs).
 * `burst`: autocannon's own `overallRate`, which sends each second's requests together at the top of
 * the second over its connections (what this bench measured before; kept to compare the two).
 */
function arrivalsOf(value) {
  if (value !== 'even' && value !== 'burst') throw new Error(`--arrivals is even or burst, not ${value}`);
  return value;
}

/** Runs the seeding script against the scale database; resolves its JSON line. */
async function seed(env, size, extra = []) {
  const args = [
    '--import',
    path.join(ROOT, 'scripts', 'lib', 'server-only.mjs'),
    'scripts/scale-seed.ts',
    ...Object.entries(size).flatMap(([k, v]) => [`--${k}`, String(v)]),
    ...extra,
  ];
  const { stdout } = await run(bin('tsx'), args, { env: { ...env, LOG_LEVEL: 'warn' }, capture: true });
  return JSON.parse(stdout.trim().split('\n').pop());
}

const fmtSize = (s) =>
  `${s.enclosures.toLocaleString('en')} enclosures, ${s.lamps.toLocaleString('en')} lamps, ` +
  `${s.readings.toLocaleString('en')} readings, ${s.designs.toLocaleString('en')} designs`;

// Requests each server process gets for a route before its timed run. The first page after the app
// starts pays for the render path the pages share reaching optimised code: on this machine its first 10
// requests took about 140 ms of CPU each and the next 20 about 40, against 30 once warm; with 10
// warm-ups, whichever route came first (the enclosures page) was timed partly cold.
const WARM_UPS = 40;

/**
 * Warms a route in every server process. One process: sequential requests on one connection. Several:
 * the cluster hands each new connection to the next process, and a kept-alive connection stays with
 * its process, so the warm-ups go over as many connections as there are processes (twice over), in
 * parallel, each process getting its share.
 */
async function warmRoute(base, cookie, route, processes) {
  if (processes === 1) return warmUp(base, { header: () => cookie }, route, 'GET', undefined, WARM_UPS);
  await autocannon({
    url: `${base}${route}`,
    headers: { cookie },
    connections: processes * 2,
    amount: WARM_UPS * processes,
    timeout: 20,
  });
}

/**
 * `rate` requests a second to `url` for `duration` s, arriving as `arrivals` says; the figures a row of
 * the table needs.
 */
async function drive(url, headers, rate, opts, connections) {
  const run = opts.arrivals === 'even' ? paced : bursts;
  return run({ url, headers, rate, duration: opts.duration, connections, timeout: 20 });
}

const arrivalText = (opts) =>
  opts.arrivals === 'even'
    ? 'requests evenly spaced'
    : "requests in bursts at each second's start (autocannon overallRate)";

/** One route at the fixed rate, with /api/health asked alongside at a quarter of it. */
async function measure(base, cookie, route, opts) {
  const headers = { cookie };
  await warmRoute(base, cookie, route, opts.processes);
  const [main, health] = await Promise.all([
    drive(`${base}${route}`, headers, opts.rate, opts, 10),
    route === '/api/health' ? null : drive(`${base}/api/health`, {}, Math.max(1, opts.rate / 4), opts, 2),
  ]);
  return {
    route: labelOf(route),
    requests: main.requests,
    rps: main.rps,
    p50: main.p50,
    p99: main.p99,
    codes: main.codes,
    bytes: main.bytes,
    errors: main.errors + main.timeouts,
    // No answer within the run: nothing measured.
    healthMax: health?.requests ? health.max : null,
    healthP99: health?.requests ? health.p99 : null,
  };
}

function printTable(rows, baseline, rate) {
  const header = ['route', 'req/s', 'p50 ms', 'p99 ms', 'bytes', 'p50 ×', 'p99 ×', 'health max ms', 'codes'];
  const kb = (b) => (b >= 10_000 ? `${(b / 1024).toFixed(0)} KiB` : `${b} B`);
  const lines = rows.map((r) => [
    r.route,
    `${r.rps < rate * 0.9 ? '*' : ''}${r.rps.toFixed(1)}`,
    String(r.p50),
    String(r.p99),
    kb(r.bytes),
    (r.p50 / Math.max(baseline.p50, 1)).toFixed(1),
    (r.p99 / Math.max(baseline.p99, 1)).toFixed(1),
    r.healthMax === null ? '-' : String(r.healthMax),
    codesText(r.codes) || 'no answer',
  ]);
  printColumns(header, lines);
}

/** Every list page and list API of the signed-in area, plus one lamp's and one enclosure's page. */
async function routesOf(base, jar, org) {
  const q = `organisationId=${org}`;
  const enclosures = await api(base, jar, 'GET', `/api/enclosures?${q}&limit=1`);
  const enclosureId = enclosures.items[0].id;
  const lamps = await api(base, jar, 'GET', `/api/lamps?${q}&limit=1&sort=due`);
  const lampId = lamps.items[0].id;
  return [
    '/enclosures',
    '/enclosures?sort=name&page=40',
    '/lamp-log',
    '/lamp-log?status=replace&sort=due',
    '/keepers',
    '/members',
    '/species',
    '/lamp-catalogue',
    '/jobs',
    `/enclosures/${enclosureId}`,
    `/enclosures/${enclosureId}/lamps`,
    `/lamp-log/${lampId}`,
    ...(await deepLampPages(base, jar, org)),
    `/api/enclosures?${q}`,
    `/api/enclosures?${q}&q=tub%2017&sort=name`,
    `/api/lamps?${q}`,
    `/api/lamps?${q}&status=test-soon&due=30&sort=due`,
    `/api/keepers?${q}`,
    `/api/organisations/${org}/members`,
    `/api/species?${q}`,
    `/api/lamp-types?${q}`,
    `/api/organisations/${org}/jobs`,
    `/api/enclosures/${enclosureId}/lamps`,
    `/api/lamps/${lampId}/readings`,
  ];
}

/**
 * The lamp log's page at 90 % of its depth, asked by its number alone (found by OFFSET) and as Next
 * reaches it (sought from the cursor of the page before): the first should grow with the organisation,
 * the second not.
 */
async function deepLampPages(base, jar, org) {
  const q = `organisationId=${org}`;
  const first = await api(base, jar, 'GET', `/api/lamps?${q}&limit=25`);
  const page = Math.max(2, Math.floor(Math.ceil(first.total / 25) * 0.9));
  const before = await api(base, jar, 'GET', `/api/lamps?${q}&limit=25&offset=${(page - 2) * 25}`);
  return [`/lamp-log?page=${page}`, `/lamp-log?page=${page}&after=${before.cursors.next}`];
}

/** A route as the tables print it: a deep page by its depth, a cursor by name (both differ by size). */
const labelOf = (route) =>
  route.includes('/lamp-log?page=')
    ? route.replace(/page=\d+/, 'page=(90 % deep)').replace(/after=[^&]+/, 'after=(cursor)')
    : route;

/** The routes `--only` names (any part of the path), or all of them. */
const chosen = (routes, only) =>
  only.length ? routes.filter((r) => only.some((part) => r.includes(part))) : routes;

/** The scale databases: `<DB_NAME>_scale` (1×) and `<DB_NAME>_scale<growth>` (the grown organisation). */
function databases(env, growth) {
  const one = `${env.DB_NAME}_scale`;
  return growth > 1 ? [one, `${one}${growth}`] : [one];
}

async function prepareScaleDb(env, name) {
  await ensureDatabases({ names: [name], user: env.DB_USER, password: env.DB_PASSWORD });
  await migrate({ ...env, DB_NAME: name });
}

/** The organisation an earlier run seeded in this database, its owner and its size. */
async function findOrg(env) {
  const found = await run(
    bin('tsx'),
    ['--import', path.join(ROOT, 'scripts', 'lib', 'server-only.mjs'), 'scripts/scale-seed.ts', '--find'],
    { env, capture: true },
  );
  return JSON.parse(found.stdout.trim().split('\n').pop());
}

/**
 * Seeds the 1× database, and the grown one as the same 1× organisation plus (growth − 1)× more, as an
 * organisation grows. Returns one line a database.
 */
async function seedAll(env, names, size, growth) {
  const lines = [];
  for (const [i, name] of names.entries()) {
    const dbEnv = { ...env, DB_NAME: name };
    await recreateDatabase(name);
    await prepareScaleDb(env, name);
    log(`Seeding ${name}: ${fmtSize(size)} ...`);
    const first = await seed(dbEnv, size);
    let seconds = first.seconds;
    let outlookSeconds = first.added.seconds.outlooks;
    let computed = first.added.computedOutlooks;
    const total = { ...size };
    if (i > 0) {
      const extra = Object.fromEntries(
        Object.entries(size).map(([k, v]) => [k, Math.round(v * (growth - 1))]),
      );
      log(`Growing ${name} to ${growth}× (${fmtSize(extra)} more) ...`);
      const grown = await seed(dbEnv, extra, [
        '--into',
        String(first.organisationId),
        '--email',
        first.ownerEmail,
        '--offset',
        String(size.enclosures),
      ]);
      seconds += grown.seconds;
      outlookSeconds += grown.added.seconds.outlooks;
      computed += grown.added.computedOutlooks;
      for (const k of Object.keys(total)) total[k] += extra[k];
    }
    // As a production database has them: statistics of the loaded tables, not of empty ones.
    await refreshStatistics(name, adminSql);
    log(
      `Seeded ${name} in ${duration(seconds * 1000)} (outlooks ${outlookSeconds.toFixed(1)} s, ` +
        `${computed.toLocaleString('en')} distinct computations).`,
    );
    lines.push({ name, size: total, seconds, outlookSeconds, computed });
  }
  return lines;
}

/** Starts the production app on one scale database, signs in as its owner; stop() ends the server. */
async function serve(life, env, name, opts) {
  const dbEnv = { ...env, DB_NAME: name };
  const org = await findOrg(dbEnv);
  log(`${name}: organisation #${org.organisationId} (${fmtSize(org.size)}).`);
  const child = await startNext(life, dbEnv, {
    port: Number(env.PORT),
    build: opts.build,
    processes: opts.processes,
    logFile: path.join(ROOT, 'test-results', `bench-scale-next-${name}.log`),
  });
  const { jar } = await signIn(env.APP_URL, org.ownerEmail, org.ownerPassword);
  return {
    org,
    jar,
    cookie: jar.header(),
    stop: async () => {
      life.services.splice(life.services.indexOf(child), 1);
      await stopProcess(child);
    },
  };
}

/**
 * `--compare=1,2`: the same routes on servers with these numbers of processes, started together on ports
 * of their own against the 1× database and measured route by route in turn, the order alternating each
 * route, so that the machine's load (shared, and drifting) weighs on each alike.
 */
async function compareProcesses(life, env, name, opts, { started, loadBefore }) {
  const servers = [];
  let port = Number(env.PORT);
  for (const processes of opts.compare) {
    port = await freePort(port + 1);
    const base = `http://localhost:${port}`;
    const sEnv = { ...env, PORT: String(port), APP_URL: base, NEXTAUTH_URL: base };
    // One build serves both (made before the first starts, unless --no-build).
    const s = await serve(life, sEnv, name, { ...opts, processes, build: opts.build && !servers.length });
    servers.push({ ...s, base, processes });
  }
  const first = servers[0];
  const routes = chosen(await routesOf(first.base, first.jar, first.org.organisationId), opts.only);
  log(
    `Measuring ${routes.length + 1} routes on ${servers.length} servers (${opts.compare.join(', ')} ` +
      `processes) in turn at ${opts.rate} req/s for ${opts.duration} s each ...`,
  );
  const rows = servers.map(() => []);
  for (const [i, route] of ['/api/health', ...routes].entries()) {
    const order = servers.map((_, k) => k);
    if (i % 2) order.reverse();
    for (const k of order) {
      const s = servers[k];
      rows[k].push(await measure(s.base, s.cookie, route, { ...opts, processes: s.processes }));
    }
  }
  const loadAfter = loadAverage();
  console.log('');
  console.log(
    `${started.toISOString()} · ${os.cpus().length} CPUs shared with other users · load average (1/5/15 min) ` +
      `${loadBefore} before, ${loadAfter} after the routes · ${opts.rate} req/s × ${opts.duration} s a route, ` +
      `/api/health alongside at ${Math.max(1, opts.rate / 4)} req/s · ${arrivalText(opts)} · each route on each server in turn`,
  );
  console.log(`organisation: ${fmtSize(first.org.size)} (${name})`);
  for (const [k, s] of servers.entries()) {
    console.log('');
    console.log(`${s.processes} server process${s.processes === 1 ? '' : 'es'}:`);
    printTable(rows[k], rows[k][0], opts.rate);
  }
  console.log(
    JSON.stringify({
      ...runConditions(started, loadBefore, loadAfter, opts),
      arrivals: opts.arrivals,
      compare: servers.map((s, k) => ({ processes: s.processes, results: rows[k] })),
    }),
  );
}

/** The routes measured again on the grown organisation: the lists whose cost must not follow its size. */
const growthRoutes = (org) => [
  '/lamp-log',
  '/lamp-log?status=replace&sort=due',
  `/api/lamps?organisationId=${org}`,
  '/enclosures',
  '/keepers',
  '/members',
  `/api/keepers?organisationId=${org}`,
];

async function main() {
  const opts = options();
  if (opts.help) {
    console.log(
      'npm run bench:scale -- [--scale=N] [--enclosures N --lamps N --readings N --designs N] [--growth=4] [--rate=20] [--duration=10] [--seed-only | --reuse] [--no-build] [--only=/enclosures,/jobs] [--processes=N | --compare=1,2] [--arrivals=even|burst]',
    );
    return;
  }
  const env = loadEnv();
  opts.processes ??= webProcesses(env.WEB_PROCESSES);
  if (!usesPrivateDb(env)) throw new Error('bench:scale seeds a database of its own on the private MariaDB');
  const life = new Lifecycle();
  life.handleSignals();
  const names = databases(env, opts.growth);
  const port = await freePort(Number(env.PORT) + 50);
  const base = `http://localhost:${port}`;
  const scaleEnv = {
    ...env,
    PORT: String(port),
    APP_URL: base,
    NEXTAUTH_URL: base,
    NEXTAUTH_SECRET: ensureSecret(),
    NEXT_DIST_DIR: BUILD_DIRS.scale,
    // A benchmark, not a check: `npx tsc --noEmit` and `npm test` check the types.
    NEXT_SKIP_TYPECHECK: '1',
    NEXT_TELEMETRY_DISABLED: '1',
    LOG_LEVEL: 'warn',
  };
  const started = new Date();
  const loadBefore = loadAverage();
  try {
    life.db = await ensureMariaDB({ port: Number(env.DB_PORT) });
    let seeded = null;
    if (opts.reuse) {
      for (const name of names) {
        await prepareScaleDb(scaleEnv, name);
        // A database seeded by an earlier version of this script may lack them.
        await refreshStatistics(name, adminSql);
      }
    } else {
      seeded = await seedAll(scaleEnv, names, opts.size, opts.growth);
    }
    if (opts.seedOnly) {
      console.log('');
      console.log(`${started.toISOString()} · load average before ${loadBefore}, after ${loadAverage()}`);
      for (const s of seeded) {
        console.log(
          `seeded ${s.name}: ${fmtSize(s.size)} in ${s.seconds.toFixed(1)} s ` +
            `(outlooks ${s.outlookSeconds.toFixed(1)} s, ${s.computed} distinct computations)`,
        );
      }
      console.log(`measure them later with: npm run bench:scale -- --reuse --growth=${opts.growth}`);
      console.log(JSON.stringify({ at: started.toISOString(), seeded }));
      return;
    }

    if (opts.compare.length) {
      await compareProcesses(life, scaleEnv, names[0], opts, { started, loadBefore });
      return;
    }

    const one = await serve(life, scaleEnv, names[0], opts);
    const org = one.org;
    const routes = chosen(await routesOf(base, one.jar, org.organisationId), opts.only);
    log(`Measuring ${routes.length + 1} routes at ${opts.rate} req/s for ${opts.duration} s each ...`);
    const baseline = await measure(base, one.cookie, '/api/health', opts);
    const rows = [baseline];
    for (const route of routes) rows.push(await measure(base, one.cookie, route, opts));
    const loadAfter = loadAverage();

    let grownRows = null;
    let grownOrg = null;
    if (names[1]) {
      await one.stop();
      const grown = await serve(life, scaleEnv, names[1], { ...opts, build: false });
      grownOrg = grown.org;
      log(`Measuring the lists again on ${names[1]} ...`);
      grownRows = [await measure(base, grown.cookie, '/api/health', opts)];
      const deep = await deepLampPages(base, grown.jar, grownOrg.organisationId);
      for (const route of chosen([...growthRoutes(grownOrg.organisationId), ...deep], opts.only)) {
        grownRows.push(await measure(base, grown.cookie, route, opts));
      }
    }

    console.log('');
    console.log(
      `${started.toISOString()} · ${os.cpus().length} CPUs shared with other users · load average (1/5/15 min) ` +
        `${loadBefore} before, ${loadAfter} after the routes · ${opts.rate} req/s × ${opts.duration} s a route, ` +
        `/api/health alongside at ${Math.max(1, opts.rate / 4)} req/s · ${arrivalText(opts)} · ${opts.processes} server ` +
        `process${opts.processes === 1 ? '' : 'es'}`,
    );
    console.log(`organisation: ${fmtSize(org.size)} (${names[0]})`);
    for (const s of seeded ?? []) {
      console.log(
        `seeding ${s.name}: ${s.seconds.toFixed(1)} s (outlooks ${s.outlookSeconds.toFixed(1)} s, ` +
          `${s.computed} distinct computations)`,
      );
    }
    if (!seeded) console.log(`seeded earlier: ${names.join(', ')} (--reuse)`);
    console.log('ratios: p50 and p99 as multiples of /api/health alone (the first row)');
    console.log('');
    printTable(rows, baseline, opts.rate);
    if (rows.some((r) => r.rps < opts.rate * 0.9)) {
      console.log(`* below 90 % of the ${opts.rate} req/s asked: saturated, latencies include queueing`);
    }
    const growth = [];
    if (grownRows) {
      console.log('');
      console.log(`load average after the grown organisation: ${loadAverage()}`);
      console.log(
        `from 1× to ${opts.growth}× the organisation (${fmtSize(grownOrg.size)}, ${names[1]}), p50 / p99 ms:`,
      );
      // The same route on both: the organisation id is the same in both databases, or compare by position.
      const sameRoute = (r) => r.replace(`=${grownOrg.organisationId}`, `=${org.organisationId}`);
      for (const more of grownRows) {
        const oneRow = rows.find((r) => r.route === sameRoute(more.route));
        const ms = (r) => (r?.requests ? `${r.p50} / ${r.p99}` : 'no answer in the run');
        const ratio =
          oneRow?.requests && more.requests
            ? ` (p50 ×${(more.p50 / Math.max(oneRow.p50, 1)).toFixed(2)}, p99 ×${(more.p99 / Math.max(oneRow.p99, 1)).toFixed(2)})`
            : '';
        console.log(
          `  ${more.route}: ${ms(oneRow)} → ${ms(more)}${ratio}, ${more.bytes} B, health max ${more.healthMax ?? '-'} ms`,
        );
        growth.push({ route: more.route, one: oneRow ?? null, grown: more });
      }
    }
    console.log(
      JSON.stringify({
        ...runConditions(started, loadBefore, loadAfter, opts),
        size: org.size,
        grownSize: grownOrg?.size ?? null,
        seeded,
        arrivals: opts.arrivals,
        processes: opts.processes,
        results: rows,
        growth,
      }),
    );
  } finally {
    await life.stop();
  }
}

main().catch((e) => {
  console.error(`bench:scale failed: ${e instanceof Error ? e.message : String(e)}`);
  process.exit(1);
});
