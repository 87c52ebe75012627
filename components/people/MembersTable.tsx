'use client';

import type { Role } from '@/lib/permissions';
import { Table, type TableColumn } from '@/components/ui/Table';
import { MemberActions } from './MemberActions';

export type MemberRow = { userId: number; name: string; email: string; role: Role };

/** Everyone in the organisation; an owner changes roles and removes people from the last column. */
export function MembersTable({
  members,
  organisationId,
  selfId,
  manages,
}: {
  members: MemberRow[];
  organisationId: number;
  selfId: number;
  manages: boolean;
}) {
  const columns: TableColumn<MemberRow>[] = [
    {
      id: 'name',
      header: 'Name',
      className: 'px-4 py-3 font-medium',
      cell: ({ row: { original: m } }) => (
        <>
          {m.name}
          {m.userId === selfId && <span className="ml-1 text-caption text-basalt-500">(you)</span>}
        </>
      ),
    },
    {
      id: 'email',
      header: 'Email',
      className: 'px-4 py-3 text-basalt-700',
      cell: ({ row }) => row.original.email,
    },
    {
      id: 'role',
      header: manages ? 'Role and actions' : 'Role',
      cell: ({ row: { original: m } }) =>
        manages ? (
          <MemberActions
            organisationId={organisationId}
            userId={m.userId}
            name={m.name}
            role={m.role}
            isSelf={m.userId === selfId}
          />
        ) : (
          <span className="rounded bg-basalt-100 px-2 py-0.5 text-caption font-medium text-basalt-700">
            {m.role}
          </span>
        ),
    },
  ];
  return (
    <Table data={members} columns={columns} caption="Members" rowKey={(m) => m.userId} rowClassName="" />
  );
}
