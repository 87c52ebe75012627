import { allow, route } from '@/lib/api';
import { assessEnclosureLamp } from '@/lib/counter/enclosure-lamp';
import { assessTest } from '@/lib/counter/queries';
import { assessBody } from '@/lib/counter/schemas';

/**
 * The counter's answer for a lamp and a reading, before anything is saved: the counter screen asks it
 * as the fields are filled in. Writes nothing. Owners and staff only. With `enclosureLampId`, a lamp of
 * the keeper linked to a customer is judged with its readings in the lamp log.
 */
export const POST = route({
  body: assessBody,
  handler: async ({ body, user }) => {
    allow(user, 'create', { kind: 'customer', organisationId: body.organisationId }, 'That organisation');
    const answer = body.enclosureLampId
      ? await assessEnclosureLamp(user, body)
      : await assessTest(user, body);
    return { answer };
  },
});
