// The security headers on the running production server: a page, the sign-in page, an API route of ours
// (answering 401 and 200), next-auth's own route and a static file carry next.config.ts's set; pages
// carry proxy.ts's full nonce-based policy as their one Content-Security-Policy.
import { describe, expect, it } from 'vitest';
import { EXPECTED_HEADERS, PAGE_CSP_DIRECTIVES, parsePolicy } from '../security/expected-headers';
import { BASE_URL } from './harness';

const PATHS: [path: string, status: number][] = [
  ['/', 200],
  ['/sign-in', 200],
  ['/api/enclosures?organisationId=1', 401],
  ['/api/health', 200],
  ['/api/auth/csrf', 200],
  ['/icon.svg', 200],
];

const PAGES = ['/', '/sign-in'];

describe('security headers on the running app', () => {
  for (const [path, status] of PATHS) {
    it(`${path} carries every security header`, async () => {
      const res = await fetch(`${BASE_URL}${path}`, { redirect: 'manual' });
      await res.body?.cancel();
      expect(res.status).toBe(status);
      for (const [name, pattern] of Object.entries(EXPECTED_HEADERS)) {
        expect(res.headers.get(name), `${path}: ${name}`).toMatch(pattern);
      }
      expect(res.headers.get('x-powered-by')).toBeNull();
      if (PAGES.includes(path)) {
        const { directives, nonce } = parsePolicy(res.headers.get('content-security-policy') ?? '');
        expect(directives).toEqual(PAGE_CSP_DIRECTIVES);
        expect(nonce).toBeTruthy();
      }
    });
  }
});

describe('prefetches', () => {
  it('a prefetched page carries the full page policy, like the page itself', async () => {
    const variants: Record<string, string>[] = [
      { purpose: 'prefetch' },
      { 'next-router-prefetch': '1', rsc: '1' },
    ];
    for (const headers of variants) {
      const res = await fetch(`${BASE_URL}/sign-in`, { headers, redirect: 'manual' });
      await res.body?.cancel();
      const { directives, nonce } = parsePolicy(res.headers.get('content-security-policy') ?? '');
      expect(directives, JSON.stringify(headers)).toEqual(PAGE_CSP_DIRECTIVES);
      expect(nonce).toBeTruthy();
      for (const [name, pattern] of Object.entries(EXPECTED_HEADERS))
        expect(res.headers.get(name), name).toMatch(pattern);
    }
  });
});
