// The pieces `npm start` and `npm test` both bring up: packages, the private database, migrations,
// the demo seed, the fake SMTP server and Next. Each started piece is registered with a Lifecycle
// so that Ctrl-C, a failure or the end of the run stops exactly what this run started.
import { mkdirSync } from 'node:fs';
import path from 'node:path';
import { emptyMainBuild } from './builds.mjs';
import { DATA_DIR, ROOT, urlPort, usesPrivateDb } from './env.mjs';
import { ensureDatabases, ensureMariaDB, recreateDatabase } from './mariadb.mjs';
import { ensureApt } from './packages.mjs';
import { webProcesses } from './web-cluster.mjs';
import {
  bin,
  canConnect,
  httpAnswers,
  log,
  red,
  run,
  service,
  stopForeground,
  stopProcess,
  waitFor,
  yellow,
} from './proc.mjs';

export class Lifecycle {
  services = [];
  db = null;
  stopping = null;
  signals = 0;

  /** Stops everything this run started: foreground commands, services (newest first), the database. */
  stop() {
    this.stopping ??= (async () => {
      await stopForeground();
      for (const s of [...this.services].reverse()) {
        await stopProcess(s).catch((e) => log(red(`could not stop ${s.serviceName}: ${e.message}`)));
      }
      if (this.db) await this.db.release().catch((e) => log(red(`could not stop MariaDB: ${e.message}`)));
    })();
    return this.stopping;
  }

  /**
   * On Ctrl-C / SIGTERM / SIGHUP, or when the parent process goes away: stop everything and exit.
   * A second signal exits at once.
   */
  handleSignals(exitCode = 130) {
    const onSignal = (why) => {
      this.signals++;
      if (this.signals > 1) {
        log(yellow('Second signal: exiting without waiting.'));
        process.exit(exitCode);
      }
      log(`${why}: stopping ...`);
      void this.stop().then(() => process.exit(exitCode));
    };
    for (const sig of ['SIGINT', 'SIGTERM', 'SIGHUP']) process.on(sig, () => onSignal(sig));
    // `kill <npm pid>` ends npm without passing the signal on; we would be left running alone.
    const parent = process.ppid;
    setInterval(() => {
      if (process.ppid !== parent && this.signals === 0) onSignal('parent process exited');
    }, 1000).unref();
  }
}

/** Starts or reuses the private MariaDB and creates the databases and the application user. */
export async function prepareDatabase(life, env, { recreate = [] } = {}) {
  if (!usesPrivateDb(env)) {
    log(`Using the external database server ${env.DB_HOST}:${env.DB_PORT} (DB_HOST is not local).`);
    return;
  }
  await ensureApt({ mariadbd: 'mariadb-server' });
  life.db = await ensureMariaDB({ port: Number(env.DB_PORT) });
  for (const name of recreate) await recreateDatabase(name);
  await ensureDatabases({
    names: [...new Set([env.DB_NAME, env.TEST_DB_NAME])],
    user: env.DB_USER,
    password: env.DB_PASSWORD,
  });
}

// The server modules' `import 'server-only'` resolves to nothing in these scripts (see server-only.mjs).
const SERVER_ONLY = path.join(ROOT, 'scripts', 'lib', 'server-only.mjs');
const WEB_CLUSTER = path.join(ROOT, 'scripts', 'lib', 'web-cluster.mjs');
const tsx = (script, args, env, opts = {}) =>
  run(bin('tsx'), ['--import', SERVER_ONLY, script, ...args], { env, ...opts });

export async function migrate(env) {
  await tsx('scripts/migrate.ts', [], env);
}

/** Seeds the demo scenario; returns { created, signIns }. */
export async function seed(env) {
  const { stdout } = await tsx('scripts/seed.ts', ['--json'], env, { capture: true });
  const line = stdout.trim().split('\n').pop() ?? '{}';
  return JSON.parse(line);
}

async function ensureFree(port, what, variable) {
  if (await canConnect(port)) {
    throw new Error(`${what}: port ${port} is already in use; set ${variable} to a free port`);
  }
}

