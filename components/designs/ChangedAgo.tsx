'use client';

import { useHydrated, useViewerZone } from '@/components/ui/LocalTime';
import { formatMoment } from '@/lib/time/format';
import { changedAgo } from './list-helpers';

/**
 * When a design or variant last changed, relative to now. The server's "now" is not the browser's, so
 * the page is rendered and hydrated with the date and time, and turns relative right after.
 */
export function ChangedAgo({ iso }: { iso: string }) {
  const zone = useViewerZone();
  const hydrated = useHydrated();
  return (
    <time dateTime={iso} title={formatMoment(iso, zone, 'datetime')}>
      {hydrated ? changedAgo(iso, new Date(), zone) : formatMoment(iso, zone, 'datetime')}
    </time>
  );
}
