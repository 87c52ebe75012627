// The project's private MariaDB instance: data under .data/mariadb, its own port on 127.0.0.1,
// its own socket. Never touches a system MariaDB (that one listens on 3306 with its own socket).
import { spawn } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, rmSync, unlinkSync, writeFileSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { DATA_DIR } from './env.mjs';
import { findProgram } from './packages.mjs';
import { canConnect, log, run, sleep } from './proc.mjs';

const osUser = os.userInfo().username;

export function mariadbPaths(dataRoot = DATA_DIR) {
  let socket = path.join(dataRoot, 'mdb.sock');
  // Unix socket paths are limited to ~107 bytes: fall back to a short path for deep checkouts.
  if (Buffer.byteLength(socket) > 100) {
    const tag = createHash('sha256').update(dataRoot).digest('hex').slice(0, 12);
    socket = path.join(os.tmpdir(), `baskwell-${tag}.sock`);
  }
  return {
    dataDir: path.join(dataRoot, 'mariadb'),
    pidFile: path.join(dataRoot, 'mdb.pid'),
    logFile: path.join(dataRoot, 'mdb.err'),
    ownerFile: path.join(dataRoot, 'mariadb.owner'),
    usersDir: path.join(dataRoot, 'mariadb.users'),
    socket,
  };
}

function program(name) {
  const p = findProgram(name);
  if (!p) throw new Error(`${name} not found (is mariadb-server installed?)`);
  return p;
}

function pidAlive(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch (e) {
    return e.code === 'EPERM';
  }
}

/** The pid of our running mariadbd (from its pid file), or null. */
export function runningPid(p = mariadbPaths()) {
  if (!existsSync(p.pidFile)) return null;
  const pid = Number(readFileSync(p.pidFile, 'utf8').trim());
  if (!Number.isInteger(pid) || pid <= 0 || !pidAlive(pid)) return null;
  try {
    const cmd = readFileSync(`/proc/${pid}/cmdline`, 'utf8');
    if (!cmd.includes('mariadbd') && !cmd.includes('mysqld')) return null;
    if (!cmd.includes(p.dataDir)) return null;
  } catch {
    /* no /proc: trust the pid file */
  }
  return pid;
}

async function ping(p) {
  const r = await run(
    program('mariadb-admin'),
    ['--no-defaults', `--socket=${p.socket}`, `-u${osUser}`, 'ping'],
    {
      capture: true,
      check: false,
    },
  );
  return r.code === 0;
}

function logTail(p, lines = 25) {
  if (!existsSync(p.logFile)) return '(no log)';
  return readFileSync(p.logFile, 'utf8').trimEnd().split('\n').slice(-lines).join('\n');
}

/** Runs SQL as the administrator over our socket (unix-socket authentication, no password). */
export async function adminSql(sql, p = mariadbPaths()) {
  const r = await run(
    program('mariadb'),
    ['--no-defaults', `--socket=${p.socket}`, `-u${osUser}`, '--batch', '--skip-column-names'],
    { capture: true, input: sql },
  );
  return r.stdout;
}

async function initialise(p) {
  log(`Initialising a private MariaDB in ${path.relative(process.cwd(), p.dataDir) || p.dataDir} ...`);
  mkdirSync(p.dataDir, { recursive: true });
  try {
    await run(
      program('mariadb-install-db'),
      [
        '--no-defaults',
        `--datadir=${p.dataDir}`,
        `--user=${osUser}`,
        '--auth-root-authentication-method=socket',
        '--skip-test-db',
      ],
      { capture: true },
    );
  } catch (e) {
    // A half-initialised folder would make every later start fail: nothing in it is data yet.
    rmSync(p.dataDir, { recursive: true, force: true });
    throw e;
  }
}

function registerUser(p, owner, serverPid) {
  mkdirSync(p.usersDir, { recursive: true });
  writeFileSync(path.join(p.usersDir, String(process.pid)), `${process.argv.slice(1).join(' ')}\n`);
  if (owner) writeFileSync(p.ownerFile, `${owner} ${serverPid}\n`);
}

