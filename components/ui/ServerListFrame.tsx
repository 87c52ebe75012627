'use client';

import { type ReactNode, useMemo } from 'react';
import { ListLoadError, ListPager, ListSearchBox } from '@/components/ui/ServerListParts';
import { Table, type TableColumn } from '@/components/ui/Table';
import { button } from '@/components/ui/styles';
import type { ServerList } from '@/components/ui/useServerList';
import type { ListSeek, ListViewCodec } from '@/lib/list-view';

/** A page of a server list; a keyset list's page also carries the cursors of its first and last rows. */
export type ServerListPage<R> = {
  items: R[];
  total: number;
  cursors?: { next: string | null; prev: string | null };
};

/**
 * The frame of every list the server searches, sorts and pages (enclosures, the lamp log, keepers,
 * members): the search box with the count, the list's own filters, the load error, the page's rows with
 * sortable headers, "nothing matches" and the pager, around `useServerList`. Rows of the previous view
 * stay up while the next loads (or failed to): dimmed, and not counted.
 *
 * A list whose view codec says `keyset` moves to the next or previous page from the cursors of the rows
 * shown, so the server seeks through its index instead of counting rows off; the others page by offset.
 */
export function ServerListFrame<C extends string, R, P extends ServerListPage<R>>({
  list,
  codec,
  noun,
  placeholder,
  narrowed = false,
  filters,
  empty,
  columns,
  rowKey,
  rowClassName,
  testId,
}: {
  list: ServerList<C, P>;
  codec: ListViewCodec<C>;
  /** "1 keeper", "3 keepers", and the caption screen readers read for the table. */
  noun: { one: string; many: string; caption: string };
  placeholder: string;
  /** Filters besides the search narrow the list, so the count says "match". */
  narrowed?: boolean;
  /** Controls between the search box and the table. */
  filters?: ReactNode;
  /** What an empty list says instead of "no … matches" and "no … here yet". */
  empty?: ReactNode;
  columns: readonly (TableColumn<R> | false)[];
  rowKey: (row: R) => string | number;
  rowClassName?: string;
  testId?: string;
}) {
  const { view, show, result } = list;
  const data = result.data;
  const items = useMemo(() => data?.items ?? [], [data]);
  const total = data?.total ?? 0;
  const stale = result.isPlaceholderData || !data;
  const busy = result.isFetching && stale;
  const count = (n: number) => `${n} ${n === 1 ? noun.one : noun.many}`;
  // A cursor is good only while the rows it was given for are the ones shown.
  const seekTo = (page: number): ListSeek | undefined => {
    const cursors = codec.spec.keyset && !stale ? data?.cursors : undefined;
    if (!cursors || page === 1) return undefined;
    if (page === view.page + 1 && cursors.next) return { after: cursors.next };
    if (page === view.page - 1 && cursors.prev) return { before: cursors.prev };
    return undefined;
  };

  return (
    <div>
      <div className="mb-3">
        <ListSearchBox
          label={`Search ${noun.many}`}
          value={list.draft}
          onChange={list.setDraft}
          maxLength={codec.spec.maxSearch}
          placeholder={placeholder}
          // The count of the rows shown; while another view loads, the old count would mislead.
          status={
            busy
              ? `Loading ${noun.many}…`
              : stale
                ? ''
                : view.q || narrowed
                  ? `${count(total)} ${total === 1 ? 'matches' : 'match'}`
                  : count(total)
          }
        />
      </div>
      {filters}
      {result.isError && (
        <ListLoadError what={noun.many} message={result.error.message} retry={() => void result.refetch()} />
      )}
      <Table
        data={items}
        columns={columns}
        caption={noun.caption}
        rowKey={rowKey}
        sort={{
          sort: view.sort,
          onSort: (column: C) => show({ sort: codec.nextSort(view.sort, column), page: 1 }),
        }}
        stale={stale}
        busy={busy}
        stack
        rowClassName={rowClassName}
        testId={testId}
      >
        {!stale && total === 0 && (
          <div className="px-4 py-6 text-center text-body text-basalt-600" role="status">
            {empty ??
              (view.q ? (
                <>
                  <p>
                    No {noun.one} matches “{view.q}”.
                  </p>
                  <button type="button" className={`${button.quiet} mt-2`} onClick={list.clearSearch}>
                    Clear the search
                  </button>
                </>
              ) : (
                <p>No {noun.many} here yet.</p>
              ))}
          </div>
        )}
      </Table>
      <ListPager
        page={view.page}
        pageSize={codec.spec.pageSize}
        total={total}
        pages={codec.pageCount(total)}
        noun={noun.many}
        onPage={(page) => show({ page, seek: seekTo(page) })}
      />
    </div>
  );
}
