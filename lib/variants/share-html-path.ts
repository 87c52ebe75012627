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
 * The held route's path for this request (`/s/<token>/held` with the query), or null when the request
 * goes to the page itself.
 */
export function heldSharePath(
  method: string,
  pathname: string,
  search: string,
  headers: Headers,
): string | null {
  if (method !== 'GET') return null;
  const page = PAGE.exec(pathname);
  if (!page || !isHeldShareSearch(search)) return null;
  if (headers.has(SHARE_RENDER_HEADER) || ROUTER_HEADERS.some((h) => headers.has(h))) return null;
  return `/s/${page[1]}/held${search}`;
}
