#!/usr/bin/env node
// `npm run bench:scale -- [--scale=N] [--enclosures N --lamps N --readings N --designs N] [--growth=4]
//                          [--rate=20] [--duration=10] [--reuse] [--no-build]`
// The signed-in area at the size of a zoo's reptile house or a busy shop. On a database of its own
// (`<DB_NAME>_scale` on the private MariaDB, recreated each run unless --reuse) it seeds a generated
// organisation (default 2,000 enclosures, 8,000 lamps, 100,000 readings, 200 designs with two variants
// each, times --scale) with chunked INSERTs and the app's own outlook recompute, builds the production
// app into .next/scale-build and starts it on a free port of its own, signs in as the organisation's
// owner, then drives every list page and list API of the signed-in area, one after another, at a fixed
// rate with autocannon while /api/health is asked alongside. Prints per route: requests/s, p50/p99, bytes
// a response, p50/p99 as multiples of /api/health's alone (the baseline), and the slowest /api/health
// answer seen while it ran. Then grows the same organisation to --growth times the size (default 4; 0
// skips) and measures the lamp log again: it should not grow with the organisation.
// The database stays after the run (--reuse measures it again without seeding; the next run without
// --reuse recreates it). Figures, not a pass/fail test: the date, the CPUs and the load average are
// printed beside them.
import autocannon from 'autocannon';
import os from 'node:os';
import path from 'node:path';
import { parseArgs } from 'node:util';
import { ensureSecret, loadEnv, ROOT, usesPrivateDb } from './lib/env.mjs';
import { ensureDatabases, ensureMariaDB, recreateDatabase } from './lib/mariadb.mjs';
import { bin, duration, freePort, log, run } from './lib/proc.mjs';
import { Lifecycle, migrate, startNext } from './lib/stack.mjs';
import { api, loadAverage, signIn, warmUp } from './load.mjs';

const DEFAULT_SIZE = { enclosures: 2000, lamps: 8000, readings: 100_000, designs: 200 };

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
      build: { type: 'boolean', default: true },
      'no-build': { type: 'boolean', default: false },
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
    growth: num('growth'),
    rate: num('rate', 1),
    duration: num('duration', 1),
    reuse: values.reuse,
    build: values.build && !values['no-build'],
    help: values.help,
  };
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

