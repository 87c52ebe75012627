/**
 * The Content-Security-Policy of every page, built per request around a fresh nonce (proxy.ts).
 * Kept free of Next imports so the header tests can build it too.
 *
 * - script-src: only scripts carrying this response's nonce, and what they load ('strict-dynamic'),
 *   so an injected <script> or inline handler never runs. Next puts the nonce on its own scripts when
 *   it finds 'nonce-…' in the request's CSP header. 'self' is ignored by browsers that know
 *   'strict-dynamic' and kept for those that do not.
 * - style-src-elem: our CSS files and nonce-carrying <style> elements (Next's own inline styles).
 * - style-src-attr 'unsafe-inline': React renders `style={{…}}` props into style="…" attributes in the
 *   server HTML (legend swatches, a few sizes), and Konva and next/dynamic set style attributes on their
 *   containers; a nonce cannot cover an attribute. Style attributes cannot run script, and <style>
 *   elements stay nonce-only, so an injected stylesheet (CSS-based exfiltration) is still refused.
 * - worker-src: the studio's field worker is a same-origin script; blob: for worker bundles that
 *   start from a blob URL.
 * - img-src data: blob: — canvas exports (PNG) and the backdrop photo preview are data/blob URLs.
 */
export type CspOptions = { nonce: string; dev?: boolean };

/** The nonce of a Content-Security-Policy (`'nonce-…'`), or null. */
export function nonceOf(policy: string | null): string | null {
  return policy ? (/'nonce-([^']+)'/.exec(policy)?.[1] ?? null) : null;
}

export function contentSecurityPolicy({ nonce, dev = false }: CspOptions): string {
  const directives: Record<string, string[]> = {
    'default-src': ["'self'"],
    // React in development rebuilds server error stacks with eval; production never evaluates strings.
    'script-src': ["'self'", `'nonce-${nonce}'`, "'strict-dynamic'", ...(dev ? ["'unsafe-eval'"] : [])],
    'style-src': ["'self'", `'nonce-${nonce}'`],
    'style-src-elem': ["'self'", `'nonce-${nonce}'`],
    'style-src-attr': ["'unsafe-inline'"],
    'img-src': ["'self'", 'data:', 'blob:'],
    'font-src': ["'self'"],
    'connect-src': ["'self'", ...(dev ? ['ws:'] : [])],
    'worker-src': ["'self'", 'blob:'],
    'object-src': ["'none'"],
    'base-uri': ["'self'"],
    'form-action': ["'self'"],
    'frame-ancestors': ["'none'"],
  };
  return Object.entries(directives)
    .map(([name, values]) => `${name} ${values.join(' ')}`)
    .join('; ');
}

/** 128 random bits, base64: unguessable, and a valid CSP nonce source. */
export function makeNonce(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return btoa(String.fromCharCode(...bytes));
}
