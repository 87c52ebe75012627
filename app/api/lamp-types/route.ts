import { z } from 'zod';
import { allow, created, page, pageQuery, route } from '@/lib/api';
import { LAMP_TECH_IDS } from '@/simulation';
import { idSchema } from '@/lib/api/schemas';
import { lampTypeInputSchema } from '@/lib/lamp-types/schema';
import { listLampTypes, toDto } from '@/lib/lamp-types/queries';
import { createLampType } from '@/lib/lamp-types/mutations';

/** The organisation's lamp catalogue (`?organisationId=`, optional `tech`). Any member reads. */
export const GET = route({
  query: z.object({
    organisationId: idSchema('The organisation id'),
    tech: z
      .enum(LAMP_TECH_IDS, { error: `The technology must be one of: ${LAMP_TECH_IDS.join(', ')}.` })
      .optional(),
    ...pageQuery,
  }),
  handler: async ({ query, user }) => {
    allow(user, 'read', { kind: 'lamp-type', organisationId: query.organisationId }, 'That organisation');
    const rows = await listLampTypes(query.organisationId, query);
    return page(rows, query.limit, toDto);
  },
});

/** A custom catalogue entry (owner and staff). Names are unique within the organisation (409). */
export const POST = route({
  body: z.intersection(z.object({ organisationId: idSchema('The organisation id') }), lampTypeInputSchema),
  handler: async ({ body, user }) => {
    const { organisationId, ...input } = body;
    allow(user, 'create', { kind: 'lamp-type', organisationId }, 'That organisation');
    return created(toDto(await createLampType(organisationId, input, user.id)));
  },
});
