import { describe, expect, it } from 'vitest';
import * as collection from '@/app/api/species/route';
import * as item from '@/app/api/species/[id]/route';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { STARTING_SHEETS } from '@/lib/species/starting-sheets';
import { CatalogueSeeding, LampType, Organisation, SpeciesSheet, type User } from '@/models';
import { testDb, withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call, expectNoInternals } from './http';

withTestDatabase();

const world = freshWorld();

const list = (as: User | null, organisationId: number, extra = '') =>
  call(collection.GET, { path: `/api/species?organisationId=${organisationId}${extra}`, as });
const patch = (as: User | null, id: number, body: unknown) =>
  call(item.PATCH, { method: 'PATCH', path: `/api/species/${id}`, params: { id }, as, body });

const newSheet = {
  commonName: 'Test monitor',
  scientificName: 'Varanus testus',
  uvZone: 3,
  baskingSurfaceC: { min: 45, max: 55 },
  warmAirC: { min: 30, max: 35 },
  coolAirC: { min: 24, max: 28 },
  sources: [{ citation: 'From memory', confidence: 'verify' }],
};

async function firstSheetId(org: Organisation): Promise<number> {
  await seedStartingCatalogue(org.id);
  const row = await SpeciesSheet.findOne({ where: { organisationId: org.id }, order: [['id', 'ASC']] });
  return row!.id;
}

describe('seedStartingCatalogue', () => {
  it('gives an organisation the starting sheets and lamp types once, each sheet with its sources', async () => {
    expect(await seedStartingCatalogue(world.shop.id)).toBe(true);
    expect(await seedStartingCatalogue(world.shop.id)).toBe(false);
    const sheets = await SpeciesSheet.findAll({ where: { organisationId: world.shop.id } });
    expect(sheets.map((s) => s.seedKey).sort()).toEqual(STARTING_SHEETS.map((s) => s.seedKey).sort());
    for (const s of sheets) {
      const sources = JSON.parse(s.sourcesJson) as { citation: string }[];
      expect(sources.length).toBeGreaterThan(0);
      expect(sources.some((x) => /from memory|Ferguson et al\. 2010/i.test(x.citation))).toBe(true);
    }
    expect(await LampType.count({ where: { organisationId: world.shop.id } })).toBeGreaterThanOrEqual(9);
    expect(await SpeciesSheet.count({ where: { organisationId: world.otherOrg.id } })).toBe(0);
  });

  it('survives concurrent calls without duplicates', async () => {
    const results = await Promise.all([1, 2, 3].map(() => seedStartingCatalogue(world.shop.id)));
    expect(results.filter(Boolean).length).toBe(1);
    expect(await SpeciesSheet.count({ where: { organisationId: world.shop.id } })).toBe(
      STARTING_SHEETS.length,
    );
  });

  it('seeds inside the transaction that creates the organisation (sign-up, demo data)', async () => {
    const sequelize = testDb();
    const orgId = await sequelize.transaction(async (transaction) => {
      const org = await Organisation.create({ name: 'Fresh sign-up' }, { transaction });
      expect(await seedStartingCatalogue(org.id, { transaction })).toBe(true);
      return org.id;
    });
    expect(await SpeciesSheet.count({ where: { organisationId: orgId } })).toBe(STARTING_SHEETS.length);
  });

  it('does not bring back a sheet the organisation deleted', async () => {
    await seedStartingCatalogue(world.shop.id);
    await SpeciesSheet.destroy({ where: { organisationId: world.shop.id, seedKey: 'python-regius' } });
    await seedStartingCatalogue(world.shop.id);
    expect(
      await SpeciesSheet.count({ where: { organisationId: world.shop.id, seedKey: 'python-regius' } }),
    ).toBe(0);
    expect(await CatalogueSeeding.count()).toBe(1);
  });
});

describe('GET /api/species', () => {
  it('lists the starting sheets to any member, keepers included', async () => {
    await seedStartingCatalogue(world.shop.id);
    const r = await list(world.keeper, world.shop.id, '&limit=100');
    expect(r.status).toBe(200);
    expect(r.body.items).toHaveLength(STARTING_SHEETS.length);
    const dragon = r.body.items.find(
      (s: { scientificName: string }) => s.scientificName === 'Pogona vitticeps',
    );
    expect(dragon).toMatchObject({
      uvZone: 4,
      baskingSurfaceC: { min: 40, max: 45 },
      seedKey: 'pogona-vitticeps',
    });
    expect(dragon.sources[0].citation).toMatch(/from memory/i);
  });

  it('pages with a cursor and searches by name', async () => {
    await seedStartingCatalogue(world.shop.id);
    const first = await list(world.staff, world.shop.id, '&limit=5');
    expect(first.body.items).toHaveLength(5);
    const second = await list(world.staff, world.shop.id, `&limit=5&cursor=${first.body.nextCursor}`);
    expect(second.body.items[0].id).toBeGreaterThan(first.body.items[4].id);
    const found = await list(world.staff, world.shop.id, '&q=gecko');
    expect(found.body.items.map((s: { commonName: string }) => s.commonName).sort()).toEqual([
      'Crested gecko',
      'Leopard gecko',
    ]);
  });

  it('only reads: an organisation without the catalogue lists none and is not given it', async () => {
    const r = await list(world.keeper, world.shop.id, '&limit=100');
    expect(r.status).toBe(200);
    expect(r.body.items).toEqual([]);
    expect(await SpeciesSheet.count({ where: { organisationId: world.shop.id } })).toBe(0);
  });

  it('answers 401 without a session and 404 for another organisation', async () => {
    expect((await list(null, world.shop.id)).status).toBe(401);
    const r = await list(world.outsider, world.shop.id);
    expect(r.status).toBe(404);
    expect(await SpeciesSheet.count({ where: { organisationId: world.shop.id } })).toBe(0);
  });

  it('refuses a missing organisation id with the field named', async () => {
    const r = await call(collection.GET, { path: '/api/species', as: world.staff });
    expect(r.status).toBe(400);
    expect(r.body.error.field).toBe('organisationId');
  });
});