/** One route at the fixed rate, with /api/health asked alongside at a quarter of it. */
async function measure(base, cookie, route, opts) {
  const headers = { cookie };
  await warmUp(base, { header: () => cookie }, route);
  const common = { connections: 10, duration: opts.duration, timeout: 20 };
  const [main, health] = await Promise.all([
    autocannon({ ...common, url: `${base}${route}`, headers, overallRate: opts.rate }),
    route === '/api/health'
      ? null
      : autocannon({
          ...common,
          connections: 2,
          url: `${base}/api/health`,
          overallRate: Math.max(1, opts.rate / 4),
        }),
  ]);
  const codes = Object.fromEntries(
    Object.entries(main.statusCodeStats ?? {}).map(([c, s]) => [c, Number(s.count)]),
  );
  return {
    route,
    requests: main.requests.total,
    rps: Math.round((main.requests.total / main.duration) * 10) / 10,
    p50: main.latency.p50,
    p99: main.latency.p99,
    bytes: main.requests.total ? Math.round(main.throughput.total / main.requests.total) : 0,
    errors: main.errors + main.timeouts,
    codes,
    // No answer within the run: nothing measured (autocannon leaves the figures at 0).
    healthMax: health?.requests.total ? health.latency.max : null,
    healthP99: health?.requests.total ? health.latency.p99 : null,
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
    Object.entries(r.codes)
      .map(([c, n]) => `${c}×${n}`)
      .join(' ') || 'no answer',
  ]);
  const widths = header.map((h, i) => Math.max(h.length, ...lines.map((l) => l[i].length)));
  const fmt = (cells) =>
    cells.map((c, i) => (i === 0 || i === 8 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ');
  console.log(fmt(header));
  console.log(widths.map((w) => '-'.repeat(w)).join('  '));
  for (const l of lines) console.log(fmt(l));
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

async function main() {
  const opts = options();
  if (opts.help) {
    console.log(
      'npm run bench:scale -- [--scale=N] [--enclosures N --lamps N --readings N --designs N] [--growth=4] [--rate=20] [--duration=10] [--reuse] [--no-build]',
    );
    return;
  }
  const env = loadEnv();
  if (!usesPrivateDb(env)) throw new Error('bench:scale seeds a database of its own on the private MariaDB');
  const life = new Lifecycle();
  life.handleSignals();
  const scaleDb = `${env.DB_NAME}_scale`;
  const port = await freePort(Number(env.PORT) + 50);
  const base = `http://localhost:${port}`;
  const scaleEnv = {
    ...env,
    DB_NAME: scaleDb,
    PORT: String(port),
    APP_URL: base,
    NEXTAUTH_URL: base,
    NEXTAUTH_SECRET: ensureSecret(),
    NEXT_DIST_DIR: '.next/scale-build',
    // A benchmark, not a check: `npx tsc --noEmit` and `npm test` check the types.
    NEXT_SKIP_TYPECHECK: '1',
    NEXT_TELEMETRY_DISABLED: '1',
    LOG_LEVEL: 'warn',
  };
  const started = new Date();
  const loadBefore = loadAverage();
  try {
    life.db = await ensureMariaDB({ port: Number(env.DB_PORT) });
    let org;
    let seedLine = null;
    if (!opts.reuse) await recreateDatabase(scaleDb);
    await ensureDatabases({ names: [scaleDb], user: env.DB_USER, password: env.DB_PASSWORD });
    await migrate(scaleEnv);
    if (opts.reuse) {
      const found = await run(
        bin('tsx'),
        ['--import', path.join(ROOT, 'scripts', 'lib', 'server-only.mjs'), 'scripts/scale-seed.ts', '--find'],
        { env: scaleEnv, capture: true },
      );
      org = JSON.parse(found.stdout.trim().split('\n').pop());
      log(`Reusing ${scaleDb}: organisation #${org.organisationId} (${fmtSize(org.size)}).`);
    } else {
      log(`Seeding ${scaleDb}: ${fmtSize(opts.size)} ...`);
      seedLine = await seed(scaleEnv, opts.size);
      org = { ...seedLine, size: opts.size };
      const a = seedLine.added;
      log(
        `Seeded in ${duration(seedLine.seconds * 1000)}: rows ${a.seconds.rows.toFixed(1)} s, ` +
          `outlooks of ${a.outlooks} lamps ${a.seconds.outlooks.toFixed(1)} s.`,
      );
    }
    await startNext(life, scaleEnv, {
      port,
      build: opts.build,
      logFile: path.join(ROOT, 'test-results', 'bench-scale-next.log'),
    });
    const { jar } = await signIn(base, org.ownerEmail, org.ownerPassword);
    const cookie = jar.header();
    const routes = await routesOf(base, jar, org.organisationId);

    log(`Measuring ${routes.length + 1} routes at ${opts.rate} req/s for ${opts.duration} s each ...`);
    const baseline = await measure(base, cookie, '/api/health', opts);
    const rows = [baseline];
    for (const route of routes) rows.push(await measure(base, cookie, route, opts));

    const loadAfter = loadAverage();
    console.log('');
    console.log(
      `${started.toISOString()} · ${os.cpus().length} CPUs shared with other users · load average (1/5/15 min) ` +
        `${loadBefore} before, ${loadAfter} after the routes · ${opts.rate} req/s × ${opts.duration} s a route, ` +
        `/api/health alongside at ${Math.max(1, opts.rate / 4)} req/s`,
    );
    console.log(`organisation: ${fmtSize(org.size)} (${scaleDb})`);
    if (seedLine) {
      console.log(
        `seeding: ${seedLine.seconds.toFixed(1)} s (rows ${seedLine.added.seconds.rows.toFixed(1)} s, ` +
          `outlooks ${seedLine.added.seconds.outlooks.toFixed(1)} s)`,
      );
    }
    console.log('ratios: p50 and p99 as multiples of /api/health alone (the first row)');
    console.log('');
    printTable(rows, baseline, opts.rate);
    if (rows.some((r) => r.rps < opts.rate * 0.9)) {
      console.log(`* below 90 % of the ${opts.rate} req/s asked: saturated, latencies include queueing`);
    }
    const growth = [];
    const lampLog = ['/lamp-log', `/api/lamps?organisationId=${org.organisationId}`];
    growth.push({ factor: 1, rows: rows.filter((r) => lampLog.includes(r.route)) });
    if (opts.growth > 1) {
      const extra = Object.fromEntries(
        Object.entries(org.size).map(([k, v]) => [k, Math.round(v * (opts.growth - 1))]),
      );
      log(`Growing the organisation to ${opts.growth}× (${fmtSize(extra)} more) ...`);
      const grown = await seed(scaleEnv, extra, [
        '--into',
        String(org.organisationId),
        '--email',
        org.ownerEmail,
        '--offset',
        String(org.size.enclosures),
      ]);
      log(
        `Grown in ${duration(grown.seconds * 1000)} (outlooks ${grown.added.seconds.outlooks.toFixed(1)} s).`,
      );
      const again = [];
      for (const route of lampLog) again.push(await measure(base, cookie, route, opts));
      growth.push({ factor: opts.growth, rows: again });
    }

    if (growth.length > 1) {
      console.log('');
      console.log(`load average after growing: ${loadAverage()}`);
      console.log(`lamp log from 1× to ${opts.growth}× the organisation (p50 / p99 ms):`);
      for (const [i, route] of lampLog.entries()) {
        const [one, more] = growth.map((g) => g.rows[i]);
        const ms = (r) =>
          r.requests ? `${r.p50} / ${r.p99} (${r.requests} answers)` : 'no answer in the run';
        const ratio =
          one.requests && more.requests ? ` (p50 ×${(more.p50 / Math.max(one.p50, 1)).toFixed(2)})` : '';
        console.log(`  ${route}: ${ms(one)} → ${ms(more)}${ratio}, health max ${more.healthMax ?? '-'} ms`);
      }
    }
    console.log(
      JSON.stringify({
        at: started.toISOString(),
        cpus: os.cpus().length,
        loadAverageBefore: loadBefore,
        loadAverageAfter: loadAfter,
        size: org.size,
        seedSeconds: seedLine?.seconds ?? null,
        rate: opts.rate,
        durationS: opts.duration,
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
