'use client';

import {
  type ColumnDef,
  flexRender,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
} from '@tanstack/react-table';
import Link from '@/components/ui/Link';
import { useId, useMemo, useState } from 'react';
import { button, focusRing, input, link } from '@/components/ui/styles';
import { formatSize, type LengthUnit, useLengthUnit } from '@/components/ui/units';
import {
  ariaSortFor,
  compareEnclosures,
  DEFAULT_ENCLOSURE_SORT,
  type EnclosureSort,
  type EnclosureSortColumn,
  matchesEnclosureSearch,
  nextSort,
} from './enclosure-table-model';
import type { EnclosureView } from './types';

const cell = 'px-4 py-3 text-basalt-700';

function columnsFor(showKeeper: boolean, unit: LengthUnit): ColumnDef<EnclosureView>[] {
  // The library only sorts and searches columns that have an accessor, so each column names one.
  const sortBy = (column: EnclosureSortColumn) => ({
    id: column,
    accessorFn: (e: EnclosureView) => e.id,
    sortingFn: (a: { original: EnclosureView }, b: { original: EnclosureView }) =>
      compareEnclosures(a.original, b.original, column),
  });
  const columns: (ColumnDef<EnclosureView> | false)[] = [
    {
      ...sortBy('name'),
      header: 'Enclosure',
      cell: ({ row: { original: e } }) => (
        <Link href={`/enclosures/${e.id}`} className={link}>
          {e.name}
        </Link>
      ),
    },
    {
      ...sortBy('animal'),
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
      ...sortBy('keeper'),
      header: 'Keeper',
      cell: ({ row: { original: e } }) => e.keeperName ?? 'Former member',
    },
    {
      ...sortBy('size'),
      header: 'Size (W × H × D)',
      cell: ({ row: { original: e } }) => (
        <span className="whitespace-nowrap tabular-nums">
          {formatSize(e.widthCm, e.heightCm, e.depthCm, unit)}
        </span>
      ),
    },
    {
      ...sortBy('updated'),
      header: 'Updated',
      cell: ({ row: { original: e } }) => (
        <time dateTime={e.updatedAt} className="whitespace-nowrap text-basalt-500">
          {e.updatedAt.slice(0, 10)}
        </time>
      ),
    },
  ];
  return columns.filter((c): c is ColumnDef<EnclosureView> => Boolean(c));
}

/** The organisation's enclosures: searchable by name, animal, species and keeper; every column sorts. */
export function EnclosureTable({
  enclosures,
  showKeeper,
}: {
  enclosures: EnclosureView[];
  showKeeper: boolean;
}) {
  const [unit] = useLengthUnit();
  const [query, setQuery] = useState('');
  const [sort, setSort] = useState<EnclosureSort>(DEFAULT_ENCLOSURE_SORT);
  const searchId = useId();
  const columns = useMemo(() => columnsFor(showKeeper, unit), [showKeeper, unit]);
  // A stable sorting array: a fresh one each render makes the library re-sort and reset its page
  // index on every render, which re-renders again without end (the page froze on the unit toggle).
  const sorting = useMemo(() => [{ id: sort.column, desc: sort.descending }], [sort]);
  // The React Compiler skips this component because the table instance cannot be memoised; nothing
  // memoised receives the instance, so the known warning is silenced here and nowhere else.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: enclosures,
    columns,
    state: { globalFilter: query, sorting },
    autoResetPageIndex: false,
    globalFilterFn: (row, _columnId, value: string) => matchesEnclosureSearch(row.original, value),
    getColumnCanGlobalFilter: () => true,
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  const rows = table.getRowModel().rows;

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
            value={query}
            onChange={(ev) => setQuery(ev.target.value)}
            placeholder={showKeeper ? 'Name, animal, species or keeper' : 'Name, animal or species'}
            className={input}
          />
        </div>
        <p className="pb-2 text-caption text-basalt-500" aria-live="polite">
          {query.trim()
            ? `${rows.length} of ${enclosures.length} enclosures match`
            : `${enclosures.length} enclosures`}
        </p>
      </div>
      <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
        <table className="min-w-full divide-y divide-basalt-200 text-left text-body">
          <caption className="sr-only">Enclosures</caption>
          <thead className="bg-basalt-50 text-caption uppercase tracking-wide text-basalt-600">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const column = header.column.id as EnclosureSortColumn;
                  const state = ariaSortFor(column, sort);
                  return (
                    <th key={header.id} scope="col" aria-sort={state} className="px-2 py-1 font-semibold">
                      <button
                        type="button"
                        onClick={() => setSort((s) => nextSort(s, column))}
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
        {rows.length === 0 && (
          <div className="px-4 py-6 text-center text-body text-basalt-600" role="status">
            <p>No enclosure matches “{query.trim()}”.</p>
            <button type="button" className={`${button.quiet} mt-2`} onClick={() => setQuery('')}>
              Clear the search
            </button>
          </div>
        )}
      </div>
    </div>
  );
}
