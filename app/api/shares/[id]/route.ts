import { ownedRoute } from '@/lib/api';
import { revokeShare } from '@/lib/variants/mutations';

/** Revokes the link: from now on it answers 404. */
export const DELETE = ownedRoute('share', 'delete', {
  handler: async ({ thing: share }) => {
    return { share: await revokeShare(share) };
  },
});
