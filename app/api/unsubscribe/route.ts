import { z } from 'zod';
import { notFound, route } from '@/lib/api';
import { withdrawConsentByToken } from '@/lib/customers/mutations';

/**
 * The one-click link in a customer's e-mails: stops reminder e-mails without signing in. The signed token
 * is the permission and names one customer and this one purpose; the answer shows no personal data. A
 * token that does not verify answers 404, the same for every such token. Opening it twice is harmless.
 */
export const GET = route({
  auth: false,
  query: z.object({ token: z.string().max(200, 'That link is not valid.') }),
  handler: async ({ query }) => {
    const shop = await withdrawConsentByToken(query.token);
    if (shop === null) throw notFound('That link');
    const html = `<!doctype html><html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1"><title>E-mails stopped</title></head><body><main><h1>E-mails stopped</h1><p>You will get no more e-mails about your lamp tests from ${escapeHtml(shop)}. To have them again, ask the shop.</p></main></body></html>`;
    return new Response(html, {
      status: 200,
      headers: { 'Content-Type': 'text/html; charset=utf-8', 'Cache-Control': 'no-store' },
    });
  },
});

const escapeHtml = (s: string) =>
  s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);