/** 'auto' when one of our scripts started the running server (and may stop it), else 'manual'. */
function ownerOf(p, serverPid) {
  if (!existsSync(p.ownerFile)) return 'manual'; // someone started it by hand: theirs to stop
  const [owner, pid] = readFileSync(p.ownerFile, 'utf8').trim().split(/\s+/);
  return owner === 'auto' && Number(pid) === serverPid ? 'auto' : 'manual';
}

function otherLiveUsers(p) {
  if (!existsSync(p.usersDir)) return [];
  const others = [];
  for (const name of readdirSync(p.usersDir)) {
    const pid = Number(name);
    if (pid === process.pid) continue;
    if (Number.isInteger(pid) && pidAlive(pid)) others.push(pid);
    else rmSync(path.join(p.usersDir, name), { force: true });
  }
  return others;
}

/**
 * Starts our MariaDB on 127.0.0.1:port, or reuses it when already running.
 * Returns a handle whose release() stops the server when this was the last script using it and a
 * script (not a person, see scripts/mariadb.mjs) started it.
 */
export async function ensureMariaDB({ port, owner = 'auto', dataRoot = DATA_DIR } = {}) {
  const p = mariadbPaths(dataRoot);
  mkdirSync(dataRoot, { recursive: true });
  const existing = runningPid(p);
  if (existing && (await ping(p))) {
    const actual = (await adminSql('SELECT @@port', p)).trim();
    if (Number(actual) !== Number(port)) {
      throw new Error(
        `our MariaDB (pid ${existing}) is running on port ${actual}, not ${port}: stop it with ` +
          '`node scripts/mariadb.mjs stop` or set DB_PORT to match',
      );
    }
    log(`Reusing the private MariaDB (pid ${existing}, port ${port}).`);
    registerUser(p);
    return handle(p, existing, false);
  }
  if (existing) {
    throw new Error(
      `MariaDB pid ${existing} does not answer on ${p.socket}; see ${p.logFile}:\n${logTail(p)}`,
    );
  }
  if (await canConnect(port)) {
    throw new Error(`port ${port} is already in use by another program: set DB_PORT to a free port`);
  }
  if (!existsSync(path.join(p.dataDir, 'mysql'))) await initialise(p);
  rmSync(p.pidFile, { force: true });
  if (existsSync(p.socket)) unlinkSync(p.socket);

  const t0 = Date.now();
  const child = spawn(
    program('mariadbd'),
    [
      '--no-defaults',
      `--datadir=${p.dataDir}`,
      `--port=${port}`,
      '--bind-address=127.0.0.1',
      `--socket=${p.socket}`,
      `--pid-file=${p.pidFile}`,
      `--log-error=${p.logFile}`,
      `--user=${osUser}`,
      '--character-set-server=utf8mb4',
      '--collation-server=utf8mb4_unicode_ci',
      '--innodb-flush-log-at-trx-commit=1',
      '--skip-name-resolve',
      '--max-connections=200',
    ],
    { detached: true, stdio: 'ignore' },
  );
  child.unref();
  let exited = null;
  child.on('exit', (code, signal) => (exited = signal ?? code));
  child.on('error', (e) => (exited = e.message));

  const until = Date.now() + 60_000;
  for (;;) {
    if (exited !== null) {
      throw new Error(`MariaDB exited (${exited}) while starting on port ${port}. Log tail:\n${logTail(p)}`);
    }
    if (existsSync(p.socket) && (await ping(p))) break;
    if (Date.now() > until) {
      child.kill('SIGKILL');
      throw new Error(`MariaDB did not answer within 60 s. Log tail:\n${logTail(p)}`);
    }
    await sleep(100);
  }
  log(`Private MariaDB started on 127.0.0.1:${port} (pid ${child.pid}, ${Date.now() - t0} ms).`);
  registerUser(p, owner, child.pid);
  return handle(p, child.pid, true);
}

