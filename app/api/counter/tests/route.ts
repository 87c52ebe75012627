import { allow, created, route } from '@/lib/api';
import { saveEnclosureLampTest } from '@/lib/counter/enclosure-lamp';
import { saveTest } from '@/lib/counter/mutations';
import { saveTestBody } from '@/lib/counter/schemas';

/**
 * Saves a counter test: the lamp under its customer (new, on record, or a walk-in kept anonymous) and the
 * reading with the verdict given. With `counterLampId` it adds a reading to a kept lamp; with
 * `enclosureLampId`, to the lamp in the enclosure of the keeper a customer is linked to (no copy is made).
 */
export const POST = route({
  body: saveTestBody,
  handler: async ({ body, user }) => {
    allow(user, 'create', { kind: 'customer', organisationId: body.organisationId }, 'That organisation');
    return created(
      body.enclosureLampId ? await saveEnclosureLampTest(user, body) : await saveTest(user, body),
    );
  },
});
