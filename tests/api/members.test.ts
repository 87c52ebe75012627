import { describe, expect, it } from 'vitest';
import * as enclosures from '@/app/api/enclosures/route';
import * as keepers from '@/app/api/keepers/route';
import * as members from '@/app/api/organisations/[id]/members/route';
import { Membership, User } from '@/models';
import { createEnclosure, createMember, withTestDatabase } from '../helpers/db';
import { freshWorld } from '../helpers/world';
import { call, sessionCookie } from './http';

withTestDatabase();

const world = freshWorld({
  names: { staff: 'Staff Person', keeper: 'Keeper Person' },
});

const path = () => `/api/organisations/${world.shop.id}/members`;
const list = (as: User) => call(members.GET, { path: path(), params: { id: world.shop.id }, as });
const setRole = (as: User, userId: number, role: string) =>
  call(members.PATCH, {
    method: 'PATCH',
    path: path(),
    params: { id: world.shop.id },
    as,
    body: { userId, role },
  });
const remove = (as: User, userId: number) =>
  call(members.DELETE, {
    method: 'DELETE',
    path: `${path()}?userId=${userId}`,
    params: { id: world.shop.id },
    as,
  });
const roleOf = async (userId: number) =>
  (await Membership.findOne({ where: { organisationId: world.shop.id, userId } }))?.role ?? null;

describe('GET members', () => {
  it('lists members for owner and staff, not for keepers or outsiders', async () => {
    const r = await list(world.staff);
    expect(r.status).toBe(200);
    expect(r.body.items.map((m: { role: string }) => m.role).sort()).toEqual(['keeper', 'owner', 'staff']);
    expect(r.body.items[0]).not.toHaveProperty('passwordHash');
    expect((await list(world.keeper)).status).toBe(404);
    expect((await list(world.outsider)).status).toBe(404);
  });
});

describe('PATCH members (change a role)', () => {
  it('is owner-only', async () => {
    const byStaff = await setRole(world.staff, world.keeper.id, 'staff');
    expect(byStaff.status).toBe(403);
    expect((await setRole(world.keeper, world.keeper.id, 'owner')).status).toBe(404);
    expect((await setRole(world.outsider, world.keeper.id, 'owner')).status).toBe(404);
    expect(await roleOf(world.keeper.id)).toBe('keeper');

    const byOwner = await setRole(world.owner, world.keeper.id, 'staff');
    expect(byOwner.status).toBe(200);
    expect(byOwner.body).toMatchObject({ userId: world.keeper.id, role: 'staff' });
    expect(await roleOf(world.keeper.id)).toBe('staff');
  });

  it('takes effect on the very next request (memberships are re-read from the database)', async () => {
    const cookie = await sessionCookie(world.staff);
    const before = await call(keepers.GET, { path: `/api/keepers?organisationId=${world.shop.id}`, cookie });
    expect(before.status).toBe(200);
    await setRole(world.owner, world.staff.id, 'keeper');
    const after = await call(keepers.GET, { path: `/api/keepers?organisationId=${world.shop.id}`, cookie });
    expect(after.status).toBe(404);
  });

  it('keeps at least one owner', async () => {
    const r = await setRole(world.owner, world.owner.id, 'staff');
    expect(r.status).toBe(409);
    expect(r.body.error.code).toBe('last_owner');
    await setRole(world.owner, world.staff.id, 'owner');
    expect((await setRole(world.owner, world.owner.id, 'staff')).status).toBe(200);
  });

  it('answers 400 naming the field for a bad role or user id, 404 for a non-member', async () => {
    const badRole = await setRole(world.owner, world.keeper.id, 'admin');
    expect(badRole.status).toBe(400);
    expect(badRole.body.error.field).toBe('role');
    const badUser = await call(members.PATCH, {
      method: 'PATCH',
      path: path(),
      params: { id: world.shop.id },
      as: world.owner,
      body: { role: 'staff' },
    });
    expect(badUser.status).toBe(400);
    expect(badUser.body.error.field).toBe('userId');
    expect((await setRole(world.owner, world.outsider.id, 'staff')).status).toBe(404);
  });
});

