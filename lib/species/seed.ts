import 'server-only';
import { UniqueConstraintError, type Transaction } from 'sequelize';
import { getSequelize } from '@/lib/db';
import { toColumns as lampTypeColumns } from '@/lib/lamp-types/store';
import { STARTING_LAMP_TYPES } from '@/lib/lamp-types/starting-lamp-types';
import { CatalogueSeeding, LampType, SpeciesSheet } from '@/models';
import { STARTING_SHEETS } from './starting-sheets';
import { toColumns } from './store';

/**
 * Gives an organisation its starting species sheets and lamp catalogue, once. Call it when an
 * organisation is created (sign-up, demo data); the species and lamp-type routes also call it lazily
 * so an organisation made any other way still gets them. Idempotent and safe to race: the marker row
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

/** For list routes: seed on first sight, cheaply (one primary-key lookup once seeded). */
export async function ensureStartingCatalogue(organisationId: number): Promise<void> {
  await seedStartingCatalogue(organisationId);
}
