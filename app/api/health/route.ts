import { route } from '@/lib/api';
import { getSequelize } from '@/lib/db';

/**
 * Liveness and readiness for a load balancer (and the cheapest route for `npm run load`): `{ ok: true }`
 * once the database answers; 503 with Retry-After when it does not (the pipeline maps the driver's
 * connection errors). Says nothing else about the server.
 */
export const GET = route({
  auth: false,
  handler: async () => {
    await getSequelize().query('SELECT 1');
    return { ok: true };
  },
});
