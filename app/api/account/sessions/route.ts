import { allow, route } from '@/lib/api';
import { endAllSessions } from '@/lib/account/mutations';

/** "Sign out everywhere": ends every session of the signed-in person, on every device, this one included. */
export const DELETE = route({
  handler: async ({ user }) => {
    allow(user, 'delete', { kind: 'account', userId: user.id }, 'That account');
    await endAllSessions(user.id);
    return { ok: true, signedOut: true };
  },
});
