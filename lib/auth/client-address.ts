import { peerAddress } from '@/lib/security/peer-address';

type HeaderSource = Headers | Record<string, string | string[] | undefined> | undefined;

function header(headers: HeaderSource, name: string): string | undefined {
  if (!headers) return undefined;
  if (headers instanceof Headers) return headers.get(name) ?? undefined;
  const v = headers[name] ?? headers[name.toLowerCase()];
  return Array.isArray(v) ? v.join(',') : v;
}

/**
 * How many reverse proxies in front of the app append to X-Forwarded-For (`TRUST_PROXY`): unset or 0 when
 * clients reach the app directly, 1 behind one proxy, and so on (`true` means 1). Anything else is 0.
 */
export function trustedProxyHops(value = process.env.TRUST_PROXY): number {
  const v = (value ?? '').trim().toLowerCase();
  if (v === 'true') return 1;
  const n = Number(v);
  return Number.isInteger(n) && n > 0 && n <= 10 ? n : 0;
}

/**
 * The client's address, for rate limits. Without a trusted proxy, X-Forwarded-For and X-Real-IP are
 * anyone's to write and are never read: the address is the connection's own (stamped by the server,
 * lib/security/peer-address.ts). Behind N trusted proxies, each appends the address it was reached from,
 * so the entry N places from the right is the one the outermost of them saw; entries left of it are
 * whatever the client sent.
 */
export function clientAddress(headers: HeaderSource, hops = trustedProxyHops()): string {
  if (hops > 0) {
    const chain = (header(headers, 'x-forwarded-for') ?? '')
      .split(',')
      .map((s) => s.trim())
      .filter(Boolean);
    const seen = chain[chain.length - hops];
    if (seen) return seen;
  }
  return peerAddress(headers) ?? 'unknown';
}
