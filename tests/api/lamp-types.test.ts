import { describe, expect, it } from 'vitest';
import * as collection from '@/app/api/lamp-types/route';
import * as item from '@/app/api/lamp-types/[id]/route';
import { STARTING_LAMP_TYPES } from '@/lib/lamp-types/starting-lamp-types';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { Lamp, LampType, type User } from '@/models';
import { createEnclosure, withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call, expectNoInternals } from './http';

withTestDatabase();

const world = freshWorld();

const list = (as: User | null, extra = '') =>
  call(collection.GET, { path: `/api/lamp-types?organisationId=${world.shop.id}${extra}`, as });
const post = (as: User, body: Record<string, unknown>) =>
  call(collection.POST, {
    method: 'POST',
    path: '/api/lamp-types',
    as,
    body: { organisationId: world.shop.id, ...body },
  });
const patch = (as: User, id: number, body: unknown) =>
  call(item.PATCH, { method: 'PATCH', path: `/api/lamp-types/${id}`, params: { id }, as, body });
const del = (as: User, id: number) =>
  call(item.DELETE, { method: 'DELETE', path: `/api/lamp-types/${id}`, params: { id }, as });

const custom = {
  name: 'Shop T5, 115 cm',
  tech: 't5',
  form: 'tube',
  lengthCm: 115,
  uvbAt30: 50,
  uviPerUvb: 0.04,
  radiantFraction: 0.5,
  beamDeg: 360,
  watts: 54,
  sources: { uvbAt30: 'our own meter readings, 2025' },
};

async function presetId(key: string): Promise<number> {
  await seedStartingCatalogue(world.shop.id);
  return (await LampType.findOne({ where: { organisationId: world.shop.id, presetKey: key } }))!.id;
}

describe('GET /api/lamp-types', () => {
  it('lists the starting catalogue, with sources, to any member', async () => {
    await seedStartingCatalogue(world.shop.id);
    const r = await list(world.keeper, '&limit=100');
    expect(r.status).toBe(200);
    expect(r.body.items).toHaveLength(STARTING_LAMP_TYPES.length);
    const mv = r.body.items.find((l: { presetKey: string }) => l.presetKey === 'mercury-vapour-160');
    expect(mv).toMatchObject({ tech: 'mercury-vapour', form: 'bulb', lengthCm: null, uvbAt30: 225 });
    // The output of a class is a recalled typical figure, said so (from memory).
    expect(mv.sources.uvbAt30).toMatch(/from memory/);
  });

  it('filters by technology and refuses an unknown one', async () => {
    await seedStartingCatalogue(world.shop.id);
    const r = await list(world.staff, '&tech=ceramic');
    expect(r.body.items.map((l: { tech: string }) => l.tech)).toEqual(['ceramic']);
    const bad = await list(world.staff, '&tech=plasma');
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('tech');
  });

  it('hides another organisation’s catalogue', async () => {
    expect((await list(world.outsider)).status).toBe(404);
    expect((await list(null)).status).toBe(401);
  });
});

describe('POST /api/lamp-types', () => {
  it('lets staff add a custom entry and refuses a keeper', async () => {
    const r = await post(world.staff, custom);
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ name: 'Shop T5, 115 cm', presetKey: null, reflectorGain: 1 });
    expect((await post(world.keeper, { ...custom, name: 'Other' })).status).toBe(403);
  });

  it('answers 409 for a duplicate name and 400 for a tube without a length', async () => {
    await post(world.owner, custom);
    const dup = await post(world.owner, custom);
    expect(dup.status).toBe(409);
    expect(dup.body.error.message).toMatch(/already has that name/);
    const bad = await post(world.owner, { ...custom, name: 'No length', lengthCm: null });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('lengthCm');
    expectNoInternals(bad);
  });
});

describe('PATCH and DELETE /api/lamp-types/[id]', () => {
  it('lets the owner edit, checking the merged entry', async () => {
    const id = await presetId('t5-high');
    const r = await patch(world.owner, id, { uvbAt30: 45, sources: { uvbAt30: 'measured' } });
    expect(r.status).toBe(200);
    expect(r.body.uvbAt30).toBe(45);
    const bad = await patch(world.owner, id, { form: 'bulb' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('lengthCm');
  });

  it('refuses a keeper (403) and hides it from outsiders (404)', async () => {
    const id = await presetId('t5-high');
    expect((await patch(world.keeper, id, { watts: 1 })).status).toBe(403);
    expect((await patch(world.outsider, id, { watts: 1 })).status).toBe(404);
    expect((await LampType.findByPk(id))!.watts).not.toBe(1);
  });

  it('refuses to delete a lamp type the lamp log uses (409), deletes an unused one', async () => {
    const used = await presetId('t5-high');
    const enclosure = await createEnclosure(world.shop, world.keeper);
    await Lamp.create({
      enclosureId: enclosure.id,
      lampTypeId: used,
      label: 'Main UV tube',
      firstUsedOn: '2025-01-01',
      hoursPerDay: 12,
      createdById: world.staff.id,
    });
    const r = await del(world.staff, used);
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('in_use');
    expect(await LampType.findByPk(used)).not.toBeNull();
    const unused = await presetId('ceramic-100');
    expect((await del(world.keeper, unused)).status).toBe(403);
    expect((await del(world.staff, unused)).status).toBe(200);
    expect(await LampType.findByPk(unused)).toBeNull();
  });
});
