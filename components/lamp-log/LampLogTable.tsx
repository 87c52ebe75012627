'use client';

import { type ColumnDef, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Select } from '@/components/ui/Select';
import { ListLoadError, ListPager, ListSearchBox, SortableHeader } from '@/components/ui/ServerListParts';
import { button } from '@/components/ui/styles';
import { useLengthUnit } from '@/components/ui/units';
import { useServerList } from '@/components/ui/useServerList';
import type { LampListPage } from '@/lib/api/lamp-list';
import {
  DUE_WITHIN_DAYS,
  LAMP_PAGE_SIZE,
  lampListView,
  MAX_LAMP_SEARCH,
  type LampListView,
  type LampSortColumn,
} from '@/lib/lamp-log/list-view';
import { STATUS_LABEL, STATUSES } from '@/lib/lamp-log/status';
import type { LampSummary } from '@/lib/lamp-log/store';
import type { LengthUnit } from '@/shared/units';
import {
  AgeCell,
  EnclosureCell,
  FallsBelowCell,
  LAMP_CELL,
  LampCell,
  LastReadingCell,
  RemainingCell,
  StatusCell,
} from './LampTable';

type Column = ColumnDef<LampSummary> & { id: LampSortColumn; className: string };

function columnsFor(unit: LengthUnit): Column[] {
  return [
    { id: 'lamp', header: 'Lamp', className: 'px-4 py-3', cell: ({ row }) => <LampCell l={row.original} /> },
    {
      id: 'enclosure',
      header: 'Enclosure',
      className: 'px-4 py-3',
      cell: ({ row }) => <EnclosureCell l={row.original} />,
    },
    {
      id: 'age',
      header: 'Age',
      className: LAMP_CELL.figure,
      cell: ({ row }) => <AgeCell l={row.original} />,
    },
    {
      id: 'lastReading',
      header: 'Last reading',
      className: LAMP_CELL.figure,
      cell: ({ row }) => <LastReadingCell l={row.original} unit={unit} />,
    },
    {
      id: 'remaining',
      header: 'Output left',
      className: LAMP_CELL.figure,
      cell: ({ row }) => <RemainingCell l={row.original} />,
    },
    {
      id: 'due',
      header: 'Basking zone below need',
      className: LAMP_CELL.text,
      cell: ({ row }) => <FallsBelowCell l={row.original} />,
    },
    {
      id: 'urgency',
      header: 'Status',
      className: 'px-4 py-3',
      cell: ({ row }) => <StatusCell l={row.original} />,
    },
  ];
}

export type PersonOption = { id: number; name: string };
export type TechOption = { id: string; label: string };

/**
 * The lamp log: the organisation's lamps searched, filtered, sorted and paged by the server (the table
 * library only lays out the page it is given), from the stored outlooks. The view is in the address bar.
 */
