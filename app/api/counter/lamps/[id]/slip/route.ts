import { created, json, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { counterLampFor } from '@/lib/customers/access';
import { counterLampView } from '@/lib/counter/queries';
import { sendSlip } from '@/lib/counter/slip';

/**
 * E-mails the test slip of the lamp's latest reading to its customer, through the outbox: only with the
 * customer's consent and an address; once per reading (a second request answers `queued: false`).
 */
export const POST = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const lamp = await counterLampFor(user, params.id, 'update');
    const message = await sendSlip(lamp, await counterLampView(lamp));
    return message ? created({ queued: true, to: message.toEmail }) : json({ queued: false });
  },
});
