'use client';
import { useCallback, useSyncExternalStore } from 'react';

/** Tailwind's `md` and `lg` breakpoints: below `md` is a phone, from `lg` the side columns fit. */
export const TABLET_QUERY = '(min-width: 768px)';
export const WIDE_QUERY = '(min-width: 1024px)';

/** Whether a media query matches now, following later changes (rotation, a resized window). */
export function useMediaQuery(query: string): boolean {
  const subscribe = useCallback(
    (onChange: () => void) => {
      const mq = window.matchMedia(query);
      mq.addEventListener('change', onChange);
      return () => mq.removeEventListener('change', onChange);
    },
    [query],
  );
  return useSyncExternalStore(
    subscribe,
    () => window.matchMedia(query).matches,
    // The studio is drawn in the browser only; a server render assumes a wide screen.
    () => true,
  );
}
