// The security headers as both header tests expect them: next.config.ts sends the first set with every
// response; proxy.ts adds the full, nonce-based Content-Security-Policy to every page.
export const EXPECTED_HEADERS: Record<string, RegExp> = {
  'x-content-type-options': /^nosniff$/,
  'referrer-policy': /^strict-origin-when-cross-origin$/,
  'x-frame-options': /^DENY$/,
  'content-security-policy': /(^|;\s*)frame-ancestors 'none'(;|$)/,
  // Features the app never uses are switched off; each directive an empty allow-list.
  'permissions-policy': /^(?=.*\bcamera=\(\))(?=.*\bmicrophone=\(\))(?=.*\bgeolocation=\(\))/,
};

/** Directives of a page's policy, each value exactly (the nonce as NONCE). */
export const PAGE_CSP_DIRECTIVES: Record<string, string> = {
  'default-src': "'self'",
  'script-src': "'self' 'nonce-NONCE' 'strict-dynamic'",
  'style-src': "'self' 'nonce-NONCE'",
  'style-src-elem': "'self' 'nonce-NONCE'",
  'style-src-attr': "'unsafe-inline'",
  'img-src': "'self' data: blob:",
  'font-src': "'self'",
  'connect-src': "'self'",
  'worker-src': "'self' blob:",
  'object-src': "'none'",
  'base-uri': "'self'",
  'form-action': "'self'",
  'frame-ancestors': "'none'",
};

/** Splits a policy into its directives, with the nonce replaced by NONCE; returns the nonce too. */
export function parsePolicy(policy: string): { directives: Record<string, string>; nonce: string | null } {
  const nonce = /'nonce-([^']+)'/.exec(policy)?.[1] ?? null;
  const directives: Record<string, string> = {};
  for (const part of policy.split(';')) {
    const [name, ...values] = part.trim().split(/\s+/);
    if (name) directives[name] = values.join(' ').replaceAll(`'nonce-${nonce}'`, "'nonce-NONCE'");
  }
  return { directives, nonce };
}
