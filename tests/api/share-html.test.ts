// The share page's held HTML (lib/variants/share-html): rendered once by the page, then served with each
// request's own CSP nonce, and never to a link that no longer works. The page render is stood in for by
// a renderer that records what it was asked and answers with a nonce of its own, as the server does;
// tests/browser/variants.browser.ts, journey-visitor and csp.browser.ts open the real thing in Chromium.
import path from 'node:path';
import { NextRequest } from 'next/server';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import * as shareRoute from '@/app/api/shares/[id]/route';
import { contentSecurityPolicy, makeNonce, nonceOf } from '@/lib/security/csp';
import { ZONE_COOKIE } from '@/lib/time/format';
import { findShare } from '@/lib/variants/queries';
import {
  heldShareToken,
  heldShareServer,
  offerHeldShareServer,
  SHARE_RENDER_HEADER,
  type HeldShareVisit,
} from '@/lib/variants/share-html-path';
import {
  heldShareHtml,
  sharePageHtml,
  sharePagesHtml,
  type RenderedPage,
  type RenderRequest,
} from '@/lib/variants/share-html';
import { ShareLink, Variant } from '@/models';
import { proxy } from '@/proxy';
import { benchDesign } from '@/simulation/testing/fixtures';
import { withTestDatabase } from '../helpers/db';
import { createKeeperWorld } from '../helpers/world';
import { call, ORIGIN, postDesign, postShare } from './variants.helpers';

withTestDatabase();
beforeEach(() => sharePagesHtml.clear());

/** The held route's file, imported afresh by the test of its offer. */
const ROUTE = path.resolve(import.meta.dirname, '../../app/s/[token]/held/route.ts');

async function sharedLink(expiresInDays?: number) {
  const { staff, enclosure } = await createKeeperWorld('Shop A', {
    enclosure: { name: 'Desert tank', speciesName: null },
    staff: true,
  });
  const { variantId } = await postDesign(staff!, enclosure.id, { name: 'Plan', variantName: 'Lit' });
  await Variant.update({ designJson: JSON.stringify(benchDesign(1, 1)) }, { where: { id: variantId } });
  const made = await postShare(staff!, variantId, expiresInDays ? { expiresInDays } : {});
  if (made.status !== 201) throw new Error(`share: ${made.status}`);
  return {
    staff: staff!,
    variantId,
    token: made.body.share.token as string,
    id: made.body.share.id as number,
  };
}

/** Revokes the link as its owner does (the share route's DELETE). */
async function revoke(staff: Awaited<ReturnType<typeof sharedLink>>['staff'], id: number) {
  const revoked = await call(shareRoute.DELETE, {
    method: 'DELETE',
    path: `/api/shares/${id}`,
    params: { id },
    user: staff,
  });
  expect(revoked.status).toBe(200);
}

/**
 * Stands in for the server's page render: the link checked as the page checks it, a page naming the
 * variant's version (or the not-found page), and its nonce on two scripts and in the payload.
 */
function fakeServer() {
  const asked: RenderRequest[] = [];
  let fail: number | null = null;
  const render = async (r: RenderRequest): Promise<RenderedPage> => {
    asked.push(r);
    const nonce = makeNonce();
    const token = r.path.split('/')[2]!.split('?')[0]!;
    const share = await findShare(token);
    const status = fail ?? (share ? 200 : 404);
    // Text beyond ASCII, as the real page has: the held bytes must be its UTF-8.
    const main = share
      ? `<h1>version ${share.variant.version} in ${r.zone}</h1><p>basking spot’s 40 °C</p>`
      : '<h1>Not found</h1>';
    return {
      status,
      headers: [
        ['content-type', 'text/html; charset=utf-8'],
        ['cache-control', 'private, no-cache, no-store, max-age=0, must-revalidate'],
        ['link', `</a.css>; rel=preload; as="style"; nonce="${nonce}"`],
      ],
      body: `<script nonce="${nonce}" src="/a.js"></script>${main}<script nonce="${nonce}">push("${nonce}")</script>`,
      nonce,
    };
  };
  return { asked, render, failWith: (s: number | null) => (fail = s) };
}

