/**
 * The keepers and members lists' views — search, sort and page — as their APIs take them and as their
 * pages' URLs carry them (lib/list-view.ts does the work; this names the columns and defaults). A shop
 * with hundreds of customers pages them on the server like the enclosures table.
 */
import { makeListView, type ListView } from '@/lib/list-view';

export { SORT_DIRECTIONS } from '@/lib/list-view';

/** Every column the keepers list sorts by; the API refuses any other. */
export const KEEPER_SORT_COLUMNS = ['name', 'email', 'joined'] as const;
export type KeeperSortColumn = (typeof KEEPER_SORT_COLUMNS)[number];

/** Every column the members list sorts by: the keepers' columns and the role. */
export const MEMBER_SORT_COLUMNS = ['name', 'email', 'role', 'joined'] as const;
export type MemberSortColumn = (typeof MEMBER_SORT_COLUMNS)[number];

/** Rows a page of either table shows. */
export const PEOPLE_PAGE_SIZE = 25;
/** Longest search the APIs take; longer is refused with a message, the URL reader cuts it. */
export const MAX_PEOPLE_SEARCH = 120;

/** Who joined last starts newest first; names, e-mails and roles start A–Z (owners first). */
export const defaultPeopleDescending = (column: KeeperSortColumn | MemberSortColumn) => column === 'joined';

export type KeeperListView = ListView<KeeperSortColumn>;
export type MemberListView = ListView<MemberSortColumn>;

/** The people lists' view of these columns, starting at `defaultSort` and ascending. */
const peopleListView = <C extends KeeperSortColumn | MemberSortColumn>(
  columns: readonly C[],
  defaultSort: C,
) =>
  makeListView({
    columns,
    defaultSort: { column: defaultSort, descending: false },
    defaultDescending: defaultPeopleDescending,
    pageSize: PEOPLE_PAGE_SIZE,
    maxSearch: MAX_PEOPLE_SEARCH,
  });

export const keeperListView = peopleListView(KEEPER_SORT_COLUMNS, 'name');

/** Owners first, then staff, then keepers, each A–Z: who runs the organisation comes first. */
export const memberListView = peopleListView(MEMBER_SORT_COLUMNS, 'role');
