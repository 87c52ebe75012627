// The background job process: `npm start` runs it beside the web server (`npm run jobs` on its own).
// It runs every job of lib/jobs/registry.ts on its interval, with the job's database lock, and records
// each run. A process of its own rather than a timer inside the web server: a job's database work and
// computation (the outlook of thousands of lamps) never holds up the server's event loop, a job that
// crashes or runs out of memory does not take the site down, and the web server needs no job code.
import { existsSync } from 'node:fs';
import { closeSequelize } from '@/lib/db';
import { JOBS } from '@/lib/jobs/registry';
import { startScheduler } from '@/lib/jobs/schedule';
import { logger } from '@/lib/log';

if (existsSync('.env')) process.loadEnvFile('.env');

const log = logger().child({ process: 'jobs' });
const tickSeconds = Number(process.env.JOBS_TICK_SECONDS ?? 60);
const scheduler = startScheduler(JOBS, { tickMs: tickSeconds * 1000, log });
log.info({ jobs: JOBS.map((j) => ({ name: j.name, everyMs: j.everyMs })) }, 'job process started');

let stopping = false;
async function stop(signal: string) {
  if (stopping) process.exit(1); // a second signal: do not wait
  stopping = true;
  log.info({ signal }, 'job process stopping; waiting for running jobs');
  await scheduler.stop();
  await closeSequelize();
  process.exit(0);
}
for (const sig of ['SIGINT', 'SIGTERM', 'SIGHUP'] as const) process.on(sig, () => void stop(sig));
