import { created, route } from '@/lib/api';
import { clientAddress } from '@/lib/auth/client-address';
import { signUp, signUpBody } from '@/lib/auth/sign-up';

/** Creates an account (confirmed later by an e-mailed link) and a new organisation owned by it. */
export const POST = route({
  body: signUpBody,
  auth: false,
  handler: async ({ req, body }) => created(await signUp(body, clientAddress(req.headers))),
});
