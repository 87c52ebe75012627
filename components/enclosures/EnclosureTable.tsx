'use client';

import { LocalTime } from '@/components/ui/LocalTime';
import Link from '@/components/ui/Link';
import { useMemo } from 'react';
import { ServerListFrame } from '@/components/ui/ServerListFrame';
import type { TableColumn } from '@/components/ui/Table';
import { link } from '@/components/ui/styles';
import { formatSize, type LengthUnit } from '@/shared/units';
import { useLengthUnit } from '@/components/ui/units';
import {
  enclosureListView,
  type EnclosureListView,
  type EnclosureSortColumn,
} from '@/lib/enclosures/list-view';
import type { EnclosureRow } from './types';
import { type EnclosurePage, useEnclosureList } from './useEnclosureList';

type Column = TableColumn<EnclosureRow> & { id: EnclosureSortColumn };

function columnsFor(showKeeper: boolean, unit: LengthUnit): (Column | false)[] {
  return [
    {
      id: 'name',
      header: 'Enclosure',
      cell: ({ row: { original: e } }) => (
        <Link href={`/enclosures/${e.id}`} className={link}>
          {e.name}
        </Link>
      ),
    },
    {
      id: 'animal',
      header: 'Animal',
      cell: ({ row: { original: e } }) =>
        e.animalName || e.speciesName ? (
          <>
            {e.animalName && <span className="font-medium text-basalt-900">{e.animalName}</span>}
            {/* One text node: React marks the seam between two adjacent texts in the HTML of every row. */}
            {e.animalName && e.speciesName ? ` · ${e.speciesName}` : e.speciesName}
          </>
        ) : (
          <span className="text-basalt-500">Not set</span>
        ),
    },
    showKeeper && {
      id: 'keeper',
      header: 'Keeper',
      cell: ({ row: { original: e } }) => e.keeperName ?? 'Former member',
    },
    {
      id: 'size',
      header: 'Size (W × H × D)',
      cell: ({ row: { original: e } }) => (
        <span className="whitespace-nowrap tabular-nums">
          {formatSize(e.widthCm, e.heightCm, e.depthCm, unit)}
        </span>
      ),
    },
    {
      id: 'updated',
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
  const columns = useMemo(() => columnsFor(showKeeper, unit), [showKeeper, unit]);
  return (
    <ServerListFrame
      list={useEnclosureList({ organisationId, keeperId, initial })}
      codec={enclosureListView}
      noun={{ one: 'enclosure', many: 'enclosures', caption: 'Enclosures' }}
      placeholder={showKeeper ? 'Name, animal, species or keeper' : 'Name, animal or species'}
      columns={columns}
      rowKey={(e) => e.id}
      // The cells' text colour is given once by their row rather than in every cell's class.
      rowClassName="text-basalt-700 hover:bg-basalt-50"
    />
  );
}
