import { created, route } from '@/lib/api';
import { enclosureFor } from '@/lib/enclosures/access';
import { listDesigns } from '@/lib/variants/queries';
import { createDesign } from '@/lib/variants/mutations';
import { createDesignBody, designListQuery, idParams } from '@/lib/variants/schemas';

/** The enclosure's designs, each with its variants (summaries). `?q=` searches names; `?cursor=&limit=` pages. */
export const GET = route({
  params: idParams,
  query: designListQuery,
  handler: async ({ params, query, user }) => {
    const enclosure = await enclosureFor(user, params.id, 'read');
    return listDesigns(enclosure, query);
  },
});

/** A new design and its first variant: from the design file sent, else the enclosure's default. */
export const POST = route({
  params: idParams,
  body: createDesignBody,
  handler: async ({ params, body, user }) => {
    const enclosure = await enclosureFor(user, params.id, 'create');
    return created(await createDesign(user, enclosure, body));
  },
});
