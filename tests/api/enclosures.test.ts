import { describe, expect, it } from 'vitest';
import * as collection from '@/app/api/enclosures/route';
import * as item from '@/app/api/enclosures/[id]/route';
import { Enclosure, type User } from '@/models';
import { createEnclosure, withTestDatabase } from '../helpers/db';
import { freshEnclosureWorld } from '../helpers/world';
import { call, expectNoInternals, send } from './http';

withTestDatabase();

const world = freshEnclosureWorld({
  enclosure: { name: 'A desert vivarium' },
  neighbour: { name: 'B rainforest tank' },
  foreign: { name: 'Elsewhere' },
});

const list = (as: User | null, organisationId: number, extra = '') =>
  call(collection.GET, { path: `/api/enclosures?organisationId=${organisationId}${extra}`, as });

describe('GET /api/enclosures', () => {
  it('shows staff every enclosure of the organisation and a keeper only their own', async () => {
    const all = await list(world.staff, world.shop.id);
    expect(all.status).toBe(200);
    expect(all.body.items.map((e: { name: string }) => e.name).sort()).toEqual([
      'A desert vivarium',
      'B rainforest tank',
    ]);
    expect(all.body.items[0].keeperName).toBeTruthy();

    const mine = await list(world.keeper, world.shop.id);
    expect(mine.status).toBe(200);
    expect(mine.body.items.map((e: { id: number }) => e.id)).toEqual([world.enclosure.id]);
  });

  it('hides another keeper and another organisation behind 404', async () => {
    expect((await list(world.keeper, world.shop.id, `&keeperId=${world.otherKeeper.id}`)).status).toBe(404);
    const other = await list(world.keeper, world.otherOrg.id);
    expect(other.status).toBe(404);
    expect(other.body.error.code).toBe('not_found');
    expect(JSON.stringify(other.body)).not.toContain('Elsewhere');
  });

  it('pages with offset and limit, with the total count', async () => {
    for (let i = 0; i < 3; i++) await createEnclosure(world.shop, world.keeper);
    const pages = [];
    for (const offset of [0, 2, 4]) {
      const r = await list(world.owner, world.shop.id, `&sort=name&limit=2&offset=${offset}`);
      expect(r.body.total).toBe(5);
      pages.push(r.body.items);
    }
    expect(pages.map((p) => p.length)).toEqual([2, 2, 1]);
    const ids = pages.flat().map((e: { id: number }) => e.id);
    expect(new Set(ids).size).toBe(5);
  });

  it('answers 401 without a session and 400 naming the field for a bad query', async () => {
    const anon = await list(null, world.shop.id);
    expect(anon.status).toBe(401);
    expect(anon.body.error.code).toBe('unauthenticated');
    const bad = await call(collection.GET, { path: '/api/enclosures?organisationId=abc', as: world.staff });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('organisationId');
    const tooMany = await list(world.staff, world.shop.id, '&limit=1000');
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.field).toBe('limit');
  });
});

describe('POST /api/enclosures', () => {
  const valid = () => ({
    organisationId: world.shop.id,
    keeperId: world.keeper.id,
    name: 'New vivarium',
    widthCm: 150,
    heightCm: 60,
    depthCm: 60,
    speciesName: 'Bearded dragon',
  });

  it('lets staff create an enclosure for a keeper', async () => {
    const r = await send(collection.POST, 'POST /api/enclosures', { as: world.staff, body: valid() });
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({
      name: 'New vivarium',
      keeperId: world.keeper.id,
      widthCm: 150,
      animalName: null,
    });
    expect(await Enclosure.count({ where: { organisationId: world.shop.id } })).toBe(3);
  });

  it('lets a keeper create their own enclosure but not one for another keeper', async () => {
    const { keeperId: _k, ...withoutKeeper } = valid();
    const own = await send(collection.POST, 'POST /api/enclosures', {
      as: world.otherKeeper,
      body: withoutKeeper,
    });
    expect(own.status).toBe(201);
    expect(own.body.keeperId).toBe(world.otherKeeper.id);
    const forOther = await send(collection.POST, 'POST /api/enclosures', {
      as: world.otherKeeper,
      body: valid(),
    });
    expect(forOther.status).toBe(404);
  });

  it.each([
    ['name', { name: '' }, 'Enter a name'],
    ['widthCm', { widthCm: -5 }, 'at least 1 cm'],
    // Once stored as 0 by a FLOAT column: a size must be a real centimetre or more.
    ['widthCm', { widthCm: 1e-320 }, 'at least 1 cm'],
    ['heightCm', { heightCm: 0.5 }, 'at least 1 cm'],
    ['heightCm', { heightCm: 'tall' }, 'centimetres'],
    ['depthCm', { depthCm: 5000 }, 'at most 2000'],
    ['keeperId', { keeperId: 'x' }, 'number'],
    ['notes', { notes: 'x'.repeat(6000) }, 'at most 5000'],
    // A lone high surrogate (half an emoji) would be stored as U+FFFD without a word.
    ['name', { name: 'Vivarium \uD83E' }, 'unpaired UTF-16 surrogate'],
    ['speciesName', { speciesName: '\uDD8E bearded dragon' }, 'broken character'],
  ])('answers 400 naming %s', async (field, patch, words) => {
    const r = await send(collection.POST, 'POST /api/enclosures', {
      as: world.staff,
      body: { ...valid(), ...patch },
    });
    expect(r.status).toBe(400);
    expect(r.body.error.code).toBe('invalid');
    expect(r.body.error.field).toBe(field);
    expect(r.body.error.message).toContain(words);
    expectNoInternals(r);
  });

  it('refuses a keeper who is not a member of the organisation', async () => {
    const r = await send(collection.POST, 'POST /api/enclosures', {
      as: world.owner,
      body: { ...valid(), keeperId: world.outsider.id },
    });
    expect(r.status).toBe(400);
    expect(r.body.error.field).toBe('keeperId');
  });
});

