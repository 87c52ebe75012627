import { allow, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { organisationContactBody } from '@/lib/organisations/schemas';
import { updateOrganisationContact } from '@/lib/organisations/mutations';

/**
 * How customers reach the shop (phone, e-mail, an address line; each optional, empty clears it), shown
 * on test slips and in e-mails to customers. The owner's to change.
 */
export const PATCH = route({
  params: idParams,
  body: organisationContactBody,
  handler: async ({ params, body, user }) => {
    allow(user, 'update', { kind: 'organisation', id: params.id }, 'That organisation');
    return { contact: await updateOrganisationContact(params.id, body) };
  },
});
