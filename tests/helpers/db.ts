// Database helpers for integration tests. They run against the test database (DB_NAME ending in _test,
// set by scripts/test.mjs) and refuse any other, so a stray run cannot wipe development data.
import bcrypt from 'bcryptjs';
import { QueryTypes, type Sequelize } from 'sequelize';
import { afterAll, beforeEach } from 'vitest';
import { closeSequelize, getSequelize } from '@/lib/db';
import { DEMO_SHOP } from '@/lib/demo/scenario';
import { seedDemo as seedDemoScenario, type SeedResult } from '@/lib/demo/seed';
import { refreshStaleOutlooks } from '@/lib/lamp-log/stored-outlooks';
import { migrateUp } from '@/lib/migrate';
import { Enclosure, Membership, Organisation, User, type Role } from '@/models';

const MIGRATIONS_TABLE = 'schema_migrations';

/** The shared Sequelize instance, checked to be on a test database. */
export function testDb(): Sequelize {
  const sequelize = getSequelize();
  const name = sequelize.getDatabaseName();
  if (!name.endsWith('_test')) {
    throw new Error(
      `tests only run against a database whose name ends in _test (DB_NAME is "${name}"): run them with npm test`,
    );
  }
  return sequelize;
}

/** Tables of the test database, children before the parents they reference. */
export async function tablesInDeleteOrder(sequelize: Sequelize = testDb()): Promise<string[]> {
  const tables = await sequelize.query<{ name: string }>(
    `SELECT TABLE_NAME AS name FROM information_schema.TABLES
      WHERE TABLE_SCHEMA = DATABASE() AND TABLE_TYPE = 'BASE TABLE'`,
    { type: QueryTypes.SELECT },
  );
  const refs = await sequelize.query<{ child: string; parent: string }>(
    `SELECT TABLE_NAME AS child, REFERENCED_TABLE_NAME AS parent FROM information_schema.KEY_COLUMN_USAGE
      WHERE TABLE_SCHEMA = DATABASE() AND REFERENCED_TABLE_NAME IS NOT NULL AND TABLE_NAME <> REFERENCED_TABLE_NAME`,
    { type: QueryTypes.SELECT },
  );
  const names = tables.map((t) => t.name).filter((n) => n !== MIGRATIONS_TABLE);
  const children = new Map<string, Set<string>>(names.map((n) => [n, new Set()]));
  for (const r of refs) children.get(r.parent)?.add(r.child);
  // Depth-first: a table is listed only after every table that references it.
  const order: string[] = [];
  const seen = new Set<string>();
  const visit = (table: string, path: Set<string>) => {
    if (seen.has(table) || path.has(table)) return; // a cycle: foreign key checks are off anyway
    path.add(table);
    for (const child of children.get(table) ?? []) visit(child, path);
    path.delete(table);
    seen.add(table);
    order.push(table);
  };
  for (const n of [...names].sort()) visit(n, new Set());
  return order;
}

let schemaReady = false;
let cachedOrder: string[] | undefined;

/** Forgets the cached table list; call after changing the schema in a test (see tests/migrations.test.ts). */
export function forgetSchema(): void {
  schemaReady = false;
  cachedOrder = undefined;
}

/**
 * Brings the schema up to date (once per test file) and empties every table but the migrations record,
 * children first. Tables added by later migrations are covered: the list comes from information_schema.
 */
export async function resetDatabase(): Promise<void> {
  const sequelize = testDb();
  if (!schemaReady) {
    await migrateUp(sequelize);
    cachedOrder = undefined;
    schemaReady = true;
  }
  const tables = (cachedOrder ??= await tablesInDeleteOrder(sequelize));
  if (tables.length === 0) return;
  // One round trip to find the tables that hold rows; most tests touch only a few.
  const filled = await sequelize.query<{ name: string }>(
    tables
      .map((t) => `SELECT '${t}' AS name FROM DUAL WHERE EXISTS (SELECT 1 FROM \`${t}\`)`)
      .join(' UNION ALL '),
    { type: QueryTypes.SELECT },
  );
  const toEmpty = new Set(filled.map((r) => r.name));
  if (toEmpty.size === 0) return;
  // One transaction pins one connection, so the session setting applies to every DELETE.
  await sequelize.transaction(async (transaction) => {
    await sequelize.query('SET FOREIGN_KEY_CHECKS = 0', { transaction });
    try {
      for (const t of tables) {
        if (toEmpty.has(t)) await sequelize.query(`DELETE FROM \`${t}\``, { transaction });
      }
    } finally {
      await sequelize.query('SET FOREIGN_KEY_CHECKS = 1', { transaction });
    }
  });
}

