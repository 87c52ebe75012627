import 'server-only';
import mariadb from 'mariadb';
import { Sequelize } from 'sequelize';
import { config } from './config';
import { initModels } from '@/models';

type Holder = { sequelize?: Sequelize };
const holder = globalThis as unknown as { __baskwellDb?: Holder };

/**
 * The one Sequelize instance of this process. Kept on globalThis so `next dev` reloads reuse the pool;
 * models are (re)registered idempotently so edited model files take effect after a reload.
 */
export function getSequelize(): Sequelize {
  holder.__baskwellDb ??= {};
  const h = holder.__baskwellDb;
  if (!h.sequelize) {
    const c = config();
    h.sequelize = new Sequelize(c.DB_NAME, c.DB_USER, c.DB_PASSWORD, {
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
  }
  initModels(h.sequelize);
  return h.sequelize;
}

export async function closeSequelize(): Promise<void> {
  const h = holder.__baskwellDb;
  if (h?.sequelize) {
    await h.sequelize.close();
    h.sequelize = undefined;
  }
}
