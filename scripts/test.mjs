#!/usr/bin/env node
// `npm test`: from a fresh clone, every check the project has, in two lanes side by side:
//   checks:  prettier --check, eslint, tsc (at low priority) and vitest's unit files, all in parallel,
//            with vitest's database files one at a time on the test database;
//   browser: `next build` at once, the demo seed in a database of its own, then the browser journeys
//            (tests/browser/*.browser.ts) in Chromium against that production build, two files at a time.
// It brings up what they need (npm and Debian packages, the private MariaDB with freshly recreated
// test databases, fake SMTP and S3 servers on their own ports for each lane) and stops what it started
// at the end. The summary prints each stage's time and the whole run's wall clock.
// It can run while `npm start` serves in the same folder: other ports, another database, another build
// folder (.next/test-build), the same MariaDB.
//
//   npm test                         everything
//   npm test -- lib/demo tests/api   only vitest, only files matching these filters
//   npm test -- --only=vitest,browser   --skip=eslint   --bail (stop at the first failing step)
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { ROOT, loadEnv, urlPort, usesPrivateDb } from './lib/env.mjs';
import { BUILD_DIRS } from './lib/builds.mjs';
import { ensureApt, ensureNodeModules } from './lib/packages.mjs';
import { bin, bold, dim, duration, freePort, green, log, red, run, yellow } from './lib/proc.mjs';
import { ensureDatabases, recreateDatabase } from './lib/mariadb.mjs';
import { Lifecycle, migrate, prepareDatabase, seed, startMail, startNext, startS3 } from './lib/stack.mjs';

const CHECKS = ['prettier', 'eslint', 'tsc', 'vitest', 'browser'];
// Files that bound response times (the health check while an export runs, a 503 soon after the database
// goes away) or check when timers fire (the scale bench's evenly spaced requests): they run alone after
// both lanes, when nothing else of this run competes for the cores, so that the bound measures the code
// and not this run's other work (a starved worker fires a second's timers together).
const TIMED_FILES = [
  'tests/security/export-stall.test.ts',
  'tests/reliability/db-outage.test.ts',
  'tests/reliability/paced-load.test.ts',
];
const TIMED_BROWSER_FILES = ['tests/browser/engine-threads.browser.ts'];
// The browser journeys run this many files at a time against the one app, each worker with its own
// Chromium: a journey mostly waits (for the server, the engine's worker, a reload), so a second file fills
// those waits on this 2-core machine; more would only queue for the cores. Each file makes what it changes
// (designs, enclosures, lamps, accounts, sessions it ends) for itself, so no file disturbs another.
const BROWSER_WORKERS = 2;
const RESULTS_DIR = path.join(ROOT, 'test-results');
// The address unit and integration tests see (APP_URL, NEXTAUTH_URL): the documented default.
const UNIT_APP_URL = 'http://localhost:3000';

function parseArgs(argv) {
  const opts = { only: null, skip: new Set(), bail: false, filters: [] };
  for (const a of argv) {
    if (a.startsWith('--only=')) opts.only = new Set(a.slice(7).split(',').filter(Boolean));
    else if (a.startsWith('--skip=')) for (const s of a.slice(7).split(',')) opts.skip.add(s);
    else if (a === '--bail') opts.bail = true;
    else if (a.startsWith('-')) throw new Error(`unknown option ${a} (--only=, --skip=, --bail)`);
    else opts.filters.push(a);
  }
  // File filters are for quick vitest runs while developing.
  if (opts.filters.length && !opts.only) opts.only = new Set(['vitest']);
  for (const name of [...(opts.only ?? []), ...opts.skip]) {
    if (!CHECKS.includes(name)) throw new Error(`unknown check "${name}" (one of ${CHECKS.join(', ')})`);
  }
  return opts;
}

const opts = parseArgs(process.argv.slice(2));
const wanted = (name) => (!opts.only || opts.only.has(name)) && !opts.skip.has(name);
const env = loadEnv();
const life = new Lifecycle();
life.handleSignals(130);
const steps = [];
let failed = false;
const startedAt = Date.now();
// Whether the browser lane's app came up (the timed journeys run against it after both lanes).
let browserAppUp = false;

/** Runs one named step, timing it. Infrastructure steps (critical) end the run when they fail. */
async function step(name, fn, { critical = false } = {}) {
  const t0 = Date.now();
  console.log(`\n${bold(`▶ ${name}`)}`);
  try {
    await fn();
    steps.push({ name, ok: true, ms: Date.now() - t0 });
    return true;
  } catch (e) {
    steps.push({ name, ok: false, ms: Date.now() - t0 });
    failed = true;
    console.error(red(`✗ ${name}: ${e instanceof Error ? e.message : String(e)}`));
    if (critical || opts.bail) throw new StopRun();
    return false;
  }
}

