'use client';

import { LocalTime } from '@/components/ui/LocalTime';
import { type ColumnDef, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import Link from '@/components/ui/Link';
import { useMemo } from 'react';
import { ListLoadError, ListPager, ListSearchBox, SortableHeader } from '@/components/ui/ServerListParts';
import { button, link } from '@/components/ui/styles';
import { formatSize, type LengthUnit } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import {
  ENCLOSURE_PAGE_SIZE,
  MAX_ENCLOSURE_SEARCH,
  type EnclosureListView,
  type EnclosureSortColumn,
  nextSort,
  pageCount,
} from '@/lib/enclosures/list-view';
import type { EnclosureView } from './types';
import { type EnclosurePage, useEnclosureList } from './useEnclosureList';

const cell = 'px-4 py-3 text-basalt-700';

type Column = ColumnDef<EnclosureView> & { id: EnclosureSortColumn };

function columnsFor(showKeeper: boolean, unit: LengthUnit): Column[] {
  const columns: (Column | false)[] = [
    {
      id: 'name',
      header: 'Enclosure',
      cell: ({ row: { original: e } }) => (
        <Link href={`/enclosures/${e.id}`} className={link}>
          {e.name}
        </Link>
      ),
    },
    {
      id: 'animal',
      header: 'Animal',
      cell: ({ row: { original: e } }) =>
        e.animalName || e.speciesName ? (
          <>
            {e.animalName && <span className="font-medium text-basalt-900">{e.animalName}</span>}
            {e.animalName && e.speciesName && ' · '}
            {e.speciesName}
          </>
        ) : (
          <span className="text-basalt-500">Not set</span>
        ),
    },
    showKeeper && {
      id: 'keeper',
      header: 'Keeper',
      cell: ({ row: { original: e } }) => e.keeperName ?? 'Former member',
    },
    {
      id: 'size',
      header: 'Size (W × H × D)',
      cell: ({ row: { original: e } }) => (
        <span className="whitespace-nowrap tabular-nums">
          {formatSize(e.widthCm, e.heightCm, e.depthCm, unit)}
        </span>
      ),
    },
    {
      id: 'updated',
      header: 'Updated',
      cell: ({ row: { original: e } }) => (
        <LocalTime value={e.updatedAt} shown="day" className="whitespace-nowrap text-basalt-500" />
      ),
    },
  ];
  return columns.filter((c): c is Column => Boolean(c));
}

/**
 * The organisation's enclosures, searched, sorted and paged by the server (the table library only
 * lays out the page it is given). Search, sort and page are in the address bar.
 */
export function EnclosureTable({
  organisationId,
  keeperId,
  showKeeper,
  initial,
}: {
  organisationId: number;
  /** Staff looking at one keeper's enclosures; a keeper's own list is narrowed by the server. */
  keeperId?: number;
  showKeeper: boolean;
  initial: { view: EnclosureListView; page: EnclosurePage };
}) {
  const [unit] = useLengthUnit();
  const { view, draft, setDraft, clearSearch, show, result } = useEnclosureList({
    organisationId,
    keeperId,
    initial,
  });
  const columns = useMemo(() => columnsFor(showKeeper, unit), [showKeeper, unit]);
  const sorting = useMemo(() => [{ id: view.sort.column, desc: view.sort.descending }], [view.sort]);
  const data = result.data;
  const items = useMemo(() => data?.items ?? [], [data]);
  const total = data?.total ?? 0;
  const pages = pageCount(total);
  // Rows of the previous view stay up while the next loads (or failed to): dimmed, and not counted.
  const stale = result.isPlaceholderData || !data;
  const busy = result.isFetching && stale;
  // The React Compiler skips this component because the table instance cannot be memoised; nothing
  // memoised receives the instance, so the known warning is silenced here and nowhere else.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: items,
    columns,
    state: { sorting, pagination: { pageIndex: view.page - 1, pageSize: ENCLOSURE_PAGE_SIZE } },
    manualSorting: true,
    manualFiltering: true,
    manualPagination: true,
    rowCount: total,
    getCoreRowModel: getCoreRowModel(),
  });
  const rows = table.getRowModel().rows;

  return (
    <div>
      <div className="mb-3">
        <ListSearchBox
          label="Search enclosures"
          value={draft}
          onChange={setDraft}
          maxLength={MAX_ENCLOSURE_SEARCH}
          placeholder={showKeeper ? 'Name, animal, species or keeper' : 'Name, animal or species'}
          // The count of the rows shown; while another view loads, the old count would mislead.
          status={
            busy
              ? 'Loading enclosures…'
              : stale
                ? ''
                : view.q
                  ? `${total} ${total === 1 ? 'enclosure matches' : 'enclosures match'}`
                  : `${total} ${total === 1 ? 'enclosure' : 'enclosures'}`
          }
        />
      </div>
      {result.isError && (
        <ListLoadError what="enclosures" message={result.error.message} retry={() => void result.refetch()} />
      )}
      <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
        <table
          className={`min-w-full divide-y divide-basalt-200 text-left text-body ${stale ? 'opacity-60' : ''}`}
          aria-busy={busy}
        >
          <caption className="sr-only">Enclosures</caption>
          <thead className="bg-basalt-50 text-caption uppercase tracking-wide text-basalt-600">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => (
                  <SortableHeader
                    key={header.id}
                    column={header.column.id as EnclosureSortColumn}
                    sort={view.sort}
                    onSort={(column) => show({ sort: nextSort(view.sort, column), page: 1 })}
                  >
                    {flexRender(header.column.columnDef.header, header.getContext())}
                  </SortableHeader>
                ))}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-basalt-100">
            {rows.map((row) => (
              <tr key={row.original.id} className="hover:bg-basalt-50">
                {row.getVisibleCells().map((c) => (
                  <td key={c.id} className={cell}>
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {!stale && total === 0 && (
          <div className="px-4 py-6 text-center text-body text-basalt-600" role="status">
            {view.q ? (
              <>
                <p>No enclosure matches “{view.q}”.</p>
                <button type="button" className={`${button.quiet} mt-2`} onClick={clearSearch}>
                  Clear the search
                </button>
              </>
            ) : (
              <p>No enclosures here yet.</p>
            )}
          </div>
        )}
      </div>
      <ListPager
        page={view.page}
        pageSize={ENCLOSURE_PAGE_SIZE}
        total={total}
        pages={pages}
        noun="enclosures"
        onPage={(page) => show({ page })}
      />
    </div>
  );
}
