'use client';

import { useServerList } from '@/components/ui/useServerList';
import {
  keeperListView,
  memberListView,
  type KeeperListView,
  type MemberListView,
} from '@/lib/people/list-view';
import type { Role } from '@/lib/permissions';

export type KeeperRow = {
  userId: number;
  name: string;
  email: string;
  enclosureCount: number;
  joinedAt: string;
};
export type MemberRow = { userId: number; name: string; email: string; role: Role; joinedAt: string };
export type PeoplePage<R> = { items: R[]; total: number; offset: number; limit: number };

/** Search, sort and page of the keepers table, fetched from `GET /api/keepers`. */
export function useKeeperList(
  organisationId: number,
  initial: { view: KeeperListView; page: PeoplePage<KeeperRow> },
) {
  return useServerList({
    codec: keeperListView,
    endpoint: '/api/keepers',
    scope: { organisationId },
    initial,
  });
}

/** Search, sort and page of the members table, fetched from `GET /api/organisations/[id]/members`. */
export function useMemberList(
  organisationId: number,
  initial: { view: MemberListView; page: PeoplePage<MemberRow> },
) {
  return useServerList({
    codec: memberListView,
    endpoint: `/api/organisations/${organisationId}/members`,
    scope: {},
    initial,
  });
}

/** The keepers and members tables alike: people are searched by name or e-mail, a row a person. */
export const peopleFrame = {
  placeholder: 'Name or e-mail',
  rowKey: (row: { userId: number }) => row.userId,
  rowClassName: '',
};
