import { route } from '@/lib/api';
import { idParams } from '@/lib/api/schemas';
import { customerFor } from '@/lib/customers/access';
import { linkedKeeper, linkKeeper, unlinkKeeper } from '@/lib/customers/keeper-link';
import { customerDto } from '@/lib/customers/queries';
import { keeperLinkBody } from '@/lib/customers/schemas';

/**
 * Links the customer to the keeper account they became (a keeper of the same organisation), so their
 * enclosure lamps show beside the counter lamps without being copied. Owners and staff only.
 */
export const PUT = route({
  params: idParams,
  body: keeperLinkBody,
  handler: async ({ params, body, user }) => {
    const customer = await customerFor(user, params.id, 'update');
    await linkKeeper(customer, body.keeperId);
    return { customer: customerDto(customer), keeper: await linkedKeeper(customer) };
  },
});

/** Drops the link; every counter lamp, enclosure lamp and reading stays. */
export const DELETE = route({
  params: idParams,
  handler: async ({ params, user }) => {
    const customer = await customerFor(user, params.id, 'update');
    await unlinkKeeper(customer);
    return { customer: customerDto(customer), keeper: null };
  },
});