describe('POST /api/species', () => {
  const post = (as: User, body: unknown) =>
    call(collection.POST, { method: 'POST', path: '/api/species', as, body });

  it('lets staff add a sheet', async () => {
    const r = await post(world.staff, { organisationId: world.shop.id, ...newSheet });
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ commonName: 'Test monitor', uvZone: 3, seedKey: null, nightMinC: null });
  });

  it('refuses a keeper with 403 and stores nothing', async () => {
    const r = await post(world.keeper, { organisationId: world.shop.id, ...newSheet });
    expect(r.status).toBe(403);
    expect(await SpeciesSheet.count({ where: { commonName: 'Test monitor' } })).toBe(0);
  });

  it('answers 400 with the field for an invalid sheet', async () => {
    const r = await post(world.owner, { organisationId: world.shop.id, ...newSheet, uvZone: 7 });
    expect(r.status).toBe(400);
    expect(r.body.error.field).toBe('uvZone');
    expectNoInternals(r);
  });
});

describe('PATCH /api/species/[id]', () => {
  it('lets the owner and staff edit, validating the merged sheet', async () => {
    const id = await firstSheetId(world.shop);
    const r = await patch(world.staff, id, { baskingSurfaceC: { min: 38, max: 44 }, notes: 'Adults only.' });
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ baskingSurfaceC: { min: 38, max: 44 }, notes: 'Adults only.' });
    const bad = await patch(world.owner, id, { coolAirC: { min: 40, max: 41 } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('coolAirC.min');
  });

  it('stores the adult length, climbing and pale-morph flags, and names a bad length', async () => {
    const id = await firstSheetId(world.shop);
    const before = await call(item.GET, { path: `/api/species/${id}`, params: { id }, as: world.staff });
    // A starting sheet comes with its animal's length and climbing filled in (from memory).
    expect(before.body).toMatchObject({ adultLengthCm: expect.any(Number), lowMelanin: false });
    expect(typeof before.body.climbs).toBe('boolean');
    const r = await patch(world.staff, id, { adultLengthCm: 45, climbs: true, lowMelanin: true });
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ adultLengthCm: 45, climbs: true, lowMelanin: true });
    const row = (await SpeciesSheet.findByPk(id))!;
    expect([row.adultLengthCm, row.climbs, row.lowMelanin]).toEqual([45, true, true]);
    const bad = await patch(world.owner, id, { adultLengthCm: 0 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('adultLengthCm');
  });

  it('refuses a keeper: 403, and the sheet is unchanged', async () => {
    const id = await firstSheetId(world.shop);
    const before = (await SpeciesSheet.findByPk(id))!.toJSON();
    const r = await patch(world.keeper, id, { uvZone: 1 });
    expect(r.status).toBe(403);
    expect(r.body.error.code).toBe('forbidden');
    const after = (await SpeciesSheet.findByPk(id))!.toJSON();
    expect(after).toEqual(before);
  });

  it('hides another organisation’s sheet (404)', async () => {
    const id = await firstSheetId(world.shop);
    expect((await patch(world.outsider, id, { uvZone: 1 })).status).toBe(404);
    expect(
      (await call(item.GET, { path: `/api/species/${id}`, params: { id }, as: world.outsider })).status,
    ).toBe(404);
  });
});

describe('DELETE /api/species/[id]', () => {
  it('lets staff delete and refuses a keeper', async () => {
    const id = await firstSheetId(world.shop);
    const del = (as: User) =>
      call(item.DELETE, { method: 'DELETE', path: `/api/species/${id}`, params: { id }, as });
    expect((await del(world.keeper)).status).toBe(403);
    expect((await del(world.staff)).status).toBe(200);
    expect(await SpeciesSheet.findByPk(id)).toBeNull();
    expect((await del(world.staff)).status).toBe(404);
  });
});