/** A visitor's request as the proxy hands it to the held route: with a fresh nonce in its policy. */
function visit(token: string, search = '', headers: Record<string, string> = {}) {
  const nonce = makeNonce();
  const req = new NextRequest(`${ORIGIN}/s/${token}/held${search}`, {
    headers: {
      'content-security-policy': contentSecurityPolicy({ nonce }),
      'user-agent': 'Chromium',
      ...headers,
    },
  });
  return { req, nonce };
}

async function view(server: ReturnType<typeof fakeServer>, token: string, search = '', headers = {}) {
  const { req, nonce } = visit(token, search, headers);
  const res = await sharePageHtml(req, token, await findShare(token), server.render);
  return { res, nonce, html: await res.text() };
}

const nonces = (html: string) => [...html.matchAll(/nonce="([^"]+)"/g)].map((m) => m[1]);

describe('share page HTML held in memory', () => {
  it('renders a working link’s page once, then serves it with each request’s own nonce', async () => {
    const { token } = await sharedLink();
    const server = fakeServer();
    const first = await view(server, token);
    expect(first.res.status).toBe(200);
    expect(first.html).toContain('version 1 in UTC');
    expect(nonces(first.html)).toEqual([first.nonce, first.nonce]);
    expect(first.html).toContain(`push("${first.nonce}")`);
    expect(first.html).toContain('<p>basking spot’s 40 °C</p>');
    expect(first.res.headers.get('content-type')).toBe('text/html; charset=utf-8');
    expect(first.res.headers.get('cache-control')).toContain('no-store');
    expect(first.res.headers.get('link')).toBe(`</a.css>; rel=preload; as="style"; nonce="${first.nonce}"`);
    expect(server.asked).toEqual([{ path: `/s/${token}`, zone: 'UTC', userAgent: 'Chromium' }]);

    const again = await view(server, token);
    expect(server.asked).toHaveLength(1);
    expect(again.nonce).not.toBe(first.nonce);
    expect(nonces(again.html)).toEqual([again.nonce, again.nonce]);
    expect(again.html).not.toContain(first.nonce);
    expect(again.res.headers.get('link')).toContain(`nonce="${again.nonce}"`);
    expect(again.html.replaceAll(again.nonce, 'N')).toBe(first.html.replaceAll(first.nonce, 'N'));
    expect(again.html).toContain('<p>basking spot’s 40 °C</p>');
  });

  it('holds a page per field and per time zone, and renders views that arrive together once', async () => {
    const { token } = await sharedLink(7);
    const server = fakeServer();
    await Promise.all([view(server, token), view(server, token), view(server, token)]);
    expect(server.asked).toHaveLength(1);
    await view(server, token, '?field=tempC');
    expect(server.asked.at(-1)!.path).toBe(`/s/${token}?field=tempC`);
    const berlin = await view(server, token, '', { cookie: `${ZONE_COOKIE}=Europe/Berlin` });
    expect(berlin.html).toContain('in Europe/Berlin');
    expect(server.asked).toHaveLength(3);
    // A zone this runtime does not know is the fallback's page.
    await view(server, token, '', { cookie: `${ZONE_COOKIE}=Not/AZone%` });
    expect(server.asked).toHaveLength(3);
  });

  it('renders afresh after a save, and serves a revoked link the page’s not-found answer', async () => {
    const { staff, variantId, token, id } = await sharedLink();
    const server = fakeServer();
    expect((await view(server, token)).html).toContain('version 1');
    const variant = (await Variant.findByPk(variantId))!;
    await variant.update({ version: 2, designJson: JSON.stringify(benchDesign(1, 2)) });
    expect((await view(server, token)).html).toContain('version 2');
    expect(server.asked).toHaveLength(2);

    await revoke(staff, id);
    const gone = await view(server, token);
    expect(gone.res.status).toBe(404);
    expect(gone.html).toContain('Not found');
    expect(gone.html).not.toContain('version');
    expect(nonces(gone.html)).toEqual([gone.nonce, gone.nonce]);
    expect(server.asked).toHaveLength(3);
  });

  it('stops serving an expired link at once', async () => {
    const { token, id } = await sharedLink(7);
    const server = fakeServer();
    expect((await view(server, token)).res.status).toBe(200);
    await ShareLink.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { id } });
    const gone = await view(server, token);
    expect(gone.res.status).toBe(404);
    expect(gone.html).not.toContain('version');
  });

  it('keeps only a page the server answered with 200', async () => {
    const { token } = await sharedLink();
    const server = fakeServer();
    server.failWith(500);
    expect((await view(server, token)).res.status).toBe(500);
    server.failWith(null);
    expect((await view(server, token)).res.status).toBe(200);
    expect((await view(server, token)).res.status).toBe(200);
    expect(server.asked).toHaveLength(2);
    expect(sharePagesHtml.size()).toBe(1);
  });

  it('holds nothing for a request without a nonce or with another query', async () => {
    const { token } = await sharedLink();
    const server = fakeServer();
    const bare = new NextRequest(`${ORIGIN}/s/${token}/held`);
    await sharePageHtml(bare, token, await findShare(token), server.render);
    await view(server, token, '?field=uvi&x=1');
    expect(server.asked).toHaveLength(2);
    expect(sharePagesHtml.size()).toBe(0);
  });

  it('refuses a link that does not work even when the page cannot be rendered', async () => {
    const unreachable = async (): Promise<RenderedPage> => {
      throw new Error('no server');
    };
    const token = 'A'.repeat(43);
    const { req } = visit(token);
    const res = await sharePageHtml(req, token, await findShare(token), unreachable);
    expect(res.status).toBe(404);
    expect(await res.text()).toBe('This link does not exist or no longer works.');
  });

  it('reads the nonce of a policy', () => {
    expect(nonceOf(contentSecurityPolicy({ nonce: 'ab+/cd==' }))).toBe('ab+/cd==');
    expect(nonceOf("default-src 'self'")).toBeNull();
    expect(nonceOf(null)).toBeNull();
  });
});

