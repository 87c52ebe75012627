import 'server-only';
import { decode, getToken, type JWT, type JWTDecodeParams } from 'next-auth/jwt';
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

/** How many decoded session cookies the process keeps; the oldest goes first beyond it. */
const DECODED_COOKIES = 500;
/** The leeway next-auth's own decoding gives a token's expiry and start, in seconds. */
const CLOCK_TOLERANCE_S = 15;
const decoded = new Map<string, JWT>();
let decodedWith = '';

/**
 * next-auth's cookie decoding, remembered by the cookie's exact text. Decoding derives the key from the
 * secret (HKDF) and decrypts the token (AES-GCM) on every signed-in request, a fixed share of each page's
 * and API call's CPU, for the same few cookies again and again; the same text under the same secret
 * always decodes to the same claims, so only a token that decoded is remembered, and its expiry is still
 * checked on every use. Whether the session was signed out is not remembered here: the database is asked
 * on every request (loadActiveSession).
 */
export async function decodeSessionCookie({ token, secret }: JWTDecodeParams): Promise<JWT | null> {
  if (!token) return null;
  const key = String(secret);
  if (decodedWith !== key) {
    decoded.clear();
    decodedWith = key;
  }
  const now = Date.now() / 1000;
  let claims = decoded.get(token);
  if (!claims) {
    // A token that does not decrypt under this secret (altered, or made with another) is no session.
    claims = (await decode({ token, secret }).catch(() => null)) ?? undefined;
    if (!claims) return null;
    if (decoded.size >= DECODED_COOKIES) decoded.delete(decoded.keys().next().value!);
    decoded.set(token, claims);
  }
  const { exp, nbf } = claims as { exp?: unknown; nbf?: unknown };
  if (typeof exp === 'number' && exp <= now - CLOCK_TOLERANCE_S) {
    decoded.delete(token);
    return null;
  }
  if (typeof nbf === 'number' && nbf > now + CLOCK_TOLERANCE_S) return null;
  return claims;
}

/**
 * Who is asking: the session cookie's JWT, then the account re-checked in the database so a bumped
 * session version, a removed membership or a sign-out takes effect on the very next request.
 */
export async function sessionUserFromHeaders(headers: Headers): Promise<CurrentUser | null> {
  // next-auth reads cookies from `req.cookies`; a plain Request only has the Cookie header.
  const req = { headers: Object.fromEntries(headers), cookies: parseCookies(headers.get('cookie')) };
  const token = await getToken({
    req: req as unknown as GetTokenReq,
    secret: authSecret(),
    decode: decodeSessionCookie,
  });
  return token ? loadActiveSession(token) : null;
}

export const sessionUser = (req: Request) => sessionUserFromHeaders(req.headers);