/** Starts the fake SMTP server on env.SMTP_PORT with its API on env.FAKE_SMTP_HTTP. */
export async function startMail(life, env, { clear = false, logFile } = {}) {
  const httpPort = urlPort(env.FAKE_SMTP_HTTP);
  await ensureFree(Number(env.SMTP_PORT), 'fake SMTP', 'SMTP_PORT');
  await ensureFree(httpPort, 'fake SMTP web API', 'FAKE_SMTP_HTTP');
  mkdirSync(path.join(DATA_DIR, env.DB_NAME), { recursive: true });
  const child = service('mail', bin('tsx'), ['scripts/fake-smtp.ts', ...(clear ? ['--clear'] : [])], {
    env,
    logFile,
  });
  life.services.push(child);
  await waitFor(
    'fake SMTP',
    async () => (await fetch(`${env.FAKE_SMTP_HTTP}/health`, { signal: AbortSignal.timeout(2000) })).ok,
    { child, timeoutMs: 30_000 },
  );
  return child;
}

/** Starts the fake S3 server (scripts/fake-s3.mjs) at env.S3_ENDPOINT with env.S3_BUCKET in env.S3_DIR. */
export async function startS3(life, env, { logFile } = {}) {
  const port = urlPort(env.S3_ENDPOINT);
  await ensureFree(port, 'fake S3', 'S3_ENDPOINT');
  const child = service('s3', process.execPath, ['scripts/fake-s3.mjs'], { env, logFile });
  life.services.push(child);
  await waitFor('fake S3', () => canConnect(port), { child, timeoutMs: 30_000 });
  return child;
}

/**
 * The background job process (scripts/jobs.ts): reminders and other jobs on their intervals, off the
 * web server's event loop. Nothing to wait for: it logs a line when it has started. If it ends on its
 * own (a crash), it is started again after a pause and the web app goes on serving: a failing job
 * must not take the site down. Its children are marked `restarts` so the caller does not stop on them.
 */
export function startJobs(life, env, { logFile, pauseMs = 10_000 } = {}) {
  const child = service('jobs', bin('tsx'), ['--import', SERVER_ONLY, 'scripts/jobs.ts'], { env, logFile });
  child.restarts = true;
  life.services.push(child);
  void child.exited.then((r) => {
    if (life.stopping) return;
    life.services = life.services.filter((s) => s !== child);
    log(red(`jobs stopped (${r.signal ?? r.code}); starting it again in ${pauseMs / 1000} s.`));
    setTimeout(() => {
      if (!life.stopping) startJobs(life, env, { logFile, pauseMs });
    }, pauseMs).unref();
  });
  return child;
}

/**
 * `next build` (unless dev), then `next start`/`next dev` on `port`; resolves once it answers.
 * `processes` (default WEB_PROCESSES, else one a core) `next start` processes share the port through
 * scripts/lib/web-cluster.mjs when more than one; `next dev` is always one process.
 */
export async function startNext(
  life,
  env,
  { port, dev = false, build = true, logFile, processes = webProcesses(env.WEB_PROCESSES) } = {},
) {
  const nextEnv = { ...env, NEXT_TELEMETRY_DISABLED: '1', WEB_PROCESSES: String(dev ? 1 : processes) };
  await ensureFree(port, 'the web app', 'PORT');
  if (!dev && build) {
    log('Building the app (next build) ...');
    if (!env.NEXT_DIST_DIR) {
      // The main build's folder holds the other builds' folders too (npm test's, the benches'): empty
      // it ourselves, keeping them, and tell Next not to empty it (scripts/lib/builds.mjs).
      emptyMainBuild(path.join(ROOT, '.next'));
      nextEnv.NEXT_KEEP_DIST = '1';
    }
    await run(bin('next'), ['build'], { env: nextEnv });
  }
  const nextArgs = [dev ? 'dev' : 'start', '-p', String(port)];
  const child =
    dev || processes === 1
      ? service('next', bin('next'), nextArgs, { env: nextEnv, logFile })
      : service('next', process.execPath, [WEB_CLUSTER, String(processes), bin('next'), ...nextArgs], {
          env: nextEnv,
          logFile,
        });
  life.services.push(child);
  await waitFor('the web app', () => httpAnswers(`http://127.0.0.1:${port}/`), {
    child,
    timeoutMs: dev ? 180_000 : 60_000,
    intervalMs: 300,
  });
  return child;
}

export { ROOT };
