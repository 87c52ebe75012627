'use client';

import type { ReactNode } from 'react';
import { ListLoadError, ListPager, ListSearchBox } from '@/components/ui/ServerListParts';
import { button } from '@/components/ui/styles';
import { MAX_PEOPLE_SEARCH, PEOPLE_PAGE_SIZE } from '@/lib/people/list-view';

/**
 * What the keepers and members tables share around their rows: the search box with the count, the
 * load error, the "no one matches" line and the pager. `table` draws the page's rows.
 */
export function PeopleListFrame({
  noun,
  label,
  list,
  table,
}: {
  noun: { one: string; many: string };
  label: string;
  list: {
    q: string;
    page: number;
    draft: string;
    setDraft: (v: string) => void;
    clearSearch: () => void;
    onPage: (page: number) => void;
    total: number;
    pages: number;
    stale: boolean;
    busy: boolean;
    error: Error | null;
    retry: () => void;
  };
  table: (empty: ReactNode) => ReactNode;
}) {
  const { q, total, stale, busy } = list;
  const count = (n: number) => `${n} ${n === 1 ? noun.one : noun.many}`;
  return (
    <div>
      <div className="mb-3">
        <ListSearchBox
          label={label}
          value={list.draft}
          onChange={list.setDraft}
          maxLength={MAX_PEOPLE_SEARCH}
          placeholder="Name or e-mail"
          // The count of the rows shown; while another view loads, the old count would mislead.
          status={
            busy
              ? `Loading ${noun.many}…`
              : stale
                ? ''
                : q
                  ? `${count(total)} ${total === 1 ? 'matches' : 'match'}`
                  : count(total)
          }
        />
      </div>
      {list.error && <ListLoadError what={noun.many} message={list.error.message} retry={list.retry} />}
      {table(
        !stale && total === 0 && (
          <div className="px-4 py-6 text-center text-body text-basalt-600" role="status">
            {q ? (
              <>
                <p>
                  No {noun.one} matches “{q}”.
                </p>
                <button type="button" className={`${button.quiet} mt-2`} onClick={list.clearSearch}>
                  Clear the search
                </button>
              </>
            ) : (
              <p>No {noun.many} here yet.</p>
            )}
          </div>
        ),
      )}
      <ListPager
        page={list.page}
        pageSize={PEOPLE_PAGE_SIZE}
        total={total}
        pages={list.pages}
        noun={noun.many}
        onPage={list.onPage}
      />
    </div>
  );
}

/** The frame's `list` from a server list's state (useServerList) and its page count. */
export function frameOf<P extends { total: number }>(
  s: {
    view: { q: string; page: number };
    draft: string;
    setDraft: (v: string) => void;
    clearSearch: () => void;
    show: (next: { page: number }) => void;
    result: {
      data: P | undefined;
      isPlaceholderData: boolean;
      isFetching: boolean;
      error: Error | null;
      refetch: () => unknown;
    };
  },
  pageCount: (total: number) => number,
) {
  const total = s.result.data?.total ?? 0;
  // Rows of the previous view stay up while the next loads (or failed to): dimmed, and not counted.
  const stale = s.result.isPlaceholderData || !s.result.data;
  return {
    q: s.view.q,
    page: s.view.page,
    draft: s.draft,
    setDraft: s.setDraft,
    clearSearch: s.clearSearch,
    onPage: (page: number) => s.show({ page }),
    total,
    pages: pageCount(total),
    stale,
    busy: s.result.isFetching && stale,
    error: s.result.error,
    retry: () => void s.result.refetch(),
  };
}
