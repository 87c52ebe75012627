// loadOwned, the one loader of a thing by id for a user, across every kind it knows: who gets the record,
// who gets "not found" (another keeper's, another organisation's, a missing id — indistinguishable) and
// who gets "forbidden" (may see it, may not change it). The page form answers null for the first two and
// says whether they may edit and delete.
import { describe, expect, it } from 'vitest';
import { loadOwned, loadOwnedForPage, ownerOf, type OwnedKind } from '@/lib/access';
import { loadUserById, type CurrentUser } from '@/lib/auth/session-user';
import { isDomainError } from '@/lib/errors';
import type { Action } from '@/lib/permissions';
import {
  CounterLamp,
  Customer,
  Design,
  Invitation,
  Lamp,
  LampType,
  Reading,
  ShareLink,
  SpeciesSheet,
  Upload,
  Variant,
} from '@/models';
import { withTestDatabase } from '../helpers/db';
import { createEnclosureWorld } from '../helpers/world';

withTestDatabase();

type Person = 'owner' | 'staff' | 'keeper' | 'otherKeeper' | 'outsider';
type Outcome = 'ok' | 'forbidden' | 'not_found';

async function attempt(kind: OwnedKind, id: number, user: CurrentUser, action: Action): Promise<Outcome> {
  try {
    const record = await loadOwned(kind, id, user, action);
    expect(record.id).toBe(id);
    return 'ok';
  } catch (e) {
    if (isDomainError(e, 'forbidden', 'not_found')) return e.kind as Outcome;
    throw e;
  }
}

async function world() {
  const w = await createEnclosureWorld({ catalogue: true });
  const people = Object.fromEntries(
    await Promise.all(
      (['owner', 'staff', 'keeper', 'otherKeeper', 'outsider'] as const).map(async (p) => [
        p,
        (await loadUserById(w[p].id))!,
      ]),
    ),
  ) as Record<Person, CurrentUser>;
  const design = await Design.create({ enclosureId: w.enclosure.id, name: 'Plan', createdById: w.keeper.id });
  const variant = await Variant.create({
    designId: design.id,
    name: 'Variant A',
    designJson: '{}',
    createdById: w.keeper.id,
    updatedById: w.keeper.id,
  });
  const share = await ShareLink.create({
    variantId: variant.id,
    tokenHash: 'a'.repeat(64),
    createdById: w.keeper.id,
  });
  const type = (await LampType.findOne({ where: { organisationId: w.shop.id } }))!;
  const sheet = (await SpeciesSheet.findOne({ where: { organisationId: w.shop.id } }))!;
  const lamp = await Lamp.create({
    enclosureId: w.enclosure.id,
    lampTypeId: type.id,
    label: 'Main UV tube',
    firstUsedOn: '2025-01-01',
    hoursPerDay: 12,
    createdById: w.keeper.id,
  });
  const reading = await Reading.create({
    lampId: lamp.id,
    takenAt: new Date('2025-06-01T10:00:00Z'),
    distanceCm: 30,
    value: 60,
    unit: 'uvb',
    takenById: w.keeper.id,
  });
  const customer = await Customer.create({
    organisationId: w.shop.id,
    name: 'Kim Invented',
    createdById: null,
  });
  const counterLamp = await CounterLamp.create({
    organisationId: w.shop.id,
    customerId: customer.id,
    lampTypeId: type.id,
    firstUsedOn: '2025-01-01',
    hoursPerDay: 12,
    createdById: w.staff.id,
  });
  const file = (enclosureId: number | null) =>
    Upload.create({
      kind: 'backdrop',
      ownerId: w.keeper.id,
      organisationId: w.shop.id,
      enclosureId,
      storageKey: `test/${enclosureId ?? 'loose'}-${w.shop.id}`,
      contentType: 'image/png',
      sizeBytes: 10,
      sha256: '0'.repeat(64),
    });
  const filed = await file(w.enclosure.id);
  // A file whose enclosure was deleted: its uploader's (the keeper) and the owners' and staff's to see.
  const loose = await file(null);
  const invitation = await Invitation.create({
    organisationId: w.shop.id,
    email: 'new.staff@example.com',
    role: 'staff',
    tokenHash: 'b'.repeat(64),
    invitedById: w.owner.id,
    expiresAt: new Date(Date.now() + 86_400_000),
  });
  const ids: Record<OwnedKind | 'loose-upload', number> = {
    enclosure: w.enclosure.id,
    design: design.id,
    variant: variant.id,
    share: share.id,
    lamp: lamp.id,
    reading: reading.id,
    species: sheet.id,
    'lamp-type': type.id,
    'lamp-type-figures': type.id,
    customer: customer.id,
    'counter-lamp': counterLamp.id,
    invitation: invitation.id,
    upload: filed.id,
    'loose-upload': loose.id,
  };
  return { w, people, ids };
}

// [read, update] for each person.
type Outcomes = Record<Person, [Outcome, Outcome]>;
const OK: [Outcome, Outcome] = ['ok', 'ok'];
const SEES: [Outcome, Outcome] = ['ok', 'forbidden'];
const HIDDEN: [Outcome, Outcome] = ['not_found', 'not_found'];

