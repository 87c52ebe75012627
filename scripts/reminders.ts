// `npm run reminders`: one run of the lamp reminder job now (the job process started by `npm start`
// runs it every hour). Same configuration as the app (.env / environment), the same lock and the same
// record of runs; prints its counts and how long it took.
import { existsSync } from 'node:fs';
import { closeSequelize } from '@/lib/db';
import { runReminders } from '@/lib/reminders/run';

// Like the app: .env fills in what the environment does not set.
if (existsSync('.env')) process.loadEnvFile('.env');
// The run's log lines (JSON) go to standard error at warning level unless asked for; the summary to
// standard output.
process.env.LOG_LEVEL ??= 'warn';
process.env.LOG_TO_STDERR ??= '1';

const t0 = performance.now();
try {
  const r = await runReminders();
  const seconds = ((performance.now() - t0) / 1000).toFixed(1);
  if (r.skipped) {
    console.log('reminders: another run of the reminder job is in progress; nothing done.');
  } else {
    const c = r.counts;
    console.log(
      `reminders: run #${r.runId} ${r.outcome} in ${seconds} s: ${c['lamps checked'] ?? 0} lamps checked, ` +
        `${r.due} due, ${r.queued} e-mails queued, ${r.sent} sent, ${r.failed} not delivered, ` +
        `${c['units failed'] ?? 0} units failed, ${c['units deferred'] ?? 0} waiting to retry`,
    );
  }
  process.exitCode = r.outcome === 'succeeded' || r.skipped ? 0 : 1;
} catch (e) {
  console.error(`reminders failed: ${e instanceof Error ? e.message : String(e)}`);
  process.exitCode = 1;
} finally {
  await closeSequelize();
}
