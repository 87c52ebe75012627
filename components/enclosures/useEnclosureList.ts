'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'next/navigation';
import { useCallback, useEffect, useMemo, useState } from 'react';
import { apiFetch } from '@/components/ui/api-client';
import {
  apiQueryForView,
  type EnclosureListView,
  pageCount,
  searchParamsForView,
  viewFromSearchParams,
} from '@/lib/enclosures/list-view';
import type { EnclosureView } from './types';

export type EnclosurePage = { items: EnclosureView[]; total: number; offset: number; limit: number };

/** Typing settles for this long before the search is sent (and written to the address bar). */
export const SEARCH_DEBOUNCE_MS = 300;

/**
 * The list's view lives in the address bar, so a link reproduces it and Back steps through it.
 * `history.pushState` updates `useSearchParams` without a server round trip (the table fetches its
 * own rows from the API).
 */
function navigate(view: EnclosureListView, mode: 'push' | 'replace' = 'push') {
  const params = searchParamsForView(view, new URLSearchParams(window.location.search)).toString();
  const url = `${window.location.pathname}${params ? `?${params}` : ''}`;
  if (mode === 'push') window.history.pushState(null, '', url);
  else window.history.replaceState(null, '', url);
}

/**
 * Search, sort and page of the enclosures table, fetched from `GET /api/enclosures`. The previous
 * page stays on screen (marked busy) while the next one loads; `initial` is what the server rendered
 * for the address the page was opened with.
 */
export function useEnclosureList({
  organisationId,
  keeperId,
  initial,
}: {
  organisationId: number;
  keeperId?: number;
  initial: { view: EnclosureListView; page: EnclosurePage };
}) {
  const searchParams = useSearchParams();
  const view = useMemo(
    () => viewFromSearchParams(new URLSearchParams(searchParams.toString())),
    [searchParams],
  );
  const apiQuery = apiQueryForView(view, { organisationId, keeperId }).toString();
  const initialQuery = apiQueryForView(initial.view, { organisationId, keeperId }).toString();

  const result = useQuery({
    queryKey: ['enclosures', apiQuery],
    queryFn: ({ signal }) => apiFetch<EnclosurePage>(`/api/enclosures?${apiQuery}`, { signal }),
    placeholderData: keepPreviousData,
    initialData: apiQuery === initialQuery ? initial.page : undefined,
  });

  // What the search box shows runs ahead of the address while someone types. When the address
  // changes from elsewhere (Back, a link), the box follows it; our own debounced write does not
  // reset it, or keys typed while it was sent would be lost.
  const [draft, setDraft] = useState(view.q);
  const [seenQ, setSeenQ] = useState(view.q);
  const [sentQ, setSentQ] = useState(view.q);
  if (view.q !== seenQ) {
    setSeenQ(view.q);
    if (view.q !== sentQ) {
      setDraft(view.q);
      setSentQ(view.q);
    }
  }

  useEffect(() => {
    const q = draft.trim();
    if (q === view.q) return;
    const timer = setTimeout(() => {
      setSentQ(q);
      navigate({ ...view, q, page: 1 });
    }, SEARCH_DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [draft, view]);

  // A page past the end (rows deleted since the link was made): show the last page instead.
  const total = result.data?.total;
  useEffect(() => {
    if (total !== undefined && !result.isPlaceholderData && view.page > pageCount(total)) {
      navigate({ ...view, page: pageCount(total) }, 'replace');
    }
  }, [total, result.isPlaceholderData, view]);

  const show = useCallback((next: Partial<EnclosureListView>) => navigate({ ...view, ...next }), [view]);
  const clearSearch = useCallback(() => {
    setDraft('');
    setSentQ('');
    navigate({ ...view, q: '', page: 1 });
  }, [view]);

  return { view, draft, setDraft, clearSearch, show, result };
}
