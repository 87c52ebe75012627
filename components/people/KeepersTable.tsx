'use client';

import { LocalTime } from '@/components/ui/LocalTime';
import Link from '@/components/ui/Link';
import { link } from '@/components/ui/styles';
import { ServerListFrame } from '@/components/ui/ServerListFrame';
import type { TableColumn } from '@/components/ui/Table';
import { keeperListView, type KeeperListView, type KeeperSortColumn } from '@/lib/people/list-view';
import { type KeeperRow, type PeoplePage, peopleFrame, useKeeperList } from './usePeopleList';

export type { KeeperRow } from './usePeopleList';

const columns: (TableColumn<KeeperRow> & { id: KeeperSortColumn | 'enclosures' })[] = [
  { id: 'name', header: 'Name', className: 'px-4 py-3 font-medium', cell: ({ row }) => row.original.name },
  {
    id: 'email',
    header: 'Email',
    className: 'px-4 py-3 text-basalt-700',
    cell: ({ row }) => row.original.email,
  },
  {
    id: 'enclosures',
    header: 'Enclosures',
    sortable: false,
    cell: ({ row: { original: k } }) => (
      <Link href={`/enclosures?keeper=${k.userId}`} className={link}>
        {k.enclosureCount} {k.enclosureCount === 1 ? 'enclosure' : 'enclosures'}
      </Link>
    ),
  },
  {
    id: 'joined',
    header: 'Joined',
    className: 'px-4 py-3 text-basalt-500',
    cell: ({ row }) => <LocalTime value={row.original.joinedAt} shown="day" className="whitespace-nowrap" />,
  },
];

/**
 * The organisation's keepers, each with a link to their enclosures: searched, sorted and paged by the
 * server (a shop has hundreds of customers), with the view in the address bar.
 */
export function KeepersTable({
  organisationId,
  initial,
}: {
  organisationId: number;
  initial: { view: KeeperListView; page: PeoplePage<KeeperRow> };
}) {
  return (
    <ServerListFrame
      noun={{ one: 'keeper', many: 'keepers', caption: 'Keepers' }}
      list={useKeeperList(organisationId, initial)}
      codec={keeperListView}
      columns={columns}
      {...peopleFrame}
    />
  );
}
