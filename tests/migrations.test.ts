import { createHash } from 'node:crypto';
import { QueryTypes, type ModelAttributeColumnOptions } from 'sequelize';
import { afterAll, describe, expect, it } from 'vitest';
import { migrateUp, migrator } from '@/lib/migrate';
import { migrations } from '@/migrations';
import '@/models';
import { closeDatabase, forgetSchema, resetDatabase, testDb } from '@/tests/helpers/db';

async function tables(): Promise<string[]> {
  const rows = await testDb().query<{ name: string }>(
    `SELECT TABLE_NAME AS name FROM information_schema.TABLES
      WHERE TABLE_SCHEMA = DATABASE() AND TABLE_TYPE = 'BASE TABLE' ORDER BY TABLE_NAME`,
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.name);
}

// Migrations that have run on real databases must build the same schema on a new one, whatever is
// refactored around them (the shared column sets in migrations/columns.ts are frozen for this reason).
// The fixture records the schema after each migration as a hash and the final schema in full, so an edit
// that changes what an old migration builds fails here and names the first migration whose result moved.
// A new migration adds a line and changes the full schema: delete the fixture, run
// `npm test -- tests/migrations.test` to write it again, and read the diff.
const FIXTURE = './fixtures/migrated-schema.txt';

// Tables no model reads or writes: counts kept by triggers in the database. (The migration ledger has
// the model umzug defines for it.)
const WITHOUT_MODEL = ['lamp_outlook_counts'];
// Columns the database keeps itself, read only by raw SQL: generated sort keys and a trigger's flag.
const DATABASE_KEPT = [
  'enclosures.name_key',
  'lamps.outlook_pending',
  'lamp_outlooks.due_last',
  'lamp_outlooks.last_reading_last',
  'lamp_outlooks.remaining_last',
];

type ColumnRow = {
  tbl: string;
  col: string;
  type: string;
  nullable: string;
  dflt: string | null;
  extra: string;
};

async function select<T extends object>(sql: string): Promise<T[]> {
  return testDb().query<T>(sql, { type: QueryTypes.SELECT });
}

async function columns(): Promise<ColumnRow[]> {
  return select<ColumnRow>(
    `SELECT TABLE_NAME tbl, COLUMN_NAME col, COLUMN_TYPE type, IS_NULLABLE nullable,
            COLUMN_DEFAULT dflt, EXTRA extra
       FROM information_schema.COLUMNS WHERE TABLE_SCHEMA = DATABASE()
      ORDER BY TABLE_NAME, ORDINAL_POSITION`,
  );
}

/** The schema as text: columns in order, indexes, foreign keys with their rules, and triggers. */
async function describeSchema(): Promise<string> {
  const lines = (await columns()).map(
    (c) =>
      `column ${c.tbl}.${c.col} ${c.type}${c.nullable === 'NO' ? ' not null' : ''}` +
      `${c.dflt === null ? '' : ` default ${c.dflt}`}${c.extra ? ` ${c.extra}` : ''}`,
  );
  const indexes = await select<{ line: string }>(
    `SELECT CONCAT('index ', TABLE_NAME, '.', INDEX_NAME, IF(NON_UNIQUE = 0, ' unique', ''), ' (',
                   GROUP_CONCAT(COLUMN_NAME, IF(COLLATION = 'D', ' DESC', '') ORDER BY SEQ_IN_INDEX SEPARATOR ', '), ')') line
       FROM information_schema.STATISTICS WHERE TABLE_SCHEMA = DATABASE()
      GROUP BY TABLE_NAME, INDEX_NAME, NON_UNIQUE ORDER BY TABLE_NAME, INDEX_NAME`,
  );
  const keys = await select<{ line: string }>(
    `SELECT CONCAT('foreign key ', k.TABLE_NAME, '.', k.COLUMN_NAME, ' -> ', k.REFERENCED_TABLE_NAME, '.',
                   k.REFERENCED_COLUMN_NAME, ' on delete ', r.DELETE_RULE, ' on update ', r.UPDATE_RULE) line
       FROM information_schema.KEY_COLUMN_USAGE k
       JOIN information_schema.REFERENTIAL_CONSTRAINTS r
         ON r.CONSTRAINT_SCHEMA = k.TABLE_SCHEMA AND r.CONSTRAINT_NAME = k.CONSTRAINT_NAME
        AND r.TABLE_NAME = k.TABLE_NAME
      WHERE k.TABLE_SCHEMA = DATABASE() ORDER BY line`,
  );
  const triggers = await select<{ line: string }>(
    `SELECT CONCAT('trigger ', TRIGGER_NAME, ' ', ACTION_TIMING, ' ', EVENT_MANIPULATION, ' ON ',
                   EVENT_OBJECT_TABLE, ': ', ACTION_STATEMENT) line
       FROM information_schema.TRIGGERS WHERE TRIGGER_SCHEMA = DATABASE() ORDER BY TRIGGER_NAME`,
  );
  return [...lines, ...[...indexes, ...keys, ...triggers].map((r) => r.line)].join('\n') + '\n';
}

