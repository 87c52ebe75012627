import { created, ownedRoute } from '@/lib/api';
import { listDesigns } from '@/lib/variants/queries';
import { createDesign } from '@/lib/variants/mutations';
import { createDesignBody, designListQuery } from '@/lib/variants/schemas';

/** The enclosure's designs, each with its variants (summaries). `?q=` searches names; `?cursor=&limit=` pages. */
export const GET = ownedRoute('enclosure', 'read', {
  query: designListQuery,
  handler: async ({ thing: enclosure, query }) => {
    return listDesigns(enclosure, query);
  },
});

/** A new design and its first variant: from the design file sent, else the enclosure's default. */
export const POST = ownedRoute('enclosure', 'create', {
  body: createDesignBody,
  handler: async ({ thing: enclosure, body, user }) => {
    return created(await createDesign(user, enclosure, body));
  },
});
