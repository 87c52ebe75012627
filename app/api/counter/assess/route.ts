import { allow, route } from '@/lib/api';
import { assessTest } from '@/lib/counter/queries';
import { assessBody } from '@/lib/counter/schemas';

/**
 * The counter's answer for a lamp and a reading, before anything is saved: the counter screen asks it
 * as the fields are filled in. Writes nothing. Owners and staff only.
 */
export const POST = route({
  body: assessBody,
  handler: async ({ body, user }) => {
    allow(user, 'create', { kind: 'customer', organisationId: body.organisationId }, 'That organisation');
    return { answer: await assessTest(user, body) };
  },
});
