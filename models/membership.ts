import { id, oneOf, ref, table, timestamps } from './columns';

export const ROLES = ['owner', 'staff', 'keeper'] as const;
export type Role = (typeof ROLES)[number];

/** A user's role in one organisation. One row per (organisation, user). */
export class Membership extends table('memberships', {
  id: id(),
  organisationId: ref(),
  userId: ref(),
  role: oneOf(ROLES),
  ...timestamps(),
}) {}
