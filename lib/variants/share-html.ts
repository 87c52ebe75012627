import 'server-only';
import { createHash } from 'node:crypto';
import { getBotType } from 'next/dist/shared/lib/router/utils/is-bot';
import { nonceOf } from '@/lib/security/csp';
import { FALLBACK_ZONE, knownZone, ZONE_COOKIE } from '@/lib/time/format';
import { Lru } from './lru';
import type { ShareRecord } from './queries';
import { isHeldShareSearch, SHARE_RENDER_HEADER, type HeldShareVisit } from './share-html-path';

/**
 * The share page's HTML, rendered once by Next and then held in memory, so a view costs a string join
 * rather than a page render (server components, their RSC payload and the HTML made from it).
 *
 * The page itself (app/s/[token]/page.tsx) stays the one place the page is written: on a miss the held
 * route asks this server for it (marked so the proxy lets it through to the page) and keeps what came
 * back, split at the CSP nonce Next put on its scripts; each view joins the parts with its own request's
 * nonce, so every answer carries a fresh nonce as before. The link is checked on every view by the
 * caller (`findShare`, one query): a revoked or expired link never reaches the held HTML, it gets the
 * page's own not-found answer.
 *
 * What the HTML depends on is in the key: the token (its links and picture addresses), the query, the
 * viewer's time zone (the expiry is written in it), the kind of client Next renders for (crawlers get
 * their metadata differently), and everything the link's query returned — names, version, expiry, the
 * stored design and the species sheet — hashed. A save, a rename or an edited sheet is therefore a new
 * key, never a stale page.
 */

/** A page as the server answered it. */
export type RenderedPage = {
  status: number;
  /** The answer's own headers worth keeping (see REPLAYED). */
  headers: [string, string][];
  body: string;
  /** The nonce in the answer's Content-Security-Policy, which Next put on the page's scripts. */
  nonce: string | null;
};

export type RenderRequest = { path: string; zone: string; userAgent: string };
export type Renderer = (request: RenderRequest) => Promise<RenderedPage>;

// The page answer's own headers. The security headers come from next.config.ts and the policy from the
// proxy, for the held answer as for the page. Vary is the page's: Next adds it to its routes' answers,
// not to one the proxy sends itself.
const REPLAYED = ['content-type', 'cache-control', 'link', 'x-robots-tag', 'vary'];

/**
 * The page rendered by this server, through the proxy like any request (so with a nonce of its own).
 * Next's server records the address it listens on as it starts (`next start` and `next dev` alike).
 */
export const renderThroughServer: Renderer = async ({ path, zone, userAgent }) => {
  const origin = process.env.__NEXT_PRIVATE_ORIGIN;
  if (!origin) throw new Error('the share page is rendered only inside the running Next server');
  const res = await fetch(new URL(path, origin), {
    headers: {
      [SHARE_RENDER_HEADER]: '1',
      accept: 'text/html',
      'user-agent': userAgent,
      // The one cookie the page reads: no session, so nothing of the visitor's account can be held.
      cookie: `${ZONE_COOKIE}=${zone}`,
    },
    redirect: 'manual',
    cache: 'no-store',
    signal: AbortSignal.timeout(30_000),
  });
  const body = await res.text();
  const headers = REPLAYED.flatMap((name): [string, string][] => {
    const value = res.headers.get(name);
    return value === null ? [] : [[name, value]];
  });
  return { status: res.status, headers, body, nonce: nonceOf(res.headers.get('content-security-policy')) };
};

/**
 * A page ready to serve with any nonce: its body, and its header values (the Link header preloads the
 * font and CSS with the nonce too), cut at every place its own nonce stood. The body's parts are kept
 * as UTF-8 bytes: a view then copies some 70 kB into one buffer instead of joining a string and
 * encoding it again (the page has non-ASCII text, so the string is encoded character by character).
 */
type Held = { status: number; headers: [string, string[]][]; parts: Buffer[] };

function held(page: RenderedPage): Held {
  // No nonce in the answer (no policy was made for it): nothing to replace.
  const cut = (text: string) => (page.nonce ? text.split(page.nonce) : [text]);
  return {
    status: page.status,
    headers: page.headers.map(([name, value]) => [name, cut(value)]),
    parts: cut(page.body).map((part) => Buffer.from(part, 'utf8')),
  };
}

