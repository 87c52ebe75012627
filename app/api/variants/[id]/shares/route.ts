import { allow, created, route } from '@/lib/api';
import { variantFor } from '@/lib/variants/access';
import { createShareBody, idParams, listQuery } from '@/lib/variants/schemas';
import { listShares } from '@/lib/variants/queries';
import { createShare } from '@/lib/variants/mutations';

/** The variant's share links (active, expired and revoked). Tokens are not stored, so none is listed. */
export const GET = route({
  params: idParams,
  query: listQuery,
  handler: async ({ params, query, user }) => {
    const variant = await variantFor(user, params.id, 'read');
    const { organisationId, keeperId } = variant.design.enclosure;
    allow(user, 'read', { kind: 'share', organisationId, keeperId }, 'The variant');
    return listShares(variant, query);
  },
});

/** A new read-only link; the answer carries the token and URL this one time. */
export const POST = route({
  params: idParams,
  body: createShareBody,
  handler: async ({ params, body, user }) => {
    const variant = await variantFor(user, params.id, 'read');
    // Sharing is its own permission: seeing a variant is not enough to hand it to others.
    const { organisationId, keeperId } = variant.design.enclosure;
    allow(user, 'create', { kind: 'share', organisationId, keeperId }, 'The variant');
    return created({ share: await createShare(user, variant, body) });
  },
});
