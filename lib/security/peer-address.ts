import { randomBytes } from 'node:crypto';
import http from 'node:http';

/**
 * The TCP peer's address, which route handlers cannot see (a Request has no socket). When the server
 * starts (instrumentation.ts), every incoming request gets a header carrying the peer's address and a
 * random per-process secret, written over anything the client sent under that name; route handlers in
 * the same process accept the header only with that secret, so a client cannot forge it, and without
 * the stamp (tests, another runtime) there is simply no address.
 */
export const PEER_HEADER = 'x-baskwell-peer';

const holder = globalThis as unknown as {
  __baskwellPeerSecret?: string;
  __baskwellPeerEmit?: typeof http.Server.prototype.emit;
};

type HeaderSource = Headers | Record<string, string | string[] | undefined> | undefined;

export function installPeerAddressStamp(): void {
  if (holder.__baskwellPeerSecret) return;
  const secret = randomBytes(18).toString('base64url');
  holder.__baskwellPeerSecret = secret;
  holder.__baskwellPeerEmit = http.Server.prototype.emit;
  const emit = http.Server.prototype.emit as (this: http.Server, ...args: unknown[]) => boolean;
  http.Server.prototype.emit = function (this: http.Server, ...args: unknown[]) {
    if (args[0] === 'request') {
      const req = args[1] as http.IncomingMessage;
      req.headers[PEER_HEADER] = `${secret} ${req.socket?.remoteAddress ?? ''}`;
    }
    return emit.apply(this, args);
  } as typeof http.Server.prototype.emit;
}

/** Takes the stamp off again (tests leave no state behind). */
export function uninstallPeerAddressStamp(): void {
  if (holder.__baskwellPeerEmit) http.Server.prototype.emit = holder.__baskwellPeerEmit;
  delete holder.__baskwellPeerEmit;
  delete holder.__baskwellPeerSecret;
}

export function peerAddress(headers: HeaderSource): string | null {
  const secret = holder.__baskwellPeerSecret;
  if (!secret || !headers) return null;
  const raw =
    headers instanceof Headers
      ? headers.get(PEER_HEADER)
      : ((v) => (Array.isArray(v) ? v[0] : v))(headers[PEER_HEADER]);
  if (!raw) return null;
  const [given, address] = raw.split(' ');
  return given === secret && address ? address : null;
}