class StopRun extends Error {}

function readCounts(file) {
  if (!existsSync(file)) return null;
  try {
    const r = JSON.parse(readFileSync(file, 'utf8'));
    return { passed: r.numPassedTests ?? 0, failed: r.numFailedTests ?? 0, skipped: r.numPendingTests ?? 0 };
  } catch {
    return null;
  }
}

function summary() {
  console.log(`\n${bold('Summary')}`);
  for (const s of steps) {
    const mark = s.ok ? green('✓') : red('✗');
    console.log(`  ${mark} ${s.name.padEnd(28)} ${duration(s.ms).padStart(9)}`);
  }
  for (const name of CHECKS.filter((c) => !wanted(c)))
    console.log(`  ${yellow('-')} ${name.padEnd(28)}   skipped`);
  // Stages overlap (two lanes), so the wall clock is less than their sum; the machine's load says how
  // much of it was ours.
  console.log(`  ${' '} ${'total (wall clock)'.padEnd(28)} ${duration(Date.now() - startedAt).padStart(9)}`);
  console.log(
    dim(
      `  ${os.cpus().length} CPUs, load average ${os
        .loadavg()
        .map((l) => l.toFixed(2))
        .join(' ')} (1/5/15 min)`,
    ),
  );
  const counts = [
    'vitest-unit.json',
    'vitest-db.json',
    'vitest-timed.json',
    'browser.json',
    'browser-timed.json',
  ]
    .map((f) => readCounts(path.join(RESULTS_DIR, f)))
    .filter(Boolean);
  if (counts.length) {
    const total = counts.reduce((a, c) => ({
      passed: a.passed + c.passed,
      failed: a.failed + c.failed,
      skipped: a.skipped + c.skipped,
    }));
    console.log(
      `\ntests: ${total.passed} passed, ${total.failed} failed${total.skipped ? `, ${total.skipped} skipped` : ''}`,
    );
  }
  console.log(failed ? red(bold('\nnpm test FAILED')) : green(bold('\nnpm test passed')));
}

/** Runs a command with its output held back, then shown whole (so parallel checks do not interleave). */
async function quietCheck(name, cmd, args, runEnv, tail = 5) {
  const t0 = Date.now();
  const r = await run(cmd, args, { env: runEnv, capture: true, check: false });
  const out = `${r.stdout}${r.stderr}`.trim();
  const ok = r.code === 0;
  console.log(`\n${bold(`▶ ${name}`)} ${ok ? green('passed') : red('FAILED')} ${duration(Date.now() - t0)}`);
  if (out) console.log(ok ? out.split('\n').slice(-tail).join('\n') : out);
  steps.push({ name, ok, ms: Date.now() - t0 });
  if (!ok) failed = true;
  return ok;
}

/** The test database of the browser journeys: beside the vitest one, so the two stages can overlap. */
const browserDbName = (testDb) => testDb.replace(/_test$/, '_browser_test');

// The browser stage's own fake mail and S3 servers (vitest's tests empty theirs whenever they like):
// this far above the vitest ones, or the next free port.
const BROWSER_PORT_OFFSET = 1000;

