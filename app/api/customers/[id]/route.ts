import { json, route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { customerFor } from '@/lib/customers/access';
import { deleteCustomer, updateCustomer } from '@/lib/customers/mutations';
import { customerDto, lampsOfCustomer } from '@/lib/customers/queries';
import { linkedKeeper } from '@/lib/customers/keeper-link';
import { updateCustomerBody } from '@/lib/customers/schemas';

export const GET = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const customer = await customerFor(user, params.id, 'read');
    const [lamps, keeper] = await Promise.all([lampsOfCustomer(customer.id), linkedKeeper(customer)]);
    return { customer: customerDto(customer), lamps, keeper };
  },
});

export const PATCH = route({
  params: idParams,
  body: updateCustomerBody,
  handler: async ({ params, body, user }) => {
    const customer = await customerFor(user, params.id, 'update');
    return { customer: customerDto(await updateCustomer(customer, body)) };
  },
});

/** Removes the person's data; their lamps and readings stay, anonymous, for the shop's decay curves. */
export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const customer = await customerFor(user, params.id, 'delete');
    await deleteCustomer(customer);
    return json({ ok: true });
  },
});
