import { json, ownedRoute } from '@/lib/api';
import { renameBody, saveVariantBody } from '@/lib/variants/schemas';
import { variantDetailOf } from '@/lib/variants/queries';
import { deleteVariant, renameVariant, saveVariantDesign } from '@/lib/variants/mutations';

export const GET = ownedRoute('variant', 'read', {
  handler: async ({ thing: variant }) => {
    return { variant: await variantDetailOf(variant) };
  },
});

/**
 * Saves the design if it is still based on the stored version; otherwise 409 with the current version
 * and design, and nothing overwritten.
 */
export const PUT = ownedRoute('variant', 'update', {
  body: saveVariantBody,
  handler: async ({ thing: variant, body, user }) => {
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
export const PATCH = ownedRoute('variant', 'update', {
  body: renameBody,
  handler: async ({ thing: variant, body }) => {
    return { variant: await renameVariant(variant, body.name) };
  },
});

export const DELETE = ownedRoute('variant', 'delete', {
  handler: async ({ thing: variant }) => {
    await deleteVariant(variant);
    return json({ ok: true });
  },
});
