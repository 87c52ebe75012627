import { route } from '@/lib/api';
import { completePasswordReset, resetCompleteBody } from '@/lib/auth/password-reset';

/** Sets a new password with the e-mailed link's token; every session of the person ends. */
export const POST = route({
  body: resetCompleteBody,
  auth: false,
  handler: async ({ body }) => {
    await completePasswordReset(body);
    return { ok: true, signedOut: true };
  },
});
