import { created, ownedRoute } from '@/lib/api';
import { variantFor } from '@/lib/variants/access';
import { createVariantBody, listQuery } from '@/lib/variants/schemas';
import { listVariants } from '@/lib/variants/queries';
import { createVariant } from '@/lib/variants/mutations';

export const GET = ownedRoute('design', 'read', {
  query: listQuery,
  handler: async ({ thing: design, query }) => {
    return listVariants(design, query);
  },
});

/**
 * A new variant: an uploaded design file (`design`), a copy of a variant the user may read
 * (`fromVariantId`), or else the enclosure's default design.
 */
export const POST = ownedRoute('design', 'create', {
  body: createVariantBody,
  handler: async ({ thing: design, body, user }) => {
    const from = body.fromVariantId ? await variantFor(user, body.fromVariantId, 'read') : undefined;
    return created({
      variant: await createVariant(user, design, { name: body.name, design: body.design, from }),
    });
  },
});
