import { json, route } from '@/lib/api';
import { designFor } from '@/lib/variants/access';
import { designDetail } from '@/lib/variants/queries';
import { deleteDesign, renameDesign } from '@/lib/variants/mutations';
import { idParams, renameBody } from '@/lib/variants/schemas';

export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const design = await designFor(user, params.id, 'read');
    return { design: await designDetail(design) };
  },
});

/** Renames the design (its content lives in its variants). */
export const PATCH = route({
  params: idParams,
  body: renameBody,
  handler: async ({ params, body, user }) => {
    const design = await designFor(user, params.id, 'update');
    return { design: await renameDesign(design, body.name) };
  },
});
export const PUT = PATCH;

/** Deletes the design with all its variants and their share links. */
export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const design = await designFor(user, params.id, 'delete');
    await deleteDesign(design);
    return json({ ok: true });
  },
});
