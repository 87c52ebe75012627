import { z } from 'zod';
import { allow, created, page, pageQuery, route } from '@/lib/api';
import { idSchema } from '@/lib/api/schemas';
import { speciesInputSchema } from '@/lib/species/schema';
import { listSheets, toDto } from '@/lib/species/queries';
import { createSheet } from '@/lib/species/mutations';

/** Species sheets of an organisation (`?organisationId=`, optional `q` to search names). Any member reads. */
export const GET = route({
  query: z.object({
    organisationId: idSchema('The organisation id'),
    q: z.string().trim().max(100, 'Search for at most 100 characters.').optional(),
    ...pageQuery,
  }),
  handler: async ({ query, user }) => {
    allow(user, 'read', { kind: 'species', organisationId: query.organisationId }, 'That organisation');
    const rows = await listSheets(query.organisationId, {
      cursor: query.cursor,
      limit: query.limit,
      q: query.q,
    });
    return page(rows, query.limit, toDto);
  },
});

/** A new sheet written by the organisation (owner and staff). */
export const POST = route({
  body: z.intersection(z.object({ organisationId: idSchema('The organisation id') }), speciesInputSchema),
  handler: async ({ body, user }) => {
    const { organisationId, ...input } = body;
    allow(user, 'create', { kind: 'species', organisationId }, 'That organisation');
    const row = await createSheet(organisationId, input, user.id);
    return created(toDto(row));
  },
});
