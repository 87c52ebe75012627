import { describe, expect, it } from 'vitest';
import {
  ENCLOSURE_OWNED_KINDS,
  can,
  roleIn,
  type Action,
  type Resource,
  type SessionUser,
} from './permissions';

// Two organisations: 1 (the shop) and 2 (someone else). Every actor below is looked at from organisation 1.
const ORG = 1;
const OTHER_ORG = 2;

const member = (id: number, role: 'owner' | 'staff' | 'keeper', organisationId = ORG): SessionUser => ({
  id,
  memberships: [{ organisationId, organisationName: `Org ${organisationId}`, role }],
});

const actors = {
  owner: member(10, 'owner'),
  staff: member(20, 'staff'),
  keeper: member(30, 'keeper'),
  // The owner of the other organisation: must never reach anything of organisation 1.
  outsider: member(40, 'owner', OTHER_ORG),
  // Signed in but in no organisation at all (e.g. just removed).
  nobody: { id: 50, memberships: [] } satisfies SessionUser,
  anonymous: null,
} as const;
type Actor = keyof typeof actors;

const ACTIONS: Action[] = ['read', 'create', 'update', 'delete'];
const ALL: Record<Action, boolean> = { read: true, create: true, update: true, delete: true };
const NONE: Record<Action, boolean> = { read: false, create: false, update: false, delete: false };
const READ_ONLY: Record<Action, boolean> = { ...NONE, read: true };
const READ_CREATE: Record<Action, boolean> = { ...READ_ONLY, create: true };

type Grants = Record<Actor, Record<Action, boolean>>;
type Row = { resource: Resource; expect: Grants };

/** What the actors named may do; every other actor may do nothing. */
const only = (granted: Partial<Grants>): Grants => ({
  owner: NONE,
  staff: NONE,
  keeper: NONE,
  outsider: NONE,
  nobody: NONE,
  anonymous: NONE,
  ...granted,
});

const rows: Record<string, Row> = {
  'the organisation': {
    resource: { kind: 'organisation', id: ORG },
    expect: only({
      owner: ALL,
      staff: READ_CREATE,
      keeper: READ_CREATE,
      // Anyone signed in may create a new organisation of their own, but sees nothing of this one.
      outsider: { ...NONE, create: true },
      nobody: { ...NONE, create: true },
    }),
  },
  // Keeper 30 owns these.
  ...Object.fromEntries(
    ENCLOSURE_OWNED_KINDS.map((kind) => [
      `the keeper's own ${kind}`,
      {
        resource: { kind, organisationId: ORG, keeperId: 30 },
        expect: only({ owner: ALL, staff: ALL, keeper: ALL }),
      },
    ]),
  ),
  ...Object.fromEntries(
    ENCLOSURE_OWNED_KINDS.map((kind) => [
      `another keeper's ${kind}`,
      {
        resource: { kind, organisationId: ORG, keeperId: 31 },
        expect: only({ owner: ALL, staff: ALL }),
      },
    ]),
  ),
  'an enclosure in the other organisation with the same keeper id': {
    resource: { kind: 'enclosure', organisationId: OTHER_ORG, keeperId: 30 },
    // The outsider owns organisation 2, so they see it; staff and keeper of organisation 1 do not.
    expect: only({ outsider: ALL }),
  },
  'the shop’s customers and counter tests': {
    resource: { kind: 'customer', organisationId: ORG },
    expect: only({ owner: ALL, staff: ALL }),
  },
  'the shop’s measured lamp curves and counter figures': {
    resource: { kind: 'shop-figures', organisationId: ORG },
    expect: only({ owner: ALL, staff: ALL }),
  },
  'background jobs': {
    resource: { kind: 'jobs', organisationId: ORG },
    expect: only({ owner: READ_ONLY }),
  },
  'members and roles': {
    resource: { kind: 'member', organisationId: ORG, userId: 30 },
    expect: only({ owner: ALL, staff: READ_ONLY }),
  },
  'an invitation for a keeper': {
    resource: { kind: 'invitation', organisationId: ORG, role: 'keeper' },
    expect: only({ owner: ALL, staff: ALL }),
  },
  'an invitation for staff': {
    resource: { kind: 'invitation', organisationId: ORG, role: 'staff' },
    expect: only({ owner: ALL, staff: READ_ONLY }),
  },
  'an invitation for an owner': {
    resource: { kind: 'invitation', organisationId: ORG, role: 'owner' },
    expect: only({ owner: ALL, staff: READ_ONLY }),
  },
  'species sheets': {
    resource: { kind: 'species', organisationId: ORG },
    expect: only({ owner: ALL, staff: ALL, keeper: READ_ONLY }),
  },
  'the lamp catalogue': {
    resource: { kind: 'lamp-type', organisationId: ORG },
    expect: only({ owner: ALL, staff: ALL, keeper: READ_ONLY }),
  },
  // Files left behind by a deleted enclosure (files filed under one follow the enclosure rows above).
  'a file the keeper uploaded': {
    resource: { kind: 'upload', organisationId: ORG, uploaderId: 30 },
    expect: only({ owner: ALL, staff: READ_CREATE, keeper: ALL }),
  },
  'a file staff uploaded': {
    resource: { kind: 'upload', organisationId: ORG, uploaderId: 20 },
    expect: only({ owner: ALL, staff: ALL, keeper: { ...NONE, create: true } }),
  },
  'a file its uploader left behind in an organisation they have left': {
    resource: { kind: 'upload', organisationId: OTHER_ORG, uploaderId: 30 },
    // Keeper 30 is no longer a member of organisation 2: uploading it gives no lasting access.
    expect: only({ outsider: ALL }),
  },
  'captured mail': {
    resource: { kind: 'mail', organisationId: ORG },
    // Owners only: captured invitations carry working links.
    expect: only({ owner: READ_ONLY }),
  },
  "the keeper's own account": {
    resource: { kind: 'account', userId: 30 },
    // Only the person themself: an owner can remove someone from the organisation, never use their account.
    expect: only({ keeper: { ...ALL, create: false } }),
  },
};

describe('can(user, action, resource)', () => {
  for (const [name, row] of Object.entries(rows)) {
    describe(name, () => {
      const cases = (Object.keys(actors) as Actor[]).flatMap((actor) =>
        ACTIONS.map((action) => ({ actor, action, allowed: row.expect[actor][action] })),
      );
      it.each(cases)('$actor $action → $allowed', ({ actor, action, allowed }) => {
        expect(can(actors[actor], action, row.resource)).toBe(allowed);
      });
    });
  }

  it('uses the role of the organisation the thing belongs to, not any role the user has elsewhere', () => {
    const ownerHereKeeperThere: SessionUser = {
      id: 30,
      memberships: [
        { organisationId: OTHER_ORG, organisationName: 'Org 2', role: 'owner' },
        { organisationId: ORG, organisationName: 'Org 1', role: 'keeper' },
      ],
    };
    expect(can(ownerHereKeeperThere, 'update', { kind: 'member', organisationId: ORG })).toBe(false);
    expect(can(ownerHereKeeperThere, 'update', { kind: 'member', organisationId: OTHER_ORG })).toBe(true);
    expect(can(ownerHereKeeperThere, 'read', { kind: 'enclosure', organisationId: ORG, keeperId: 31 })).toBe(
      false,
    );
    expect(roleIn(ownerHereKeeperThere, ORG)).toBe('keeper');
    expect(roleIn(ownerHereKeeperThere, 3)).toBeNull();
  });
});
