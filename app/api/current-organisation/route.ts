import { z } from 'zod';
import { allow, json, route } from '@/lib/api';
import { idSchema } from '@/lib/api/schemas';
import { CURRENT_ORG_COOKIE } from '@/lib/session';

/** Switches the organisation the user works in (remembered in a cookie; checked again on every page). */
export const PUT = route({
  body: z.object({ organisationId: idSchema('The organisation id') }),
  handler: async ({ body, user }) => {
    allow(user, 'read', { kind: 'organisation', id: body.organisationId }, 'That organisation');
    const res = json({ organisationId: body.organisationId });
    const secure = (process.env.NEXTAUTH_URL ?? '').startsWith('https://');
    res.headers.append(
      'Set-Cookie',
      `${CURRENT_ORG_COOKIE}=${body.organisationId}; Path=/; Max-Age=31536000; SameSite=Lax; HttpOnly${secure ? '; Secure' : ''}`,
    );
    return res;
  },
});
