import { z } from 'zod';
import { notFound, route } from '@/lib/api';
import { withdrawConsentByToken } from '@/lib/customers/mutations';

/**
 * The one-click link in a customer's e-mails: stops reminder e-mails without signing in. The signed token
 * is the permission and names one customer and this one purpose. It withdraws the consent here, so the
 * link does its work even when nothing follows the answer, then sends the person to the small page that
 * says so (`/unsubscribe`, in the app's look, naming only the shop). A token that does not verify answers
 * 404, the same for every such token. Opening it twice is harmless.
 */
export const GET = route({
  auth: false,
  query: z.object({ token: z.string().max(200, 'That link is not valid.') }),
  handler: async ({ query }) => {
    const shop = await withdrawConsentByToken(query.token);
    if (shop === null) throw notFound('That link');
    return new Response(null, {
      status: 303,
      headers: {
        // Relative, so the answer does not depend on the address the app is reached by.
        Location: `/unsubscribe?token=${encodeURIComponent(query.token)}`,
        'Cache-Control': 'no-store',
        'Referrer-Policy': 'no-referrer',
      },
    });
  },
});
