import 'server-only';
import { config } from '@/lib/config';
import { readCapped } from '@/lib/read-capped';
import { ApiError, payloadTooLarge } from './errors';

export const MAX_JSON_BODY_BYTES = 1024 * 1024;

const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

export const isStateChanging = (method: string) => STATE_CHANGING.has(method.toUpperCase());

function originOf(url: string | undefined | null): string | null {
  if (!url) return null;
  try {
    return new URL(url).origin;
  } catch {
    return null;
  }
}

/** next-auth's session cookie (plain, `__Secure-` on https, and the chunked `.0`, `.1` … forms). */
const SESSION_COOKIE = /(?:^|;\s*)(?:__Secure-)?next-auth\.session-token(?:\.\d+)?=/;

export const carriesSessionCookie = (headers: Headers) => SESSION_COOKIE.test(headers.get('cookie') ?? '');

/**
 * Cross-site request forgery guard for state-changing requests. Browsers send Origin with every POST,
 * PUT, PATCH and DELETE, same-origin ones included, so:
 * - an Origin that is not ours is refused;
 * - no Origin at all on a request that carries a session cookie is refused too (our pages always send
 *   one; a request without it did not come from them);
 * - no Origin and no cookie (a script calling a public route such as sign-up) passes: it has no session
 *   to abuse.
 * Sec-Fetch-Site: cross-site is refused whatever Origin says.
 */
export function assertSameOrigin(req: Request): void {
  assertSameOriginHeaders(req.headers, req.url);
}

/** The same check on bare headers (server actions read them through next/headers). */
export function assertSameOriginHeaders(headers: Headers, url?: string): void {
  if (headers.get('sec-fetch-site') === 'cross-site') throw crossSite();
  const origin = headers.get('origin');
  if (!origin) {
    if (carriesSessionCookie(headers)) throw originRequired();
    return;
  }
  if (!allowedOrigins(headers, url).has(origin)) throw crossSite();
}

function allowedOrigins(headers: Headers, url: string | undefined): Set<string> {
  const allowed = new Set<string>();
  const app = originOf(config().APP_URL);
  if (app) allowed.add(app);
  const nextAuthUrl = originOf(process.env.NEXTAUTH_URL);
  if (nextAuthUrl) allowed.add(nextAuthUrl);
  const host = headers.get('x-forwarded-host') ?? headers.get('host');
  if (host) {
    const fromUrl = url ? new URL(url).protocol.replace(':', '') : 'http';
    const proto = headers.get('x-forwarded-proto') ?? fromUrl;
    allowed.add(`${proto}://${host}`);
  }
  return allowed;
}

/**
 * The bodies an HTML form (or a "simple" cross-origin fetch, which needs no CORS preflight) can send.
 * No route takes them: JSON routes need application/json, the photo upload takes image bytes.
 */
const FORM_MEDIA_TYPES = new Set(['application/x-www-form-urlencoded', 'multipart/form-data', 'text/plain']);

export function assertNotFormBody(req: Request): void {
  const mediaType = (req.headers.get('content-type') ?? '').split(';')[0]!.trim().toLowerCase();
  if (FORM_MEDIA_TYPES.has(mediaType)) throw unsupportedMediaType();
}

const originRequired = () =>
  new ApiError(
    403,
    'cross_site',
    'This request did not say which site it came from (no Origin header), so it was not accepted.',
  );

const unsupportedMediaType = () =>
  new ApiError(415, 'unsupported_media_type', 'Send the request body as application/json.');

const crossSite = () =>
  new ApiError(403, 'cross_site', 'Requests from other sites are not accepted. Use Baskwell itself.');

/** Reads a JSON body of at most `limit` bytes; counts bytes as they stream in, whatever Content-Length says. */
export async function readJsonBody(req: Request, limit = MAX_JSON_BODY_BYTES): Promise<unknown> {
  const declared = Number(req.headers.get('content-length') ?? '');
  if (Number.isFinite(declared) && declared > limit) throw payloadTooLarge(limit);
  const contentType = req.headers.get('content-type') ?? '';
  if (!req.body) {
    if (contentType) throw invalidJson('The request body is empty.');
    return undefined;
  }
  if (!/^application\/json\s*(;|$)/i.test(contentType)) throw unsupportedMediaType();
  const bytes = await readCapped(req.body, limit, () => payloadTooLarge(limit));
  if (bytes.byteLength === 0) return undefined;
  const text = new TextDecoder().decode(bytes);
  try {
    return JSON.parse(text);
  } catch {
    throw invalidJson('The request body is not valid JSON.');
  }
}

const invalidJson = (message: string) => new ApiError(400, 'invalid_json', message);