describe('the proxy sends a browser’s share page visit to the held route', () => {
  const token = 'A'.repeat(43);
  // As after a start, before the held route has been loaded.
  beforeEach(() => offerHeldShareServer(undefined));
  const rewritten = async (
    path: string,
    init: { method?: string; headers?: Record<string, string> } = {},
  ) => {
    const res = await proxy(new NextRequest(`http://localhost:3000${path}`, init));
    const to = res.headers.get('x-middleware-rewrite');
    // The rewritten request carries the same policy as the answer, so the page's nonce is the answer's.
    if (to)
      expect(res.headers.get('x-middleware-request-content-security-policy')).toBe(
        res.headers.get('content-security-policy'),
      );
    return to ? new URL(to).pathname + new URL(to).search : null;
  };

  it('with no query or a field the page shows', async () => {
    expect(await rewritten(`/s/${token}`)).toBe(`/s/${token}/held`);
    expect(await rewritten(`/s/${token}?field=tempC`)).toBe(`/s/${token}/held?field=tempC`);
  });

  it('and leaves everything else to the page and routes as before', async () => {
    expect(await rewritten(`/s/${token}?field=other`)).toBeNull();
    expect(await rewritten(`/s/${token}?field=uvi&x=1`)).toBeNull();
    expect(await rewritten(`/s/${token}`, { method: 'HEAD' })).toBeNull();
    expect(await rewritten(`/s/${token}`, { headers: { rsc: '1' } })).toBeNull();
    expect(await rewritten(`/s/${token}`, { headers: { [SHARE_RENDER_HEADER]: '1' } })).toBeNull();
    expect(await rewritten(`/s/${token}/report?format=pdf`)).toBeNull();
    expect(await rewritten(`/s/${token}/picture/1/uvi.svg`)).toBeNull();
    expect(heldShareToken('GET', '/studio/1', '', new Headers())).toBeNull();
  });
});

