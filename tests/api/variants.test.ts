import { describe, expect, it } from 'vitest';
import * as designRoute from '@/app/api/designs/[id]/route';
import * as designVariantsRoute from '@/app/api/designs/[id]/variants/route';
import * as enclosureDesignsRoute from '@/app/api/enclosures/[id]/designs/route';
import * as variantRoute from '@/app/api/variants/[id]/route';
import { Design, Variant, type User } from '@/models';
import { addMember, createUser, withTestDatabase } from '../helpers/db';
import { createEnclosureWorld } from '../helpers/world';
import { send } from './http';
import { postVariant, putVariant } from './variants.helpers';

withTestDatabase();

async function world() {
  const w = await createEnclosureWorld({
    shopName: 'Shop A',
    enclosure: { widthCm: 90, heightCm: 45, depthCm: 45 },
  });
  return { ...w, org: w.shop, otherOrgEnclosure: w.foreign };
}

async function designWithVariant(w: Awaited<ReturnType<typeof world>>, name = 'Basking plan') {
  const r = await send(enclosureDesignsRoute.POST, 'POST /api/enclosures/[id]/designs', {
    id: w.enclosure.id,
    as: w.staff,
    body: { name },
  });
  expect(r.status).toBe(201);
  return { designId: r.body.design.id as number, variantId: r.body.variant.id as number };
}

const lamp = {
  type: 'lamp',
  id: 'uv1',
  tech: 't5',
  form: 'tube',
  x: 45,
  y: 47,
  length: 55,
  uvbAt30: 25,
};

async function getVariant(user: User, id: number) {
  return send(variantRoute.GET, 'GET /api/variants/[id]', { id, as: user });
}