const hash = (text: string) => createHash('sha256').update(text).digest('hex').slice(0, 16);

/** A model's column type as MariaDB reports it (display widths and spacing aside). */
function sqlType(definition: ModelAttributeColumnOptions): string {
  const type = definition.type as { toSql(options: object): string } | string;
  const escape = (value: string) => testDb().escape(value);
  return normalise(typeof type === 'string' ? type : type.toSql({ escape }));
}
function normalise(type: string): string {
  return type
    .toLowerCase()
    .replace(/^integer/, 'int')
    .replace(/^(tinyint|smallint|int|bigint)\((?!1\))\d+\)/, '$1')
    .replace(/,\s+/g, ',')
    .replace(/^double precision/, 'double');
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

describe('migrated schema', () => {
  it('is the same, migration by migration, as the one recorded', async () => {
    const umzug = migrator(testDb());
    await umzug.down({ to: 0 });
    const steps: string[] = [];
    for (const m of migrations) {
      await umzug.up({ to: m.name });
      steps.push(`${m.name} ${hash(await describeSchema())}`);
    }
    const text = `# schema after each migration (hash)\n${steps.join('\n')}\n\n# schema after all\n${await describeSchema()}`;
    await expect(text).toMatchFileSnapshot(FIXTURE);
    // Every migration up, one at a time, with the schema read after each: slow on a busy shared machine.
  }, 180_000);

  it('has a table for every model, with the model’s columns, types and nullability', async () => {
    await migrateUp(testDb());
    const actual = new Map<string, Map<string, ColumnRow>>();
    for (const c of await columns()) {
      if (!actual.has(c.tbl)) actual.set(c.tbl, new Map());
      actual.get(c.tbl)!.set(c.col, c);
    }
    const modelled = new Set<string>();
    const differences: string[] = [];
    for (const model of Object.values(testDb().models)) {
      const table = model.getTableName() as string;
      modelled.add(table);
      const found = actual.get(table) ?? new Map<string, ColumnRow>();
      const listed = new Set<string>();
      for (const a of Object.values(model.getAttributes())) {
        const column = a.field ?? '';
        listed.add(column);
        // Only a column built nullable() may hold null; the timestamps Sequelize writes are NOT NULL.
        const want = `${sqlType(a)}${a.allowNull === true ? '' : ' not null'}`;
        const c = found.get(column);
        const got = c ? `${normalise(c.type)}${c.nullable === 'YES' ? '' : ' not null'}` : 'missing';
        if (got !== want) differences.push(`${table}.${column}: model ${want}, migrated ${got}`);
      }
      for (const column of found.keys()) {
        if (!listed.has(column) && !DATABASE_KEPT.includes(`${table}.${column}`))
          differences.push(`${table}.${column}: migrated, not in model ${model.name}`);
      }
    }
    expect(differences).toEqual([]);
    expect([...actual.keys()].filter((t) => !modelled.has(t)).sort()).toEqual(WITHOUT_MODEL);
  });
});
