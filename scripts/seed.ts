// Adds the demo scenario to the database named by DB_NAME (idempotent; never deletes anything).
//   npm run seed                 prints what it created and the demo sign-ins
//   npm run seed -- --json       prints { created, signIns } as JSON (read by scripts/start.mjs)
import { closeSequelize, getSequelize } from '@/lib/db';
import { DEMO_SIGN_INS } from '@/lib/demo/scenario';
import { seedDemo } from '@/lib/demo/seed';
import { refreshStaleOutlooks } from '@/lib/lamp-log/outlook-store';

async function main() {
  const { created } = await seedDemo(getSequelize());
  // The lamp log reads stored outlooks: compute the seeded lamps' now rather than on first view.
  await refreshStaleOutlooks();
  if (process.argv.includes('--json')) {
    console.log(JSON.stringify({ created, signIns: DEMO_SIGN_INS }));
    return;
  }
  const total = Object.values(created).reduce((a, b) => a + b, 0);
  console.log(
    total === 0
      ? 'Demo scenario already present: nothing added.'
      : `Demo scenario added: ${Object.entries(created)
          .map(([k, v]) => `${v} ${k}`)
          .join(', ')}.`,
  );
  console.log('Demo sign-ins:');
  for (const s of DEMO_SIGN_INS) {
    console.log(`  ${s.organisation.padEnd(26)} ${s.role.padEnd(7)} ${s.email.padEnd(32)} ${s.password}`);
  }
}

main()
  .catch((e: unknown) => {
    console.error(e instanceof Error ? e.message : e);
    process.exitCode = 1;
  })
  .finally(() => closeSequelize());
