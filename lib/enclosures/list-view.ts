/**
 * The enclosures list view — search, sort and page — as the API takes it and as the page's URL
 * carries it (lib/list-view.ts does the work; this names the columns and defaults).
 */
import { makeListView, type ListSort, type ListView } from '@/lib/list-view';

export { ariaSortFor, SORT_DIRECTIONS, type SortDirection } from '@/lib/list-view';

/** Every column the list sorts by; the API refuses any other. */
export const ENCLOSURE_SORT_COLUMNS = ['name', 'animal', 'keeper', 'size', 'updated'] as const;
export type EnclosureSortColumn = (typeof ENCLOSURE_SORT_COLUMNS)[number];

export type EnclosureSort = ListSort<EnclosureSortColumn>;

/** A shop opens the list to find what changed last, so newest-first is the default. */
export const DEFAULT_ENCLOSURE_SORT: EnclosureSort = { column: 'updated', descending: true };

/** Dates and sizes start newest/largest first; text starts A–Z. */
export const defaultDescending = (column: EnclosureSortColumn) => column === 'updated' || column === 'size';

/** Rows a page of the table shows. */
export const ENCLOSURE_PAGE_SIZE = 25;
/** Longest search the API takes; longer is refused with a message, the URL reader cuts it. */
export const MAX_ENCLOSURE_SEARCH = 120;

export type EnclosureListView = ListView<EnclosureSortColumn>;

export const enclosureListView = makeListView({
  columns: ENCLOSURE_SORT_COLUMNS,
  defaultSort: DEFAULT_ENCLOSURE_SORT,
  defaultDescending,
  pageSize: ENCLOSURE_PAGE_SIZE,
  maxSearch: MAX_ENCLOSURE_SEARCH,
});

export const DEFAULT_ENCLOSURE_VIEW: EnclosureListView = enclosureListView.defaultView;

export const { viewFromSearchParams, searchParamsForView, listQueryForView, nextSort, pageCount } =
  enclosureListView;

/** The same as `GET /api/enclosures` parameters, for the table's own fetches. */
export function apiQueryForView(
  view: EnclosureListView,
  scope: { organisationId: number; keeperId?: number },
): URLSearchParams {
  return enclosureListView.apiQueryForView(view, scope);
}
