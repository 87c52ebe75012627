import { route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { counterLampFor } from '@/lib/customers/access';
import { counterLampView } from '@/lib/counter/queries';

/** A lamp tested at the counter: its customer, every reading, and today's answer from all of them. */
export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => ({
    lamp: await counterLampView(await counterLampFor(user, params.id, 'read')),
  }),
});
