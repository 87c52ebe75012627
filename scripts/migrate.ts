// Applies pending migrations to the database named by DB_NAME; `--down` reverts the last one.
import { closeSequelize, getSequelize } from '@/lib/db';
import { migrateUp, migrator } from '@/lib/migrate';

async function main() {
  const sequelize = getSequelize();
  if (process.argv.includes('--down')) {
    const reverted = await migrator(sequelize).down();
    console.log(
      reverted.length ? `Reverted ${reverted.map((m) => m.name).join(', ')}.` : 'Nothing to revert.',
    );
    return;
  }
  const applied = await migrateUp(sequelize);
  console.log(applied.length ? `Applied ${applied.join(', ')}.` : 'Database schema is up to date.');
}

main()
  .catch((e: unknown) => {
    console.error(e instanceof Error ? (e.stack ?? e.message) : e);
    process.exitCode = 1;
  })
  .finally(() => closeSequelize());
