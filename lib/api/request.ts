import { config } from '@/lib/config';
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

/**
 * Cross-site request forgery guard for state-changing requests: a browser always sends Origin on
 * cross-origin requests, so when it is present it must be our own. (JSON-only bodies add a second wall:
 * a plain HTML form cannot send application/json.)
 */
export function assertSameOrigin(req: Request): void {
  if (req.headers.get('sec-fetch-site') === 'cross-site') throw crossSite();
  const origin = req.headers.get('origin');
  if (!origin) return;
  const allowed = new Set<string>();
  const app = originOf(config().APP_URL);
  if (app) allowed.add(app);
  const nextAuthUrl = originOf(process.env.NEXTAUTH_URL);
  if (nextAuthUrl) allowed.add(nextAuthUrl);
  const host = req.headers.get('x-forwarded-host') ?? req.headers.get('host');
  if (host) {
    const proto = req.headers.get('x-forwarded-proto') ?? new URL(req.url).protocol.replace(':', '');
    allowed.add(`${proto}://${host}`);
  }
  if (!allowed.has(origin)) throw crossSite();
}

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
  if (!/^application\/json\s*(;|$)/i.test(contentType)) {
    throw new ApiError(415, 'unsupported_media_type', 'Send the request body as application/json.');
  }
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > limit) {
      await reader.cancel();
      throw payloadTooLarge(limit);
    }
    chunks.push(value);
  }
  if (size === 0) return undefined;
  const text = new TextDecoder().decode(Buffer.concat(chunks));
  try {
    return JSON.parse(text);
  } catch {
    throw invalidJson('The request body is not valid JSON.');
  }
}

const invalidJson = (message: string) => new ApiError(400, 'invalid_json', message);
