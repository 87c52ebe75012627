import { route } from '@/lib/api';
import { clientAddress } from '@/lib/auth/client-address';
import { requestPasswordReset, resetRequestBody } from '@/lib/auth/password-reset';

/** "Forgot your password?": e-mails a link if an account has the address; the answer is the same either way. */
export const POST = route({
  body: resetRequestBody,
  auth: false,
  handler: async ({ req, body }) => requestPasswordReset(body, clientAddress(req.headers)),
});
