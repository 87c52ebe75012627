import 'server-only';
import { headers } from 'next/headers';
import { nonceOf } from './csp';

/** This response's CSP nonce (proxy.ts puts the policy on the request), for a page's own inline script. */
export async function pageNonce(): Promise<string | undefined> {
  return nonceOf((await headers()).get('content-security-policy')) ?? undefined;
}
