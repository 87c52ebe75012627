import 'server-only';
import { headers } from 'next/headers';

/** This response's CSP nonce (proxy.ts puts the policy on the request), for a page's own inline script. */
export async function pageNonce(): Promise<string | undefined> {
  const csp = (await headers()).get('content-security-policy') ?? '';
  return /'nonce-([^']+)'/.exec(csp)?.[1];
}
