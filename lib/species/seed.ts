import 'server-only';
import { literal, Op, UniqueConstraintError, type Transaction } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { toColumns as lampTypeColumns } from '@/lib/lamp-types/mutations';
import { STARTING_LAMP_TYPES } from '@/lib/lamp-types/starting-lamp-types';
import { CatalogueSeeding, LampType, Organisation, SpeciesSheet } from '@/models';
import { STARTING_SHEETS } from './starting-sheets';
import { toColumns } from './mutations';

/**
 * Gives an organisation its starting species sheets and lamp catalogue, once. Called where an
 * organisation is created (sign-up, a new organisation, the demo seed, the tests' world), inside the
 * creating transaction, and never from a read: pages and the public share page only read. An
 * organisation made before that (or by a script) gets it from `seedMissingCatalogues`, which
 * `npm run migrate` runs after the migrations. Idempotent and safe to race: the marker row
 * and the unique (organisation, seed key) indexes stop duplicates, and once the marker exists nothing is
 * re-added — sheets an organisation deleted on purpose stay deleted.
 * Pass the caller's transaction when the organisation is created inside one (its row is not visible to
 * other connections until that commits). Returns true when this call did the seeding.
 */
export async function seedStartingCatalogue(
  organisationId: number,
  opts: { transaction?: Transaction } = {},
): Promise<boolean> {
  const sequelize = getSequelize();
  if (await CatalogueSeeding.findByPk(organisationId, { transaction: opts.transaction })) return false;
  if (opts.transaction) return seedIn(organisationId, opts.transaction);
  return sequelize.transaction((transaction) => seedIn(organisationId, transaction));
}

async function seedIn(organisationId: number, transaction: Transaction): Promise<boolean> {
  // Claim the organisation first: a concurrent caller blocks on the key, then fails on it and stops.
  try {
    await CatalogueSeeding.create({ organisationId, seededAt: new Date() }, { transaction });
  } catch (e) {
    if (e instanceof UniqueConstraintError) return false;
    throw e;
  }
  await SpeciesSheet.bulkCreate(
    STARTING_SHEETS.map(({ seedKey, ...sheet }) => ({
      organisationId,
      ...toColumns(sheet),
      seedKey,
      createdById: null,
      updatedById: null,
    })),
    { transaction, ignoreDuplicates: true },
  );
  const existingNames = new Set(
    (await LampType.findAll({ where: { organisationId }, attributes: ['name'], transaction })).map(
      (l) => l.name,
    ),
  );
  // Names are unique per organisation: keep an entry the organisation already made by that name.
  const lampTypes = STARTING_LAMP_TYPES.filter((l) => !existingNames.has(l.name));
  await LampType.bulkCreate(
    lampTypes.map(({ presetKey, ...lampType }) => ({
      organisationId,
      ...lampTypeColumns(lampType),
      presetKey,
      createdById: null,
      updatedById: null,
    })),
    { transaction, ignoreDuplicates: true },
  );
  return true;
}

/**
 * Seeds every organisation that has no catalogue yet (no marker row): those created before every way of
 * creating one seeded it, or by a script. Returns how many were seeded.
 */
export async function seedMissingCatalogues(): Promise<number> {
  const missing = await Organisation.findAll({
    attributes: ['id'],
    where: { id: { [Op.notIn]: literal('(SELECT organisation_id FROM catalogue_seedings)') } },
    order: [['id', 'ASC']],
  });
  let seeded = 0;
  for (const { id } of missing) if (await seedStartingCatalogue(id)) seeded++;
  return seeded;
}
