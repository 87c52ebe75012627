// The people (and enclosures) that access tests set up again and again, made in one place so every
// test file means the same thing by "staff", "a keeper" and "the outsider".
import { beforeEach } from 'vitest';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { LampType } from '@/models';
import {
  addMember,
  createEnclosure,
  createMember,
  createOrganisation,
  createUser,
  type EnclosureFields,
} from './db';

export type WorldOptions = {
  /** The shop's name; a generated one when not given. */
  shopName?: string;
  /** Names of the staff member and the keeper, for tests that look for them in replies. */
  names?: { staff?: string; keeper?: string };
  /** Give both organisations the starting species sheets and lamp catalogue, as a new one gets. */
  catalogue?: boolean;
};

/**
 * A shop with an owner, a member of staff and a keeper, and an owner of another organisation (the
 * outsider, who must learn nothing about the shop).
 */
export async function createWorld({ shopName, names = {}, catalogue = false }: WorldOptions = {}) {
  const shop = await createOrganisation(shopName);
  const { user: owner } = await createMember('owner', shop);
  const staff = (await createUser({ name: names.staff })).user;
  const keeper = (await createUser({ name: names.keeper })).user;
  await addMember(shop, staff, 'staff');
  await addMember(shop, keeper, 'keeper');
  const { organisation: otherOrg, user: outsider } = await createMember('owner');
  if (catalogue) {
    await seedStartingCatalogue(shop.id);
    await seedStartingCatalogue(otherOrg.id);
  }
  return { shop, owner, staff, keeper, otherOrg, outsider };
}

/**
 * The world above with a second keeper of the shop, and an enclosure each: the keeper's (`enclosure`),
 * the other keeper's (`neighbour`, which the keeper must not reach) and the outsider's (`foreign`).
 */
export async function createEnclosureWorld(
  options: WorldOptions & {
    enclosure?: EnclosureFields;
    neighbour?: EnclosureFields;
    foreign?: EnclosureFields;
  } = {},
) {
  const world = await createWorld(options);
  const otherKeeper = (await createUser()).user;
  await addMember(world.shop, otherKeeper, 'keeper');
  const enclosure = await createEnclosure(world.shop, world.keeper, options.enclosure);
  const neighbour = await createEnclosure(world.shop, otherKeeper, options.neighbour);
  const foreign = await createEnclosure(world.otherOrg, world.outsider, options.foreign);
  return { ...world, otherKeeper, enclosure, neighbour, foreign };
}

export type EnclosureWorld = Awaited<ReturnType<typeof createEnclosureWorld>>;

/**
 * One object whose fields are a world `make` builds afresh before each test of the file. Call it after
 * `withTestDatabase()`, whose emptying of the database runs first (vitest runs `beforeEach` hooks in the
 * order they were added); a file's own `beforeEach` added after it sees this test's world.
 */
function freshForEachTest<T extends object>(make: () => Promise<T>): T {
  const world = {} as T;
  beforeEach(async () => {
    Object.assign(world, await make());
  });
  return world;
}

/** `createWorld(options)` before each test: `world.owner`, `world.staff`, `world.keeper` … */
export const freshWorld = (options?: WorldOptions) => freshForEachTest(() => createWorld(options));

/** `createEnclosureWorld(options)` before each test: `world.enclosure`, `world.neighbour` … */
export const freshEnclosureWorld = (options?: Parameters<typeof createEnclosureWorld>[0]) =>
  freshForEachTest(() => createEnclosureWorld(options));

/**
 * The smallest world a design test needs: an organisation with a keeper and the keeper's enclosure, and
 * a member of staff when asked for (`staff`), with the starting catalogue when asked for (`catalogue`).
 */
export async function createKeeperWorld(
  shopName: string,
  options: { enclosure?: EnclosureFields; staff?: boolean; catalogue?: boolean } = {},
) {
  const org = await createOrganisation(shopName);
  const staff = options.staff ? (await createMember('staff', org)).user : undefined;
  const { user: keeper } = await createMember('keeper', org);
  const enclosure = await createEnclosure(org, keeper, options.enclosure);
  if (options.catalogue) await seedStartingCatalogue(org.id);
  return { org, staff, keeper, enclosure };
}

/**
 * An organisation with the starting catalogue and two keepers, Ann and Bob, to give lamps to: with the
 * catalogue's T5 tube and a lamp type with no UV (a heat lamp), and a member of staff when asked for.
 */
export async function createLampKeepersWorld(options: { staff?: boolean } = {}) {
  const org = await createOrganisation();
  await seedStartingCatalogue(org.id);
  const staff = options.staff ? (await createMember('staff', org)).user : undefined;
  const { user: ann } = await createMember('keeper', org);
  const { user: bob } = await createMember('keeper', org);
  const types = await LampType.findAll({ where: { organisationId: org.id } });
  const t5 = types.find((t) => t.tech === 't5')!;
  const heat = types.find((t) => !(t.uvbAt30 > 0))!;
  return { org, staff, ann, bob, t5, heat };
}
