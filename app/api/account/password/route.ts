import { allow, route } from '@/lib/api';
import { changePassword, changePasswordBody } from '@/lib/account/mutations';

/** Changes the signed-in person's password; every session of theirs ends, this one included. */
export const PUT = route({
  body: changePasswordBody,
  handler: async ({ body, user }) => {
    allow(user, 'update', { kind: 'account', userId: user.id }, 'That account');
    await changePassword(user.id, body);
    return { ok: true, signedOut: true };
  },
});