describe('designs of an enclosure', () => {
  it('creates a design whose first variant is the default design sized to the enclosure', async () => {
    const w = await world();
    const { designId, variantId } = await designWithVariant(w);
    const v = await getVariant(w.keeper, variantId);
    expect(v.status).toBe(200);
    expect(v.body.variant).toMatchObject({ id: variantId, designId, version: 1, name: 'Variant A' });
    expect(v.body.variant.design.enclosure).toEqual({ width: 90, height: 45, depth: 45 });
    expect(v.body.variant.design.objects).toEqual([
      { type: 'screen', id: 'lid', name: 'Mesh lid', x1: 0, y1: 45, x2: 90, y2: 45 },
    ]);
    expect(v.body.variant.updatedBy).toEqual({ id: w.staff.id, name: w.staff.name });
  });

  it('lists, searches and pages designs for the keeper who owns the enclosure', async () => {
    const w = await world();
    for (const name of ['Alpha', 'Beta', 'Gamma plan']) await designWithVariant(w, name);
    const first = await send(enclosureDesignsRoute.GET, 'GET /api/enclosures/[id]/designs?limit=2', {
      id: w.enclosure.id,
      as: w.keeper,
    });
    expect(first.status).toBe(200);
    expect(first.body.items.map((d: { name: string }) => d.name)).toEqual(['Alpha', 'Beta']);
    expect(first.body.items[0].variants).toHaveLength(1);
    const second = await send(
      enclosureDesignsRoute.GET,
      `GET /api/enclosures/[id]/designs?limit=2&cursor=${first.body.nextCursor}`,
      { id: w.enclosure.id, as: w.keeper },
    );
    expect(second.body.items.map((d: { name: string }) => d.name)).toEqual(['Gamma plan']);
    expect(second.body.nextCursor).toBeNull();
    const search = await send(enclosureDesignsRoute.GET, 'GET /api/enclosures/[id]/designs?q=plan', {
      id: w.enclosure.id,
      as: w.owner,
    });
    expect(search.body.items.map((d: { name: string }) => d.name)).toEqual(['Gamma plan']);
  });

  it('renames and deletes a design (its variants go with it)', async () => {
    const w = await world();
    const { designId, variantId } = await designWithVariant(w);
    const renamed = await send(designRoute.PATCH, 'PATCH /api/designs/[id]', {
      id: designId,
      as: w.keeper,
      body: { name: '  Winter set-up ' },
    });
    expect(renamed.status).toBe(200);
    expect(renamed.body.design.name).toBe('Winter set-up');
    const del = await send(designRoute.DELETE, 'DELETE /api/designs/[id]', { id: designId, as: w.keeper });
    expect(del.status).toBe(200);
    expect(await Design.findByPk(designId)).toBeNull();
    expect(await Variant.findByPk(variantId)).toBeNull();
  });

  it('answers 400 naming the field, 401 without a session', async () => {
    const w = await world();
    const bad = await send(enclosureDesignsRoute.POST, 'POST /api/enclosures/[id]/designs', {
      id: w.enclosure.id,
      as: w.staff,
      body: { name: '   ' },
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('name');
    const anon = await send(enclosureDesignsRoute.GET, 'GET /api/enclosures/[id]/designs', {
      id: w.enclosure.id,
    });
    expect(anon.status).toBe(401);
  });
});

describe('variants', () => {
  it('saves with the base version, bumps the version and records who saved', async () => {
    const w = await world();
    const { variantId } = await designWithVariant(w);
    const before = (await getVariant(w.keeper, variantId)).body.variant;
    const design = { ...before.design, objects: [...before.design.objects, lamp] };
    const put = await putVariant(w.keeper, variantId, { design, baseVersion: 1 });
    expect(put.status).toBe(200);
    expect(put.body.variant).toMatchObject({ id: variantId, version: 2 });
    const after = (await getVariant(w.staff, variantId)).body.variant;
    expect(after.version).toBe(2);
    expect(after.design).toEqual(design);
    expect(after.updatedAt).toBe(put.body.variant.updatedAt);
    expect(after.updatedBy).toEqual({ id: w.keeper.id, name: w.keeper.name });
  });

  it('refuses a stale save with 409, the current version and design, and overwrites nothing', async () => {
    const w = await world();
    const { variantId } = await designWithVariant(w);
    const base = (await getVariant(w.keeper, variantId)).body.variant.design;
    const mine = { ...base, objects: [...base.objects, lamp] };
    const theirs = { ...base, objects: [...base.objects, { ...lamp, id: 'other', x: 20 }] };
    const first = await putVariant(w.staff, variantId, { design: theirs, baseVersion: 1 });
    expect(first.status).toBe(200);
    const stale = await putVariant(w.keeper, variantId, {
      design: mine,
      baseVersion: 1,
      name: 'Should not stick',
    });
    expect(stale.status).toBe(409);
    expect(stale.body.error.code).toBe('stale');
    expect(stale.body.current).toEqual({ version: 2, design: theirs });
    const row = await Variant.findByPk(variantId);
    expect(JSON.parse(row!.designJson)).toEqual(theirs);
    expect(row!.version).toBe(2);
    expect(row!.name).toBe('Variant A');
    expect(row!.updatedById).toBe(w.staff.id);
  });

  it('lets exactly one of two concurrent saves from the same version win', async () => {
    const w = await world();
    const { variantId } = await designWithVariant(w);
    const base = (await getVariant(w.keeper, variantId)).body.variant.design;
    const save = (x: number) =>
      putVariant(w.keeper, variantId, {
        design: { ...base, objects: [...base.objects, { ...lamp, x }] },
        baseVersion: 1,
      });
    const results = await Promise.all([save(10), save(20), save(30)]);
    expect(results.map((r) => r.status).sort()).toEqual([200, 409, 409]);
    const winner = results.find((r) => r.status === 200)!;
    const row = await Variant.findByPk(variantId);
    expect(row!.version).toBe(2);
    const xs = [10, 20, 30][results.indexOf(winner)];
    expect(JSON.parse(row!.designJson).objects[1].x).toBe(xs);
  });

  it('rejects an invalid design with 400 naming the field', async () => {
    const w = await world();
    const { designId, variantId } = await designWithVariant(w);
    const base = (await getVariant(w.keeper, variantId)).body.variant.design;
    const bad = { ...base, objects: [...base.objects, { ...lamp, uvbAt30: -5 }] };
    const put = await putVariant(w.keeper, variantId, { design: bad, baseVersion: 1 });
    expect(put.status).toBe(400);
    expect(put.body.error.field).toBe('design.objects[1].uvbAt30');
    // The message itself names the field, so whoever shows it to the user shows where the fault is.
    expect(put.body.error.message).toMatch(/^objects\[1\]\.uvbAt30: /);
    const upload = await postVariant(w.keeper, designId, {
      name: 'Upload',
      design: { ...base, objects: [{ ...lamp, colour: 'red' }] },
    });
    expect(upload.status).toBe(400);
    expect(upload.body.error.field).toBe('design.objects[0].colour');
    expect(upload.body.error.message).toBe('objects[0].colour: unknown field');
    const missing = await putVariant(w.keeper, variantId, { baseVersion: 1 });
    expect(missing.status).toBe(400);
    expect(missing.body.error.field).toBe('design');
    expect((await Variant.findByPk(variantId))!.version).toBe(1);
  });

  it('imports a design file: names the field at fault in the message, refuses an unknown version', async () => {
    const w = await world();
    const { designId } = await designWithVariant(w);
    const upload = (design: unknown) => postVariant(w.keeper, designId, { name: 'Imported', design });
    const file = {
      format: 'baskwell.design',
      version: 2,
      enclosure: { width: 90, height: 45, depth: 45 },
      objects: [
        { type: 'screen', id: 'lid', x1: 0, y1: 45, x2: 90, y2: 45 },
        { type: 'ledge', id: 'rock', x: 50, y: 0, width: 20, height: 10 },
        lamp,
      ],
    };
    const wrongType = await upload({
      ...file,
      objects: [file.objects[0], file.objects[1], { ...lamp, uvbAt30: 'sixty' }],
    });
    expect(wrongType.status).toBe(400);
    expect(wrongType.body.error.field).toBe('design.objects[2].uvbAt30');
    expect(wrongType.body.error.message).toBe('objects[2].uvbAt30: expected number, received string');
    const newer = await upload({ ...file, version: 99 });
    expect(newer.status).toBe(400);
    expect(newer.body.error.field).toBe('design.version');
    expect(newer.body.error.message).toBe('version: version 99 is newer than this app reads (2)');
    const older = await upload({ ...file, version: 0 });
    expect(older.body.error.message).toBe('version: cannot upgrade from version 0');
    expect(await Variant.count({ where: { designId } })).toBe(1);

    // A valid file is stored as sent (optional fields left out take the engine's defaults when run).
    const ok = await upload(file);
    expect(ok.status).toBe(201);
    expect((await getVariant(w.keeper, ok.body.variant.id)).body.variant.design).toEqual(file);
  });

  it('creates variants by upload, by duplicating and from the default; lists them in pages', async () => {
    const w = await world();
    const { designId, variantId } = await designWithVariant(w);
    const base = (await getVariant(w.keeper, variantId)).body.variant.design;
    const uploaded = { ...base, objects: [...base.objects, lamp] };
    const post = (body: unknown) => postVariant(w.keeper, designId, body);
    const up = await post({ name: 'Uploaded', design: uploaded });
    expect(up.status).toBe(201);
    const dup = await post({ name: 'Copy', fromVariantId: up.body.variant.id });
    expect(dup.status).toBe(201);
    expect((await getVariant(w.keeper, dup.body.variant.id)).body.variant.design).toEqual(uploaded);
    const fresh = await post({ name: 'Fresh' });
    expect((await getVariant(w.keeper, fresh.body.variant.id)).body.variant.design).toEqual(base);
    const both = await post({ name: 'Both', design: uploaded, fromVariantId: variantId });
    expect(both.status).toBe(400);

    const page1 = await send(designVariantsRoute.GET, 'GET /api/designs/[id]/variants?limit=3', {
      id: designId,
      as: w.keeper,
    });
    expect(page1.body.items.map((v: { name: string }) => v.name)).toEqual(['Variant A', 'Uploaded', 'Copy']);
    const page2 = await send(
      designVariantsRoute.GET,
      `GET /api/designs/[id]/variants?limit=3&cursor=${page1.body.nextCursor}`,
      { id: designId, as: w.keeper },
    );
    expect(page2.body.items.map((v: { name: string }) => v.name)).toEqual(['Fresh']);
  });

  it('renames without changing the version, and keeps the last variant of a design', async () => {
    const w = await world();
    const { designId, variantId } = await designWithVariant(w);
    const renamed = await send(variantRoute.PATCH, 'PATCH /api/variants/[id]', {
      id: variantId,
      as: w.keeper,
      body: { name: 'Lamp lowered' },
    });
    expect(renamed.status).toBe(200);
    expect(renamed.body.variant).toMatchObject({ name: 'Lamp lowered', version: 1 });
    const last = await send(variantRoute.DELETE, 'DELETE /api/variants/[id]', {
      id: variantId,
      as: w.keeper,
    });
    expect(last.status).toBe(409);
    const copy = await postVariant(w.keeper, designId, { name: 'Copy', fromVariantId: variantId });
    const del = await send(variantRoute.DELETE, 'DELETE /api/variants/[id]', {
      id: copy.body.variant.id,
      as: w.keeper,
    });
    expect(del.status).toBe(200);
    expect(await Variant.findByPk(copy.body.variant.id)).toBeNull();
  });

  it('lets a member of two organisations reach both, and only them', async () => {
    const w = await world();
    const { variantId } = await designWithVariant(w);
    const { user: both } = await createUser();
    await addMember(w.org, both, 'staff');
    expect((await getVariant(both, variantId)).status).toBe(200);
    const { user: none } = await createUser();
    expect((await getVariant(none, variantId)).status).toBe(404);
  });
});
