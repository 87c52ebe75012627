import 'server-only';
import { QueryTypes, type Sequelize } from 'sequelize';

/**
 * What makes an acknowledged save survive a crash of the database server: InnoDB tables (crash-safe
 * through its redo log; MyISAM and MEMORY are not) and `innodb_flush_log_at_trx_commit = 1`, which writes
 * and syncs the redo log at every commit (MariaDB documents 0 and 2 as losing up to about a second of
 * committed transactions on a crash). The doublewrite buffer keeps pages from being half-written.
 */
export async function durabilityProblems(sequelize: Sequelize): Promise<string[]> {
  const [settings] = await sequelize.query<{ flush: string | number; doublewrite: string | number }>(
    'SELECT @@GLOBAL.innodb_flush_log_at_trx_commit AS flush, @@GLOBAL.innodb_doublewrite AS doublewrite',
    { type: QueryTypes.SELECT },
  );
  const problems: string[] = [];
  if (Number(settings?.flush) !== 1) {
    problems.push(
      `innodb_flush_log_at_trx_commit is ${settings?.flush}, not 1: a crash of the database server can lose ` +
        'saves it already acknowledged (start mariadbd with --innodb-flush-log-at-trx-commit=1)',
    );
  }
  if (Number(settings?.doublewrite) === 0) {
    problems.push('innodb_doublewrite is off: a crash mid-write can leave torn pages (turn it on)');
  }
  const others = await sequelize.query<{ name: string; engine: string | null }>(
    `SELECT TABLE_NAME AS name, ENGINE AS engine FROM information_schema.TABLES
      WHERE TABLE_SCHEMA = DATABASE() AND TABLE_TYPE = 'BASE TABLE' AND (ENGINE IS NULL OR ENGINE <> 'InnoDB')
      ORDER BY TABLE_NAME`,
    { type: QueryTypes.SELECT },
  );
  for (const t of others) {
    problems.push(
      `table ${t.name} uses ${t.engine ?? 'no'} engine, not InnoDB: it is not crash-safe ` +
        `(ALTER TABLE \`${t.name}\` ENGINE=InnoDB)`,
    );
  }
  return problems;
}

/** Set to 1 to start anyway on a database that can lose acknowledged saves (a loud warning instead). */
export const ALLOW_NON_DURABLE = 'BASKWELL_ALLOW_NON_DURABLE_DB';

/**
 * Refuses (throws) when the database can lose acknowledged saves, unless ALLOW_NON_DURABLE is set, in
 * which case every problem is printed as a warning. Returns the problems found.
 */
export async function assertDurable(sequelize: Sequelize, warn = console.warn): Promise<string[]> {
  const problems = await durabilityProblems(sequelize);
  if (problems.length === 0) return problems;
  const list = problems.map((p) => `  - ${p}`).join('\n');
  if (process.env[ALLOW_NON_DURABLE] === '1') {
    warn(`WARNING: the database is not crash-safe; starting anyway because ${ALLOW_NON_DURABLE}=1:\n${list}`);
    return problems;
  }
  throw new Error(
    `the database is not crash-safe, refusing to start:\n${list}\n` +
      `(set ${ALLOW_NON_DURABLE}=1 to start anyway and accept losing saves in a crash)`,
  );
}