// The keeper's own enclosure and everything in it is theirs; another keeper of the same shop and the other
// organisation's owner learn nothing of it.
const IN_ENCLOSURE: Outcomes = { owner: OK, staff: OK, keeper: OK, otherKeeper: HIDDEN, outsider: HIDDEN };
// The catalogue: every member reads it, owners and staff change it.
const CATALOGUE: Outcomes = { owner: OK, staff: OK, keeper: SEES, otherKeeper: SEES, outsider: HIDDEN };
// Customers and the shop's measured figures: owners' and staff's alone; a keeper does not learn they exist.
const SHOP_ONLY: Outcomes = { owner: OK, staff: OK, keeper: HIDDEN, otherKeeper: HIDDEN, outsider: HIDDEN };
// An invitation to join as staff: owners withdraw it; staff see it but bring in only keepers.
const STAFF_INVITATION: Outcomes = {
  owner: OK,
  staff: SEES,
  keeper: HIDDEN,
  otherKeeper: HIDDEN,
  outsider: HIDDEN,
};
// The keeper's file of a deleted enclosure: staff see it, only its uploader or an owner change it.
const LOOSE_UPLOAD: Outcomes = { owner: OK, staff: SEES, keeper: OK, otherKeeper: HIDDEN, outsider: HIDDEN };
const EXPECTED: Record<OwnedKind | 'loose-upload', Outcomes> = {
  enclosure: IN_ENCLOSURE,
  design: IN_ENCLOSURE,
  variant: IN_ENCLOSURE,
  share: IN_ENCLOSURE,
  lamp: IN_ENCLOSURE,
  reading: IN_ENCLOSURE,
  species: CATALOGUE,
  'lamp-type': CATALOGUE,
  'lamp-type-figures': SHOP_ONLY,
  customer: SHOP_ONLY,
  'counter-lamp': SHOP_ONLY,
  invitation: STAFF_INVITATION,
  upload: IN_ENCLOSURE,
  'loose-upload': LOOSE_UPLOAD,
};
const CASES = Object.keys(EXPECTED) as (keyof typeof EXPECTED)[];
const kindOf = (c: keyof typeof EXPECTED): OwnedKind => (c === 'loose-upload' ? 'upload' : c);

describe('loadOwned', () => {
  it('gives each kind to whom it belongs, "forbidden" to who may only see it, "not found" to the rest', async () => {
    const { people, ids } = await world();
    const got: Record<string, Record<string, [Outcome, Outcome]>> = {};
    for (const c of CASES) {
      got[c] = {};
      for (const person of Object.keys(people) as Person[]) {
        got[c][person] = [
          await attempt(kindOf(c), ids[c], people[person], 'read'),
          await attempt(kindOf(c), ids[c], people[person], 'update'),
        ];
      }
    }
    expect(got).toEqual(EXPECTED);
  });

  it('loads what the ownership is read from: the enclosure above a design, variant, share, lamp and reading', async () => {
    const { w, people, ids } = await world();
    const keeper = people.keeper;
    const share = await loadOwned('share', ids.share, keeper, 'read');
    expect(share.variant.design.enclosure.id).toBe(w.enclosure.id);
    const reading = await loadOwned('reading', ids.reading, keeper, 'read');
    expect(reading.lamp.enclosure.keeperId).toBe(w.keeper.id);
    const enclosure = await loadOwned('enclosure', ids.enclosure, keeper, 'read');
    expect(enclosure.keeper?.name).toBe(w.keeper.name);
    expect(ownerOf('design', await loadOwned('design', ids.design, keeper, 'read'))).toEqual({
      kind: 'design',
      organisationId: w.shop.id,
      keeperId: w.keeper.id,
    });
  });

  it('answers a missing or malformed id "not found", naming the kind', async () => {
    const { people } = await world();
    for (const id of [2 ** 31, 0, -1, 1.5, Number.NaN]) {
      await expect(loadOwned('variant', id, people.owner, 'read')).rejects.toMatchObject({
        kind: 'not_found',
        message: 'The variant was not found.',
      });
    }
    await expect(loadOwned('species', 2 ** 31, people.owner, 'read')).rejects.toMatchObject({
      message: 'That species sheet was not found.',
    });
  });

  it('says why a file may not be deleted', async () => {
    const { people, ids } = await world();
    await expect(loadOwned('upload', ids['loose-upload'], people.staff, 'delete')).rejects.toMatchObject({
      kind: 'forbidden',
      message: 'Only the person who uploaded it, or an owner, can delete this file.',
    });
  });
});

describe('loadOwnedForPage', () => {
  it('gives null where loadOwned says "not found", and whether this person may edit and delete', async () => {
    const { people, ids } = await world();
    expect(await loadOwnedForPage('design', ids.design, people.otherKeeper)).toBeNull();
    expect(await loadOwnedForPage('customer', String(ids.customer), people.keeper)).toBeNull();
    const mine = await loadOwnedForPage('design', String(ids.design), people.keeper);
    expect(mine && { id: mine.record.id, canEdit: mine.canEdit, canDelete: mine.canDelete }).toEqual({
      id: ids.design,
      canEdit: true,
      canDelete: true,
    });
    const sheet = await loadOwnedForPage('species', ids.species, people.keeper);
    expect(sheet && [sheet.canEdit, sheet.canDelete]).toEqual([false, false]);
    const staffSheet = await loadOwnedForPage('species', ids.species, people.staff);
    expect(staffSheet && [staffSheet.canEdit, staffSheet.canDelete]).toEqual([true, true]);
  });

  it('takes the route segment as it comes: anything but a whole positive number is null', async () => {
    const { people, ids } = await world();
    for (const raw of [`${ids.design}abc`, ` ${ids.design}`, `${ids.design}.0`, '-1', '0', '', '1e3']) {
      expect(await loadOwnedForPage('design', raw, people.owner)).toBeNull();
    }
  });
});
