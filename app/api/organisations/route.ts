import { z } from 'zod';
import { created, route } from '@/lib/api';
import { organisationNameSchema } from '@/lib/api/schemas';
import { getSequelize } from '@/lib/db';
import { can } from '@/lib/permissions';
import { forbidden } from '@/lib/api/errors';
import { Membership, Organisation } from '@/models';

/** Starts another organisation (a second shop, a household) with the caller as its owner. */
export const POST = route({
  body: z.object({ name: organisationNameSchema }),
  handler: async ({ body, user }) => {
    if (!can(user, 'create', { kind: 'organisation', id: 0 })) throw forbidden();
    const organisation = await getSequelize().transaction(async (transaction) => {
      const org = await Organisation.create({ name: body.name }, { transaction });
      await Membership.create({ organisationId: org.id, userId: user.id, role: 'owner' }, { transaction });
      return org;
    });
    return created({ id: organisation.id, name: organisation.name, role: 'owner' });
  },
});