describe('the proxy answers a share page visit itself once the held route is loaded', () => {
  afterEach(() => offerHeldShareServer(undefined));

  /** The held route's server as the route offers it, with the stand-in page render. */
  function offer(server: ReturnType<typeof fakeServer>) {
    const visits: HeldShareVisit[] = [];
    offerHeldShareServer(async (visit) => {
      visits.push(visit);
      return heldShareHtml(visit, await findShare(visit.token), server.render);
    });
    return visits;
  }

  const visitThroughProxy = async (path: string, init: { headers?: Record<string, string> } = {}) => {
    const res = await proxy(new NextRequest(`http://localhost:3000${path}`, init));
    const nonce = nonceOf(res.headers.get('content-security-policy'));
    return { res, nonce, html: await res.text() };
  };

  it('is offered by the held route as Next loads it', async () => {
    offerHeldShareServer(undefined);
    expect(heldShareServer()).toBeNull();
    // A module of its own for this load: database files share loaded modules, and an earlier file may
    // already have loaded the route (its offer then made long before, and taken back since).
    await import(/* @vite-ignore */ `${ROUTE}?load=${Date.now()}`);
    expect(heldShareServer()).toBeTypeOf('function');
  });

  it('serves the held page with the nonce of the policy it sends, with no rewrite', async () => {
    const { token } = await sharedLink();
    const server = fakeServer();
    const visits = offer(server);
    const first = await visitThroughProxy(`/s/${token}?field=uvb`, {
      headers: { 'user-agent': 'Chromium', cookie: `${ZONE_COOKIE}=Europe/Berlin` },
    });
    expect(first.res.status).toBe(200);
    expect(first.res.headers.get('x-middleware-rewrite')).toBeNull();
    expect(first.nonce).toBeTruthy();
    expect(nonces(first.html)).toEqual([first.nonce, first.nonce]);
    expect(first.html).toContain('version 1 in Europe/Berlin');
    expect(visits.map((v) => [v.token, v.search, v.nonce])).toEqual([[token, '?field=uvb', first.nonce]]);
    expect(server.asked).toEqual([
      { path: `/s/${token}?field=uvb`, zone: 'Europe/Berlin', userAgent: 'Chromium' },
    ]);

    const again = await visitThroughProxy(`/s/${token}?field=uvb`, {
      headers: { 'user-agent': 'Chromium', cookie: `${ZONE_COOKIE}=Europe/Berlin` },
    });
    expect(again.nonce).not.toBe(first.nonce);
    expect(nonces(again.html)).toEqual([again.nonce, again.nonce]);
    expect(server.asked).toHaveLength(1);
  });

  it('stops serving a revoked link at once', async () => {
    const { staff, token, id } = await sharedLink();
    const server = fakeServer();
    offer(server);
    expect((await visitThroughProxy(`/s/${token}`)).res.status).toBe(200);
    await revoke(staff, id);
    const gone = await visitThroughProxy(`/s/${token}`);
    expect(gone.res.status).toBe(404);
    expect(gone.html).not.toContain('version');
    expect(nonces(gone.html)).toEqual([gone.nonce, gone.nonce]);
  });

  it('leaves a visit it cannot answer (its server failed) to the held route', async () => {
    const token = 'A'.repeat(43);
    offerHeldShareServer(async () => {
      throw new Error('database unavailable');
    });
    const res = await proxy(new NextRequest(`http://localhost:3000/s/${token}`));
    expect(new URL(res.headers.get('x-middleware-rewrite')!).pathname).toBe(`/s/${token}/held`);
    expect(res.headers.get('x-middleware-request-content-security-policy')).toBe(
      res.headers.get('content-security-policy'),
    );
  });

  it('leaves other requests to the page and routes as before', async () => {
    const token = 'A'.repeat(43);
    const visits = offer(fakeServer());
    for (const [path, headers] of [
      [`/s/${token}?field=other`, {}],
      [`/s/${token}`, { rsc: '1' }],
      [`/s/${token}`, { [SHARE_RENDER_HEADER]: '1' }],
      [`/s/${token}/picture/1/uvi.svg`, {}],
      ['/studio/1', {}],
    ] as const) {
      const res = await proxy(new NextRequest(`http://localhost:3000${path}`, { headers }));
      expect(res.headers.get('x-middleware-next'), path).toBe('1');
    }
    const head = await proxy(new NextRequest(`http://localhost:3000/s/${token}`, { method: 'HEAD' }));
    expect(head.headers.get('x-middleware-next')).toBe('1');
    expect(visits).toEqual([]);
  });
});
