'use client';

import { createContext, useContext, useEffect, useSyncExternalStore, type ReactNode } from 'react';
import { FALLBACK_ZONE, formatMoment, knownZone, ZONE_COOKIE, type TimeShown } from '@/lib/time/format';

/** The zone the server rendered the page in (from the browser's cookie, or UTC on a first visit). */
const ServerZone = createContext<string>(FALLBACK_ZONE);

const browserZone = () => knownZone(Intl.DateTimeFormat().resolvedOptions().timeZone) ?? FALLBACK_ZONE;
const noSubscription = () => () => undefined;

/**
 * Gives every moment on the page the zone the server used, and remembers the browser's own zone in a
 * cookie so the next page is rendered in it from the start.
 */
export function ViewerZoneProvider({ zone, children }: { zone: string; children: ReactNode }) {
  useEffect(() => {
    const own = browserZone();
    if (own !== zone) {
      document.cookie = `${ZONE_COOKIE}=${own}; path=/; max-age=31536000; samesite=lax`;
    }
  }, [zone]);
  return <ServerZone.Provider value={zone}>{children}</ServerZone.Provider>;
}

/**
 * The viewer's time zone. While a server-rendered page hydrates it is the zone the server used (so the
 * text matches and React reports no mismatch); right after, the browser's own zone.
 */
export function useViewerZone(): string {
  const serverZone = useContext(ServerZone);
  return useSyncExternalStore(noSubscription, browserZone, () => serverZone);
}

/** A moment as a `<time>` element, in the viewer's time zone. */
export function LocalTime({
  value,
  shown = 'datetime',
  className,
}: {
  value: string | Date;
  shown?: TimeShown;
  className?: string;
}) {
  const zone = useViewerZone();
  const iso = typeof value === 'string' ? value : value.toISOString();
  return (
    <time dateTime={iso} className={className}>
      {formatMoment(value, zone, shown)}
    </time>
  );
}

/**
 * False while the server renders and the browser hydrates, true after: text that depends on the
 * present moment ("3 min ago") is shown only once it can no longer differ from the server's HTML.
 */
export function useHydrated(): boolean {
  return useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
}
