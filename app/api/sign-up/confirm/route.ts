import { route } from '@/lib/api';
import { confirmAccount, confirmBody } from '@/lib/auth/sign-up';

/** Confirms a new account with the e-mailed link's token; the person then signs in with their password. */
export const POST = route({
  body: confirmBody,
  auth: false,
  handler: async ({ body }) => {
    await confirmAccount(body);
    return { ok: true };
  },
});
