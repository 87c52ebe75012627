import 'server-only';
import { getToken } from 'next-auth/jwt';
import { authSecret } from '@/lib/auth/secret';
import { loadActiveSession } from '@/lib/auth/ended-sessions';
import type { CurrentUser } from '@/lib/auth/session-user';

export function parseCookies(header: string | null | undefined): Record<string, string> {
  const out: Record<string, string> = {};
  for (const part of (header ?? '').split(';')) {
    const i = part.indexOf('=');
    if (i < 1) continue;
    const name = part.slice(0, i).trim();
    const raw = part.slice(i + 1).trim();
    try {
      out[name] = decodeURIComponent(raw);
    } catch {
      out[name] = raw;
    }
  }
  return out;
}

type GetTokenReq = Parameters<typeof getToken>[0]['req'];

/**
 * Who is asking: the session cookie's JWT, then the account re-checked in the database so a bumped
 * session version, a removed membership or a sign-out takes effect on the very next request.
 */
export async function sessionUserFromHeaders(headers: Headers): Promise<CurrentUser | null> {
  // next-auth reads cookies from `req.cookies`; a plain Request only has the Cookie header.
  const req = { headers: Object.fromEntries(headers), cookies: parseCookies(headers.get('cookie')) };
  const token = await getToken({ req: req as unknown as GetTokenReq, secret: authSecret() });
  return token ? loadActiveSession(token) : null;
}

export const sessionUser = (req: Request) => sessionUserFromHeaders(req.headers);
