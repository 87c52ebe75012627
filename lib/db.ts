import 'server-only';
import mariadb from 'mariadb';
import { type BindOrReplacements, QueryTypes, Sequelize } from 'sequelize';
import { config } from './config';
import { initModels } from '@/models/register';

type Holder = { sequelize?: Sequelize };
const holder = globalThis as unknown as { __baskwellDb?: Holder };

/** A new instance (it connects only when first used) with every model registered on it. */
function open(): Sequelize {
  const c = config();
  const sequelize = new Sequelize(c.DB_NAME, c.DB_USER, c.DB_PASSWORD, {
    host: c.DB_HOST,
    port: c.DB_PORT,
    dialect: 'mariadb',
    dialectModule: mariadb,
    // Skip Sequelize's first-connection version query: it bypasses the pool's acquire timeout, so a
    // server that accepts connections but never answers would hang requests instead of giving a 503.
    ...({ databaseVersion: '10.11.0' } as object), // honoured by Sequelize 6 but missing from its types
    logging: false,
    pool: { max: 10, min: 0, idle: 10_000, acquire: 3_000 },
    dialectOptions: { connectTimeout: 3_000, timezone: 'Z' },
    timezone: '+00:00',
    define: { underscored: true },
  });
  initModels(sequelize);
  (holder.__baskwellDb ??= {}).sequelize = sequelize;
  return sequelize;
}

/**
 * The one Sequelize instance of this process, for transactions and raw queries. Kept on globalThis so
 * `next dev` reloads reuse the pool. Nobody needs to call this to make the models work: they are
 * registered when this module loads (below), and `@/models` loads this module.
 */
export function getSequelize(): Sequelize {
  return holder.__baskwellDb?.sequelize ?? open();
}

/**
 * The rows of a SELECT the app writes as SQL (`:name` replacements, arrays expanded for `IN (:ids)`),
 * through Sequelize like every other read, so the tests that count and EXPLAIN a page's queries see
 * exactly what production sends.
 */
export function selectRows<T extends object>(
  sql: string,
  replacements: Record<string, unknown> = {},
): Promise<T[]> {
  return getSequelize().query<T>(sql, {
    replacements: replacements as BindOrReplacements,
    type: QueryTypes.SELECT,
  });
}

/**
 * Closes the pool. The models move at once to a fresh instance, which opens no connection until it is
 * used: a test worker runs the next file on the same loaded modules after the last one closed the pool,
 * and its models must still work.
 */
export async function closeSequelize(): Promise<void> {
  const closing = holder.__baskwellDb?.sequelize;
  if (!closing) return;
  open();
  await closing.close();
}

// Register the models as this module loads: on the instance a `next dev` reload kept (edited model files
// take effect), or on a new one.
initModels(getSequelize());
