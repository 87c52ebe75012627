#!/usr/bin/env node
// `npm run restore -- <file> [--database NAME] [--force] [--grant]`: loads a dump made by
// `npm run backup` (.sql or .sql.gz) into a database, DB_NAME by default.
//
// A database that already holds tables is never overwritten unless --force; even then its current
// content is first saved with `npm run backup` (the path is printed), then the database is dropped and
// created anew so no table of the old content survives beside the restored ones.
// --grant gives the application account (DB_USER) every privilege on the database, for a database the
// app is to use that `npm start` did not create.
import { spawn } from 'node:child_process';
import { createReadStream, existsSync, openSync, readSync, closeSync } from 'node:fs';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import { pathToFileURL } from 'node:url';
import { createGunzip } from 'node:zlib';
import { loadEnv } from './lib/env.mjs';
import { refreshStatistics } from './lib/mariadb.mjs';
import { backup, checkDatabaseName, connection, program, sql } from './backup.mjs';

const literal = (s) => `'${String(s).replace(/\\/g, '\\\\').replace(/'/g, "\\'")}'`;

function isGzip(file) {
  const fd = openSync(file, 'r');
  try {
    const head = Buffer.alloc(2);
    readSync(fd, head, 0, 2, 0);
    return head[0] === 0x1f && head[1] === 0x8b;
  } finally {
    closeSync(fd);
  }
}

/** Number of tables (and views) in `database`; null when it does not exist. */
export async function tableCount(database, env = process.env) {
  const out = await sql(
    `SELECT COUNT(*) FROM information_schema.SCHEMATA WHERE SCHEMA_NAME = ${literal(database)};\n` +
      `SELECT COUNT(*) FROM information_schema.TABLES WHERE TABLE_SCHEMA = ${literal(database)};`,
    { env },
  );
  const [exists, tables] = out.trim().split('\n').map(Number);
  return exists ? tables : null;
}

/**
 * Restores `file` into `database`. Refuses (throws) when the database holds tables and `force` is not
 * set. Resolves { tables, safetyBackup, ms }.
 */
export async function restore({ file, database, force = false, grant = false, env = process.env }) {
  checkDatabaseName(database);
  if (!existsSync(file)) throw new Error(`${file} does not exist`);
  const t0 = Date.now();
  const before = await tableCount(database, env);
  let safetyBackup = null;
  if (before) {
    if (!force) {
      throw new Error(
        `database ${database} is not empty (${before} tables): restore into another --database, ` +
          'or add --force to replace it (its current content is backed up first)',
      );
    }
    safetyBackup = (await backup({ database, env })).file;
    console.error(`Saved the current content of ${database} to ${safetyBackup}`);
  }
  const id = `\`${database}\``;
  await sql(
    (before !== null && force ? `DROP DATABASE ${id};\n` : '') +
      `CREATE DATABASE IF NOT EXISTS ${id} CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;`,
    { env },
  );
  if (grant) {
    for (const host of ['127.0.0.1', 'localhost']) {
      await sql(`GRANT ALL PRIVILEGES ON ${id}.* TO ${literal(env.DB_USER)}@${literal(host)};`, { env });
    }
  }

  const c = connection(env);
  const child = spawn(
    program('mariadb'),
    [...c.args, '--default-character-set=utf8mb4', '--binary-mode', database],
    { env: c.env, stdio: ['pipe', 'ignore', 'pipe'] },
  );
  let stderr = '';
  child.stderr.on('data', (d) => (stderr += d));
  const exited = new Promise((resolve, reject) => {
    child.on('error', reject);
    child.on('close', (code, signal) => resolve(signal ?? code));
  });
  const input = createReadStream(file);
  try {
    await pipeline(isGzip(file) ? [input, createGunzip(), child.stdin] : [input, child.stdin]);
  } catch (e) {
    // The client quitting early (an SQL error) closes its stdin: its own message says more.
    child.kill();
    const code = await exited;
    throw new Error(`restore failed (mariadb ${code}): ${stderr.trim() || e.message}`);
  }
  const code = await exited;
  if (code !== 0) throw new Error(`restore failed (mariadb exited with ${code}): ${stderr.trim()}`);
  // The load leaves InnoDB's statistics of the empty tables until its background recount, which a
  // restart soon after would lose: the lists' query plans need the real sizes.
  await refreshStatistics(database, (s) => sql(s, { env }));
  return { tables: await tableCount(database, env), safetyBackup, ms: Date.now() - t0 };
}

function parseArgs(argv, env) {
  const opts = { file: null, database: env.DB_NAME, force: false, grant: false };
  for (let i = 0; i < argv.length; i++) {
    const a = argv[i];
    if (a === '--force') opts.force = true;
    else if (a === '--grant') opts.grant = true;
    else if (a === '--database' || a.startsWith('--database=')) {
      opts.database = a.includes('=') ? a.slice(a.indexOf('=') + 1) : argv[++i];
      if (!opts.database) throw new Error('--database needs a name');
    } else if (a === '--help' || a === '-h') opts.help = true;
    else if (a.startsWith('-')) throw new Error(`unknown option ${a} (--database NAME, --force, --grant)`);
    else if (opts.file) throw new Error(`one file at a time (got ${opts.file} and ${a})`);
    else opts.file = path.resolve(a);
  }
  return opts;
}

async function main() {
  const env = loadEnv();
  const opts = parseArgs(process.argv.slice(2), env);
  if (opts.help || !opts.file) {
    console.log('npm run restore -- <file.sql|file.sql.gz> [--database NAME] [--force] [--grant]');
    if (!opts.help) process.exitCode = 2;
    return;
  }
  console.error(`Restoring ${opts.file} into ${opts.database} on the ${connection(env).where} ...`);
  const r = await restore({ ...opts, env });
  console.error(`Restored ${r.tables} tables in ${(r.ms / 1000).toFixed(1)} s.`);
  console.log(opts.database);
}

if (process.argv[1] && pathToFileURL(path.resolve(process.argv[1])).href === import.meta.url) {
  main().catch((e) => {
    console.error(`restore refused or failed: ${e instanceof Error ? e.message : String(e)}`);
    process.exit(1);
  });
}