describe('/api/enclosures/[id]', () => {
  const get = (as: User, id: number) => call(item.GET, { path: `/api/enclosures/${id}`, params: { id }, as });
  const patch = (as: User, id: number, body: unknown) =>
    call(item.PATCH, { method: 'PATCH', path: `/api/enclosures/${id}`, params: { id }, as, body });
  const del = (as: User, id: number) =>
    call(item.DELETE, { method: 'DELETE', path: `/api/enclosures/${id}`, params: { id }, as });

  it('a keeper reads and edits their own enclosure', async () => {
    expect((await get(world.keeper, world.enclosure.id)).body.name).toBe('A desert vivarium');
    const r = await patch(world.keeper, world.enclosure.id, { animalName: 'Sable', widthCm: 122 });
    expect(r.status).toBe(200);
    expect(r.body).toMatchObject({ animalName: 'Sable', widthCm: 122, name: 'A desert vivarium' });
  });

  it("a keeper cannot read, change or delete another keeper's enclosure", async () => {
    for (const r of [
      await get(world.keeper, world.neighbour.id),
      await patch(world.keeper, world.neighbour.id, { name: 'Mine now' }),
      await del(world.keeper, world.neighbour.id),
    ]) {
      expect(r.status).toBe(404);
      expect(r.text).not.toContain('rainforest');
    }
    const unchanged = await Enclosure.findByPk(world.neighbour.id);
    expect(unchanged?.name).toBe('B rainforest tank');
  });

  it("nobody reaches another organisation's enclosure", async () => {
    for (const as of [world.owner, world.staff, world.keeper]) {
      expect((await get(as, world.foreign.id)).status).toBe(404);
      expect((await patch(as, world.foreign.id, { name: 'x' })).status).toBe(404);
      expect((await del(as, world.foreign.id)).status).toBe(404);
    }
    expect(await Enclosure.findByPk(world.foreign.id)).not.toBeNull();
  });

  it('a keeper cannot hand their enclosure to another keeper; staff can', async () => {
    const refused = await patch(world.keeper, world.enclosure.id, { keeperId: world.otherKeeper.id });
    expect(refused.status).toBe(403);
    const moved = await patch(world.staff, world.enclosure.id, { keeperId: world.otherKeeper.id });
    expect(moved.status).toBe(200);
    expect(moved.body.keeperId).toBe(world.otherKeeper.id);
  });

  it('answers 400 naming the field, and for an empty change', async () => {
    const bad = await patch(world.staff, world.enclosure.id, { heightCm: 0 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('heightCm');
    const empty = await patch(world.staff, world.enclosure.id, {});
    expect(empty.status).toBe(400);
    const badId = await call(item.GET, {
      path: '/api/enclosures/abc',
      params: { id: 'abc' },
      as: world.staff,
    });
    expect(badId.status).toBe(400);
    expect(badId.body.error.field).toBe('id');
  });

  it('staff delete an enclosure', async () => {
    expect((await del(world.staff, world.enclosure.id)).status).toBe(200);
    expect(await Enclosure.findByPk(world.enclosure.id)).toBeNull();
    expect((await get(world.staff, world.enclosure.id)).status).toBe(404);
  });
});
