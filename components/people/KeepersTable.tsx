'use client';

import Link from '@/components/ui/Link';
import { link } from '@/components/ui/styles';
import { Table, type TableColumn } from '@/components/ui/Table';

export type KeeperRow = {
  userId: number;
  name: string;
  email: string;
  enclosureCount: number;
  joinedAt: string;
};

const columns: TableColumn<KeeperRow>[] = [
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
    cell: ({ row }) => row.original.joinedAt.slice(0, 10),
  },
];

/** The organisation's keepers, each with a link to their enclosures. */
export function KeepersTable({ keepers }: { keepers: KeeperRow[] }) {
  return (
    <Table data={keepers} columns={columns} caption="Keepers" rowKey={(k) => k.userId} rowClassName="" />
  );
}
