import type { Role } from '@/models/membership';

export type { Role };

/**
 * Who may do what. A pure function over the session user and a description of the thing, so the rules
 * can be read in one place and unit-tested without a database. Route handlers load the thing first
 * (to learn its organisation and keeper) and then ask `can`.
 */

export type MembershipClaim = {
  organisationId: number;
  organisationName: string;
  role: Role;
  /** The organisation holds invented example data (the demo), which its pages say; read with the session. */
  exampleData?: boolean;
};
export type SessionUser = { id: number; memberships: MembershipClaim[] };

export type Action = 'read' | 'create' | 'update' | 'delete';

/** Things that belong to one keeper's enclosure share its ownership rules. */
export const ENCLOSURE_OWNED_KINDS = ['enclosure', 'design', 'variant', 'share', 'lamp', 'reading'] as const;
export type EnclosureOwnedKind = (typeof ENCLOSURE_OWNED_KINDS)[number];

export type Resource =
  | { kind: 'organisation'; id: number }
  | { kind: EnclosureOwnedKind; organisationId: number; keeperId: number }
  /** A membership (or the list of them when `userId` is left out). */
  | { kind: 'member'; organisationId: number; userId?: number }
  /** `role` is the role the invitation grants. */
  | { kind: 'invitation'; organisationId: number; role?: Role }
  | { kind: 'species'; organisationId: number }
  | { kind: 'lamp-type'; organisationId: number }
  /**
   * An uploaded file no longer filed under an enclosure (its enclosure was deleted); one that still is
   * follows its enclosure's rules. `uploaderId` is the member who uploaded it.
   */
  | { kind: 'upload'; organisationId: number; uploaderId: number }
  /** The development mail viewer, which shows captured invitation links (owners only). */
  | { kind: 'mail'; organisationId: number }
  /** The background jobs page: recent runs, and this organisation's failed units and undelivered e-mail. */
  | { kind: 'jobs'; organisationId: number }
  /**
   * The shop's customers and the lamps it tested for them at the counter (with their readings). Personal
   * data of people who are not members: the owner's and staff's alone.
   */
  | { kind: 'customer'; organisationId: number }
  /**
   * What the shop learns from its tests: the lamp types' measured decay curves (adopting one for the
   * organisation) and the counter's figures. Learned from customers' lamps, so the owner's and staff's.
   */
  | { kind: 'shop-figures'; organisationId: number }
  /** A person's own account: password and sessions. No role, not even an owner's, reaches another's. */
  | { kind: 'account'; userId: number };

export function roleIn(user: SessionUser | null | undefined, organisationId: number): Role | null {
  if (!user) return null;
  return user.memberships.find((m) => m.organisationId === organisationId)?.role ?? null;
}

const isStaffOrOwner = (role: Role | null) => role === 'owner' || role === 'staff';

export function can(user: SessionUser | null | undefined, action: Action, resource: Resource): boolean {
  if (!user) return false;
  switch (resource.kind) {
    case 'organisation': {
      const role = roleIn(user, resource.id);
      if (action === 'read') return role !== null;
      // Creating an organisation is open to anyone signed in (sign-up); settings and deletion are the owner's.
      if (action === 'create') return true;
      return role === 'owner';
    }
    case 'enclosure':
    case 'design':
    case 'variant':
    case 'share':
    case 'lamp':
    case 'reading': {
      const role = roleIn(user, resource.organisationId);
      if (isStaffOrOwner(role)) return true;
      // A keeper works on their own enclosures (and everything in them) and sees nothing of other keepers.
      return role === 'keeper' && resource.keeperId === user.id;
    }
    case 'member': {
      const role = roleIn(user, resource.organisationId);
      // Staff need the member list to assign enclosures to keepers; keepers do not see other customers.
      if (action === 'read') return isStaffOrOwner(role);
      // Adding members happens through invitations; changing roles and removing people is the owner's.
      return role === 'owner';
    }
    case 'invitation': {
      const role = roleIn(user, resource.organisationId);
      if (role === 'owner') return true;
      if (role !== 'staff') return false;
      if (action === 'read') return true;
      // Staff bring in customers (keepers); only an owner brings in staff or other owners.
      return resource.role === 'keeper';
    }
    case 'species':
    case 'lamp-type': {
      const role = roleIn(user, resource.organisationId);
      if (action === 'read') return role !== null;
      return isStaffOrOwner(role);
    }
    case 'upload': {
      const role = roleIn(user, resource.organisationId);
      if (role === null) return false;
      const isUploader = resource.uploaderId === user.id;
      // Staff look after the organisation's files; a keeper sees only what they uploaded themselves.
      if (action === 'read') return isUploader || isStaffOrOwner(role);
      if (action === 'create') return true;
      // Changing or removing someone else's file is the owner's call.
      return isUploader || role === 'owner';
    }
    case 'mail':
      // Invitation links are as good as passwords: only the organisation's owners see its captured mail.
      return action === 'read' && roleIn(user, resource.organisationId) === 'owner';
    case 'jobs':
      // Failures name members and their e-mail addresses and show delivery errors: the owner's to follow up.
      return action === 'read' && roleIn(user, resource.organisationId) === 'owner';
    case 'shop-figures':
      // The measured curves come from customers' lamps as well as enclosures: keepers see only what an
      // adopted curve does to their own lamps' outlooks, never the shop's test figures.
      return isStaffOrOwner(roleIn(user, resource.organisationId));
    case 'customer':
      // Keepers are customers themselves: they never see the shop's list of other people.
      return isStaffOrOwner(roleIn(user, resource.organisationId));
    case 'account':
      return action !== 'create' && resource.userId === user.id;
  }
}
