import { allow, created, page, route } from '@/lib/api';
import { createCustomer } from '@/lib/customers/mutations';
import { customerDto, listCustomers } from '@/lib/customers/queries';
import { createCustomerBody, customerListQuery } from '@/lib/customers/schemas';

/**
 * The shop's customers (`?organisationId=`, `q` searches name, e-mail and phone; paged by `cursor`).
 * Owners and staff only: keepers never see the shop's list of people.
 */
export const GET = route({
  query: customerListQuery,
  handler: async ({ query, user }) => {
    allow(user, 'read', { kind: 'customer', organisationId: query.organisationId }, 'That organisation');
    const rows = await listCustomers(query.organisationId, query);
    return page(rows, query.limit, customerDto);
  },
});

/** A new customer; consent to reminder e-mails is recorded with today's date when given. */
export const POST = route({
  body: createCustomerBody,
  handler: async ({ body, user }) => {
    allow(user, 'create', { kind: 'customer', organisationId: body.organisationId }, 'That organisation');
    return created({ customer: customerDto(await createCustomer(body, user.id)) });
  },
});
