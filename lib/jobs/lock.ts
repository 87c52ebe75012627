import 'server-only';
import { createHash } from 'node:crypto';
import type { Sequelize } from 'sequelize';

/**
 * A MariaDB named lock (GET_LOCK) held on one connection taken out of the pool for the whole run.
 * Named locks belong to a connection, so the lock is released when the run ends, and also when its
 * process dies or loses the connection — no stale lock to clear by hand. Two app instances (or a
 * scheduled run and `npm run reminders`) therefore never run the same job at once.
 */
type RawConnection = { query: (sql: string, values?: unknown[]) => Promise<Record<string, unknown>[]> };
type Pool = {
  getConnection: (o: { type: 'read' | 'write' }) => Promise<RawConnection>;
  releaseConnection: (c: RawConnection) => Promise<void> | void;
};

/** Lock names are per database, so the development and test databases on one server do not collide. */
export function lockName(database: string, job: string): string {
  const name = `baskwell.${database}.job.${job}`;
  // MariaDB limits lock names to 64 characters.
  return name.length <= 64
    ? name
    : `baskwell.job.${createHash('sha256').update(name).digest('hex').slice(0, 40)}`;
}

/** Runs `fn` holding the lock, or returns `{ locked: true }` at once when someone else holds it. */
export async function withNamedLock<T>(
  sequelize: Sequelize,
  name: string,
  fn: () => Promise<T>,
): Promise<{ locked: false; value: T } | { locked: true }> {
  const pool = sequelize.connectionManager as unknown as Pool;
  const conn = await pool.getConnection({ type: 'write' });
  try {
    const [row] = await conn.query('SELECT GET_LOCK(?, 0) AS got', [name]);
    if (Number(row?.got) !== 1) return { locked: true };
    try {
      return { locked: false, value: await fn() };
    } finally {
      await conn.query('SELECT RELEASE_LOCK(?)', [name]).catch(() => undefined);
    }
  } finally {
    await pool.releaseConnection(conn);
  }
}
