import bcrypt from 'bcryptjs';
import { describe, expect, it } from 'vitest';
import { Enclosure, Membership, Organisation, User } from '@/models';
import { createEnclosure, seedDemo, testDb, withTestDatabase } from '@/tests/helpers/db';
import { DEMO_HOUSEHOLD, DEMO_ORGANISATIONS, DEMO_SHOP, DEMO_SIGN_INS, demoSignIn } from './scenario';

withTestDatabase();

async function counts() {
  return {
    organisations: await Organisation.count(),
    users: await User.count(),
    memberships: await Membership.count(),
    enclosures: await Enclosure.count(),
  };
}

describe('demo scenario data', () => {
  it('has a shop with an owner, two staff and three keepers, and a household with an owner', () => {
    const roles = (org: typeof DEMO_SHOP) => org.people.map((p) => p.role).sort();
    expect(roles(DEMO_SHOP)).toEqual(['keeper', 'keeper', 'keeper', 'owner', 'staff', 'staff']);
    expect(roles(DEMO_HOUSEHOLD)).toEqual(['owner']);
    for (const keeper of DEMO_SHOP.people.filter((p) => p.role === 'keeper')) {
      expect(keeper.enclosures?.length).toBeGreaterThanOrEqual(1);
      expect(keeper.enclosures?.length).toBeLessThanOrEqual(2);
    }
    expect(DEMO_HOUSEHOLD.people[0]?.enclosures).toHaveLength(1);
  });

  it('uses unique e-mails on example.com and passwords of at least 12 characters', () => {
    const emails = DEMO_SIGN_INS.map((s) => s.email);
    expect(new Set(emails).size).toBe(emails.length);
    for (const s of DEMO_SIGN_INS) {
      expect(s.email).toMatch(/^[a-z0-9.-]+@example\.com$/);
      expect(s.password.length).toBeGreaterThanOrEqual(12);
    }
    expect(demoSignIn('staff').role).toBe('staff');
    expect(demoSignIn('owner', DEMO_HOUSEHOLD.name).email).toBe(DEMO_HOUSEHOLD.people[0]?.email);
  });
});

describe('seedDemo', () => {
  it('creates the scenario, with every sign-in working', async () => {
    const people = DEMO_ORGANISATIONS.flatMap((o) => o.people);
    const enclosures = people.flatMap((p) => p.enclosures ?? []);
    const { created } = await seedDemo();
    expect(created).toMatchObject({
      organisations: DEMO_ORGANISATIONS.length,
      users: people.length,
      memberships: people.length,
      enclosures: enclosures.length,
      // One example design for each enclosure (lib/demo/designs.test.ts checks what is in them).
      designs: enclosures.length,
    });
    for (const s of DEMO_SIGN_INS) {
      const user = await User.scope('withPassword').findOne({ where: { email: s.email } });
      expect(user, s.email).not.toBeNull();
      expect(await bcrypt.compare(s.password, user?.passwordHash ?? '')).toBe(true);
      const org = await Organisation.findOne({ where: { name: s.organisation } });
      const membership = await Membership.findOne({ where: { userId: user?.id, organisationId: org?.id } });
      expect(membership?.role).toBe(s.role);
      // Invented data, marked so wherever its lamps, readings and reports appear.
      expect(org?.exampleData).toBe(true);
    }
    const sable = await Enclosure.findOne({ where: { animalName: 'Sable' } });
    expect(sable?.speciesName).toBe('Bearded dragon');
    expect(sable?.keeperId).toBe(
      (await User.findOne({ where: { email: 'tomasz.wrenfield@example.com' } }))?.id,
    );
  });

  it('changes nothing when run again', async () => {
    await seedDemo();
    const before = await counts();
    const again = await seedDemo();
    // Nothing of any kind (people, enclosures, example designs, links, photos) is added a second time.
    expect(Object.keys(again.created)).toContain('designs');
    expect(Object.entries(again.created).filter(([, n]) => n !== 0)).toEqual([]);
    expect(await counts()).toEqual(before);
  });

  it('keeps what users changed or added, and does not recreate a renamed organisation', async () => {
    await seedDemo();
    const owner = await User.scope('withPassword').findOne({ where: { email: demoSignIn('owner').email } });
    if (!owner) throw new Error('demo owner missing');
    const newHash = await bcrypt.hash('a-password-the-owner-chose', 4);
    await owner.update({ name: 'Maren T.', passwordHash: newHash });
    const shop = await Organisation.findOne({ where: { name: DEMO_SHOP.name } });
    if (!shop) throw new Error('demo shop missing');
    await shop.update({ name: 'Fernhollow Reptiles & Rescue' });
    const extra = await createEnclosure(shop, owner, { name: 'Quarantine tub' });
    const before = await counts();

    await seedDemo();

    expect(await counts()).toEqual(before);
    const ownerAfter = await User.scope('withPassword').findByPk(owner.id);
    expect(ownerAfter?.name).toBe('Maren T.');
    expect(ownerAfter?.passwordHash).toBe(newHash);
    expect(await Enclosure.findByPk(extra.id)).not.toBeNull();
    expect((await Organisation.findByPk(shop.id))?.name).toBe('Fernhollow Reptiles & Rescue');
  });

  it('runs on the test database only', () => {
    expect(testDb().getDatabaseName()).toMatch(/_test$/);
  });
});
