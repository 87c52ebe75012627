import { beforeEach, describe, expect, it } from 'vitest';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { STARTING_SHEETS } from '@/lib/species/starting-sheets';
import { CatalogueSeeding, SpeciesSheet, type Organisation } from '@/models';
import { createOrganisation, withTestDatabase } from '../../tests/helpers/db';
import { attachedSpecies, speciesOptions } from './species';

withTestDatabase();

// An organisation made without the catalogue (by a script, or before every creation path seeded it).
let older: Organisation;

beforeEach(async () => {
  older = await createOrganisation('Older household');
});

describe('speciesOptions', () => {
  it('reads the starting sheets, ready for the engine, once the organisation has them', async () => {
    await seedStartingCatalogue(older.id);
    const options = await speciesOptions(older.id);
    expect(options.map((o) => o.scientificName).sort()).toEqual(
      STARTING_SHEETS.map((s) => s.scientificName).sort(),
    );
    const dragon = attachedSpecies(options, 'pogona vitticeps');
    expect(dragon?.sheet.uvZone).toBe(4);
  });

  it('only reads: an organisation without the catalogue gets none from it', async () => {
    expect(await speciesOptions(older.id)).toEqual([]);
    expect(await SpeciesSheet.count({ where: { organisationId: older.id } })).toBe(0);
    expect(await CatalogueSeeding.findByPk(older.id)).toBeNull();
  });
});

describe('seedStartingCatalogue', () => {
  it('is idempotent: a second call adds nothing, and a deleted sheet stays deleted', async () => {
    expect(await seedStartingCatalogue(older.id)).toBe(true);
    await SpeciesSheet.destroy({ where: { organisationId: older.id, seedKey: 'python-regius' } });
    expect(await seedStartingCatalogue(older.id)).toBe(false);
    const again = await speciesOptions(older.id);
    expect(again).toHaveLength(STARTING_SHEETS.length - 1);
    expect(again.some((o) => o.scientificName === 'Python regius')).toBe(false);
  });

  it('runs concurrently for one organisation without duplicate sheets', async () => {
    const done = await Promise.all([1, 2, 3].map(() => seedStartingCatalogue(older.id)));
    expect(done.filter(Boolean)).toHaveLength(1);
    expect(await SpeciesSheet.count({ where: { organisationId: older.id } })).toBe(STARTING_SHEETS.length);
  });
});
