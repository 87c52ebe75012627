// The start-up check that the database keeps acknowledged saves through a crash (lib/db-durability.ts,
// run by scripts/migrate.ts, which `npm start` and `npm test` run first). The unsafe settings are made on
// a MariaDB of this test's own: SET GLOBAL on the shared test instance would change it for every test.
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import mariadb from 'mariadb';
import { Sequelize } from 'sequelize';
import { ALLOW_NON_DURABLE, assertDurable, durabilityProblems } from '@/lib/db-durability';
import { closeDatabase, testDb } from '../helpers/db';
import { ROOT, TSX, tsxArgs } from '../helpers/tsx';
import { throwawayMariaDB, THROWAWAY_PASSWORD, THROWAWAY_USER, type Throwaway } from './throwaway-mariadb';

let db: Throwaway;
beforeAll(async () => {
  db = await throwawayMariaDB('baskwell_durability_test');
  await db.start();
}, 120_000);
afterAll(async () => {
  await closeDatabase();
  await db?.destroy();
}, 60_000);

/** A connection of this test's own to the throwaway database (the shared one stays on the test database). */
function connect(): Sequelize {
  return new Sequelize(db.database, THROWAWAY_USER, THROWAWAY_PASSWORD, {
    host: '127.0.0.1',
    port: db.port,
    dialect: 'mariadb',
    dialectModule: mariadb,
    logging: false,
  });
}

/** `npx tsx scripts/migrate.ts` as npm start runs it, against the throwaway database. */
async function migrate(extraEnv: Record<string, string> = {}) {
  try {
    const { stdout, stderr } = await promisify(execFile)(TSX, tsxArgs('scripts/migrate.ts'), {
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

  it('finds unsynced commits and a table that is not InnoDB, naming it', { timeout: 60_000 }, async () => {
    const sequelize = connect();
    try {
      expect(await durabilityProblems(sequelize)).toEqual([]);
      await db.sql('SET GLOBAL innodb_flush_log_at_trx_commit = 2');
      await db.sql(`CREATE TABLE \`${db.database}\`.scratch_notes (id INT PRIMARY KEY) ENGINE=MyISAM`);
      const problems = await durabilityProblems(sequelize);
      expect(problems).toHaveLength(2);
      expect(problems[0]).toMatch(/^innodb_flush_log_at_trx_commit is 2, not 1: /);
      expect(problems[1]).toMatch(/^table scratch_notes uses MyISAM engine, not InnoDB/);

      await expect(assertDurable(sequelize)).rejects.toThrow(/not crash-safe, refusing to start/);
      const warnings: string[] = [];
      process.env[ALLOW_NON_DURABLE] = '1';
      try {
        expect(await assertDurable(sequelize, (m: string) => warnings.push(m))).toEqual(problems);
      } finally {
        delete process.env[ALLOW_NON_DURABLE];
      }
      expect(warnings).toHaveLength(1);
      expect(warnings[0]).toContain('WARNING: the database is not crash-safe');
      expect(warnings[0]).toContain('scratch_notes');
    } finally {
      await db.sql('SET GLOBAL innodb_flush_log_at_trx_commit = 1');
      await db.sql(`DROP TABLE IF EXISTS \`${db.database}\`.scratch_notes`);
      await sequelize.close();
    }
  });

  it(
    'makes the start-up migration step (npm start, npm test) refuse such a database',
    { timeout: 180_000 },
    async () => {
      await db.sql('SET GLOBAL innodb_flush_log_at_trx_commit = 0');
      try {
        const refused = await migrate();
        expect(refused.code).toBe(1);
        expect(refused.out).toContain('not crash-safe, refusing to start');
        expect(refused.out).toContain('innodb_flush_log_at_trx_commit is 0, not 1');
      } finally {
        await db.sql('SET GLOBAL innodb_flush_log_at_trx_commit = 1');
      }
    },
  );
});
