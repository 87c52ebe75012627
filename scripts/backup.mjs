#!/usr/bin/env node
// `npm run backup`: a consistent SQL dump of one database into .data/backups/<db>-<timestamp>.sql
// (or .sql.gz with --gzip; BACKUP_DIR or --dir choose another folder). Prints the file's path on stdout; progress goes to stderr.
//
//   npm run backup                              the development database (DB_NAME)
//   npm run backup -- --database baskwell_test  another database
//   npm run backup -- --gzip --dir /some/where  compressed, elsewhere
//
// The private MariaDB is reached as its administrator over its own socket (as scripts/lib/mariadb.mjs
// does), so routines and triggers are readable; an external server (DB_HOST not local) with DB_USER and
// DB_PASSWORD. --single-transaction reads every InnoDB table at one instant without locking the app out.
import { spawn } from 'node:child_process';
import { createWriteStream, mkdirSync, renameSync, rmSync, statSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import { pathToFileURL } from 'node:url';
import { createGzip } from 'node:zlib';
import { DATA_DIR, loadEnv, usesPrivateDb } from './lib/env.mjs';
import { mariadbPaths } from './lib/mariadb.mjs';
import { findProgram } from './lib/packages.mjs';

/** Where backups go: BACKUP_DIR from the environment, else .data/backups (ignored by git). */
export const backupDir = (env = process.env) =>
  env.BACKUP_DIR ? path.resolve(env.BACKUP_DIR) : path.join(DATA_DIR, 'backups');

/** Database names we accept on the command line: they end up in SQL and in file names. */
export function checkDatabaseName(name) {
  if (typeof name !== 'string' || !/^[A-Za-z0-9_]{1,64}$/.test(name)) {
    throw new Error(`"${name}" is not a database name (letters, digits and _ only)`);
  }
  return name;
}

export function program(name) {
  const p = findProgram(name);
  if (!p) throw new Error(`${name} not found: install mariadb-client (or run npm start once)`);
  return p;
}

/**
 * How the MariaDB client programs reach the server: arguments and environment.
 * Private instance: the OS user over our socket (unix-socket authentication, full rights).
 * External server: host, port and the application account (password through MYSQL_PWD, not argv).
 */
export function connection(env = process.env) {
  if (usesPrivateDb(env)) {
    const { socket } = mariadbPaths();
    return {
      args: ['--no-defaults', `--socket=${socket}`, `-u${os.userInfo().username}`],
      env: { ...process.env },
      where: `private MariaDB (${socket})`,
    };
  }
  return {
    args: [
      '--no-defaults',
      `--host=${env.DB_HOST}`,
      `--port=${env.DB_PORT}`,
      '--protocol=TCP',
      `--user=${env.DB_USER}`,
    ],
    env: { ...process.env, MYSQL_PWD: env.DB_PASSWORD ?? '' },
    where: `${env.DB_HOST}:${env.DB_PORT}`,
  };
}

/** Runs the mariadb client with `sql` on stdin; resolves its stdout (tab-separated, no headers). */
export function sql(statements, { database, env = process.env } = {}) {
  const c = connection(env);
  const args = [...c.args, '--batch', '--skip-column-names', ...(database ? [database] : [])];
  return new Promise((resolve, reject) => {
    const child = spawn(program('mariadb'), args, { env: c.env, stdio: ['pipe', 'pipe', 'pipe'] });
    let out = '';
    let err = '';
    child.stdout.on('data', (d) => (out += d));
    child.stderr.on('data', (d) => (err += d));
    child.on('error', reject);
    child.on('close', (code) =>
      code === 0 ? resolve(out) : reject(new Error(`mariadb exited with ${code}: ${err.trim()}`)),
    );
    child.stdin.end(statements);
  });
}

/** 2025-03-04T05-06-07-089Z: sortable, safe in file names, unique enough for one machine. */
export function timestamp(d = new Date()) {
  return d.toISOString().replace(/[:.]/g, '-');
}

/**
 * Dumps `database` into `dir`. Writes to a ".partial" file first and renames it only when mariadb-dump
 * succeeded and the dump ends with its completion marker, so a failed run never leaves something that
 * looks like a backup. Resolves { file, bytes, ms }.
 */
export async function backup({ database, dir, gzip = false, env = process.env } = {}) {
  dir ??= backupDir(env);
  checkDatabaseName(database);
  mkdirSync(dir, { recursive: true, mode: 0o700 });
  const file = path.join(dir, `${database}-${timestamp()}.sql${gzip ? '.gz' : ''}`);
  const partial = `${file}.partial`;
  const c = connection(env);
  const t0 = Date.now();
  const args = [
    ...c.args,
    '--single-transaction',
    '--routines',
    '--triggers',
    '--events',
    '--hex-blob',
    '--default-character-set=utf8mb4',
    // The dump restores into whatever database the restore names, so it carries no CREATE DATABASE/USE.
    '--no-create-db',
    database,
  ];
  const child = spawn(program('mariadb-dump'), args, { env: c.env, stdio: ['ignore', 'pipe', 'pipe'] });
  let stderr = '';
  child.stderr.on('data', (d) => (stderr += d));
  const exited = new Promise((resolve, reject) => {
    child.on('error', reject);
    child.on('close', (code, signal) => resolve(signal ?? code));
  });
  // The tail of the dump, to check mariadb-dump's "-- Dump completed" line.
  let tail = '';
  child.stdout.on('data', (d) => (tail = (tail + d.toString('latin1')).slice(-200)));
  const out = createWriteStream(partial, { mode: 0o600 });
  try {
    await pipeline(gzip ? [child.stdout, createGzip(), out] : [child.stdout, out]);
    const code = await exited;
    if (code !== 0) throw new Error(`mariadb-dump exited with ${code}: ${stderr.trim()}`);
    if (!/-- Dump completed/.test(tail)) throw new Error('the dump is incomplete (no completion marker)');
    renameSync(partial, file);
  } catch (e) {
    rmSync(partial, { force: true });
    throw e;
  }
  return { file, bytes: statSync(file).size, ms: Date.now() - t0 };
}

function parseArgs(argv, env) {
  const opts = { database: env.DB_NAME, dir: backupDir(env), gzip: false };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    const value = () => {
      const v = a.includes('=') ? a.slice(a.indexOf('=') + 1) : argv[++i];
      if (!v) throw new Error(`${a} needs a value`);
      return v;
    };
    if (a === '--gzip') opts.gzip = true;
    else if (a.startsWith('--database')) opts.database = value();
    else if (a.startsWith('--dir')) opts.dir = path.resolve(value());
    else if (a === '--help' || a === '-h') opts.help = true;
    else throw new Error(`unknown argument ${a} (--database NAME, --dir DIR, --gzip)`);
  }
  return opts;
}

async function main() {
  const env = loadEnv();
  const opts = parseArgs(process.argv.slice(2), env);
  if (opts.help) {
    console.log('npm run backup -- [--database NAME] [--dir DIR] [--gzip]');
    return;
  }
  console.error(`Backing up ${opts.database} from the ${connection(env).where} ...`);
  const r = await backup({ database: opts.database, dir: opts.dir, gzip: opts.gzip, env });
  console.error(`Wrote ${(r.bytes / 1024).toFixed(1)} KiB in ${(r.ms / 1000).toFixed(1)} s.`);
  console.log(r.file);
}

if (process.argv[1] && pathToFileURL(path.resolve(process.argv[1])).href === import.meta.url) {
  main().catch((e) => {
    console.error(`backup failed: ${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  });
}
