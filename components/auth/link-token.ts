'use client';

import { useSyncExternalStore } from 'react';

/**
 * The token of an e-mailed link. It travels in the address's fragment (`#token=…`), which browsers never
 * send to a server, so it stays out of logs and Referer headers; it is read here and posted once.
 * undefined while the server renders the page (the fragment exists only in the browser), null if absent.
 */
const readToken = () => new URLSearchParams(window.location.hash.slice(1)).get('token');
function subscribeToHash(onChange: () => void) {
  window.addEventListener('hashchange', onChange);
  return () => window.removeEventListener('hashchange', onChange);
}

export function useLinkToken(): string | null | undefined {
  return useSyncExternalStore(subscribeToHash, readToken, () => undefined);
}
