'use client';

import type { ReactNode } from 'react';
import type { ListSort } from '@/lib/list-view';
import { SortableHeader } from './ServerListParts';

/** What a column's cell is drawn from: its row's record. */
export type TableCellContext<T> = { row: { original: T } };

/**
 * A column: an `id`, a `header`, a `cell` drawn from `row.original`, plus the classes of its cells, so
 * a page says what a column shows and how it sits, never how a table is drawn. `false` in a column list
 * leaves the column out (a column only some viewers get).
 */
export type TableColumn<T> = {
  id: string;
  /** The heading: text, or a function drawing it (a heading only screen readers hear). */
  header: ReactNode | (() => ReactNode);
  cell: (context: TableCellContext<T>) => ReactNode;
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
  /** The heading's words where `header` is not plain text: a stacked row's label for the cell. */
  label?: string;
  /** In a stacked row (phones) the cell takes the row's whole width (a status with its reasons). */
  wide?: boolean;
};

/** Sorting done by the server: every header becomes a button that asks for the next sort. */
export type ServerSort<C extends string> = { sort: ListSort<C>; onSort: (column: C) => void };

const FRAME = 'overflow-x-auto rounded-lg border border-basalt-200 bg-white';

/**
 * The one table of the app's lists: a bordered frame, a caption for screen readers, a header row and a
 * row a record, in the order given. Searching, sorting and paging stay with the server, so the table
 * only lays cells out: it is drawn directly from the columns and records (a table library's per-row and
 * per-cell objects cost a list page about a sixth of what the server allocates to render it, for
 * nothing it used) (`sort` draws the headers as sort buttons, keyboard-usable;
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
  stack = false,
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
  /**
   * On a phone's width each row is drawn as a card: the row's name across the top, then each cell under
   * its heading's words, two to a line (`table-stack` in app/globals.css), instead of a table to scroll
   * sideways past the columns that matter. The sort buttons wrap above the cards. The cells keep their
   * table roles for screen readers (CSS display changes can drop them).
   */
  stack?: boolean;
  children?: ReactNode;
}) {
  const shown = columns.filter((c): c is TableColumn<T> => c !== false);
  const headClass = [
    'bg-basalt-50 text-caption text-basalt-600',
    head === 'caps' ? 'uppercase tracking-wide' : '',
    stickyHead ? 'sticky top-0' : '',
  ]
    .filter(Boolean)
    .join(' ');

  // Stacked rows name each cell by its heading; the roles keep the table's meaning once CSS draws its
  // parts as blocks.
  const labelOf = (column: TableColumn<T>) =>
    column.label ?? (typeof column.header === 'string' ? column.header : undefined);
  const role = (r: string) => (stack ? r : undefined);
  return (
    <div className={frameClassName}>
      <table
        role={role('table')}
        className={`${fullWidth ? 'w-full' : 'min-w-full'} divide-y divide-basalt-200 text-left text-body ${stale ? 'opacity-60' : ''}${stack ? ' table-stack' : ''}`}
        aria-busy={busy || undefined}
        data-testid={testId}
      >
        <caption className={showCaption ? 'mb-1 text-left text-caption text-basalt-600' : 'sr-only'}>
          {caption}
        </caption>
        <thead className={headClass} role={role('rowgroup')}>
          <tr role={role('row')}>
            {shown.map((column) => {
              const label = typeof column.header === 'function' ? column.header() : column.header;
              return sort && column.sortable !== false ? (
                <SortableHeader
                  key={column.id}
                  column={column.id as C}
                  sort={sort.sort}
                  onSort={sort.onSort}
                  role={role('columnheader')}
                >
                  {label}
                </SortableHeader>
              ) : (
                <th
                  key={column.id}
                  scope="col"
                  role={role('columnheader')}
                  className={column.headerClassName ?? 'px-4 py-2 font-semibold'}
                  title={column.title}
                >
                  {label}
                </th>
              );
            })}
          </tr>
        </thead>
        <tbody className="divide-y divide-basalt-100" role={role('rowgroup')}>
          {data.map((original) => {
            const context: TableCellContext<T> = { row: { original } };
            return (
              <tr
                key={rowKey(original)}
                role={role('row')}
                className={rowClassName || undefined}
                data-testid={rowTestId?.(original)}
              >
                {shown.map((column) => {
                  const content = column.cell(context);
                  const className = column.className ?? 'px-4 py-3';
                  return column.rowHeader ? (
                    <th key={column.id} scope="row" role={role('rowheader')} className={className}>
                      {content}
                    </th>
                  ) : (
                    <td
                      key={column.id}
                      role={role('cell')}
                      className={className}
                      data-label={stack ? labelOf(column) : undefined}
                      data-wide={stack && column.wide ? '' : undefined}
                    >
                      {content}
                    </td>
                  );
                })}
              </tr>
            );
          })}
        </tbody>
      </table>
      {children}
    </div>
  );
}
