import { created, json, ownedRoute } from '@/lib/api';
import { counterLampView } from '@/lib/counter/queries';
import { customerNameOf, sendSlip, slipContentOf } from '@/lib/counter/slip';
import { runEngineTask } from '@/lib/engine-pool';
import { download } from '@/lib/reports/build';

/**
 * The test slip of the lamp's latest reading. GET: the one-page PDF for the counter to print or hand on
 * (drawn on an engine thread, as the reports are). POST: the same slip e-mailed to the customer through
 * the outbox, only with the customer's consent and an address; once per reading (a second request
 * answers `queued: false`).
 */
export const GET = ownedRoute('counter-lamp', 'read', {
  handler: async ({ thing: lamp, req }) => {
    const view = await counterLampView(lamp);
    const content = await slipContentOf(view, await customerNameOf(lamp));
    const pdf = await runEngineTask('counterSlipPdf', { content, now: new Date() }, { signal: req.signal });
    return download(new Uint8Array(pdf), 'application/pdf', `lamp-test-${lamp.id}-${content.testedOn}.pdf`);
  },
});

export const POST = ownedRoute('counter-lamp', 'update', {
  handler: async ({ thing: lamp }) => {
    const message = await sendSlip(lamp, await counterLampView(lamp));
    return message ? created({ queued: true, to: message.toEmail }) : json({ queued: false });
  },
});
