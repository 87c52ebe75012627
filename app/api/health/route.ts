import { route } from '@/lib/api';
import { getSequelize } from '@/lib/db';
import { jobsHealth } from '@/lib/jobs/health';

/**
 * Liveness and readiness for a load balancer (and the cheapest route for `npm run load`), and a glance
 * for whoever watches the background jobs: `{ ok: true, database: 'up', jobs: [...] }` once the database
 * answers, with each job's last start, that run's outcome and its last successful run. 503 with
 * Retry-After when the database does not answer (the pipeline maps the driver's connection errors).
 * No organisation's data: only times and outcomes of jobs that serve everyone.
 */
export const GET = route({
  auth: false,
  handler: async () => {
    await getSequelize().query('SELECT 1');
    return { ok: true, database: 'up', jobs: await jobsHealth() };
  },
});
