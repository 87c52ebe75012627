import { route } from '@/lib/api';
import { shareFor } from '@/lib/variants/access';
import { idParams } from '@/lib/variants/schemas';
import { revokeShare } from '@/lib/variants/mutations';

/** Revokes the link: from now on it answers 404. */
export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const share = await shareFor(user, params.id, 'delete');
    return { share: await revokeShare(share) };
  },
});
