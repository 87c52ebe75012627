/**
 * The enclosures list view — search, sort and page — as the API takes it and as the page's URL
 * carries it. Pure (no zod, React or database), so the server schema, the table and the tests share
 * one allow-list and one set of defaults.
 */

/** Every column the list sorts by; the API refuses any other. */
export const ENCLOSURE_SORT_COLUMNS = ['name', 'animal', 'keeper', 'size', 'updated'] as const;
export type EnclosureSortColumn = (typeof ENCLOSURE_SORT_COLUMNS)[number];
export const SORT_DIRECTIONS = ['asc', 'desc'] as const;
export type SortDirection = (typeof SORT_DIRECTIONS)[number];

export type EnclosureSort = { column: EnclosureSortColumn; descending: boolean };

/** A shop opens the list to find what changed last, so newest-first is the default. */
export const DEFAULT_ENCLOSURE_SORT: EnclosureSort = { column: 'updated', descending: true };

/** Dates and sizes start newest/largest first; text starts A–Z. */
export const defaultDescending = (column: EnclosureSortColumn) => column === 'updated' || column === 'size';

/** Rows a page of the table shows. */
export const ENCLOSURE_PAGE_SIZE = 25;
/** Longest search the API takes; longer is refused with a message, the URL reader cuts it. */
export const MAX_ENCLOSURE_SEARCH = 120;

export type EnclosureListView = { q: string; sort: EnclosureSort; page: number };

export const DEFAULT_ENCLOSURE_VIEW: EnclosureListView = { q: '', sort: DEFAULT_ENCLOSURE_SORT, page: 1 };

const isColumn = (v: string | null): v is EnclosureSortColumn =>
  (ENCLOSURE_SORT_COLUMNS as readonly string[]).includes(v ?? '');

/**
 * The view a page URL names (`?q=&sort=&dir=&page=`). A hand-edited or stale link never breaks the
 * page: anything unknown falls back to the default.
 */
export function viewFromSearchParams(params: URLSearchParams): EnclosureListView {
  const sortParam = params.get('sort');
  const column = isColumn(sortParam) ? sortParam : DEFAULT_ENCLOSURE_SORT.column;
  const dir = params.get('dir');
  const descending = dir === 'asc' ? false : dir === 'desc' ? true : defaultDescending(column);
  const page = Number(params.get('page'));
  return {
    q: (params.get('q') ?? '').trim().slice(0, MAX_ENCLOSURE_SEARCH),
    sort: { column, descending },
    page: Number.isInteger(page) && page >= 1 && page <= 100_000 ? page : 1,
  };
}

/**
 * Writes the view into `base` (other parameters, such as `keeper`, are kept), leaving defaults out so
 * the plain list keeps its plain address.
 */
export function searchParamsForView(view: EnclosureListView, base?: URLSearchParams): URLSearchParams {
  const out = new URLSearchParams(base);
  for (const key of ['q', 'sort', 'dir', 'page']) out.delete(key);
  if (view.q) out.set('q', view.q);
  const { column, descending } = view.sort;
  if (column !== DEFAULT_ENCLOSURE_SORT.column || descending !== DEFAULT_ENCLOSURE_SORT.descending) {
    out.set('sort', column);
    out.set('dir', descending ? 'desc' : 'asc');
  }
  if (view.page > 1) out.set('page', String(view.page));
  return out;
}

/** The list query a view asks for: its search and sort, its page as offset and limit. */
export function listQueryForView(view: EnclosureListView) {
  return {
    q: view.q || undefined,
    sort: view.sort.column,
    descending: view.sort.descending,
    offset: (view.page - 1) * ENCLOSURE_PAGE_SIZE,
    limit: ENCLOSURE_PAGE_SIZE,
  };
}

/** The same as `GET /api/enclosures` parameters, for the table's own fetches. */
export function apiQueryForView(
  view: EnclosureListView,
  scope: { organisationId: number; keeperId?: number },
): URLSearchParams {
  const { q, sort, descending, offset, limit } = listQueryForView(view);
  const out = new URLSearchParams({ organisationId: String(scope.organisationId) });
  if (scope.keeperId) out.set('keeperId', String(scope.keeperId));
  if (q) out.set('q', q);
  out.set('sort', sort);
  out.set('dir', descending ? 'desc' : 'asc');
  out.set('offset', String(offset));
  out.set('limit', String(limit));
  return out;
}

/** aria-sort value for a column header. */
export function ariaSortFor(
  column: EnclosureSortColumn,
  sort: EnclosureSort,
): 'ascending' | 'descending' | 'none' {
  if (sort.column !== column) return 'none';
  return sort.descending ? 'descending' : 'ascending';
}

/** Clicking a header: the same column flips direction; a new column starts in its natural direction. */
export function nextSort(current: EnclosureSort, column: EnclosureSortColumn): EnclosureSort {
  if (current.column === column) return { column, descending: !current.descending };
  return { column, descending: defaultDescending(column) };
}

/** Pages needed for `total` rows (at least one, so "page 1 of 1" reads right for an empty list). */
export const pageCount = (total: number) => Math.max(1, Math.ceil(total / ENCLOSURE_PAGE_SIZE));
