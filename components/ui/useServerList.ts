'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'next/navigation';
import { useCallback, useEffect, useMemo, useState } from 'react';
import { apiFetch } from '@/components/ui/api-client';
import type { ListView, ListViewCodec } from '@/lib/list-view';

/** Typing settles for this long before the search is sent (and written to the address bar). */
export const SEARCH_DEBOUNCE_MS = 300;

/**
 * A server-side list (search, sort, filters, page) whose view lives in the address bar, so a link
 * reproduces it and Back steps through it. `history.pushState` updates `useSearchParams` without a
 * server round trip; the rows come from the list's API. The previous page stays on screen (marked
 * busy) while the next one loads; `initial` is what the server rendered for the address the page was
 * opened with.
 */
export function useServerList<C extends string, P extends { total: number }>({
  codec,
  endpoint,
  scope,
  initial,
}: {
  codec: ListViewCodec<C>;
  endpoint: string;
  scope: Record<string, number | undefined>;
  initial: { view: ListView<C>; page: P };
}) {
  const searchParams = useSearchParams();
  const view = useMemo(
    () => codec.viewFromSearchParams(new URLSearchParams(searchParams.toString())),
    [codec, searchParams],
  );
  const navigate = useCallback(
    (next: ListView<C>, mode: 'push' | 'replace' = 'push') => {
      const params = codec.searchParamsForView(next, new URLSearchParams(window.location.search)).toString();
      const url = `${window.location.pathname}${params ? `?${params}` : ''}`;
      if (mode === 'push') window.history.pushState(null, '', url);
      else window.history.replaceState(null, '', url);
    },
    [codec],
  );
  const apiQuery = codec.apiQueryForView(view, scope).toString();
  const initialQuery = codec.apiQueryForView(initial.view, scope).toString();

  const result = useQuery({
    queryKey: [endpoint, apiQuery],
    queryFn: ({ signal }) => apiFetch<P>(`${endpoint}?${apiQuery}`, { signal }),
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
  }, [draft, view, navigate]);

  // A page past the end (rows deleted since the link was made): show the last page instead.
  const total = result.data?.total;
  useEffect(() => {
    if (total !== undefined && !result.isPlaceholderData && view.page > codec.pageCount(total)) {
      navigate({ ...view, page: codec.pageCount(total), seek: undefined }, 'replace');
    }
  }, [total, result.isPlaceholderData, view, codec, navigate]);

  // A cursor belongs to the page it was given for: any other change (sort, filter, a page without one)
  // drops it.
  const show = useCallback(
    (next: Partial<ListView<C>>) => navigate({ ...view, seek: undefined, ...next }),
    [view, navigate],
  );
  const clearSearch = useCallback(() => {
    setDraft('');
    setSentQ('');
    navigate({ ...view, q: '', page: 1 });
  }, [view, navigate]);

  return { view, draft, setDraft, clearSearch, show, result };
}

/** What `useServerList` gives a list's frame: its view, the search box's draft, and the rows' query. */
export type ServerList<C extends string, P extends { total: number }> = ReturnType<
  typeof useServerList<C, P>
>;
