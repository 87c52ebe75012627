/**
 * Which share page requests the proxy sends to the held-HTML route (app/s/[token]/held) instead of the
 * page renderer. Kept free of server imports: proxy.ts runs it on every page request.
 *
 * Only a plain browser visit of `/s/<token>` with no query or one of the fields the page shows: the
 * page's HTML is the same for every visitor of those, so it is rendered once and held. Anything else
 * (another query, a HEAD, Next's own client-router requests for the page's RSC payload, and the held
 * route's own request to render the page) goes to the page as before.
 */

/** Marks the held route's own request for the page, which must reach the page renderer. */
export const SHARE_RENDER_HEADER = 'x-baskwell-share-render';

/** The fields the share page shows (its `?field=`), the first the default. */
export const SHARE_FIELDS = ['uvi', 'uvb', 'tempC'] as const;

const PAGE = /^\/s\/([A-Za-z0-9_-]{1,128})$/;
const SEARCH = new RegExp(`^(?:|\\?field=(?:${SHARE_FIELDS.join('|')}))$`);

// Headers Next's client router sends when it asks a page for its RSC payload rather than its HTML.
const ROUTER_HEADERS = [
  'rsc',
  'next-router-prefetch',
  'next-router-state-tree',
  'next-router-segment-prefetch',
];

/** True if `search` is one the held route serves (empty, or `?field=` with a field the page shows). */
export const isHeldShareSearch = (search: string) => SEARCH.test(search);

/**
 * The token of a share page visit the held HTML serves, or null when the request goes to the page
 * itself.
 */
export function heldShareToken(
  method: string,
  pathname: string,
  search: string,
  headers: Headers,
): string | null {
  if (method !== 'GET') return null;
  const page = PAGE.exec(pathname);
  if (!page || !isHeldShareSearch(search)) return null;
  if (headers.has(SHARE_RENDER_HEADER) || ROUTER_HEADERS.some((h) => headers.has(h))) return null;
  return page[1]!;
}

/** The held route's path for a visit of this link (`/s/<token>/held` with the visit's query). */
export const heldRoutePath = (token: string, search: string) => `/s/${token}/held${search}`;

/** A share page visit as the proxy hands it over: the link, the query, the request's nonce and headers. */
export type HeldShareVisit = { token: string; search: string; nonce: string; headers: Headers };

/** Answers a visit with the held page (or the page's not-found answer when the link does not work). */
export type HeldShareServer = (visit: HeldShareVisit) => Promise<Response>;

// The proxy and the app's routes are separate bundles in one process: the proxy cannot import the held
// route's code (it would load a second copy of the models and the database layer), so the held route
// leaves its server here when Next loads it, on the process's global object, and the proxy calls it.
// Before that (the first visit after a start) the proxy rewrites to the route, which loads it.
const SERVER = Symbol.for('baskwell.variants.share-html.server');
const slot = globalThis as typeof globalThis & { [SERVER]?: HeldShareServer | undefined };

/** The held route's server once the route has been loaded in this process, else null. */
export const heldShareServer = (): HeldShareServer | null => slot[SERVER] ?? null;

/** Called by the held route as it loads (and by tests, with undefined to take it back). */
export function offerHeldShareServer(serve: HeldShareServer | undefined): void {
  slot[SERVER] = serve;
}
