'use client';

import { useMemo } from 'react';
import { ListLoadError, ListPager, ListSearchBox } from '@/components/ui/ServerListParts';
import { Table, type TableColumn } from '@/components/ui/Table';
import { button } from '@/components/ui/styles';
import type { ListView, ListViewCodec } from '@/lib/list-view';
import { MAX_PEOPLE_SEARCH, PEOPLE_PAGE_SIZE } from '@/lib/people/list-view';
import type { PeoplePage } from './usePeopleList';

type ServerListState<C extends string, R> = {
  view: ListView<C>;
  draft: string;
  setDraft: (v: string) => void;
  clearSearch: () => void;
  show: (next: Partial<ListView<C>>) => void;
  result: {
    data: PeoplePage<R> | undefined;
    isPlaceholderData: boolean;
    isFetching: boolean;
    error: Error | null;
    refetch: () => unknown;
  };
};

/**
 * The keepers and members tables: the search box with the count, the load error, the page's rows
 * with sortable headers, "no one matches" and the pager, around a server list (useServerList).
 */
export function PeopleListFrame<C extends string, R extends { userId: number }>({
  noun,
  state,
  codec,
  columns,
}: {
  noun: { one: string; many: string; caption: string };
  state: ServerListState<C, R>;
  codec: ListViewCodec<C>;
  columns: readonly TableColumn<R>[];
}) {
  const { view, show, result } = state;
  const data = result.data;
  const items = useMemo(() => data?.items ?? [], [data]);
  const total = data?.total ?? 0;
  // Rows of the previous view stay up while the next loads (or failed to): dimmed, and not counted.
  const stale = result.isPlaceholderData || !data;
  const busy = result.isFetching && stale;
  const count = (n: number) => `${n} ${n === 1 ? noun.one : noun.many}`;
  return (
    <div>
      <div className="mb-3">
        <ListSearchBox
          label={`Search ${noun.many}`}
          value={state.draft}
          onChange={state.setDraft}
          maxLength={MAX_PEOPLE_SEARCH}
          placeholder="Name or e-mail"
          // The count of the rows shown; while another view loads, the old count would mislead.
          status={
            busy
              ? `Loading ${noun.many}…`
              : stale
                ? ''
                : view.q
                  ? `${count(total)} ${total === 1 ? 'matches' : 'match'}`
                  : count(total)
          }
        />
      </div>
      {result.error && (
        <ListLoadError what={noun.many} message={result.error.message} retry={() => void result.refetch()} />
      )}
      <Table
        data={items}
        columns={columns}
        caption={noun.caption}
        rowKey={(r) => r.userId}
        rowClassName=""
        sort={{
          sort: view.sort,
          onSort: (column: C) => show({ sort: codec.nextSort(view.sort, column), page: 1 }),
        }}
        stale={stale}
        busy={busy}
      >
        {!stale && total === 0 && (
          <div className="px-4 py-6 text-center text-body text-basalt-600" role="status">
            {view.q ? (
              <>
                <p>
                  No {noun.one} matches “{view.q}”.
                </p>
                <button type="button" className={`${button.quiet} mt-2`} onClick={state.clearSearch}>
                  Clear the search
                </button>
              </>
            ) : (
              <p>No {noun.many} here yet.</p>
            )}
          </div>
        )}
      </Table>
      <ListPager
        page={view.page}
        pageSize={PEOPLE_PAGE_SIZE}
        total={total}
        pages={codec.pageCount(total)}
        noun={noun.many}
        onPage={(page) => show({ page })}
      />
    </div>
  );
}