export function LampLogTable({
  organisationId,
  keepers,
  techs,
  initial,
}: {
  organisationId: number;
  /** Staff choose a keeper; null for a keeper, whose list the server narrows to their own. */
  keepers: PersonOption[] | null;
  techs: TechOption[];
  initial: { view: LampListView; page: LampListPage };
}) {
  const [unit] = useLengthUnit();
  const { view, draft, setDraft, show, result } = useServerList({
    codec: lampListView,
    endpoint: '/api/lamps',
    scope: { organisationId },
    initial,
  });
  const columns = useMemo(() => columnsFor(unit), [unit]);
  const sorting = useMemo(() => [{ id: view.sort.column, desc: view.sort.descending }], [view.sort]);
  const data = result.data;
  const items = useMemo(() => data?.items ?? [], [data]);
  const total = data?.total ?? 0;
  const pages = lampListView.pageCount(total);
  const stale = result.isPlaceholderData || !data;
  const busy = result.isFetching && stale;
  const filters = view.filters ?? {};
  const filtered = Object.keys(filters).some((k) => k !== 'retired' && k !== 'enclosure');
  const setFilter = (key: string, value: string) => {
    const next = { ...filters };
    if (value) next[key] = value;
    else delete next[key];
    show({ filters: next, page: 1 });
  };
  // See EnclosureTable: the table instance cannot be memoised by the React Compiler.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: items,
    columns,
    state: { sorting, pagination: { pageIndex: view.page - 1, pageSize: LAMP_PAGE_SIZE } },
    manualSorting: true,
    manualFiltering: true,
    manualPagination: true,
    rowCount: total,
    getCoreRowModel: getCoreRowModel(),
  });

  return (
    <div>
      <div className="mb-3 flex flex-wrap items-end gap-3">
        <div className="grow">
          <ListSearchBox
            label="Search lamps"
            value={draft}
            onChange={setDraft}
            maxLength={MAX_LAMP_SEARCH}
            placeholder="Lamp, lamp type, enclosure or species"
            status={
              busy
                ? 'Loading lamps…'
                : stale
                  ? ''
                  : view.q || filtered
                    ? `${total} ${total === 1 ? 'lamp matches' : 'lamps match'}`
                    : `${total} ${total === 1 ? 'lamp' : 'lamps'}`
            }
          />
        </div>
      </div>
      <fieldset className="mb-4 flex flex-wrap items-end gap-3">
        <legend className="sr-only">Filter the lamps</legend>
        <Select
          label="Status"
          value={filters.status ?? ''}
          onChange={(ev) => setFilter('status', ev.target.value)}
          className="w-40"
        >
          <option value="">Any in use</option>
          {STATUSES.map((s) => (
            <option key={s} value={s}>
              {STATUS_LABEL[s]}
            </option>
          ))}
        </Select>
        <Select
          label="Due within"
          value={filters.due ?? ''}
          onChange={(ev) => setFilter('due', ev.target.value)}
          className="w-36"
        >
          <option value="">Any time</option>
          {DUE_WITHIN_DAYS.map((d) => (
            <option key={d} value={String(d)}>
              {d} days
            </option>
          ))}
        </Select>
        <Select
          label="Technology"
          value={filters.tech ?? ''}
          onChange={(ev) => setFilter('tech', ev.target.value)}
          className="w-48"
        >
          <option value="">Any</option>
          {techs.map((t) => (
            <option key={t.id} value={t.id}>
              {t.label}
            </option>
          ))}
        </Select>
        {keepers && (
          <Select
            label="Keeper"
            value={filters.keeper ?? ''}
            onChange={(ev) => setFilter('keeper', ev.target.value)}
            className="w-48"
          >
            <option value="">Anyone</option>
            {keepers.map((k) => (
              <option key={k.id} value={String(k.id)}>
                {k.name}
              </option>
            ))}
          </Select>
        )}
        <label className="flex items-center gap-2 pb-2 text-body text-basalt-700">
          <input
            type="checkbox"
            checked={filters.retired === '1'}
            onChange={(ev) => setFilter('retired', ev.target.checked ? '1' : '')}
          />
          Include retired lamps
        </label>
      </fieldset>
      {result.isError && (
        <ListLoadError what="lamps" message={result.error.message} retry={() => void result.refetch()} />
      )}
      <div className="overflow-x-auto rounded-lg border border-basalt-200 bg-white">
        <table
          className={`min-w-full divide-y divide-basalt-200 text-left text-body ${stale ? 'opacity-60' : ''}`}
          aria-busy={busy}
          data-testid="lamp-table"
        >
          <caption className="sr-only">Lamps</caption>
          <thead className="bg-basalt-50 text-caption uppercase tracking-wide text-basalt-600">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => (
                  <SortableHeader
                    key={header.id}
                    column={header.column.id as LampSortColumn}
                    sort={view.sort}
                    onSort={(column) => show({ sort: lampListView.nextSort(view.sort, column), page: 1 })}
                  >
                    {flexRender(header.column.columnDef.header, header.getContext())}
                  </SortableHeader>
                ))}
              </tr>
            ))}
          </thead>
          <tbody className="divide-y divide-basalt-100">
            {table.getRowModel().rows.map((row) => (
              <tr key={row.original.id} className="align-top hover:bg-basalt-50">
                {row.getVisibleCells().map((c) => (
                  <td key={c.id} className={(c.column.columnDef as Column).className}>
                    {flexRender(c.column.columnDef.cell, c.getContext())}
                  </td>
                ))}
              </tr>
            ))}
          </tbody>
        </table>
        {!stale && total === 0 && (
          <div className="px-4 py-6 text-center text-body text-basalt-600" role="status">
            <p>{view.q ? `No lamp matches “${view.q}” here.` : 'No lamp matches these filters.'}</p>
            <button
              type="button"
              className={`${button.quiet} mt-2`}
              onClick={() => {
                setDraft('');
                show({ q: '', filters: {}, page: 1 });
              }}
            >
              Clear the search and filters
            </button>
          </div>
        )}
      </div>
      <ListPager
        page={view.page}
        pageSize={LAMP_PAGE_SIZE}
        total={total}
        pages={pages}
        noun="lamps"
        onPage={(page) => show({ page })}
      />
    </div>
  );
}
