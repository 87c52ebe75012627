/**
 * The lamp log's list view — search, sort, filters and page — as `GET /api/lamps` takes it and as the
 * page's URL carries it (lib/list-view.ts does the work; this names the columns, filters and defaults).
 */
import { makeListView, type ListSort, type ListView } from '@/lib/list-view';
import { isStatus } from './status';

export const LAMP_SORT_COLUMNS = [
  'urgency',
  'lamp',
  'enclosure',
  'age',
  'lastReading',
  'remaining',
  'due',
] as const;
export type LampSortColumn = (typeof LAMP_SORT_COLUMNS)[number];
export type LampSort = ListSort<LampSortColumn>;

/** The lamp log answers "what needs doing": most urgent first, then the nearest date. */
export const DEFAULT_LAMP_SORT: LampSort = { column: 'urgency', descending: false };

/** Latest reading and oldest lamp first; everything else starts at the top of its scale. */
export const defaultLampDescending = (column: LampSortColumn) => column === 'lastReading' || column === 'age';

export const LAMP_PAGE_SIZE = 25;
export const MAX_LAMP_SEARCH = 120;
/** "Due within" choices, in days. */
export const DUE_WITHIN_DAYS = [7, 14, 30, 90] as const;

const isId = (v: string) => /^[1-9]\d{0,9}$/.test(v);

export const LAMP_FILTERS = {
  status: isStatus,
  // The API checks the technology against the engine's list; the address only needs a plausible id
  // (the client bundle stays free of the engine).
  tech: (v: string) => /^[a-z0-9-]{1,40}$/.test(v),
  keeper: isId,
  enclosure: isId,
  due: (v: string) => (DUE_WITHIN_DAYS as readonly number[]).includes(Number(v)),
  retired: (v: string) => v === '1',
} as const;

export type LampListView = ListView<LampSortColumn>;

export const lampListView = makeListView({
  columns: LAMP_SORT_COLUMNS,
  defaultSort: DEFAULT_LAMP_SORT,
  defaultDescending: defaultLampDescending,
  pageSize: LAMP_PAGE_SIZE,
  maxSearch: MAX_LAMP_SEARCH,
  filters: LAMP_FILTERS,
  // Next and Previous seek from the page's last or first row: a deep page costs what the first does.
  keyset: true,
});