describe('DELETE members (remove)', () => {
  it('is owner-only and ends the removed member’s sessions at once', async () => {
    await createEnclosure(world.shop, world.keeper, { name: 'Kept after removal' });
    const keeperCookie = await sessionCookie(world.keeper);
    expect((await remove(world.staff, world.keeper.id)).status).toBe(403);
    expect(await roleOf(world.keeper.id)).toBe('keeper');

    const r = await remove(world.owner, world.keeper.id);
    expect(r.status).toBe(200);
    expect(await roleOf(world.keeper.id)).toBeNull();
    expect((await User.findByPk(world.keeper.id))?.sessionVersion).toBe(2);
    const after = await call(enclosures.GET, {
      path: `/api/enclosures?organisationId=${world.shop.id}`,
      cookie: keeperCookie,
    });
    expect(after.status).toBe(401);
    // Nothing the keeper saved is lost: staff still see the enclosure.
    const list = await call(enclosures.GET, {
      path: `/api/enclosures?organisationId=${world.shop.id}`,
      as: world.staff,
    });
    expect(list.body.items.map((e: { name: string }) => e.name)).toContain('Kept after removal');
  });

  it('refuses to remove the last owner', async () => {
    const r = await remove(world.owner, world.owner.id);
    expect(r.status).toBe(409);
    expect(await roleOf(world.owner.id)).toBe('owner');
  });
});

describe('GET /api/keepers', () => {
  it('lists keepers with their enclosure counts for staff; not for keepers', async () => {
    await createEnclosure(world.shop, world.keeper);
    await createEnclosure(world.shop, world.keeper);
    const r = await call(keepers.GET, {
      path: `/api/keepers?organisationId=${world.shop.id}`,
      as: world.staff,
    });
    expect(r.status).toBe(200);
    expect(r.body.items).toEqual([
      expect.objectContaining({ userId: world.keeper.id, name: 'Keeper Person', enclosureCount: 2 }),
    ]);
    expect(
      (await call(keepers.GET, { path: `/api/keepers?organisationId=${world.shop.id}`, as: world.keeper }))
        .status,
    ).toBe(404);
  });
});

describe('the people lists page, search and sort on the server', () => {
  const keeperList = (qs: string) =>
    call(keepers.GET, { path: `/api/keepers?organisationId=${world.shop.id}${qs}`, as: world.staff });
  const memberList = (qs: string) =>
    call(members.GET, { path: `${path()}?${qs}`, params: { id: world.shop.id }, as: world.staff });

  it('pages the keepers with a total, finds one by name or e-mail, and sorts by name either way', async () => {
    // Words no generated e-mail address holds, so a search finds the one name.
    const WORDS = ['Alpha', 'Bravo', 'Charlie', 'Delta', 'Echo', 'Foxtrot'];
    for (let i = 0; i < 6; i++) {
      const { user } = await createMember('keeper', world.shop);
      await user.update({ name: `Example customer ${WORDS[i]}` });
    }
    const first = await keeperList('&limit=3');
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ total: 7, offset: 0, limit: 3 });
    expect(first.body.items.map((k: { name: string }) => k.name)).toEqual([
      'Example customer Alpha',
      'Example customer Bravo',
      'Example customer Charlie',
    ]);
    const last = await keeperList('&limit=3&offset=6');
    expect(last.body.items.map((k: { name: string }) => k.name)).toEqual(['Keeper Person']);
    const desc = await keeperList('&limit=2&sort=name&dir=desc');
    expect(desc.body.items.map((k: { name: string }) => k.name)).toEqual([
      'Keeper Person',
      'Example customer Foxtrot',
    ]);
    const found = await keeperList(`&q=${encodeURIComponent('customer delta')}`);
    expect(found.body.total).toBe(1);
    expect(found.body.items[0]).toMatchObject({ name: 'Example customer Delta', enclosureCount: 0 });
    expect(found.body.items[0]).not.toHaveProperty('role');
    const byMail = await keeperList(`&q=${encodeURIComponent(world.keeper.email)}`);
    expect(byMail.body.items.map((k: { userId: number }) => k.userId)).toEqual([world.keeper.id]);
    // Only keepers: the owner and staff are not in this list whatever the search.
    expect((await keeperList('&q=Staff')).body.total).toBe(0);
  });

  it('lists members owners first, narrows to a role, and refuses an unknown sort', async () => {
    const all = await memberList('');
    expect(all.status).toBe(200);
    expect(all.body.items.map((m: { role: string }) => m.role)).toEqual(['owner', 'staff', 'keeper']);
    expect(all.body.total).toBe(3);
    const staffOnly = await memberList('role=staff');
    expect(staffOnly.body.items.map((m: { userId: number }) => m.userId)).toEqual([world.staff.id]);
    const newest = await memberList('sort=joined&limit=1');
    expect(newest.body.items.map((m: { userId: number }) => m.userId)).toEqual([world.keeper.id]);
    expect((await memberList('sort=password')).status).toBe(400);
    expect((await keeperList('&sort=role')).status).toBe(400);
  });
});
