'use client';

import { type ColumnDef, flexRender, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import type { ReactNode } from 'react';
import type { ListSort } from '@/lib/list-view';
import { SortableHeader } from './ServerListParts';

/**
 * A column: TanStack Table's definition (an `id`, a `header`, a `cell` that gets `row.original`) plus
 * the classes of its cells, so a page says what a column shows and how it sits, never how a table is
 * drawn. `false` in a column list leaves the column out (a column only some viewers get).
 */
export type TableColumn<T> = ColumnDef<T> & {
  id: string;
  /** Classes of the column's body cells; `px-4 py-3` when not given. */
  className?: string;
  /** Classes of the header cell; `px-4 py-2 font-semibold` when not given. */
  headerClassName?: string;
  /** A longer explanation of the heading, shown on hover. */
  title?: string;
  /** `false`: a column the server does not sort by, left a plain heading in a sorted table. */
  sortable?: boolean;
  /** The cell names its row (`<th scope="row">`), so a screen reader says it before each cell of the row. */
  rowHeader?: boolean;
};

/** Sorting done by the server: every header becomes a button that asks for the next sort. */
export type ServerSort<C extends string> = { sort: ListSort<C>; onSort: (column: C) => void };

const FRAME = 'overflow-x-auto rounded-lg border border-basalt-200 bg-white';

/**
 * The one table of the app's lists: a bordered frame, a caption for screen readers, a header row and a
 * row a record. Rows are laid out by TanStack Table in the order given; searching, sorting and paging of
 * server-side lists stay with the server (`sort` draws the headers as sort buttons, keyboard-usable;
 * a column marked `sortable: false` keeps a plain heading).
 * `children` sit inside the frame below the table — where a list says that nothing matches.
 */
export function Table<T, C extends string = string>({
  data,
  columns,
  caption,
  showCaption = false,
  rowKey,
  sort,
  stale = false,
  busy = false,
  head = 'caps',
  stickyHead = false,
  inline = false,
  fullWidth = inline,
  frameClassName = inline ? 'overflow-x-auto' : FRAME,
  rowClassName = inline ? '' : 'hover:bg-basalt-50',
  testId,
  rowTestId,
  children,
}: {
  data: readonly T[];
  columns: readonly (TableColumn<T> | false)[];
  /** What the table lists, read out by screen readers. */
  caption: string;
  /** The caption is shown too, above the table (a table that stands beside a chart says what it holds). */
  showCaption?: boolean;
  rowKey: (row: T) => string | number;
  sort?: ServerSort<C>;
  /** The rows are the previous view's while the next loads: dimmed. */
  stale?: boolean;
  busy?: boolean;
  /** `caps`: small capitals headings; `plain` where a heading holds a unit whose case matters (µW/cm²). */
  head?: 'caps' | 'plain';
  /** The header row stays in view as the frame scrolls (a frame with a height limit). */
  stickyHead?: boolean;
  /**
   * A small table inside a card or a section (a comparison, a calibration): no frame or row highlight of
   * its own, and the width of what holds it.
   */
  inline?: boolean;
  /** `w-full` rather than `min-w-full`: the columns share the frame and wrap rather than scroll. */
  fullWidth?: boolean;
  frameClassName?: string;
  rowClassName?: string;
  testId?: string;
  /** A body row's `data-testid`, where it has one. */
  rowTestId?: (row: T) => string | undefined;
  children?: ReactNode;
}) {
  const shown = columns.filter((c): c is TableColumn<T> => c !== false);
  // The React Compiler skips this component because the table instance cannot be memoised; nothing
  // memoised receives the instance, so the known warning is silenced here and nowhere else.
  // eslint-disable-next-line react-hooks/incompatible-library
  const table = useReactTable({
    data: data as T[],
    columns: shown,
    getRowId: (row) => String(rowKey(row)),
    state: sort ? { sorting: [{ id: sort.sort.column, desc: sort.sort.descending }] } : {},
    manualSorting: true,
    manualFiltering: true,
    manualPagination: true,
    getCoreRowModel: getCoreRowModel(),
  });
  const headClass = [
    'bg-basalt-50 text-caption text-basalt-600',
    head === 'caps' ? 'uppercase tracking-wide' : '',
    stickyHead ? 'sticky top-0' : '',
  ]
    .filter(Boolean)
    .join(' ');

  return (
    <div className={frameClassName}>
      <table
        className={`${fullWidth ? 'w-full' : 'min-w-full'} divide-y divide-basalt-200 text-left text-body ${stale ? 'opacity-60' : ''}`}
        aria-busy={busy || undefined}
        data-testid={testId}
      >
        <caption className={showCaption ? 'mb-1 text-left text-caption text-basalt-600' : 'sr-only'}>
          {caption}
        </caption>
        <thead className={headClass}>
          {table.getHeaderGroups().map((group) => (
            <tr key={group.id}>
              {group.headers.map((header) => {
                const column = header.column.columnDef as TableColumn<T>;
                const label = flexRender(column.header, header.getContext());
                return sort && column.sortable !== false ? (
                  <SortableHeader
                    key={header.id}
                    column={column.id as C}
                    sort={sort.sort}
                    onSort={sort.onSort}
                  >
                    {label}
                  </SortableHeader>
                ) : (
                  <th
                    key={header.id}
                    scope="col"
                    className={column.headerClassName ?? 'px-4 py-2 font-semibold'}
                    title={column.title}
                  >
                    {label}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody className="divide-y divide-basalt-100">
          {table.getRowModel().rows.map((row) => (
            <tr key={row.id} className={rowClassName || undefined} data-testid={rowTestId?.(row.original)}>
              {row.getVisibleCells().map((cell) => {
                const column = cell.column.columnDef as TableColumn<T>;
                const content = flexRender(column.cell, cell.getContext());
                const className = column.className ?? 'px-4 py-3';
                return column.rowHeader ? (
                  <th key={cell.id} scope="row" className={className}>
                    {content}
                  </th>
                ) : (
                  <td key={cell.id} className={className}>
                    {content}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
      {children}
    </div>
  );
}
