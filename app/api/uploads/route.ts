import { z } from 'zod';
import { created, route } from '@/lib/api';
import { idSchema } from '@/lib/api/schemas';
import { enclosureFor } from '@/lib/enclosures/access';
import { MAX_IMAGE_BYTES } from '@/lib/uploads/limits';
import { readRawBody } from '@/lib/uploads/read-body';
import { storeBackdrop } from '@/lib/uploads/mutations';
import { uploadJson, uploadsOf } from '@/lib/uploads/queries';

/** The uploads of an enclosure (`?enclosureId=&kind=`), newest first. */
export const GET = route({
  query: z.object({
    enclosureId: idSchema('The enclosure'),
    kind: z
      .enum(['backdrop', 'readings-csv'], { error: 'The kind must be backdrop or readings-csv.' })
      .optional(),
  }),
  handler: async ({ query, user }) => {
    const enclosure = await enclosureFor(user, query.enclosureId, 'read');
    const rows = await uploadsOf(enclosure.id, query.kind, 100);
    return { items: rows.map(uploadJson) };
  },
});

/**
 * A photo of the real enclosure for the studio's traced backdrop: the file itself is the request body
 * (`POST /api/uploads?kind=backdrop&enclosureId=…&name=…`). JPEG, PNG or WebP by content, at most
 * 10 MB (413 beyond), metadata removed before it is stored.
 */
export const POST = route({
  query: z.object({
    kind: z.literal('backdrop', {
      error: 'Only backdrop photos are uploaded here; readings go to /api/readings/import.',
    }),
    enclosureId: idSchema('The enclosure'),
    name: z.string().max(200).optional(),
  }),
  handler: async ({ req, query, user }) => {
    const enclosure = await enclosureFor(user, query.enclosureId, 'update');
    const bytes = await readRawBody(req, MAX_IMAGE_BYTES);
    const upload = await storeBackdrop(
      user,
      enclosure,
      bytes,
      req.headers.get('content-type'),
      query.name ?? null,
    );
    return created({ upload: uploadJson(upload) });
  },
});
