// The security headers next.config.ts sends with every response, as both header tests expect them.
export const EXPECTED_HEADERS: Record<string, RegExp> = {
  'x-content-type-options': /^nosniff$/,
  'referrer-policy': /^strict-origin-when-cross-origin$/,
  'x-frame-options': /^DENY$/,
  'content-security-policy': /(^|;\s*)frame-ancestors 'none'(;|$)/,
  // Features the app never uses are switched off; each directive an empty allow-list.
  'permissions-policy': /^(?=.*\bcamera=\(\))(?=.*\bmicrophone=\(\))(?=.*\bgeolocation=\(\))/,
};
