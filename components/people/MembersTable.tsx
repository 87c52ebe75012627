'use client';

import { useMemo } from 'react';
import { ServerListFrame } from '@/components/ui/ServerListFrame';
import type { TableColumn } from '@/components/ui/Table';
import { memberListView, type MemberListView, type MemberSortColumn } from '@/lib/people/list-view';
import { MemberActions } from './MemberActions';
import { type MemberRow, type PeoplePage, peopleFrame, useMemberList } from './usePeopleList';

export type { MemberRow } from './usePeopleList';

/**
 * Everyone in the organisation, searched, sorted and paged by the server with the view in the address
 * bar; an owner changes roles and removes people from the role column.
 */
export function MembersTable({
  organisationId,
  selfId,
  manages,
  initial,
}: {
  organisationId: number;
  selfId: number;
  manages: boolean;
  initial: { view: MemberListView; page: PeoplePage<MemberRow> };
}) {
  const state = useMemberList(organisationId, initial);
  const columns = useMemo<(TableColumn<MemberRow> & { id: MemberSortColumn })[]>(
    () => [
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
    ],
    [organisationId, selfId, manages],
  );
  return (
    <ServerListFrame
      noun={{ one: 'member', many: 'members', caption: 'Members' }}
      list={state}
      codec={memberListView}
      columns={columns}
      {...peopleFrame}
    />
  );
}
