import { z } from 'zod';
import { created, route } from '@/lib/api';
import { forbidden } from '@/lib/api/errors';
import { organisationNameSchema } from '@/lib/api/schemas';
import { createOrganisation } from '@/lib/organisations/mutations';
import { can } from '@/lib/permissions';

/** Starts another organisation (a second shop, a household) with the caller as its owner. */
export const POST = route({
  body: z.object({ name: organisationNameSchema }),
  handler: async ({ body, user }) => {
    if (!can(user, 'create', { kind: 'organisation', id: 0 })) throw forbidden();
    const organisation = await createOrganisation(body.name, user.id);
    return created({ id: organisation.id, name: organisation.name, role: 'owner' });
  },
});
