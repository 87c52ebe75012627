import { beforeEach, describe, expect, it } from 'vitest';
import { STARTING_SHEETS } from '@/lib/species/starting-sheets';
import { CatalogueSeeding, SpeciesSheet, type Organisation } from '@/models';
import { createOrganisation, withTestDatabase } from '../../tests/helpers/db';
import { attachedSpecies, speciesOptions } from './species';

withTestDatabase();

// An organisation made before sign-up seeded the catalogue: no sheets, no seeding marker.
let older: Organisation;

beforeEach(async () => {
  older = await createOrganisation('Older household');
});

describe('speciesOptions', () => {
  it('gives an organisation without a catalogue its starting sheets, ready for the engine', async () => {
    expect(await SpeciesSheet.count({ where: { organisationId: older.id } })).toBe(0);
    const options = await speciesOptions(older.id);
    expect(options.map((o) => o.scientificName).sort()).toEqual(
      STARTING_SHEETS.map((s) => s.scientificName).sort(),
    );
    const dragon = attachedSpecies(options, 'pogona vitticeps');
    expect(dragon?.sheet.uvZone).toBe(4);
    expect(await CatalogueSeeding.findByPk(older.id)).not.toBeNull();
  });

  it('is idempotent: a second call adds nothing, and a deleted sheet stays deleted', async () => {
    await speciesOptions(older.id);
    await SpeciesSheet.destroy({ where: { organisationId: older.id, seedKey: 'python-regius' } });
    const again = await speciesOptions(older.id);
    expect(again).toHaveLength(STARTING_SHEETS.length - 1);
    expect(again.some((o) => o.scientificName === 'Python regius')).toBe(false);
    expect(await SpeciesSheet.count({ where: { organisationId: older.id } })).toBe(
      STARTING_SHEETS.length - 1,
    );
  });

  it('runs concurrently for one organisation without duplicate sheets', async () => {
    const lists = await Promise.all([1, 2, 3].map(() => speciesOptions(older.id)));
    for (const list of lists) expect(list).toHaveLength(STARTING_SHEETS.length);
    expect(await SpeciesSheet.count({ where: { organisationId: older.id } })).toBe(STARTING_SHEETS.length);
  });
});
