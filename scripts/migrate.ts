// Applies pending migrations to the database named by DB_NAME; `--down` reverts the last one.
// Then gives every organisation without the starting catalogue its copy (lib/species/seed.ts), and
// refuses (exit 1) when the database could lose acknowledged saves in a crash (lib/db-durability.ts):
// `npm start` and `npm test` run this before anything else touches the database.
import { assertDurable } from '@/lib/db-durability';
import { closeSequelize, getSequelize } from '@/lib/db';
import { migrateUp, migrator } from '@/lib/migrate';
import { seedMissingCatalogues } from '@/lib/species/seed';

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
  // Pages only read the starting catalogue; an organisation made before every creation path seeded it
  // (or made by a script) gets it here.
  const seeded = await seedMissingCatalogues();
  if (seeded > 0)
    console.log(`Added the starting catalogue to ${seeded} organisation${seeded === 1 ? '' : 's'}.`);
  const problems = await assertDurable(sequelize);
  if (problems.length === 0) console.log('Database is crash-safe (InnoDB, redo log synced at each commit).');
}

main()
  .catch((e: unknown) => {
    console.error(e instanceof Error ? (e.stack ?? e.message) : e);
    process.exitCode = 1;
  })
  .finally(() => closeSequelize());
