/**
 * Which navigation entry the page at `pathname` belongs to: the one whose address is the page's or the
 * longest that contains it as a folder. One page is in one area only, so `/counter/dashboard` is "Counter
 * figures" and not also "Counter"; a page under no entry marks none.
 */
export function activeNavHref(hrefs: readonly string[], pathname: string): string | null {
  let best: string | null = null;
  for (const href of hrefs) {
    const inside = pathname === href || pathname.startsWith(`${href}/`);
    if (inside && (best === null || href.length > best.length)) best = href;
  }
  return best;
}
