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

type Row = { resource: Resource; expect: Record<Actor, Record<Action, boolean>> };

const rows: Record<string, Row> = {
  'the organisation': {
    resource: { kind: 'organisation', id: ORG },
    expect: {
      owner: ALL,
      staff: { read: true, create: true, update: false, delete: false },
      keeper: { read: true, create: true, update: false, delete: false },
      // Anyone signed in may create a new organisation of their own, but sees nothing of this one.
      outsider: { ...NONE, create: true },
      nobody: { ...NONE, create: true },
      anonymous: NONE,
    },
  },
  // Keeper 30 owns these.
  ...Object.fromEntries(
    ENCLOSURE_OWNED_KINDS.map((kind) => [
      `the keeper's own ${kind}`,
      {
        resource: { kind, organisationId: ORG, keeperId: 30 },
        expect: { owner: ALL, staff: ALL, keeper: ALL, outsider: NONE, nobody: NONE, anonymous: NONE },
      },
    ]),
  ),
  ...Object.fromEntries(
    ENCLOSURE_OWNED_KINDS.map((kind) => [
      `another keeper's ${kind}`,
      {
        resource: { kind, organisationId: ORG, keeperId: 31 },
        expect: { owner: ALL, staff: ALL, keeper: NONE, outsider: NONE, nobody: NONE, anonymous: NONE },
      },
    ]),
  ),
  'an enclosure in the other organisation with the same keeper id': {
    resource: { kind: 'enclosure', organisationId: OTHER_ORG, keeperId: 30 },
    // The outsider owns organisation 2, so they see it; staff and keeper of organisation 1 do not.
    expect: { owner: NONE, staff: NONE, keeper: NONE, outsider: ALL, nobody: NONE, anonymous: NONE },
  },
  'the shop’s customers and counter tests': {
    resource: { kind: 'customer', organisationId: ORG },
    expect: { owner: ALL, staff: ALL, keeper: NONE, outsider: NONE, nobody: NONE, anonymous: NONE },
  },
  'the shop’s measured lamp curves and counter figures': {
    resource: { kind: 'shop-figures', organisationId: ORG },
    expect: { owner: ALL, staff: ALL, keeper: NONE, outsider: NONE, nobody: NONE, anonymous: NONE },
  },
  'background jobs': {
    resource: { kind: 'jobs', organisationId: ORG },
    expect: { owner: READ_ONLY, staff: NONE, keeper: NONE, outsider: NONE, nobody: NONE, anonymous: NONE },
  },
  'members and roles': {
    resource: { kind: 'member', organisationId: ORG, userId: 30 },
    expect: { owner: ALL, staff: READ_ONLY, keeper: NONE, outsider: NONE, nobody: NONE, anonymous: NONE },
  },
  'an invitation for a keeper': {
    resource: { kind: 'invitation', organisationId: ORG, role: 'keeper' },
    expect: { owner: ALL, staff: ALL, keeper: NONE, outsider: NONE, nobody: NONE, anonymous: NONE },
  },
  'an invitation for staff': {
    resource: { kind: 'invitation', organisationId: ORG, role: 'staff' },
    expect: { owner: ALL, staff: READ_ONLY, keeper: NONE, outsider: NONE, nobody: NONE, anonymous: NONE },
  },
  'an invitation for an owner': {
    resource: { kind: 'invitation', organisationId: ORG, role: 'owner' },
    expect: { owner: ALL, staff: READ_ONLY, keeper: NONE, outsider: NONE, nobody: NONE, anonymous: NONE },
  },
  'species sheets': {
    resource: { kind: 'species', organisationId: ORG },
    expect: { owner: ALL, staff: ALL, keeper: READ_ONLY, outsider: NONE, nobody: NONE, anonymous: NONE },
  },
  'the lamp catalogue': {
    resource: { kind: 'lamp-type', organisationId: ORG },
    expect: { owner: ALL, staff: ALL, keeper: READ_ONLY, outsider: NONE, nobody: NONE, anonymous: NONE },
  },
  // Files left behind by a deleted enclosure (files filed under one follow the enclosure rows above).
  'a file the keeper uploaded': {
    resource: { kind: 'upload', organisationId: ORG, uploaderId: 30 },
    expect: {
      owner: ALL,
      staff: { read: true, create: true, update: false, delete: false },
      keeper: ALL,
      outsider: NONE,
      nobody: NONE,
      anonymous: NONE,
    },
  },
  'a file staff uploaded': {
    resource: { kind: 'upload', organisationId: ORG, uploaderId: 20 },
    expect: {
      owner: ALL,
      staff: ALL,
      keeper: { read: false, create: true, update: false, delete: false },
      outsider: NONE,
      nobody: NONE,
      anonymous: NONE,
    },
  },
  'a file its uploader left behind in an organisation they have left': {
    resource: { kind: 'upload', organisationId: OTHER_ORG, uploaderId: 30 },
    // Keeper 30 is no longer a member of organisation 2: uploading it gives no lasting access.
    expect: { owner: NONE, staff: NONE, keeper: NONE, outsider: ALL, nobody: NONE, anonymous: NONE },
  },
  'captured mail': {
    resource: { kind: 'mail', organisationId: ORG },
    // Owners only: captured invitations carry working links.
    expect: {
      owner: READ_ONLY,
      staff: NONE,
      keeper: NONE,
      outsider: NONE,
      nobody: NONE,
      anonymous: NONE,
    },
  },
  "the keeper's own account": {
    resource: { kind: 'account', userId: 30 },
    // Only the person themself: an owner can remove someone from the organisation, never use their account.
    expect: {
      owner: NONE,
      staff: NONE,
      keeper: { ...ALL, create: false },
      outsider: NONE,
      nobody: NONE,
      anonymous: NONE,
    },
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
