import { NextResponse, type NextRequest } from 'next/server';
import { contentSecurityPolicy, makeNonce } from '@/lib/security/csp';

/**
 * A fresh nonce and Content-Security-Policy for every page request. Next reads the nonce from the
 * request's CSP header while it renders and puts it on its own scripts; the same policy goes out on the
 * response. Only a header: authorization is never done here (every route and page checks access itself).
 */
export function proxy(request: NextRequest) {
  const csp = contentSecurityPolicy({ nonce: makeNonce(), dev: process.env.NODE_ENV === 'development' });
  const headers = new Headers(request.headers);
  headers.set('content-security-policy', csp);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set('Content-Security-Policy', csp);
  return response;
}

export const config = {
  matcher: [
    {
      // Pages only: API replies and static files keep next.config.ts's baseline policy (frame-ancestors).
      source: '/((?!api/|_next/static|_next/image|favicon.ico|icon.svg).*)',
      // Router prefetches carry no HTML to protect; skipping them saves work.
      missing: [
        { type: 'header', key: 'next-router-prefetch' },
        { type: 'header', key: 'purpose', value: 'prefetch' },
      ],
    },
  ],
};
