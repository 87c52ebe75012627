import { ownedRoute } from '@/lib/api';
import { linkedKeeper, linkKeeper, unlinkKeeper } from '@/lib/customers/keeper-link';
import { customerDto } from '@/lib/customers/queries';
import { keeperLinkBody } from '@/lib/customers/schemas';

/**
 * Links the customer to the keeper account they became (a keeper of the same organisation), so their
 * enclosure lamps show beside the counter lamps without being copied. Owners and staff only.
 */
export const PUT = ownedRoute('customer', 'update', {
  body: keeperLinkBody,
  handler: async ({ thing: customer, body }) => {
    await linkKeeper(customer, body.keeperId);
    return { customer: customerDto(customer), keeper: await linkedKeeper(customer) };
  },
});

/** Drops the link; every counter lamp, enclosure lamp and reading stays. */
export const DELETE = ownedRoute('customer', 'update', {
  handler: async ({ thing: customer }) => {
    await unlinkKeeper(customer);
    return { customer: customerDto(customer), keeper: null };
  },
});
