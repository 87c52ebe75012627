'use client';

import { LocalTime } from '@/components/ui/LocalTime';
import Link from '@/components/ui/Link';
import { useMemo } from 'react';
import { ListLoadError, ListPager, ListSearchBox } from '@/components/ui/ServerListParts';
import { Table, type TableColumn } from '@/components/ui/Table';
import { button, link } from '@/components/ui/styles';
import { formatSize, type LengthUnit } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import {
  ENCLOSURE_PAGE_SIZE,
  MAX_ENCLOSURE_SEARCH,
  type EnclosureListView,
  type EnclosureSortColumn,
  nextSort,
  pageCount,
} from '@/lib/enclosures/list-view';
import type { EnclosureRow } from './types';
import { type EnclosurePage, useEnclosureList } from './useEnclosureList';

const cell = 'px-4 py-3 text-basalt-700';

type Column = TableColumn<EnclosureRow> & { id: EnclosureSortColumn };

function columnsFor(showKeeper: boolean, unit: LengthUnit): (Column | false)[] {
  return [
    {
      id: 'name',
      className: cell,
      header: 'Enclosure',
      cell: ({ row: { original: e } }) => (
        <Link href={`/enclosures/${e.id}`} className={link}>
          {e.name}
        </Link>
      ),
    },
    {
      id: 'animal',
      className: cell,
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
      id: 'keeper',
      className: cell,
      header: 'Keeper',
      cell: ({ row: { original: e } }) => e.keeperName ?? 'Former member',
    },
    {
      id: 'size',
      className: cell,
      header: 'Size (W × H × D)',
      cell: ({ row: { original: e } }) => (
        <span className="whitespace-nowrap tabular-nums">
          {formatSize(e.widthCm, e.heightCm, e.depthCm, unit)}
        </span>
      ),
    },
    {
      id: 'updated',
      className: cell,
      header: 'Updated',
      cell: ({ row: { original: e } }) => (
        <LocalTime value={e.updatedAt} shown="day" className="whitespace-nowrap text-basalt-500" />
      ),
    },
  ];
}

/**
 * The organisation's enclosures, searched, sorted and paged by the server (the table library only
 * lays out the page it is given). Search, sort and page are in the address bar.
 */
export function EnclosureTable({
  organisationId,
  keeperId,
  showKeeper,
  initial,
}: {
  organisationId: number;
  /** Staff looking at one keeper's enclosures; a keeper's own list is narrowed by the server. */
  keeperId?: number;
  showKeeper: boolean;
  initial: { view: EnclosureListView; page: EnclosurePage };
}) {
  const [unit] = useLengthUnit();
  const { view, draft, setDraft, clearSearch, show, result } = useEnclosureList({
    organisationId,
    keeperId,
    initial,
  });
  const columns = useMemo(() => columnsFor(showKeeper, unit), [showKeeper, unit]);
  const data = result.data;
  const items = useMemo(() => data?.items ?? [], [data]);
  const total = data?.total ?? 0;
  const pages = pageCount(total);
  // Rows of the previous view stay up while the next loads (or failed to): dimmed, and not counted.
  const stale = result.isPlaceholderData || !data;
  const busy = result.isFetching && stale;

  return (
    <div>
      <div className="mb-3">
        <ListSearchBox
          label="Search enclosures"
          value={draft}
          onChange={setDraft}
          maxLength={MAX_ENCLOSURE_SEARCH}
          placeholder={showKeeper ? 'Name, animal, species or keeper' : 'Name, animal or species'}
          // The count of the rows shown; while another view loads, the old count would mislead.
          status={
            busy
              ? 'Loading enclosures…'
              : stale
                ? ''
                : view.q
                  ? `${total} ${total === 1 ? 'enclosure matches' : 'enclosures match'}`
                  : `${total} ${total === 1 ? 'enclosure' : 'enclosures'}`
          }
        />
      </div>
      {result.isError && (
        <ListLoadError what="enclosures" message={result.error.message} retry={() => void result.refetch()} />
      )}
      <Table
        data={items}
        columns={columns}
        caption="Enclosures"
        rowKey={(e) => e.id}
        sort={{ sort: view.sort, onSort: (column) => show({ sort: nextSort(view.sort, column), page: 1 }) }}
        stale={stale}
        busy={busy}
      >
        {!stale && total === 0 && (
          <div className="px-4 py-6 text-center text-body text-basalt-600" role="status">
            {view.q ? (
              <>
                <p>No enclosure matches “{view.q}”.</p>
                <button type="button" className={`${button.quiet} mt-2`} onClick={clearSearch}>
                  Clear the search
                </button>
              </>
            ) : (
              <p>No enclosures here yet.</p>
            )}
          </div>
        )}
      </Table>
      <ListPager
        page={view.page}
        pageSize={ENCLOSURE_PAGE_SIZE}
        total={total}
        pages={pages}
        noun="enclosures"
        onPage={(page) => show({ page })}
      />
    </div>
  );
}
