import { NextResponse, type NextRequest } from 'next/server';
import { hasControlCharacter } from '@/lib/auth/return-to';
import { contentSecurityPolicy, makeNonce } from '@/lib/security/csp';
import { heldRoutePath, heldShareServer, heldShareToken } from '@/lib/variants/share-html-path';

/** Query parameters that name a page to return to: a control character in one is an attack, not a typo. */
const RETURN_PARAMS = ['callbackUrl', 'returnTo'];

/**
 * A fresh nonce and Content-Security-Policy for every page request — prefetches too, since the browser
 * may keep a prefetched answer and show it as the page. Next reads the nonce from the request's CSP
 * header while it renders and puts it on its own scripts; the same policy goes out on the response.
 * A return address with a control character answers 400 here, before next-auth would fail to put it in
 * a cookie (a 500) or a browser would strip it into another site's address. Only headers and that
 * check: authorization is never done here (every route and page checks access itself).
 * A browser's visit of a share page is answered with its held HTML (with this nonce) by the held route's
 * server, which checks the link itself like the page does (lib/variants/share-html-path,
 * app/s/[token]/held): here, where the request lands, once that route is loaded, else by a rewrite to it.
 */
export async function proxy(request: NextRequest): Promise<Response> {
  const params = request.nextUrl.searchParams;
  if (RETURN_PARAMS.some((name) => params.getAll(name).some(hasControlCharacter))) {
    const message = 'The return address (callbackUrl) is not valid.';
    return request.nextUrl.pathname.startsWith('/api/')
      ? NextResponse.json({ error: { code: 'invalid', message, field: 'callbackUrl' } }, { status: 400 })
      : new NextResponse(message, { status: 400, headers: { 'content-type': 'text/plain; charset=utf-8' } });
  }
  if (request.nextUrl.pathname.startsWith('/api/')) return NextResponse.next();
  const nonce = makeNonce();
  const csp = contentSecurityPolicy({ nonce, dev: process.env.NODE_ENV === 'development' });
  const { pathname, search } = request.nextUrl;
  const token = heldShareToken(request.method, pathname, search, request.headers);
  const serve = token === null ? null : heldShareServer();
  if (token !== null && serve) {
    // A failure here (the database away, say) falls through to the rewrite: the route then answers as
    // it did before the proxy served these, through Next's error handling rather than the proxy's.
    const response = await serve({ token, search, nonce, headers: request.headers }).catch(() => null);
    if (response) {
      response.headers.set('Content-Security-Policy', csp);
      return response;
    }
  }
  const headers = new Headers(request.headers);
  headers.set('content-security-policy', csp);
  const response =
    token === null
      ? NextResponse.next({ request: { headers } })
      : NextResponse.rewrite(new URL(heldRoutePath(token, search), request.url), { request: { headers } });
  response.headers.set('Content-Security-Policy', csp);
  return response;
}

export const config = {
  matcher: [
    // Pages: API replies and static files keep next.config.ts's baseline policy (frame-ancestors).
    { source: '/((?!api/|_next/static|_next/image|favicon.ico|icon.svg).*)' },
    // next-auth's own routes: only the return-address check.
    { source: '/api/auth/:path*' },
  ],
};