async function main() {
  const testDb = env.TEST_DB_NAME;
  if (!/_test$/.test(testDb) || testDb === env.DB_NAME) {
    throw new Error(`TEST_DB_NAME must end in _test and differ from DB_NAME (it is dropped): "${testDb}"`);
  }
  rmSync(RESULTS_DIR, { recursive: true, force: true });
  mkdirSync(RESULTS_DIR, { recursive: true });
  const runVitest = wanted('vitest');
  const runBrowser = wanted('browser');
  const needDb = runVitest || runBrowser;
  // With our own MariaDB the browser journeys get a database of their own and run beside vitest; an
  // external server's databases cannot be created from here, so they then share the test database and
  // wait for vitest, as one stage after the other.
  const overlap = usesPrivateDb(env);
  const browserDb = overlap ? browserDbName(testDb) : testDb;

  await step('npm packages', () => ensureNodeModules(), { critical: true });

  // Test ports: the documented defaults, or the next free ones (a second run or npm start may hold them).
  // Each is chosen above the one before, so that no two servers of this run are given the same port.
  const smtpPort = await freePort(Number(env.TEST_SMTP_PORT));
  const mailHttpPort = await freePort(urlPort(env.TEST_FAKE_SMTP_HTTP), '127.0.0.1');
  const appPort = await freePort(Number(env.TEST_PORT));
  const s3Port = await freePort(urlPort(env.TEST_S3_ENDPOINT));
  const browserSmtpPort = await freePort(smtpPort + BROWSER_PORT_OFFSET);
  const browserMailHttpPort = await freePort(mailHttpPort + BROWSER_PORT_OFFSET, '127.0.0.1');
  const browserS3Port = await freePort(s3Port + BROWSER_PORT_OFFSET);
  const appUrl = `http://localhost:${appPort}`;
  const testEnv = {
    ...env,
    DB_NAME: testDb,
    SMTP_PORT: String(smtpPort),
    FAKE_SMTP_HTTP: `http://127.0.0.1:${mailHttpPort}`,
    // The browser tests read the development mail viewer (off unless asked for).
    MAIL_VIEWER: '1',
    PORT: String(appPort),
    APP_URL: appUrl,
    NEXTAUTH_URL: appUrl,
    E2E_BASE_URL: appUrl,
    NEXTAUTH_SECRET: env.TEST_NEXTAUTH_SECRET || 'baskwell-test-only-secret-0123456789abcdefghijklmnop',
    NEXT_TELEMETRY_DISABLED: '1',
    S3_ENDPOINT: `http://127.0.0.1:${s3Port}`,
    S3_BUCKET: env.TEST_S3_BUCKET,
    S3_DIR: path.join(ROOT, '.data', 's3-test'),
  };
  // A build folder of its own, so a running `npm start` keeps serving its build.
  const browserEnv = {
    ...testEnv,
    NEXT_DIST_DIR: BUILD_DIRS.test,
    // The studio's probe for the journeys (round trips, camera: components/studio/testing/probe.ts)
    // exists in this build only.
    NEXT_PUBLIC_STUDIO_PROBE: '1',
    // The tsc step checks the types beside the build (and fails the run if they are wrong).
    NEXT_SKIP_TYPECHECK: wanted('tsc') ? '1' : '0',
    ...(overlap
      ? {
          DB_NAME: browserDb,
          SMTP_PORT: String(browserSmtpPort),
          FAKE_SMTP_HTTP: `http://127.0.0.1:${browserMailHttpPort}`,
          S3_ENDPOINT: `http://127.0.0.1:${browserS3Port}`,
          S3_DIR: path.join(ROOT, '.data', 's3-browser-test'),
        }
      : {}),
  };

  if (needDb) {
    await step(
      'database (private MariaDB)',
      async () => {
        await prepareDatabase(life, env, { recreate: runVitest ? [testDb] : [] });
        if (overlap && runBrowser && browserDb !== testDb) {
          await ensureDatabases({ names: [browserDb], user: env.DB_USER, password: env.DB_PASSWORD });
        }
      },
      { critical: true },
    );
  }

  // Two lanes side by side: the checks (static checks, then vitest) and the browser journeys (build,
  // seed, serve, test). Each stage is timed on its own; the wall clock of the whole run is printed last.
  const lanes = [];
  if (runVitest || ['prettier', 'eslint', 'tsc'].some(wanted)) lanes.push(checksLane(testEnv));
  if (runBrowser) {
    // Without a database of its own the browser lane seeds and tests only after vitest is done with it.
    const vitestDone = overlap ? Promise.resolve() : Promise.allSettled([lanes[0]]);
    // Its own mail and S3 servers unless it shares vitest's (an external database, one after the other).
    const ownServers = overlap || !runVitest;
    lanes.push(browserLane(browserEnv, { appUrl, appPort, browserDb, vitestDone, ownServers }));
  }
  const results = await Promise.allSettled(lanes);
  const stop = results.find((r) => r.status === 'rejected');
  if (stop) throw stop.reason;

  // Filters pick files the way vitest does: a filter is a part of the file's path.
  const picked = (files) =>
    files.filter((f) => !opts.filters.length || opts.filters.some((x) => f.includes(x)));
  const timed = opts.only?.has('browser') ? [] : picked(TIMED_FILES);
  if (runVitest && timed.length) {
    const unitEnv = { ...testEnv, APP_URL: UNIT_APP_URL, NEXTAUTH_URL: UNIT_APP_URL, PORT: '3000' };
    await step('vitest: timed database files, alone', () =>
      run(bin('vitest'), [...vitestArgs('db', 'timed'), ...timed], { env: unitEnv }),
    );
  }
  const timedBrowser = opts.only?.has('browser') || !opts.filters.length ? picked(TIMED_BROWSER_FILES) : [];
  if (runBrowser && browserAppUp && timedBrowser.length) {
    await step('browser: timed journeys, alone', () =>
      run(bin('vitest'), [...browserArgs('browser-timed'), ...timedBrowser], { env: browserEnv }),
    );
  }
}

