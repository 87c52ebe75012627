import { json, ownedRoute } from '@/lib/api';
import { designDetail } from '@/lib/variants/queries';
import { deleteDesign, renameDesign } from '@/lib/variants/mutations';
import { renameBody } from '@/lib/variants/schemas';

export const GET = ownedRoute('design', 'read', {
  handler: async ({ thing: design }) => {
    return { design: await designDetail(design) };
  },
});

/** Renames the design (its content lives in its variants). */
export const PATCH = ownedRoute('design', 'update', {
  body: renameBody,
  handler: async ({ thing: design, body }) => {
    return { design: await renameDesign(design, body.name) };
  },
});
export const PUT = PATCH;

/** Deletes the design with all its variants and their share links. */
export const DELETE = ownedRoute('design', 'delete', {
  handler: async ({ thing: design }) => {
    await deleteDesign(design);
    return json({ ok: true });
  },
});
