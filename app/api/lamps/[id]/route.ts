import { route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { lampFor } from '@/lib/lamp-log/access';
import { todayIso } from '@/lib/lamp-log/dates';
import { updateLamp } from '@/lib/lamp-log/mutations';
import { updateLampBody } from '@/lib/lamp-log/schemas';
import { lampDetail } from '@/lib/lamp-log/queries';

/** One lamp with its readings and the chart's data (points at 30 cm, fitted curve and band). */
export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const lamp = await lampFor(user, params.id, 'read');
    return lampDetail(lamp, todayIso());
  },
});

/** Edit or retire (`retiredOn`) a lamp. */
export const PATCH = route({
  params: idParams,
  body: updateLampBody,
  handler: async ({ params, body, user }) => {
    const lamp = await lampFor(user, params.id, 'update');
    await updateLamp(lamp, body);
    return lampDetail(lamp, todayIso());
  },
});

/** Removes the lamp and its readings. Retiring keeps the history; this is for lamps added by mistake. */
export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const lamp = await lampFor(user, params.id, 'delete');
    await lamp.destroy();
    return { ok: true, id: params.id };
  },
});