/**
 * One vitest run of browser journeys (`files`: paths or filters) as a step, its output kept in
 * test-results/<name>.log and shown whole when it ends, so it does not interleave with vitest's.
 */
async function browserRun(title, name, files, runEnv) {
  const logFile = path.join(RESULTS_DIR, `${name}.log`);
  log(`${title}: follow ${path.relative(ROOT, logFile)}; shown here when they end.`);
  let output = '';
  const ok = await step(title, async () => {
    const r = await run(bin('vitest'), [...browserArgs(name), ...files], {
      env: runEnv,
      capture: true,
      check: false,
      logFile,
    });
    output = `${r.stdout}${r.stderr}`;
    if (r.code !== 0) throw new Error(`browser tests exited with ${r.signal ?? r.code}`);
  });
  console.log(`\n${bold(`▶ ${title}: output`)}\n${output.trimEnd()}`);
  return ok;
}

/** A vitest run of the browser journeys, its JSON report in test-results/<name>.json. */
const browserArgs = (name) => [
  'run',
  '--config',
  'vitest.browser.config.ts',
  '--passWithNoTests',
  '--reporter=default',
  '--reporter=json',
  `--outputFile.json=${path.join(RESULTS_DIR, `${name}.json`)}`,
];

/** A vitest run of one project of vitest.config.ts, its JSON report in test-results/vitest-<name>.json. */
const vitestArgs = (project, name = project) => [
  'run',
  '--project',
  project,
  // A file filter may match files of one project only.
  '--passWithNoTests',
  '--reporter=default',
  '--reporter=json',
  `--outputFile.json=${path.join(RESULTS_DIR, `vitest-${name}.json`)}`,
];

/** prettier, eslint and tsc side by side, then vitest on the test database with its mail and S3. */
async function checksLane(testEnv) {
  // vitest's database, mail and S3 come up while the static checks run (they need none of them).
  const infra = (async () => {
    if (!wanted('vitest')) return;
    await step('migrations (test database)', () => migrate(testEnv), { critical: true });
    await step(
      'fake SMTP',
      () => startMail(life, testEnv, { clear: true, logFile: path.join(RESULTS_DIR, 'fake-smtp.log') }),
      { critical: true },
    );
    await step(
      'fake S3',
      () => {
        // A clean bucket each run: objects of an earlier run would only confuse the tests.
        rmSync(testEnv.S3_DIR, { recursive: true, force: true });
        return startS3(life, testEnv, { logFile: path.join(RESULTS_DIR, 'fake-s3.log') });
      },
      { critical: true },
    );
  })();

  // The static checks (no time limits) yield the cores to the long chains — the database files one at a
  // time, the browser journeys — filling the gaps instead of delaying them.
  const low = (cmd, args) => ['nice', ['-n', '10', cmd, ...args]];
  const jobs = [];
  if (wanted('prettier'))
    jobs.push(['prettier --check', bin('prettier'), ['--check', '.', '--log-level=warn']]);
  if (wanted('eslint')) jobs.push(['eslint', bin('eslint'), ['.', '--max-warnings=0']]);
  if (wanted('tsc')) jobs.push(['tsc --noEmit', bin('tsc'), ['--noEmit']]);
  if (jobs.length) log(`Running ${jobs.map((s) => s[0]).join(', ')} side by side ...`);
  const running = jobs.map(([name, cmd, args]) => quietCheck(name, ...low(cmd, args), testEnv));

  if (wanted('vitest')) {
    // Integration tests call route handlers as if the app ran at the default address.
    const unitEnv = { ...testEnv, APP_URL: UNIT_APP_URL, NEXTAUTH_URL: UNIT_APP_URL, PORT: '3000' };
    // vitest.config.ts's two projects as two runs side by side (one run would finish the unit files
    // before it starts the database ones): the unit files in parallel, shown whole when they end; the
    // database files one at a time on the test database, shown as they go.
    const filters = opts.only?.has('browser') ? [] : opts.filters;
    // At normal priority: unit files have time limits (the engine pool's, the tests' own), and a starved
    // worker on a busy machine would fail them.
    running.push(
      quietCheck('vitest: unit files', bin('vitest'), [...vitestArgs('unit'), ...filters], unitEnv, 8),
    );
    const notTimed = { ...unitEnv, VITEST_DB_EXCLUDE: TIMED_FILES.join(',') };
    running.push(
      infra.then(() =>
        step('vitest: database files', () =>
          run(bin('vitest'), [...vitestArgs('db'), ...filters], { env: notTimed }),
        ),
      ),
    );
  }
  const oks = await Promise.all(running);
  if (opts.bail && oks.includes(false)) throw new StopRun();
}

