'use client';

import { type ColumnDef, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import Link from '@/components/ui/Link';
import { useId, useMemo } from 'react';
import { Notice } from '@/components/ui/Notice';
import { button, focusRing, input, link } from '@/components/ui/styles';
import { formatSize, type LengthUnit } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import {
  ariaSortFor,
  ENCLOSURE_PAGE_SIZE,
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
        <time dateTime={e.updatedAt} className="whitespace-nowrap text-basalt-500">
          {e.updatedAt.slice(0, 10)}
        </time>
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
  const searchId = useId();
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
  const first = (view.page - 1) * ENCLOSURE_PAGE_SIZE + 1;

  return (
    <div>
      <div className="mb-3 flex flex-wrap items-end gap-3">
        <div className="w-full max-w-sm">
          <label htmlFor={searchId} className="mb-1 block text-caption font-medium text-basalt-700">
            Search enclosures
          </label>
          <input
            id={searchId}
            type="search"
            value={draft}
            onChange={(ev) => setDraft(ev.target.value)}
            maxLength={120}
            placeholder={showKeeper ? 'Name, animal, species or keeper' : 'Name, animal or species'}
            className={input}
          />
        </div>
        <p className="pb-2 text-caption text-basalt-500" aria-live="polite">
          {/* The count of the rows shown; while another view loads, the old count would mislead. */}
          {busy
            ? 'Loading enclosures…'
            : stale
              ? ''
              : view.q
                ? `${total} ${total === 1 ? 'enclosure matches' : 'enclosures match'}`
                : `${total} ${total === 1 ? 'enclosure' : 'enclosures'}`}
        </p>
      </div>
      {result.isError && (
        <div className="mb-3">
          <Notice tone="error" title="The enclosures could not be loaded.">
            <p>{result.error.message}</p>
            <button
              type="button"
              className={`${button.secondary} mt-2`}
              onClick={() => void result.refetch()}
            >
              Try again
            </button>
          </Notice>
        </div>
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
                {group.headers.map((header) => {
                  const column = header.column.id as EnclosureSortColumn;
                  const state = ariaSortFor(column, view.sort);
                  return (
                    <th key={header.id} scope="col" aria-sort={state} className="px-2 py-1 font-semibold">
                      <button
                        type="button"
                        onClick={() => show({ sort: nextSort(view.sort, column), page: 1 })}
                        className={`inline-flex items-center gap-1 rounded px-2 py-1 uppercase tracking-wide hover:bg-basalt-100 ${focusRing}`}
                      >
                        {flexRender(header.column.columnDef.header, header.getContext())}
                        <span aria-hidden="true" className={state === 'none' ? 'text-basalt-300' : ''}>
                          {state === 'ascending' ? '▲' : state === 'descending' ? '▼' : '↕'}
                        </span>
                      </button>
                    </th>
                  );
                })}
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
      {total > ENCLOSURE_PAGE_SIZE && (
        <nav aria-label="Pages of enclosures" className="mt-3 flex flex-wrap items-center justify-end gap-3">
          <p className="text-caption text-basalt-600">
            {first}–{Math.min(first + ENCLOSURE_PAGE_SIZE - 1, total)} of {total} · page {view.page} of{' '}
            {pages}
          </p>
          <button
            type="button"
            className={button.secondary}
            disabled={view.page <= 1}
            onClick={() => show({ page: view.page - 1 })}
          >
            Previous page
          </button>
          <button
            type="button"
            className={button.secondary}
            disabled={view.page >= pages}
            onClick={() => show({ page: view.page + 1 })}
          >
            Next page
          </button>
        </nav>
      )}
    </div>
  );
}
