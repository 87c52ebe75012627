import { allow, created, ownedRoute } from '@/lib/api';
import { createShareBody, listQuery } from '@/lib/variants/schemas';
import { listShares } from '@/lib/variants/queries';
import { createShare } from '@/lib/variants/mutations';

/** The variant's share links (active, expired and revoked). Tokens are not stored, so none is listed. */
export const GET = ownedRoute('variant', 'read', {
  query: listQuery,
  handler: async ({ thing: variant, query, user }) => {
    const { organisationId, keeperId } = variant.design.enclosure;
    allow(user, 'read', { kind: 'share', organisationId, keeperId }, 'The variant');
    return listShares(variant, query);
  },
});

/** A new read-only link; the answer carries the token and URL this one time. */
export const POST = ownedRoute('variant', 'read', {
  body: createShareBody,
  handler: async ({ thing: variant, body, user }) => {
    // Sharing is its own permission: seeing a variant is not enough to hand it to others.
    const { organisationId, keeperId } = variant.design.enclosure;
    allow(user, 'create', { kind: 'share', organisationId, keeperId }, 'The variant');
    return created({ share: await createShare(user, variant, body) });
  },
});
