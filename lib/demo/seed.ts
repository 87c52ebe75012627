import 'server-only';
import bcrypt from 'bcryptjs';
import type { Sequelize, Transaction } from 'sequelize';
import { Enclosure, Membership, Organisation, User, initModels } from '@/models';
import { DEMO_ORGANISATIONS, DEMO_PASSWORDS, type DemoOrganisation } from './scenario';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { seedDemoDesigns } from './designs';
import { seedDemoCounter } from './counter';
import { seedDemoLampLog } from './lamp-log';

export type SeedResult = {
  created: {
    organisations: number;
    users: number;
    memberships: number;
    enclosures: number;
    designs: number;
    variants: number;
    shares: number;
    photos: number;
  };
};

/** bcrypt cost for demo accounts: quick to seed, still a real hash. */
const DEMO_HASH_COST = 10;

/**
 * One hash per demo password for the life of the process: the passwords are printed for everyone to
 * use, so accounts of one role sharing a hash gives nothing away, and a process that seeds again (the
 * test suite does, dozens of times) does not pay about 0.1 s of bcrypt per account each time.
 */
const demoHashes = new Map<string, Promise<string>>();
function demoPasswordHash(password: string): Promise<string> {
  let hash = demoHashes.get(password);
  if (!hash) {
    hash = bcrypt.hash(password, DEMO_HASH_COST);
    hash.catch(() => demoHashes.delete(password));
    demoHashes.set(password, hash);
  }
  return hash;
}

/**
 * Finds the organisation of a demo scenario: by name, or, when someone renamed it, through its demo
 * owner's owner membership, so a renamed organisation is not created a second time.
 */
async function findOrganisation(org: DemoOrganisation, transaction: Transaction) {
  const byName = await Organisation.findOne({
    where: { name: org.name },
    order: [['id', 'ASC']],
    transaction,
  });
  if (byName) return byName;
  const owner = org.people.find((p) => p.role === 'owner');
  if (!owner) return null;
  const user = await User.findOne({ where: { email: owner.email }, transaction });
  if (!user) return null;
  const membership = await Membership.findOne({
    where: { userId: user.id, role: 'owner' },
    order: [['id', 'ASC']],
    transaction,
  });
  return membership ? Organisation.findByPk(membership.organisationId, { transaction }) : null;
}

/**
 * Adds the demo scenario where it is missing, in one transaction. Idempotent: rows are found again by
 * organisation name, e-mail and enclosure name; nothing that exists is changed or deleted, so demo
 * accounts keep any password or data their users gave them.
 */
export async function seedDemo(sequelize: Sequelize): Promise<SeedResult> {
  initModels(sequelize);
  const created = {
    organisations: 0,
    users: 0,
    memberships: 0,
    enclosures: 0,
    designs: 0,
    variants: 0,
    shares: 0,
    photos: 0,
  };
  await sequelize.transaction(async (transaction) => {
    for (const org of DEMO_ORGANISATIONS) {
      let organisation = await findOrganisation(org, transaction);
      if (!organisation) {
        organisation = await Organisation.create({ name: org.name, exampleData: true }, { transaction });
        created.organisations++;
      } else if (!organisation.exampleData) {
        // A demo organisation seeded before organisations carried the mark: its data is still invented.
        await organisation.update({ exampleData: true }, { transaction });
      }
      // The starting species sheets and lamp catalogue (once per organisation; see lib/species/seed.ts).
      await seedStartingCatalogue(organisation.id, { transaction });
      for (const person of org.people) {
        const email = person.email.toLowerCase();
        let user = await User.findOne({ where: { email }, transaction });
        if (!user) {
          const passwordHash = await demoPasswordHash(DEMO_PASSWORDS[person.role]);
          // Example accounts sign in at once: nobody holds their made-up addresses to confirm them.
          user = await User.create(
            { email, name: person.name, passwordHash, emailConfirmedAt: new Date() },
            { transaction },
          );
          created.users++;
        }
        const membership = await Membership.findOne({
          where: { organisationId: organisation.id, userId: user.id },
          transaction,
        });
        if (!membership) {
          await Membership.create(
            { organisationId: organisation.id, userId: user.id, role: person.role },
            { transaction },
          );
          created.memberships++;
        }
        for (const enclosure of person.enclosures ?? []) {
          const where = { organisationId: organisation.id, keeperId: user.id, name: enclosure.name };
          if (await Enclosure.findOne({ where, transaction })) continue;
          await Enclosure.create({ ...where, ...enclosure }, { transaction });
          created.enclosures++;
        }
      }
    }
    // Invented lamps and meter readings for the lamp log (lib/demo/lamp-log.ts).
    await seedDemoLampLog(transaction);
    // Invented customers of the shop and their counter tests (lib/demo/counter.ts).
    await seedDemoCounter(transaction);
    // Example designs of those enclosures, made over the logged lamps (lib/demo/designs.ts).
    Object.assign(created, await seedDemoDesigns(transaction));
  });
  return { created };
}
