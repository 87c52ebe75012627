// The start-up check that the database keeps acknowledged saves through a crash (lib/db-durability.ts,
// run by scripts/migrate.ts, which `npm start` and `npm test` run first). The unsafe settings are made on
// a MariaDB of this test's own: SET GLOBAL on the shared test instance would change it for every test.
import { execFile } from 'node:child_process';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { durabilityProblems } from '@/lib/db-durability';
import { closeDatabase, testDb } from '../helpers/db';
import { throwawayMariaDB, type Throwaway } from './throwaway-mariadb';

const ROOT = path.resolve(import.meta.dirname, '..', '..');
const TSX = path.join(ROOT, 'node_modules', '.bin', 'tsx');

let db: Throwaway;
beforeAll(async () => {
  db = await throwawayMariaDB('baskwell_durability_test');
  await db.start();
}, 120_000);
afterAll(async () => {
  await closeDatabase();
  await db?.destroy();
}, 60_000);

/** `npx tsx scripts/migrate.ts` as npm start runs it, against the throwaway database. */
async function migrate(extraEnv: Record<string, string> = {}) {
  try {
    const { stdout, stderr } = await promisify(execFile)(TSX, ['scripts/migrate.ts'], {
      cwd: ROOT,
      env: { ...db.env(), ...extraEnv },
      timeout: 90_000,
    });
    return { code: 0, out: `${stdout}${stderr}` };
  } catch (e) {
    const err = e as { code?: number; stdout?: string; stderr?: string };
    return { code: err.code ?? -1, out: `${err.stdout ?? ''}${err.stderr ?? ''}` };
  }
}

describe('crash-safety check at start', () => {
  it('finds nothing wrong with the test database npm test starts', async () => {
    expect(await durabilityProblems(testDb())).toEqual([]);
  });

  it('migrates and reports a crash-safe database', { timeout: 120_000 }, async () => {
    const r = await migrate();
    expect(r.out).toContain('Database is crash-safe');
    expect(r.code).toBe(0);
  });

  it(
    'refuses to start when commits are not synced, unless told to accept it (then warns)',
    { timeout: 180_000 },
    async () => {
      await db.sql('SET GLOBAL innodb_flush_log_at_trx_commit = 2');
      try {
        const refused = await migrate();
        expect(refused.code).toBe(1);
        expect(refused.out).toContain('not crash-safe, refusing to start');
        expect(refused.out).toContain('innodb_flush_log_at_trx_commit is 2, not 1');

        const warned = await migrate({ BASKWELL_ALLOW_NON_DURABLE_DB: '1' });
        expect(warned.code).toBe(0);
        expect(warned.out).toMatch(/WARNING: the database is not crash-safe[^\n]*\n\s+- innodb_flush_log/);
      } finally {
        await db.sql('SET GLOBAL innodb_flush_log_at_trx_commit = 1');
      }
    },
  );

  it('refuses a table that is not InnoDB, naming it', { timeout: 120_000 }, async () => {
    await db.sql(`CREATE TABLE \`${db.database}\`.scratch_notes (id INT PRIMARY KEY) ENGINE=MyISAM`);
    try {
      const r = await migrate();
      expect(r.code).toBe(1);
      expect(r.out).toContain('table scratch_notes uses MyISAM engine, not InnoDB');
      expect(r.out).not.toContain('innodb_flush_log_at_trx_commit');
    } finally {
      await db.sql(`DROP TABLE \`${db.database}\`.scratch_notes`);
    }
  });
});
