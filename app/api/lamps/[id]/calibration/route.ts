import { allow, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { lampFor } from '@/lib/lamp-log/access';
import { applyCalibrationTo } from '@/lib/lamp-log/mutations';
import { calibrationProposal } from '@/lib/lamp-log/queries';
import { calibrationBody } from '@/lib/lamp-log/schemas';

/** What calibrating this lamp would change in each variant that has its design lamp. */
export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const lamp = await lampFor(user, params.id, 'read');
    return calibrationProposal(lamp);
  },
});

/** Applies the proposal to one variant (its version goes up by one; 409 if it moved on meanwhile). */
export const POST = route({
  params: idParams,
  body: calibrationBody,
  handler: async ({ params, body, user }) => {
    const lamp = await lampFor(user, params.id, 'read');
    allow(
      user,
      'update',
      { kind: 'variant', organisationId: lamp.enclosure.organisationId, keeperId: lamp.enclosure.keeperId },
      'The lamp',
    );
    return applyCalibrationTo(user, lamp, body.variantId, body.baseVersion);
  },
});
