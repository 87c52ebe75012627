import { allow, ownedRoute } from '@/lib/api';
import { applyCalibrationTo } from '@/lib/lamp-log/mutations';
import { calibrationProposal } from '@/lib/lamp-log/queries';
import { calibrationBody } from '@/lib/lamp-log/schemas';

/** What calibrating this lamp would change in each variant that has its design lamp. */
export const GET = ownedRoute('lamp', 'read', {
  handler: async ({ thing: lamp }) => {
    return calibrationProposal(lamp);
  },
});

/** Applies the proposal to one variant (its version goes up by one; 409 if it moved on meanwhile). */
export const POST = ownedRoute('lamp', 'read', {
  body: calibrationBody,
  handler: async ({ thing: lamp, body, user }) => {
    allow(
      user,
      'update',
      { kind: 'variant', organisationId: lamp.enclosure.organisationId, keeperId: lamp.enclosure.keeperId },
      'The lamp',
    );
    return applyCalibrationTo(user, lamp, body.variantId, body.baseVersion);
  },
});