function handle(p, pid, started) {
  return {
    pid,
    started,
    socket: p.socket,
    /** Leaves the server running for other users of it; stops it when we were the last. */
    async release() {
      rmSync(path.join(p.usersDir, String(process.pid)), { force: true });
      const others = otherLiveUsers(p);
      if (ownerOf(p, pid) !== 'auto') return;
      if (others.length) {
        log(`Leaving MariaDB running: still used by pid ${others.join(', ')}.`);
        return;
      }
      await stopMariaDB(p);
    },
  };
}

/** Stops our MariaDB cleanly (it flushes and removes its pid file). */
export async function stopMariaDB(p = mariadbPaths()) {
  const pid = runningPid(p);
  if (!pid) return false;
  log(`Stopping the private MariaDB (pid ${pid}) ...`);
  await run(program('mariadb-admin'), ['--no-defaults', `--socket=${p.socket}`, `-u${osUser}`, 'shutdown'], {
    capture: true,
    check: false,
  });
  const until = Date.now() + 30_000;
  while (pidAlive(pid) && Date.now() < until) await sleep(100);
  if (pidAlive(pid)) {
    process.kill(pid, 'SIGKILL');
    await sleep(200);
  }
  rmSync(p.ownerFile, { force: true });
  return true;
}

const ident = (name) => {
  if (!/^[A-Za-z0-9_]+$/.test(name)) throw new Error(`unsafe database or user name: ${name}`);
  return name;
};
const literal = (s) => `'${String(s).replace(/\\/g, '\\\\').replace(/'/g, "\\'")}'`;

/** Creates the databases (if missing) and the application user with every privilege on them. */
export async function ensureDatabases({ names, user, password }, p = mariadbPaths()) {
  const stmts = [];
  for (const db of names) {
    stmts.push(
      `CREATE DATABASE IF NOT EXISTS \`${ident(db)}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
    );
  }
  for (const host of ['127.0.0.1', 'localhost']) {
    const account = `${literal(ident(user))}@${literal(host)}`;
    stmts.push(`CREATE USER IF NOT EXISTS ${account} IDENTIFIED BY ${literal(password)};`);
    // Keeps the account in step with a password changed in .env.
    stmts.push(`ALTER USER ${account} IDENTIFIED BY ${literal(password)};`);
    for (const db of names) stmts.push(`GRANT ALL PRIVILEGES ON \`${ident(db)}\`.* TO ${account};`);
  }
  await adminSql(stmts.join('\n'), p);
}

/** Drops and recreates one database (the test database: never the development one). */
export async function recreateDatabase(name, p = mariadbPaths()) {
  await adminSql(
    `DROP DATABASE IF EXISTS \`${ident(name)}\`;\n` +
      `CREATE DATABASE \`${ident(name)}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
    p,
  );
}

/**
 * Brings the optimiser's table statistics up to date: ANALYZE TABLE on every base table of `database`,
 * through `runSql` (statements in, the client's batch output out). After a bulk load (a restore, the
 * scale bench's seed) InnoDB counts the changed rows in memory and recalculates some seconds later in
 * the background; a server stopped before that keeps the statistics of empty tables, and with them the
 * optimiser read the lamp log's 25-row page by scanning every lamp (32,100 rows examined, 24–35 ms,
 * instead of about a hundred rows in under a millisecond). Returns the number of tables.
 */
export async function refreshStatistics(database, runSql) {
  const names = (
    await runSql(
      `SELECT TABLE_NAME FROM information_schema.TABLES WHERE TABLE_SCHEMA = ${literal(database)} AND TABLE_TYPE = 'BASE TABLE';`,
    )
  )
    .split('\n')
    .map((n) => n.trim())
    .filter(Boolean);
  if (names.length) {
    await runSql(`ANALYZE TABLE ${names.map((n) => `\`${ident(database)}\`.\`${ident(n)}\``).join(', ')};`);
  }
  return names.length;
}
