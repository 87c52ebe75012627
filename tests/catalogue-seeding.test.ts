// The starting catalogue (species sheets and lamp types) is written when an organisation is created,
// never by a read: the pages, the lists and the public share page only read it.
import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import SharePage from '@/app/s/[token]/page';
import { STARTING_LAMP_TYPES } from '@/lib/lamp-types/starting-lamp-types';
import { createOrganisation as createOrganisationWithOwner } from '@/lib/organisations/mutations';
import { seedMissingCatalogues } from '@/lib/species/seed';
import { STARTING_SHEETS } from '@/lib/species/starting-sheets';
import { LampType, SpeciesSheet } from '@/models';
import { postDesign, postShare } from './api/variants.helpers';
import {
  createEnclosure,
  createMember,
  createOrganisation,
  createUser,
  tablesInDeleteOrder,
  testDb,
  withTestDatabase,
} from './helpers/db';

withTestDatabase();

async function catalogueOf(organisationId: number) {
  return {
    sheets: await SpeciesSheet.count({ where: { organisationId } }),
    lampTypes: await LampType.count({ where: { organisationId } }),
  };
}

/**
 * Every table of this test database with its live checksum: any row written, changed or removed changes
 * it. Counted here rather than with the server's global statement counters, which also count the browser
 * tests' writes to their own database on the same server while this file runs.
 */
async function tableChecksums(): Promise<Record<string, string>> {
  const tables = await tablesInDeleteOrder();
  const rows = await testDb().query<{ Table: string; Checksum: string | number | null }>(
    `CHECKSUM TABLE ${tables.map((t) => `\`${t}\``).join(', ')}`,
    { type: QueryTypes.SELECT },
  );
  return Object.fromEntries(rows.map((r) => [r.Table, String(r.Checksum)]));
}

describe('the starting catalogue', () => {
  it('is there as soon as an organisation is created', async () => {
    const { user } = await createUser();
    const org = await createOrganisationWithOwner('New shop', user.id);
    expect(await catalogueOf(org.id)).toEqual({
      sheets: STARTING_SHEETS.length,
      lampTypes: STARTING_LAMP_TYPES.length,
    });
  });

  it('reaches an organisation made without it when the migrations run, once', async () => {
    const bare = await createOrganisation('Made by a script');
    expect(await catalogueOf(bare.id)).toEqual({ sheets: 0, lampTypes: 0 });
    expect(await seedMissingCatalogues()).toBe(1);
    expect(await catalogueOf(bare.id)).toEqual({
      sheets: STARTING_SHEETS.length,
      lampTypes: STARTING_LAMP_TYPES.length,
    });
    expect(await seedMissingCatalogues()).toBe(0);
  });

  it('is not written by the public share page, even for an organisation that lacks it', async () => {
    const org = await createOrganisation('Shop without a catalogue');
    const { user: keeper } = await createMember('keeper', org);
    const enclosure = await createEnclosure(org, keeper, {
      name: 'Desert tank',
      speciesName: 'Bearded dragon',
    });
    const { variantId } = await postDesign(keeper, enclosure.id, { name: 'Plan', variantName: 'Low lamp' });
    const token = (await postShare(keeper, variantId)).body.share.token as string;

    const before = await tableChecksums();
    const page = await SharePage({ params: Promise.resolve({ token }), searchParams: Promise.resolve({}) });
    const after = await tableChecksums();
    expect(page).toBeTruthy();
    expect(Object.keys(before).length).toBeGreaterThan(5);
    expect(after).toEqual(before);
    expect(await catalogueOf(org.id)).toEqual({ sheets: 0, lampTypes: 0 });
  });
});
