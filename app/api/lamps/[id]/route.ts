import { ownedRoute } from '@/lib/api';
import { todayIso } from '@/lib/lamp-log/dates';
import { updateLamp } from '@/lib/lamp-log/mutations';
import { updateLampBody } from '@/lib/lamp-log/schemas';
import { lampDetail } from '@/lib/lamp-log/queries';

/** One lamp with its readings and the chart's data (points at 30 cm, fitted curve and band). */
export const GET = ownedRoute('lamp', 'read', {
  handler: async ({ thing: lamp }) => {
    return lampDetail(lamp, todayIso());
  },
});

/** Edit or retire (`retiredOn`) a lamp. */
export const PATCH = ownedRoute('lamp', 'update', {
  body: updateLampBody,
  handler: async ({ thing: lamp, body }) => {
    await updateLamp(lamp, body);
    return lampDetail(lamp, todayIso());
  },
});

/** Removes the lamp and its readings. Retiring keeps the history; this is for lamps added by mistake. */
export const DELETE = ownedRoute('lamp', 'delete', {
  handler: async ({ thing: lamp, params }) => {
    await lamp.destroy();
    return { ok: true, id: params.id };
  },
});
