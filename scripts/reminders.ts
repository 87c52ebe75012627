// `npm run reminders`: one pass of the lamp reminder job (the app server also runs it every hour).
// Uses the same configuration as the app (.env / environment); prints what it did.
import { existsSync } from 'node:fs';
import { closeSequelize } from '@/lib/db';
import { runReminders } from '@/lib/reminders/run';

// Like the app: .env fills in what the environment does not set.
if (existsSync('.env')) process.loadEnvFile('.env');

try {
  const r = await runReminders();
  console.log(`reminders: ${r.due} due, ${r.queued} e-mails queued, ${r.sent} sent, ${r.failed} failed`);
  process.exitCode = r.failed > 0 ? 1 : 0;
} catch (e) {
  console.error(`reminders failed: ${e instanceof Error ? e.message : String(e)}`);
  process.exitCode = 1;
} finally {
  await closeSequelize();
}
