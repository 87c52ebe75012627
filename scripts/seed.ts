// Adds the demo scenario to the database named by DB_NAME (idempotent; never deletes anything), then runs
// the lamp reminder job once, so the demo's worn tube has its reminder waiting in the mail viewer (the
// fake SMTP server must be up for it to be delivered now; otherwise the app's own run delivers it).
//   npm run seed                 prints what it created and the demo sign-ins
//   npm run seed -- --json       prints { created, reminders, signIns } as JSON (read by scripts/start.mjs)
import { closeSequelize, getSequelize } from '@/lib/db';
import { DEMO_SIGN_INS } from '@/lib/demo/scenario';
import { seedDemo } from '@/lib/demo/seed';
import { refreshStaleOutlooks } from '@/lib/lamp-log/stored-outlooks';
import { runReminders } from '@/lib/reminders/run';

async function main() {
  const { created } = await seedDemo(getSequelize());
  // The lamp log reads stored outlooks: compute the seeded lamps' now rather than on first view.
  await refreshStaleOutlooks();
  const reminders = await runReminders().catch((e: unknown) => {
    console.error(`Lamp reminders not run: ${e instanceof Error ? e.message : String(e)}`);
    return null;
  });
  if (process.argv.includes('--json')) {
    console.log(JSON.stringify({ created, reminders, signIns: DEMO_SIGN_INS }));
    return;
  }
  if (reminders?.queued || reminders?.sent) {
    console.log(`Lamp reminders: ${reminders.queued} queued, ${reminders.sent} sent.`);
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
