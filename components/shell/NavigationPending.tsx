'use client';

import { useLinkStatus } from 'next/link';

/**
 * A bar across the top of the window while the page a link opens is loading. Signed-in pages that may
 * answer "not found" have no loading skeleton (it would fix the status at 200 before the page runs), so
 * without this a click on a slow page would look ignored. Rendered inside the link (useLinkStatus
 * reads the nearest one) but fixed to the window, so it never shifts the link's text; only the last
 * link clicked shows it. It appears after a short delay, so quick navigations do not flash.
 */
export function NavigationPending() {
  const { pending } = useLinkStatus();
  if (!pending) return null;
  return (
    <span aria-hidden="true" data-testid="navigation-pending" className="navigation-pending">
      <span />
    </span>
  );
}
