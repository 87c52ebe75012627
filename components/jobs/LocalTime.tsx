'use client';

import { useSyncExternalStore } from 'react';

const never = () => () => undefined;

const local = (iso: string) =>
  new Date(iso).toLocaleString(undefined, {
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    hour: '2-digit',
    minute: '2-digit',
  });

/**
 * A moment in the viewer's own time zone. The server does not know it, so the server's render (and a
 * browser without script) shows UTC, labelled as such; the browser shows its local time.
 */
export function LocalTime({ iso }: { iso: string }) {
  const text = useSyncExternalStore(
    never,
    () => local(iso),
    () => `${iso.slice(0, 16).replace('T', ' ')} UTC`,
  );
  return <time dateTime={iso}>{text}</time>;
}
