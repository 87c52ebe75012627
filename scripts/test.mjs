#!/usr/bin/env node
// `npm test`: from a fresh clone, every check the project has, in order:
//   prettier --check, eslint, tsc (run side by side), vitest (unit + integration, on the test database),
//   then browser journeys (tests/browser/*.browser.ts) in Chromium against a production build of the app.
// It brings up what they need (npm and Debian packages, the private MariaDB with a freshly recreated
// test database, a fake SMTP server on its own ports) and stops what it started at the end.
// It can run while `npm start` serves in the same folder: other ports, another database, another build
// folder (.next/test-build), the same MariaDB.
//
//   npm test                         everything
//   npm test -- lib/demo tests/api   only vitest, only files matching these filters
//   npm test -- --only=vitest,browser   --skip=eslint   --bail (stop at the first failing step)
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { ROOT, loadEnv, urlPort, usesPrivateDb } from './lib/env.mjs';
import { ensureApt, ensureNodeModules } from './lib/packages.mjs';
import { bin, bold, duration, freePort, green, log, red, run, yellow } from './lib/proc.mjs';
import { recreateDatabase } from './lib/mariadb.mjs';
import { Lifecycle, migrate, prepareDatabase, seed, startMail, startNext, startS3 } from './lib/stack.mjs';

const CHECKS = ['prettier', 'eslint', 'tsc', 'vitest', 'browser'];
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
  const counts = ['vitest.json', 'browser.json']
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
async function quietCheck(name, cmd, args, runEnv) {
  const t0 = Date.now();
  const r = await run(cmd, args, { env: runEnv, capture: true, check: false });
  const out = `${r.stdout}${r.stderr}`.trim();
  const ok = r.code === 0;
  console.log(`\n${bold(`▶ ${name}`)} ${ok ? green('passed') : red('FAILED')} ${duration(Date.now() - t0)}`);
  if (out) console.log(ok ? out.split('\n').slice(-5).join('\n') : out);
  steps.push({ name, ok, ms: Date.now() - t0 });
  if (!ok) failed = true;
  return ok;
}

async function main() {
  const testDb = env.TEST_DB_NAME;
  if (!/_test$/.test(testDb) || testDb === env.DB_NAME) {
    throw new Error(`TEST_DB_NAME must end in _test and differ from DB_NAME (it is dropped): "${testDb}"`);
  }
  rmSync(RESULTS_DIR, { recursive: true, force: true });
  mkdirSync(RESULTS_DIR, { recursive: true });
  const needDb = wanted('vitest') || wanted('browser');

  await step('npm packages', () => ensureNodeModules(), { critical: true });

  // Test ports: the documented defaults, or the next free ones (a second run or npm start may hold them).
  const smtpPort = await freePort(Number(env.TEST_SMTP_PORT));
  const mailHttpPort = await freePort(urlPort(env.TEST_FAKE_SMTP_HTTP), '127.0.0.1');
  const appPort = await freePort(Number(env.TEST_PORT));
  const s3Port = await freePort(urlPort(env.TEST_S3_ENDPOINT));
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

  let chromium = null;
  if (needDb) {
    await step('database (private MariaDB)', () => prepareDatabase(life, env, { recreate: [testDb] }), {
      critical: true,
    });
  }
  if (wanted('browser')) {
    // Installed in the background while the other checks run; awaited before the browser step.
    chromium = ensureApt({ chromium: ['chromium', 'fonts-liberation'] }, { quiet: true }).then(
      () => null,
      (e) => e,
    );
  }
  if (needDb) {
    await step('migrations (test database)', () => migrate(testEnv), { critical: true });
    await step(
      'fake SMTP',
      () => startMail(life, testEnv, { clear: true, logFile: path.join(RESULTS_DIR, 'fake-smtp.log') }),
      {
        critical: true,
      },
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
  }

  const statics = [];
  if (wanted('prettier'))
    statics.push(['prettier --check', bin('prettier'), ['--check', '.', '--log-level=warn']]);
  if (wanted('eslint')) statics.push(['eslint', bin('eslint'), ['.', '--max-warnings=0']]);
  if (wanted('tsc')) statics.push(['tsc --noEmit', bin('tsc'), ['--noEmit']]);
  if (statics.length) {
    log(`Running ${statics.map((s) => s[0]).join(', ')} side by side ...`);
    const oks = await Promise.all(statics.map(([name, cmd, args]) => quietCheck(name, cmd, args, testEnv)));
    if (opts.bail && oks.includes(false)) throw new StopRun();
  }

  if (wanted('vitest')) {
    // Integration tests call route handlers as if the app ran at the default address.
    const unitEnv = { ...testEnv, APP_URL: UNIT_APP_URL, NEXTAUTH_URL: UNIT_APP_URL, PORT: '3000' };
    await step('vitest', () =>
      run(
        bin('vitest'),
        [
          'run',
          '--reporter=default',
          '--reporter=json',
          `--outputFile.json=${path.join(RESULTS_DIR, 'vitest.json')}`,
          ...(opts.only?.has('browser') ? [] : opts.filters),
        ],
        { env: unitEnv },
      ),
    );
  }

  if (wanted('browser')) {
    await step('chromium (Debian package)', async () => {
      const err = await chromium;
      if (err) throw err;
    });
    if (steps.at(-1)?.ok === false) return;
    await step('browser: fresh test database + demo seed', async () => {
      // An external server's test database cannot be recreated from here: the seed then adds to it.
      if (usesPrivateDb(env)) await recreateDatabase(testDb);
      await migrate(testEnv);
      await seed(testEnv);
    });
    // A build folder of its own, so a running `npm start` keeps serving its build.
    const browserEnv = {
      ...testEnv,
      NEXT_DIST_DIR: '.next/test-build',
      // The tsc step above already checked the types (and failed the run if they are wrong).
      NEXT_SKIP_TYPECHECK: wanted('tsc') ? '1' : '0',
    };
    let appStarted = false;
    const nextLog = path.join(RESULTS_DIR, 'next.log');
    await step('browser: next build', () => run(bin('next'), ['build'], { env: browserEnv }));
    if (steps.at(-1)?.ok) {
      appStarted = await step(`browser: next start (${appUrl})`, () =>
        startNext(life, browserEnv, { port: appPort, build: false, logFile: nextLog }),
      );
    }
    if (appStarted) {
      const ok = await step('browser tests', () =>
        run(
          bin('vitest'),
          [
            'run',
            '--config',
            'vitest.browser.config.ts',
            '--reporter=default',
            '--reporter=json',
            `--outputFile.json=${path.join(RESULTS_DIR, 'browser.json')}`,
            ...(opts.only?.has('browser') ? opts.filters : []),
          ],
          { env: browserEnv },
        ),
      );
      if (!ok) {
        console.log(yellow(`Last lines of the app's log (${path.relative(ROOT, nextLog)}):`));
        console.log(readFileSync(nextLog, 'utf8').trimEnd().split('\n').slice(-40).join('\n'));
        console.log(yellow(`Screenshots: ${path.relative(ROOT, path.join(RESULTS_DIR, 'screenshots'))}/`));
      }
    }
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
