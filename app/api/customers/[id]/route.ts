import { json, ownedRoute } from '@/lib/api';
import { deleteCustomer, updateCustomer } from '@/lib/customers/mutations';
import { customerDto, lampsOfCustomer } from '@/lib/customers/queries';
import { linkedKeeper } from '@/lib/customers/keeper-link';
import { updateCustomerBody } from '@/lib/customers/schemas';

export const GET = ownedRoute('customer', 'read', {
  handler: async ({ thing: customer }) => {
    const [lamps, keeper] = await Promise.all([lampsOfCustomer(customer.id), linkedKeeper(customer)]);
    return { customer: customerDto(customer), lamps, keeper };
  },
});

export const PATCH = ownedRoute('customer', 'update', {
  body: updateCustomerBody,
  handler: async ({ thing: customer, body }) => {
    return { customer: customerDto(await updateCustomer(customer, body)) };
  },
});

/** Removes the person's data; their lamps and readings stay, anonymous, for the shop's decay curves. */
export const DELETE = ownedRoute('customer', 'delete', {
  handler: async ({ thing: customer }) => {
    await deleteCustomer(customer);
    return json({ ok: true });
  },
});
