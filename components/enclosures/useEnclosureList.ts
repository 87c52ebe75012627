'use client';

import { useServerList } from '@/components/ui/useServerList';
import { enclosureListView, type EnclosureListView } from '@/lib/enclosures/list-view';
import type { EnclosureRow } from './types';

export type EnclosurePage = { items: EnclosureRow[]; total: number; offset: number; limit: number };

export { SEARCH_DEBOUNCE_MS } from '@/components/ui/useServerList';

/** Search, sort and page of the enclosures table, fetched from `GET /api/enclosures`. */
export function useEnclosureList({
  organisationId,
  keeperId,
  initial,
}: {
  organisationId: number;
  keeperId?: number;
  initial: { view: EnclosureListView; page: EnclosurePage };
}) {
  return useServerList({
    codec: enclosureListView,
    endpoint: '/api/enclosures',
    scope: { organisationId, keeperId },
    initial,
  });
}
