import { describe, expect, it } from 'vitest';
import { STARTING_SHEETS, ZONE_CONFIDENCE } from '@/lib/species/starting-sheets';
import { toDto } from '@/lib/species/queries';
import { toColumns } from '@/lib/species/mutations';
import { down, up } from '@/migrations/0017-starting-sheets-size-climbing';
import { SpeciesSheet } from '@/models';
import { createOrganisation, createUser, testDb, withTestDatabase } from './helpers/db';

withTestDatabase();

const OLD_ZONE_CONFIDENCE =
  'from memory; the zone definitions are published, this species’ zone was not checked — verify';

/** A starting sheet as organisations were seeded before sizes and climbing were filled in. */
function asSeededBefore(sheet: (typeof STARTING_SHEETS)[number]) {
  return {
    ...sheet,
    adultLengthCm: null,
    climbs: false,
    sources: sheet.sources
      .filter((s) => !s.covers.includes('adultLengthCm'))
      .map((s) => (s.confidence === ZONE_CONFIDENCE ? { ...s, confidence: OLD_ZONE_CONFIDENCE } : s)),
  };
}

const comparable = (row: SpeciesSheet) => {
  const { id: _i, organisationId: _o, updatedAt: _u, seedKey: _k, ...rest } = toDto(row);
  return rest;
};

describe('migration: starting sheets get adult length and climbing', () => {
  it('fills every untouched seeded sheet exactly as a new organisation gets it, and leaves edited ones alone', async () => {
    const org = await createOrganisation();
    const { user } = await createUser();
    const rows = await Promise.all(
      STARTING_SHEETS.map(({ seedKey, ...sheet }) =>
        SpeciesSheet.create({
          organisationId: org.id,
          ...toColumns(asSeededBefore({ seedKey, ...sheet })),
          seedKey,
          createdById: null,
          updatedById: null,
        }),
      ),
    );
    // Someone corrected the corn snake's sheet by hand (a smaller animal): it stays as they left it.
    const snake = rows.find((r) => r.seedKey === 'pantherophis-guttatus')!;
    await snake.update({ notes: 'Our hatchlings', updatedById: user.id });
    const snakeBefore = comparable(snake);
    // A sheet of the organisation's own (no seed key) is never touched.
    const own = await SpeciesSheet.create({
      organisationId: org.id,
      ...toColumns({ ...asSeededBefore(STARTING_SHEETS[0]!), commonName: 'Our dragon' }),
      seedKey: null,
      createdById: user.id,
      updatedById: user.id,
    });

    const context = testDb().getQueryInterface();
    await up({ context });

    for (const seeded of STARTING_SHEETS) {
      const row = (await SpeciesSheet.findOne({
        where: { organisationId: org.id, seedKey: seeded.seedKey },
      }))!;
      if (seeded.seedKey === 'pantherophis-guttatus') {
        expect(comparable(row)).toEqual(snakeBefore);
        continue;
      }
      const { seedKey: _k, ...expected } = seeded;
      expect(comparable(row), seeded.commonName).toEqual(expected);
    }
    expect((await SpeciesSheet.findByPk(own.id))!.adultLengthCm).toBeNull();

    // Running it again changes nothing.
    await up({ context });
    const dragon = (await SpeciesSheet.findOne({
      where: { organisationId: org.id, seedKey: 'pogona-vitticeps' },
    }))!;
    expect(toDto(dragon).sources.filter((s) => s.covers.includes('adultLengthCm'))).toHaveLength(1);

    await down({ context });
    const back = (await SpeciesSheet.findByPk(dragon.id))!;
    const { seedKey: _k, ...before } = asSeededBefore(
      STARTING_SHEETS.find((s) => s.seedKey === 'pogona-vitticeps')!,
    );
    expect(comparable(back)).toEqual(before);
  });
});
