/**
 * A server-side list's view — search, sort, filters and page — as its API takes it and as its page's
 * URL carries it: `?q=&sort=&dir=&page=` plus the list's own filters. Pure (no zod, React or
 * database), so a list's server schema, its table and its tests share one allow-list and one set of
 * defaults. Each list (enclosures, the lamp log) makes one with `makeListView`.
 */

export const SORT_DIRECTIONS = ['asc', 'desc'] as const;
export type SortDirection = (typeof SORT_DIRECTIONS)[number];

export type ListSort<C extends string> = { column: C; descending: boolean };

/**
 * Where a keyset list's page starts: after the last row of the page before it (Next) or before the
 * first row of the page after it (Previous), as the opaque cursor its API answered with. Without one
 * (a link typed or shared with only `page=`) the page is found by its offset.
 */
export type ListSeek = { after: string } | { before: string };

/** A cursor as the API writes it (base64url); anything else in an address is ignored. */
export const isCursor = (v: string | null | undefined): v is string => /^[A-Za-z0-9_-]{1,400}$/.test(v ?? '');

/** Filters are named text values; a list checks each with its own rule and drops what fails it. */
export type ListFilters = Record<string, string>;

export type ListView<C extends string> = {
  q: string;
  sort: ListSort<C>;
  page: number;
  /** Only on lists that have filters. */
  filters?: ListFilters;
  /** Only on keyset lists, and only beyond the first page. */
  seek?: ListSeek;
};

export type ListViewSpec<C extends string> = {
  columns: readonly C[];
  defaultSort: ListSort<C>;
  /** The direction a column starts in when its header is first clicked. */
  defaultDescending: (column: C) => boolean;
  pageSize: number;
  maxSearch: number;
  /** Each filter's URL key and the rule its value must pass (anything else is ignored). */
  filters?: Record<string, (value: string) => boolean>;
  /** The list's API answers cursors and seeks by them (`after`/`before` in the address and the API). */
  keyset?: boolean;
};

export function makeListView<C extends string>(spec: ListViewSpec<C>) {
  const isColumn = (v: string | null): v is C => (spec.columns as readonly string[]).includes(v ?? '');
  const filterKeys = Object.keys(spec.filters ?? {});
  const defaultView: ListView<C> = {
    q: '',
    sort: spec.defaultSort,
    page: 1,
    ...(spec.filters ? { filters: {} } : {}),
  };

  /** The view a page URL names. A hand-edited or stale link never breaks the page: anything unknown falls back to the default. */
  function viewFromSearchParams(params: URLSearchParams): ListView<C> {
    const sortParam = params.get('sort');
    const column = isColumn(sortParam) ? sortParam : spec.defaultSort.column;
    const dir = params.get('dir');
    const descending = dir === 'asc' ? false : dir === 'desc' ? true : spec.defaultDescending(column);
    const page = Number(params.get('page'));
    const view: ListView<C> = {
      q: (params.get('q') ?? '').trim().slice(0, spec.maxSearch),
      sort: { column, descending },
      page: Number.isInteger(page) && page >= 1 && page <= 100_000 ? page : 1,
    };
    if (spec.filters) {
      const filters: ListFilters = {};
      for (const [key, ok] of Object.entries(spec.filters)) {
        const v = params.get(key);
        if (v && ok(v)) filters[key] = v;
      }
      view.filters = filters;
    }
    const seek = seekFrom(params);
    if (seek && view.page > 1) view.seek = seek;
    return view;
  }

  function seekFrom(params: URLSearchParams): ListSeek | undefined {
    if (!spec.keyset) return undefined;
    const after = params.get('after');
    const before = params.get('before');
    if (isCursor(after)) return { after };
    if (isCursor(before)) return { before };
    return undefined;
  }

  function writeSeek(out: URLSearchParams, view: ListView<C>) {
    if (!spec.keyset || !view.seek || view.page <= 1) return;
    if ('after' in view.seek) out.set('after', view.seek.after);
    else out.set('before', view.seek.before);
  }

  /** Writes the view into `base` (other parameters are kept), leaving defaults out so the plain list keeps its plain address. */
  function searchParamsForView(view: ListView<C>, base?: URLSearchParams): URLSearchParams {
    const out = new URLSearchParams(base);
    for (const key of ['q', 'sort', 'dir', 'page', 'after', 'before', ...filterKeys]) out.delete(key);
    if (view.q) out.set('q', view.q);
    const { column, descending } = view.sort;
    if (column !== spec.defaultSort.column || descending !== spec.defaultSort.descending) {
      out.set('sort', column);
      out.set('dir', descending ? 'desc' : 'asc');
    }
    for (const key of filterKeys) {
      const v = view.filters?.[key];
      if (v) out.set(key, v);
    }
    if (view.page > 1) out.set('page', String(view.page));
    writeSeek(out, view);
    return out;
  }

  /**
   * The list query a view asks for: its search, sort and filters, its page as offset and limit, and on a
   * keyset list the cursor it seeks from (the offset is then only the fallback for a stale cursor).
   */
  function listQueryForView(view: ListView<C>) {
    const seek = spec.keyset && view.page > 1 ? view.seek : undefined;
    return {
      q: view.q || undefined,
      sort: view.sort.column,
      descending: view.sort.descending,
      offset: (view.page - 1) * spec.pageSize,
      limit: spec.pageSize,
      ...(view.filters ?? {}),
      ...(seek ?? {}),
    };
  }

  /** The list API's parameters for a view, for the table's own fetches. */
  function apiQueryForView(view: ListView<C>, scope: Record<string, number | undefined>): URLSearchParams {
    const out = new URLSearchParams();
    for (const [key, value] of Object.entries(scope)) if (value) out.set(key, String(value));
    if (view.q) out.set('q', view.q);
    out.set('sort', view.sort.column);
    out.set('dir', view.sort.descending ? 'desc' : 'asc');
    for (const key of filterKeys) {
      const v = view.filters?.[key];
      if (v) out.set(key, v);
    }
    out.set('offset', String((view.page - 1) * spec.pageSize));
    out.set('limit', String(spec.pageSize));
    writeSeek(out, view);
    return out;
  }

  /** Clicking a header: the same column flips direction; a new column starts in its natural direction. */
  function nextSort(current: ListSort<C>, column: C): ListSort<C> {
    if (current.column === column) return { column, descending: !current.descending };
    return { column, descending: spec.defaultDescending(column) };
  }

  /** Pages needed for `total` rows (at least one, so "page 1 of 1" reads right for an empty list). */
  const pageCount = (total: number) => Math.max(1, Math.ceil(total / spec.pageSize));

  return {
    spec,
    defaultView,
    viewFromSearchParams,
    searchParamsForView,
    listQueryForView,
    apiQueryForView,
    nextSort,
    pageCount,
  };
}

export type ListViewCodec<C extends string> = ReturnType<typeof makeListView<C>>;

/** aria-sort value for a column header. */
export function ariaSortFor<C extends string>(
  column: C,
  sort: ListSort<C>,
): 'ascending' | 'descending' | 'none' {
  if (sort.column !== column) return 'none';
  return sort.descending ? 'descending' : 'ascending';
}

/** A page's `searchParams` object as URLSearchParams, repeated keys kept. */
export function toSearchParams(params: Record<string, string | string[] | undefined>): URLSearchParams {
  const out = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    for (const v of Array.isArray(value) ? value : value === undefined ? [] : [value]) out.append(key, v);
  }
  return out;
}