/**
 * The browser journeys: `next build` from the start (beside the static checks and vitest: both are
 * needed and neither waits for the other), the demo seed in the browser's own database meanwhile, then
 * the app on its port and tests/browser/*.browser.ts in Chromium, BROWSER_WORKERS files at a time.
 */
async function browserLane(browserEnv, { appUrl, appPort, browserDb, vitestDone, ownServers }) {
  const chromium = ensureApt({ chromium: ['chromium', 'fonts-liberation'] }, { quiet: true }).then(
    () => null,
    (e) => e,
  );
  const buildLog = path.join(RESULTS_DIR, 'next-build.log');
  const built = step('browser: next build', async () => {
    const r = await run(bin('next'), ['build'], {
      env: browserEnv,
      capture: true,
      check: false,
      logFile: buildLog,
    });
    if (r.code !== 0) {
      console.log(`${r.stdout}${r.stderr}`.trimEnd().split('\n').slice(-40).join('\n'));
      throw new Error(`next build exited with ${r.signal ?? r.code} (log: ${path.relative(ROOT, buildLog)})`);
    }
  });
  const seeded = (async () => {
    await vitestDone;
    return step(`browser: database ${browserDb} + demo seed`, async () => {
      // An external server's test database cannot be recreated from here: the seed then adds to it.
      if (usesPrivateDb(env)) await recreateDatabase(browserDb);
      await migrate(browserEnv);
      // Mail first: the seed runs the reminder job, whose e-mail the demo walk finds in the mail viewer.
      if (ownServers) {
        await startMail(life, browserEnv, {
          clear: true,
          logFile: path.join(RESULTS_DIR, 'fake-smtp-browser.log'),
        });
        rmSync(browserEnv.S3_DIR, { recursive: true, force: true });
        await startS3(life, browserEnv, { logFile: path.join(RESULTS_DIR, 'fake-s3-browser.log') });
      }
      const seeded = await seed(browserEnv);
      if (!(seeded.reminders?.sent > 0)) {
        log(
          `The demo seed sent no reminder e-mail (the demo walk looks for one): ${JSON.stringify(seeded.reminders)}`,
        );
      }
    });
  })();
  const ready = await Promise.all([built, seeded]);
  if (ready.includes(false)) return;
  const chromiumOk = await step('chromium (Debian package)', async () => {
    const err = await chromium;
    if (err) throw err;
  });
  if (!chromiumOk) return;
  const nextLog = path.join(RESULTS_DIR, 'next.log');
  const appStarted = await step(`browser: next start (${appUrl})`, () =>
    startNext(life, browserEnv, { port: appPort, build: false, logFile: nextLog }),
  );
  if (!appStarted) return;
  browserAppUp = true;
  const ok = await browserRun(
    `browser tests (${BROWSER_WORKERS} at a time)`,
    'browser',
    opts.only?.has('browser') ? opts.filters : [],
    {
      ...browserEnv,
      VITEST_BROWSER_EXCLUDE: TIMED_BROWSER_FILES.join(','),
      BROWSER_WORKERS: String(BROWSER_WORKERS),
    },
  );
  if (!ok) {
    console.log(yellow(`Last lines of the app's log (${path.relative(ROOT, nextLog)}):`));
    console.log(readFileSync(nextLog, 'utf8').trimEnd().split('\n').slice(-40).join('\n'));
    console.log(yellow(`Screenshots: ${path.relative(ROOT, path.join(RESULTS_DIR, 'screenshots'))}/`));
  }
}

main()
  .catch((e) => {
    if (!(e instanceof StopRun)) {
      failed = true;
      console.error(red(`\nnpm test stopped: ${e instanceof Error ? e.message : String(e)}`));
    }
  })
  .then(async () => {
    if (life.stopping) return;
    await life.stop();
    summary();
    process.exit(failed ? 1 : 0);
  });
