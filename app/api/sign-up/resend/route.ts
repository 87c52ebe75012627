import { route } from '@/lib/api';
import { clientAddress } from '@/lib/auth/client-address';
import { resendBody, resendConfirmation } from '@/lib/auth/sign-up';

/** E-mails a new confirmation link if the address has an account waiting for one; the same answer either way. */
export const POST = route({
  body: resendBody,
  auth: false,
  handler: async ({ req, body }) => resendConfirmation(body, clientAddress(req.headers)),
});
