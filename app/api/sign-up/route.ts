import { created, route } from '@/lib/api';
import { clientAddress } from '@/lib/auth/client-address';
import { signUp, signUpBody } from '@/lib/auth/sign-up';

/** Creates an account and a new organisation owned by it. The page then signs in with the same password. */
export const POST = route({
  body: signUpBody,
  auth: false,
  handler: async ({ req, body }) => created(await signUp(body, clientAddress(req.headers))),
});