/** Adds the demo scenario (lib/demo/scenario.ts) to the test database. */
export async function seedDemo(): Promise<SeedResult> {
  const result = await seedDemoScenario(testDb());
  // As `npm run seed` does: the outlooks of lamps written inside the seed's transactions are recomputed
  // after their commits, in the background; bring them all up to date before a test reads the lamp log.
  await refreshStaleOutlooks();
  return result;
}

/** Adds the demo scenario and gives its example shop, the organisation most demo tests look at. */
export async function seedDemoShop(): Promise<Organisation> {
  await seedDemo();
  return (await Organisation.findOne({ where: { name: DEMO_SHOP.name } }))!;
}

export function closeDatabase(): Promise<void> {
  return closeSequelize();
}

/**
 * Registers the usual hooks of a database test file: an empty (optionally seeded) database before each
 * test, and the pool closed after the file.
 */
export function withTestDatabase({ seed = false }: { seed?: boolean } = {}): void {
  beforeEach(async () => {
    await resetDatabase();
    if (seed) await seedDemo();
  });
  afterAll(closeDatabase);
}

// --- fixtures -------------------------------------------------------------------------------------

let counter = 0;
const unique = () => `${Date.now().toString(36)}${(counter++).toString(36)}`;

export const FIXTURE_PASSWORD = 'fixture-password-123';
// A cost of 4 (bcrypt's minimum) keeps fixtures fast; demo accounts and real ones use a higher cost.
let fixtureHash: Promise<string> | undefined;

export async function createUser(
  overrides: { email?: string; name?: string; password?: string; confirmed?: boolean } = {},
): Promise<{ user: User; password: string }> {
  testDb();
  const password = overrides.password ?? FIXTURE_PASSWORD;
  const passwordHash =
    password === FIXTURE_PASSWORD
      ? await (fixtureHash ??= bcrypt.hash(FIXTURE_PASSWORD, 4))
      : await bcrypt.hash(password, 4);
  const id = unique();
  const user = await User.create({
    email: (overrides.email ?? `user-${id}@example.com`).toLowerCase(),
    name: overrides.name ?? `Test User ${id}`,
    passwordHash,
    emailConfirmedAt: overrides.confirmed === false ? null : new Date(),
  });
  return { user, password };
}

export async function createOrganisation(name?: string): Promise<Organisation> {
  testDb();
  return Organisation.create({ name: name ?? `Test Organisation ${unique()}` });
}

export async function addMember(organisation: Organisation, user: User, role: Role): Promise<Membership> {
  return Membership.create({ organisationId: organisation.id, userId: user.id, role });
}

/** A new organisation with one member of the given role. */
export async function createMember(
  role: Role,
  organisation?: Organisation,
): Promise<{ organisation: Organisation; user: User; password: string; membership: Membership }> {
  const org = organisation ?? (await createOrganisation());
  const { user, password } = await createUser();
  const membership = await addMember(org, user, role);
  return { organisation: org, user, password, membership };
}

export type EnclosureFields = Partial<{
  name: string;
  widthCm: number;
  heightCm: number;
  depthCm: number;
  speciesName: string | null;
  animalName: string | null;
  notes: string | null;
}>;

export async function createEnclosure(
  organisation: Organisation,
  keeper: User,
  overrides: EnclosureFields = {},
): Promise<Enclosure> {
  return Enclosure.create({
    organisationId: organisation.id,
    keeperId: keeper.id,
    name: `Enclosure ${unique()}`,
    widthCm: 120,
    heightCm: 60,
    depthCm: 60,
    speciesName: null,
    animalName: null,
    notes: null,
    ...overrides,
  });
}
