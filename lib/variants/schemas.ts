import { z } from 'zod';
import { textSchema } from '@/lib/api/text';
import { DESIGN_MIGRATIONS, parseDesign, TOO_COMPLEX, type Design } from '@/simulation';
import { tooComplex } from './stored-design';
import { pageQuery } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';

/** The longest a share link lasts. */
export const MAX_SHARE_DAYS = 365;

/** Request shapes of the design, variant and share routes. */

// One id parser for every route (lib/api/schemas); re-exported for the routes that import it from here.
export { idParams };

export const nameField = textSchema('Give it a name.')
  .trim()
  .min(1, 'Give it a name.')
  .max(120, 'Keep the name to 120 characters.');

/**
 * A design file, checked (and migrated from older versions) by the engine's own parser. The issue path
 * is the file's own path, so the API's `field` reads e.g. `design.objects[2].uvbAt30`.
 */
export const designFile = z.unknown().transform((value, ctx): Design => {
  const r = parseDesign(value, DESIGN_MIGRATIONS, { computable: true });
  if (r.ok) return r.design;
  const where = r.error.path || 'design';
  // Not a malformed request but one the server will not compute: thrown past zod so the route pipeline
  // answers 422 naming the limit instead of the 400 of a validation issue.
  if (r.error.code === TOO_COMPLEX) throw tooComplex(`design.${where}`, r.error.message);
  ctx.addIssue({
    code: 'custom',
    path: r.error.path ? [r.error.path] : [],
    message: `${where}: ${r.error.message}`,
  });
  return z.NEVER;
});

export const listQuery = z.object(pageQuery);
export const designListQuery = z.object({
  ...pageQuery,
  q: z.string().trim().max(120, 'Keep the search to 120 characters.').optional(),
});

export const createDesignBody = z.strictObject({
  name: nameField,
  variantName: nameField.optional(),
  design: designFile.optional(),
});

export const renameBody = z.strictObject({ name: nameField });

export const createVariantBody = z
  .strictObject({
    name: nameField,
    design: designFile.optional(),
    fromVariantId: idParams.shape.id.optional(),
  })
  .refine((b) => !(b.design !== undefined && b.fromVariantId !== undefined), {
    message: 'Send either a design or fromVariantId, not both.',
    path: ['fromVariantId'],
  });

export const saveVariantBody = z.strictObject({
  design: designFile,
  baseVersion: z.number({ error: 'baseVersion must be the version you started from.' }).int().positive(),
  name: nameField.optional(),
});

export const createShareBody = z.strictObject({
  expiresInDays: z
    .number({ error: 'expiresInDays must be a number of days.' })
    .int('expiresInDays must be a whole number of days.')
    .min(1, 'A link lasts at least 1 day.')
    .max(MAX_SHARE_DAYS, `A link lasts at most ${MAX_SHARE_DAYS} days.`)
    .optional(),
});