function respond(page: Held, nonce: string): Response {
  const headers = new Headers();
  for (const [name, parts] of page.headers) headers.set(name, parts.join(nonce));
  const sep = Buffer.from(nonce, 'utf8');
  const pieces = page.parts.flatMap((part, i) => (i === 0 ? [part] : [sep, part]));
  return new Response(Buffer.concat(pieces), { status: page.status, headers });
}

// About 70 kB an entry; a link's views are one entry per field (and zone), so this holds the pages of
// some forty links opened at the same time.
const KEY = Symbol.for('baskwell.variants.share-html');
const holder = globalThis as typeof globalThis & { [KEY]?: Lru<string, Promise<Held>> };
const pages = () => (holder[KEY] ??= new Lru<string, Promise<Held>>(128));

function pageKey(token: string, search: string, zone: string, userAgent: string, share: ShareRecord) {
  return [
    token,
    search,
    zone,
    getBotType(userAgent) ?? 'browser',
    createHash('sha256').update(JSON.stringify(share)).digest('base64url'),
  ].join('\n');
}

/**
 * The share page for this request (as the held route gets it, the nonce in its policy header): see
 * `heldShareHtml`.
 */
export function sharePageHtml(
  request: Request,
  token: string,
  share: ShareRecord | null,
  render: Renderer = renderThroughServer,
): Promise<Response> {
  const visit = {
    token,
    search: new URL(request.url).search,
    nonce: nonceOf(request.headers.get('content-security-policy')),
    headers: request.headers,
  };
  return heldShareHtml(visit, share, render);
}

/**
 * The share page for this visit: held HTML with the visit's nonce when the link works (rendering and
 * holding it on the first view; views that arrive together share that render), otherwise the page as
 * the server renders it now (the not-found page of a revoked, expired or unknown link; a page asked for
 * without a nonce). Only a 200 is held.
 */
export async function heldShareHtml(
  visit: Omit<HeldShareVisit, 'nonce'> & { nonce: string | null },
  share: ShareRecord | null,
  render: Renderer = renderThroughServer,
): Promise<Response> {
  const { token, search, nonce, headers } = visit;
  const zone = knownZone(cookieValue(headers.get('cookie'), ZONE_COOKIE)) ?? FALLBACK_ZONE;
  const userAgent = headers.get('user-agent') ?? '';
  const wanted: RenderRequest = { path: `/s/${token}${search}`, zone, userAgent };
  if (!share) {
    // The page's own not-found answer, as before; a plain one if the page cannot be rendered.
    const page = await render(wanted).catch(() => null);
    return page ? respond(held(page), nonce ?? page.nonce ?? '') : gone();
  }
  if (!nonce || !isHeldShareSearch(search)) {
    const page = await render(wanted);
    return respond(held(page), nonce ?? page.nonce ?? '');
  }
  const lru = pages();
  const key = pageKey(token, search, zone, userAgent, share);
  let made = lru.get(key);
  if (!made) {
    made = render(wanted).then(held);
    lru.set(key, made);
    const mine = made;
    const forget = () => {
      if (lru.get(key) === mine) lru.delete(key);
    };
    // A failed render, or an answer other than the page (the link revoked meanwhile, an error), is
    // served to the requests that waited for it and not kept.
    made.then((page) => page.status !== 200 && forget(), forget);
  }
  return respond(await made, nonce);
}

const gone = () =>
  new Response('This link does not exist or no longer works.', {
    status: 404,
    headers: { 'content-type': 'text/plain; charset=utf-8', 'cache-control': 'no-store' },
  });

function cookieValue(header: string | null, name: string): string | null {
  for (const pair of header?.split(';') ?? []) {
    const at = pair.indexOf('=');
    if (at <= 0 || pair.slice(0, at).trim() !== name) continue;
    try {
      return decodeURIComponent(pair.slice(at + 1).trim());
    } catch {
      return null; // not a zone the browser wrote
    }
  }
  return null;
}

/** For tests: start with no pages held. */
export const sharePagesHtml = { clear: () => pages().clear(), size: () => pages().size };
