// `npm run backup` and `npm run restore` end to end: the demo scenario (plus a row with awkward text)
// is dumped from the test database and restored into a database of its own, and every table must come
// back with the same rows. Runs the real scripts in child processes, exactly as a person would.
import { execFile } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pathToFileURL } from 'node:url';
import { promisify } from 'node:util';
import mariadb from 'mariadb';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Enclosure, Reading } from '@/models';
import { closeDatabase, resetDatabase, seedDemo, testDb } from '../helpers/db';

const run = promisify(execFile);
const ROOT = path.resolve(import.meta.dirname, '..', '..');
const CHECK_DB = 'baskwell_restore_check';
// Text that breaks naive dumps: quotes, a backslash, a newline, a NUL-free 4-byte emoji, SQL-ish text.
const AWKWARD = `O'Brien "said" \\ back-slash;\nnew line -- not a comment; 🦎 °C µW/cm² ' OR '1'='1`;

type Row = Record<string, unknown>;
let admin: mariadb.Connection;
let work: string;

/** Our MariaDB's socket, found the way the scripts find it (external servers have no socket of ours). */
async function socketPath(): Promise<string> {
  const lib = (await import(pathToFileURL(path.join(ROOT, 'scripts/lib/mariadb.mjs')).href)) as {
    mariadbPaths: () => { socket: string };
  };
  return lib.mariadbPaths().socket;
}

/** Runs a project script with the test's environment; resolves its exit code and output. */
async function script(name: string, args: string[]) {
  try {
    const r = await run(process.execPath, [path.join(ROOT, 'scripts', name), ...args], {
      cwd: ROOT,
      env: { ...process.env, BACKUP_DIR: work },
      timeout: 120_000,
    });
    return { code: 0, stdout: r.stdout, stderr: r.stderr };
  } catch (e) {
    const err = e as { code?: number; stdout?: string; stderr?: string };
    return { code: err.code ?? -1, stdout: err.stdout ?? '', stderr: err.stderr ?? '' };
  }
}

/** Every table's exact row count and checksum, and the routines and triggers, of one database. */
async function snapshot(db: string) {
  const tables = (await admin.query(
    `SELECT TABLE_NAME AS name, TABLE_TYPE AS type FROM information_schema.TABLES
      WHERE TABLE_SCHEMA = ? ORDER BY TABLE_NAME`,
    [db],
  )) as Row[];
  const rows: Record<string, number> = {};
  const checksums: Record<string, string> = {};
  for (const t of tables) {
    const name = String(t.name);
    // information_schema's TABLE_ROWS is an estimate for InnoDB: count exactly.
    const [count] = (await admin.query(`SELECT COUNT(*) AS n FROM \`${db}\`.\`${name}\``)) as Row[];
    rows[name] = Number(count?.n);
    if (t.type === 'BASE TABLE') {
      const [sum] = (await admin.query(`CHECKSUM TABLE \`${db}\`.\`${name}\``)) as Row[];
      checksums[name] = String(sum?.Checksum);
    }
  }
  const [routines] = (await admin.query(
    'SELECT COUNT(*) AS n FROM information_schema.ROUTINES WHERE ROUTINE_SCHEMA = ?',
    [db],
  )) as Row[];
  const [triggers] = (await admin.query(
    'SELECT COUNT(*) AS n FROM information_schema.TRIGGERS WHERE TRIGGER_SCHEMA = ?',
    [db],
  )) as Row[];
  return {
    tables: tables.map((t) => `${String(t.name)} (${String(t.type)})`),
    rows,
    checksums,
    routines: Number(routines?.n),
    triggers: Number(triggers?.n),
  };
}

const dropCheckDatabase = () => admin?.query(`DROP DATABASE IF EXISTS \`${CHECK_DB}\``);

beforeAll(async () => {
  work = mkdtempSync(path.join(os.tmpdir(), 'baskwell-backup-'));
  // The application account may not create databases: the check runs as the administrator, over the
  // private instance's socket, as the scripts do.
  admin = await mariadb.createConnection({
    socketPath: await socketPath(),
    user: os.userInfo().username,
  });
  await dropCheckDatabase();
  await resetDatabase();
  await seedDemo();
  const enclosure = await Enclosure.findOne({ order: [['id', 'ASC']] });
  await enclosure!.update({ notes: AWKWARD });
  // A measured value with more digits than FLOAT keeps: the restore must give it back to the last digit.
  const reading = await Reading.findOne({ order: [['id', 'ASC']] });
  await reading!.update({ value: 0.1234567890123 });
});

