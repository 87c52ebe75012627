// The security headers, checked without building anything: next.config.ts headers() for every response,
// and proxy.ts's nonce-based Content-Security-Policy for pages. tests/browser/headers.browser.ts and
// csp.browser.ts check them on the running production server.
import { NextRequest } from 'next/server';
import { describe, expect, it } from 'vitest';
import { contentSecurityPolicy, makeNonce } from '@/lib/security/csp';
import config from '@/next.config';
import { config as proxyConfig, proxy } from '@/proxy';
import { EXPECTED_HEADERS, PAGE_CSP_DIRECTIVES, parsePolicy } from './expected-headers';

describe('next.config.ts headers()', () => {
  it('sends every security header on every path', async () => {
    expect(config.headers).toBeTypeOf('function');
    const rules = await config.headers!();
    // One rule matching everything: pages, API routes, static files.
    const everywhere = rules.filter((r) => r.source === '/:path*' && !r.has && !r.missing);
    expect(everywhere).toHaveLength(1);
    const sent = new Map(everywhere[0]!.headers.map((h) => [h.key.toLowerCase(), h.value]));
    for (const [name, pattern] of Object.entries(EXPECTED_HEADERS)) {
      expect(sent.get(name), name).toMatch(pattern);
    }
  });

  it('no other rule overrides them with a weaker value', async () => {
    const rules = await config.headers!();
    for (const rule of rules.filter((r) => r.source !== '/:path*')) {
      for (const h of rule.headers) {
        const pattern = EXPECTED_HEADERS[h.key.toLowerCase()];
        if (pattern) expect(h.value, `${rule.source}: ${h.key}`).toMatch(pattern);
      }
    }
  });
});

describe('an uploaded file keeps its own policy', () => {
  it('the last rule matching /api/uploads/<id> sends the merged, stricter policy', async () => {
    const rules = await config.headers!();
    const matching = rules.filter((r) =>
      new RegExp(`^${r.source.replace(':path*', '.*').replace(':id', '[^/]+')}$`).test('/api/uploads/12'),
    );
    const csp = matching.flatMap((r) =>
      r.headers.filter((h) => h.key.toLowerCase() === 'content-security-policy'),
    );
    // Next applies matching rules in order; a later one wins for the same header.
    const sent = csp.at(-1)?.value ?? '';
    expect(sent).toMatch(/default-src 'none'/);
    expect(sent).toMatch(/(^|; )sandbox(;|$)/);
    expect(sent).toMatch(EXPECTED_HEADERS['content-security-policy']!);
  });
});

describe('the page Content-Security-Policy (proxy.ts)', () => {
  it('has exactly the intended directives, nonce-based, with no unsafe script source', () => {
    const { directives, nonce } = parsePolicy(contentSecurityPolicy({ nonce: 'abc123==' }));
    expect(nonce).toBe('abc123==');
    expect(directives).toEqual(PAGE_CSP_DIRECTIVES);
  });

  it('adds eval to scripts only in development (React rebuilds error stacks with it)', () => {
    const dev = parsePolicy(contentSecurityPolicy({ nonce: 'n', dev: true })).directives;
    expect(dev['script-src']).toContain("'unsafe-eval'");
    expect(parsePolicy(contentSecurityPolicy({ nonce: 'n' })).directives['script-src']).not.toContain(
      'unsafe',
    );
  });

  it('makes a fresh, unguessable nonce every time', () => {
    const nonces = new Set(Array.from({ length: 200 }, makeNonce));
    expect(nonces.size).toBe(200);
    for (const n of nonces) expect(Buffer.from(n, 'base64')).toHaveLength(16);
  });

  it('sends the policy on the response and hands it to Next on the request (which reads the nonce)', async () => {
    const res = await proxy(new NextRequest('http://localhost:3000/enclosures'));
    const sent = res.headers.get('content-security-policy');
    const { directives, nonce } = parsePolicy(sent ?? '');
    expect(directives).toEqual(PAGE_CSP_DIRECTIVES);
    expect(nonce).toBeTruthy();
    // NextResponse.next({ request: { headers } }) passes overridden request headers this way.
    expect(res.headers.get('x-middleware-request-content-security-policy')).toBe(sent);
    const again = (await proxy(new NextRequest('http://localhost:3000/enclosures'))).headers.get(
      'content-security-policy',
    );
    expect(parsePolicy(again ?? '').nonce).not.toBe(nonce);
  });

  it('runs on pages, not on API routes or static files', () => {
    const source = proxyConfig.matcher[0]!.source;
    const matches = (path: string) => new RegExp(`^${source}$`).test(path);
    for (const page of ['/', '/sign-in', '/studio/12', '/s/abc', '/enclosures/3/lamps'])
      expect(matches(page), page).toBe(true);
    for (const other of ['/api/health', '/_next/static/chunks/a.js', '/favicon.ico', '/icon.svg'])
      expect(matches(other), other).toBe(false);
  });

  it('runs on prefetches too: a prefetched page the browser keeps carries the same policy', async () => {
    // A matcher entry with `missing` (or `has`) conditions would let prefetches past without the policy.
    for (const entry of proxyConfig.matcher) expect(entry, entry.source).not.toHaveProperty('missing');
    for (const entry of proxyConfig.matcher) expect(entry, entry.source).not.toHaveProperty('has');
    const prefetch = new NextRequest('http://localhost:3000/enclosures', {
      headers: { purpose: 'prefetch', 'next-router-prefetch': '1' },
    });
    const { directives } = parsePolicy((await proxy(prefetch)).headers.get('content-security-policy') ?? '');
    expect(directives).toEqual(PAGE_CSP_DIRECTIVES);
  });
});

describe('return addresses with control characters (proxy.ts)', () => {
  const matched = (path: string) =>
    proxyConfig.matcher.some((m) => new RegExp(`^${m.source.replace(':path*', '.*')}$`).test(path));

  it.each([
    ['/sign-in?callbackUrl=%2F%0A%2Fevil.example'],
    ['/sign-in?callbackUrl=%2F%09%2Fevil.example'],
    ['/sign-in?callbackUrl=%2Fok&callbackUrl=%2F%0D%0ASet-Cookie:x=1'],
    ['/api/auth/signin?callbackUrl=%2F%0A%2Fevil.example'],
    ['/api/auth/signout?callbackUrl=%2F%00'],
  ])('answers %s with 400, never a redirect or a server error', async (path) => {
    expect(matched(new URL(path, 'http://x').pathname), path).toBe(true);
    const res = await proxy(new NextRequest(`http://localhost:3000${path}`));
    expect(res.status).toBe(400);
    expect(res.headers.get('location')).toBeNull();
    expect(await res.text()).toMatch(/return address/);
  });

  it('lets an ordinary return address through, and API routes keep the baseline policy', async () => {
    const page = await proxy(new NextRequest('http://localhost:3000/sign-in?callbackUrl=%2Fenclosures%2F3'));
    expect(page.status).toBe(200);
    expect(page.headers.get('content-security-policy')).toMatch(/nonce-/);
    const api = await proxy(new NextRequest('http://localhost:3000/api/auth/csrf'));
    expect(api.status).toBe(200);
    expect(api.headers.get('content-security-policy')).toBeNull();
  });
});
