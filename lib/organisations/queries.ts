import 'server-only';
import { Membership, Organisation, User } from '@/models';

/** Reads of an organisation and its people. Access is checked by the caller (a route's allow()). */

export type MemberRow = Membership & { user?: User };

export const memberJson = (m: MemberRow) => ({
  userId: m.userId,
  name: m.user?.name ?? '',
  email: m.user?.email ?? '',
  role: m.role,
  joinedAt: m.createdAt.toISOString(),
});

export async function organisationName(id: number): Promise<string | null> {
  return (await Organisation.findByPk(id, { attributes: ['name'] }))?.name ?? null;
}

/** Whether the organisation holds invented example data (the demo), which every view of it must say. */
export async function isExampleData(id: number): Promise<boolean> {
  return (await Organisation.findByPk(id, { attributes: ['exampleData'] }))?.exampleData ?? false;
}
