import { QueryTypes } from 'sequelize';
import { afterAll, describe, expect, it } from 'vitest';
import { migrateUp, migrator } from '@/lib/migrate';
import { migrations } from '@/migrations';
import { closeDatabase, forgetSchema, resetDatabase, testDb } from '@/tests/helpers/db';

async function tables(): Promise<string[]> {
  const rows = await testDb().query<{ name: string }>(
    `SELECT TABLE_NAME AS name FROM information_schema.TABLES
      WHERE TABLE_SCHEMA = DATABASE() AND TABLE_TYPE = 'BASE TABLE' ORDER BY TABLE_NAME`,
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.name);
}

afterAll(async () => {
  // Other test files share this database: leave it migrated and empty.
  forgetSchema();
  await resetDatabase();
  await closeDatabase();
});

describe('migrations', () => {
  it('apply, revert one by one to nothing, and apply again', async () => {
    const sequelize = testDb();
    const umzug = migrator(sequelize);
    await migrateUp(sequelize);
    const full = await tables();
    expect((await umzug.executed()).map((m) => m.name)).toEqual(migrations.map((m) => m.name));
    expect(full).toEqual(expect.arrayContaining(['organisations', 'users', 'memberships', 'enclosures']));

    // Step down one at a time, so every down step runs on the schema its up step left.
    for (let left = migrations.length - 1; left >= 0; left--) {
      await umzug.down();
      expect((await umzug.executed()).map((m) => m.name)).toEqual(
        migrations.slice(0, left).map((m) => m.name),
      );
    }
    expect(await tables()).toEqual(['schema_migrations']);

    const applied = await migrateUp(sequelize);
    expect(applied).toEqual(migrations.map((m) => m.name));
    expect(await tables()).toEqual(full);
    // Every migration up, down and up again: well past the default limit on a busy shared machine.
  }, 180_000);

  it('leave no FLOAT column, so a backup and restore gives back every number exactly', async () => {
    await migrateUp(testDb());
    // mariadb-dump writes FLOAT with six significant digits: a restored value would differ in its last digit.
    const rows = await testDb().query<{ col: string }>(
      `SELECT CONCAT(TABLE_NAME, '.', COLUMN_NAME) AS col FROM information_schema.COLUMNS
        WHERE TABLE_SCHEMA = DATABASE() AND DATA_TYPE = 'float' ORDER BY col`,
      { type: QueryTypes.SELECT },
    );
    expect(rows.map((r) => r.col)).toEqual([]);
  });

  it('have unique names in order', () => {
    const names = migrations.map((m) => m.name);
    expect(new Set(names).size).toBe(names.length);
    expect([...names].sort()).toEqual(names);
  });
});
