import { json, route } from '@/lib/api';
import { variantFor } from '@/lib/variants/access';
import { idParams, renameBody, saveVariantBody } from '@/lib/variants/schemas';
import { variantDetailOf } from '@/lib/variants/queries';
import { deleteVariant, renameVariant, saveVariantDesign } from '@/lib/variants/mutations';

export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const variant = await variantFor(user, params.id, 'read');
    return { variant: await variantDetailOf(variant) };
  },
});

/**
 * Saves the design if it is still based on the stored version; otherwise 409 with the current version
 * and design, and nothing overwritten.
 */
export const PUT = route({
  params: idParams,
  body: saveVariantBody,
  handler: async ({ params, body, user }) => {
    const variant = await variantFor(user, params.id, 'update');
    const r = await saveVariantDesign(user, variant, body);
    if (r.ok) return { variant: r.variant };
    return json(
      {
        error: {
          code: 'stale',
          message: 'Someone saved this variant after you opened it. Nothing was overwritten.',
        },
        current: r.current,
      },
      409,
    );
  },
});

/** Renames the variant without touching its design or version. */
export const PATCH = route({
  params: idParams,
  body: renameBody,
  handler: async ({ params, body, user }) => {
    const variant = await variantFor(user, params.id, 'update');
    return { variant: await renameVariant(variant, body.name) };
  },
});

export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const variant = await variantFor(user, params.id, 'delete');
    await deleteVariant(variant);
    return json({ ok: true });
  },
});
