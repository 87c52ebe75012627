'use client';

import { useId, type ReactNode } from 'react';
import { Notice } from '@/components/ui/Notice';
import { button, focusRing, input } from '@/components/ui/styles';
import { ariaSortFor, type ListSort } from '@/lib/list-view';

/** Pieces every server-side list table shares: the search box, sortable headers, the error and the pager. */

export function ListSearchBox({
  label,
  value,
  onChange,
  placeholder,
  maxLength,
  status,
}: {
  label: string;
  value: string;
  onChange: (value: string) => void;
  placeholder: string;
  maxLength: number;
  /** The count of rows shown, or what is loading; read out politely. */
  status: string;
}) {
  const id = useId();
  return (
    <div className="flex flex-wrap items-end gap-3">
      <div className="w-full max-w-sm">
        <label htmlFor={id} className="mb-1 block text-caption font-medium text-basalt-700">
          {label}
        </label>
        <input
          id={id}
          type="search"
          value={value}
          onChange={(ev) => onChange(ev.target.value)}
          maxLength={maxLength}
          placeholder={placeholder}
          className={input}
        />
      </div>
      <p className="pb-2 text-caption text-basalt-500" aria-live="polite">
        {status}
      </p>
    </div>
  );
}

export function SortableHeader<C extends string>({
  column,
  sort,
  onSort,
  role,
  children,
}: {
  column: C;
  sort: ListSort<C>;
  onSort: (column: C) => void;
  /** `columnheader` in a table whose rows CSS may draw as blocks (the stacked phone layout). */
  role?: string;
  children: ReactNode;
}) {
  const state = ariaSortFor(column, sort);
  return (
    <th scope="col" role={role} aria-sort={state} className="px-2 py-1 font-semibold">
      <button
        type="button"
        onClick={() => onSort(column)}
        className={`inline-flex items-center gap-1 rounded px-2 py-1 uppercase tracking-wide hover:bg-basalt-100 ${focusRing}`}
      >
        {children}
        <span aria-hidden="true" className={state === 'none' ? 'text-basalt-300' : ''}>
          {state === 'ascending' ? '▲' : state === 'descending' ? '▼' : '↕'}
        </span>
      </button>
    </th>
  );
}

export function ListLoadError({
  what,
  message,
  retry,
}: {
  what: string;
  message: string;
  retry: () => void;
}) {
  return (
    <div className="mb-3">
      <Notice tone="error" title={`The ${what} could not be loaded.`}>
        <p>{message}</p>
        <button type="button" className={`${button.secondary} mt-2`} onClick={retry}>
          Try again
        </button>
      </Notice>
    </div>
  );
}

export function ListPager({
  page,
  pageSize,
  total,
  pages,
  noun,
  onPage,
}: {
  page: number;
  pageSize: number;
  total: number;
  pages: number;
  /** Plural, as in "Pages of enclosures". */
  noun: string;
  onPage: (page: number) => void;
}) {
  if (total <= pageSize) return null;
  const first = (page - 1) * pageSize + 1;
  return (
    <nav aria-label={`Pages of ${noun}`} className="mt-3 flex flex-wrap items-center justify-end gap-3">
      <p className="text-caption text-basalt-600">
        {first}–{Math.min(first + pageSize - 1, total)} of {total} · page {page} of {pages}
      </p>
      <button
        type="button"
        className={button.secondary}
        disabled={page <= 1}
        onClick={() => onPage(page - 1)}
      >
        Previous page
      </button>
      <button
        type="button"
        className={button.secondary}
        disabled={page >= pages}
        onClick={() => onPage(page + 1)}
      >
        Next page
      </button>
    </nav>
  );
}
