import { created, route } from '@/lib/api';
import { designFor, variantFor } from '@/lib/variants/access';
import { createVariantBody, idParams, listQuery } from '@/lib/variants/schemas';
import { listVariants } from '@/lib/variants/queries';
import { createVariant } from '@/lib/variants/mutations';

export const GET = route({
  params: idParams,
  query: listQuery,
  handler: async ({ params, query, user }) => {
    const design = await designFor(user, params.id, 'read');
    return listVariants(design, query);
  },
});

/**
 * A new variant: an uploaded design file (`design`), a copy of a variant the user may read
 * (`fromVariantId`), or else the enclosure's default design.
 */
export const POST = route({
  params: idParams,
  body: createVariantBody,
  handler: async ({ params, body, user }) => {
    const design = await designFor(user, params.id, 'create');
    const from = body.fromVariantId ? await variantFor(user, body.fromVariantId, 'read') : undefined;
    return created({
      variant: await createVariant(user, design, { name: body.name, design: body.design, from }),
    });
  },
});
