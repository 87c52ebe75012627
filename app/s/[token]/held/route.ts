import type { NextRequest } from 'next/server';
import { findShare } from '@/lib/variants/queries';
import { heldShareHtml, sharePageHtml } from '@/lib/variants/share-html';
import { offerHeldShareServer } from '@/lib/variants/share-html-path';

export const dynamic = 'force-dynamic';

/**
 * The share page `/s/<token>` as a browser asks for it: its HTML rendered once by the page (../page.tsx)
 * and then served from memory with the request's CSP nonce (lib/variants/share-html). The link is
 * checked on every view (one query), so a revoked or expired link gets the page's not-found answer at
 * once.
 *
 * Once this module is loaded the proxy answers those visits itself with the server offered here (no
 * rewrite, no second trip through Next's routing for a page that is a string join); until then, the
 * first visit after a start, it rewrites them to this route.
 */
offerHeldShareServer(async (visit) => heldShareHtml(visit, await findShare(visit.token)));

export async function GET(request: NextRequest, ctx: { params: Promise<{ token: string }> }) {
  const { token } = await ctx.params;
  const response = await sharePageHtml(request, token, await findShare(token));
  // Next puts its own Vary (the same as the page's) on a route's answer and would add this one to it.
  response.headers.delete('vary');
  return response;
}