afterAll(async () => {
  await dropCheckDatabase();
  await admin?.end();
  rmSync(work, { recursive: true, force: true });
  await closeDatabase();
});

describe('npm run backup / npm run restore', () => {
  it('restores every table of the test database with the same rows', { timeout: 180_000 }, async () => {
    const source = testDb().getDatabaseName();
    const backup = await script('backup.mjs', []);
    expect(backup.stderr).toContain(source);
    expect(backup.code).toBe(0);
    const file = backup.stdout.trim().split('\n').pop()!;
    expect(path.dirname(file)).toBe(work);
    expect(path.basename(file)).toMatch(new RegExp(`^${source}-\\d{4}-\\d\\d-\\d\\dT[\\d-]+Z\\.sql$`));
    const dump = readFileSync(file, 'utf8');
    expect(dump).toMatch(/-- Dump completed/);
    expect(dump).not.toMatch(/^CREATE DATABASE|^USE /m);

    const restored = await script('restore.mjs', [file, '--database', CHECK_DB]);
    expect(restored.stderr).toMatch(/Restored \d+ tables/);
    expect(restored.code).toBe(0);

    const before = await snapshot(source);
    const after = await snapshot(CHECK_DB);
    // The scenario fills many tables; an empty source would prove nothing.
    expect(Object.values(before.rows).filter((n) => n > 0).length).toBeGreaterThanOrEqual(6);
    expect(after.tables).toEqual(before.tables);
    expect(after.rows).toEqual(before.rows);
    expect(after.checksums).toEqual(before.checksums);
    expect(after.routines).toBe(before.routines);
    expect(after.triggers).toBe(before.triggers);
    const [row] = (await admin.query(`SELECT notes FROM \`${CHECK_DB}\`.enclosures WHERE notes = ?`, [
      AWKWARD,
    ])) as Row[];
    expect(row?.notes).toBe(AWKWARD);

    // The optimiser's statistics describe the restored rows, not the empty tables the load created
    // (InnoDB would recount only later in the background, and a restart before that loses the count).
    const stats = (await admin.query(
      `SELECT table_name AS name, n_rows AS n FROM mysql.innodb_table_stats
        WHERE database_name = ? AND table_name IN ('readings', 'lamps', 'enclosures')`,
      [CHECK_DB],
    )) as Row[];
    expect(stats.map((s) => String(s.name)).sort()).toEqual(['enclosures', 'lamps', 'readings']);
    for (const s of stats) {
      expect(before.rows[String(s.name)], String(s.name)).toBeGreaterThan(0);
      expect(Number(s.n), `${String(s.name)}: statistics of the restored rows`).toBeGreaterThan(0);
    }
  });

  it(
    'refuses to restore over a database that holds tables unless --force',
    { timeout: 180_000 },
    async () => {
      const file = readdirSync(work).find((f) => f.endsWith('.sql'));
      expect(file).toBeDefined();
      await admin.query(`UPDATE \`${CHECK_DB}\`.enclosures SET notes = 'changed after the restore'`);

      const refused = await script('restore.mjs', [path.join(work, file!), '--database', CHECK_DB]);
      expect(refused.code).toBe(1);
      expect(refused.stderr).toMatch(/not empty .*--force/);
      const [kept] = (await admin.query(
        `SELECT COUNT(*) AS n FROM \`${CHECK_DB}\`.enclosures WHERE notes = 'changed after the restore'`,
      )) as Row[];
      expect(Number(kept?.n)).toBeGreaterThan(0);

      const forced = await script('restore.mjs', [path.join(work, file!), '--database', CHECK_DB, '--force']);
      expect(forced.code).toBe(0);
      // The replaced content was saved first, next to the other backups.
      const safety = readdirSync(work).filter((f) => f.startsWith(`${CHECK_DB}-`));
      expect(safety).toHaveLength(1);
      expect(readFileSync(path.join(work, safety[0]!), 'utf8')).toContain('changed after the restore');
      const [changed] = (await admin.query(
        `SELECT COUNT(*) AS n FROM \`${CHECK_DB}\`.enclosures WHERE notes = 'changed after the restore'`,
      )) as Row[];
      expect(Number(changed?.n)).toBe(0);
      expect((await snapshot(CHECK_DB)).rows).toEqual((await snapshot(testDb().getDatabaseName())).rows);
    },
  );
});
