import { allow, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { jobsOverview } from '@/lib/jobs/overview';

/**
 * `GET /api/organisations/:id/jobs`: the recent background job runs, with this organisation's counts,
 * and its failing units and undelivered e-mail. The owner's only; anyone else gets 404.
 */
export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    allow(user, 'read', { kind: 'jobs', organisationId: params.id }, 'That organisation');
    return jobsOverview(params.id);
  },
});
