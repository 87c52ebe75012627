import type { NextRequest } from 'next/server';
import { findShare } from '@/lib/variants/queries';
import { sharePageHtml } from '@/lib/variants/share-html';

export const dynamic = 'force-dynamic';

/**
 * The share page `/s/<token>` as a browser asks for it (proxy.ts sends those requests here): its HTML
 * rendered once by the page (../page.tsx) and then served from memory with this request's CSP nonce
 * (lib/variants/share-html). The link is checked on every view (one query), so a revoked or expired
 * link gets the page's not-found answer at once.
 */
export async function GET(request: NextRequest, ctx: { params: Promise<{ token: string }> }) {
  const { token } = await ctx.params;
  return sharePageHtml(request, token, await findShare(token));
}
