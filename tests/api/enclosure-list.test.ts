// GET /api/enclosures searched, sorted and paged on the real test database, with more enclosures than
// one page holds: every sort column both ways, page boundaries, the search fields, and a keeper who
// only ever sees their own enclosures whatever they ask for.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import * as collection from '@/app/api/enclosures/route';
import { ENCLOSURE_SORT_COLUMNS, type EnclosureSortColumn } from '@/lib/enclosures/list-view';
import { Enclosure, type Organisation, type User } from '@/models';
import {
  addMember,
  closeDatabase,
  createEnclosure,
  createMember,
  createUser,
  resetDatabase,
  testDb,
} from '../helpers/db';
import { call, expectNoInternals } from './http';

afterAll(closeDatabase);

type Row = {
  id: number;
  name: string;
  keeperId: number;
  keeperName: string | null;
  animalName: string | null;
  speciesName: string | null;
  widthCm: number;
  heightCm: number;
  depthCm: number;
  updatedAt: string;
};

let shop: Organisation;
let owner: User;
let ana: User;
let emile: User;
let zed: User;
let outsider: User;
const made: Row[] = [];

const WORDS = ['Desert', 'forest', 'Bench', 'rock', 'Cave'];
const ANIMALS = [null, 'Saffron', 'Pip', null, 'Olive'];
const SPECIES = ['Crested gecko', null, 'Central bearded dragon', null, 'Leopard gecko'];

beforeAll(async () => {
  await resetDatabase();
  ({ organisation: shop, user: owner } = await createMember('owner'));
  ana = (await createUser({ name: 'Ana Brook', email: 'ana.brook@example.com' })).user;
  emile = (await createUser({ name: 'Émile Dunn', email: 'e.dunn@example.com' })).user;
  zed = (await createUser({ name: 'Zed Quill', email: 'zq@example.com' })).user;
  for (const k of [ana, emile, zed]) await addMember(shop, k, 'keeper');
  let outsiderOrg: Organisation;
  ({ organisation: outsiderOrg, user: outsider } = await createMember('owner'));
  await createEnclosure(outsiderOrg, outsider, { name: 'Elsewhere vivarium', speciesName: 'Crested gecko' });

  const keepers = [ana, emile, zed];
  // 37 enclosures: more than one page of the table (25) and several of the test pages below.
  for (let i = 0; i < 37; i++) {
    const keeper = keepers[i % 3]!;
    const e = await createEnclosure(shop, keeper, {
      name: `${WORDS[i % 5]} vivarium ${String(i).padStart(2, '0')}`,
      animalName: ANIMALS[i % 5],
      speciesName: SPECIES[i % 5],
      // Few distinct sizes, so most rows tie on floor area (and some on height) and the tie-breaks count.
      widthCm: [60, 90, 120][i % 3]!,
      depthCm: [45, 30][i % 2]!,
      heightCm: [45, 60][i % 4 === 0 ? 0 : 1]!,
    });
    // Distinct update times, but pairs that tie, set past the automatic timestamp.
    const updatedAt = new Date(Date.UTC(2026, 0, 1 + Math.floor(i / 2)));
    await testDb().query('UPDATE enclosures SET updated_at = ? WHERE id = ?', {
      replacements: [updatedAt, e.id],
    });
    made.push({
      id: e.id,
      name: e.name,
      keeperId: keeper.id,
      keeperName: keeper.name,
      animalName: e.animalName ?? null,
      speciesName: e.speciesName ?? null,
      widthCm: e.widthCm,
      heightCm: e.heightCm,
      depthCm: e.depthCm,
      updatedAt: updatedAt.toISOString(),
    });
  }
}, 60_000);

const get = (as: User | null, query: string) =>
  call(collection.GET, { path: `/api/enclosures?organisationId=${shop.id}&${query}`, as });

async function listAll(as: User, query: string, pageSize = 100): Promise<Row[]> {
  const out: Row[] = [];
  for (let offset = 0; ; offset += pageSize) {
    const r = await get(as, `${query}&offset=${offset}&limit=${pageSize}`);
    expect(r.status).toBe(200);
    out.push(...r.body.items);
    if (r.body.items.length < pageSize) return out;
  }
}

// The order the API promises (see lib/enclosures/queries.ts), written out independently: accents and
// case ignored, empty text last in both directions, ties by name then id.
const fold = (s: string) =>
  s
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase();
const text = (a: string, b: string) => (fold(a) < fold(b) ? -1 : fold(a) > fold(b) ? 1 : 0);
const label = (e: Row) => [e.animalName, e.speciesName].filter(Boolean).join(' ');

function expectedOrder(rows: Row[], column: EnclosureSortColumn, descending: boolean): number[] {
  const sign = descending ? -1 : 1;
  const emptyLast = (a: string, b: string) => (a ? 0 : 1) - (b ? 0 : 1) || sign * text(a, b);
  const by = (a: Row, b: Row): number => {
    switch (column) {
      case 'name':
        return sign * text(a.name, b.name);
      case 'animal':
        return emptyLast(label(a), label(b));
      case 'keeper':
        return emptyLast(a.keeperName ?? '', b.keeperName ?? '');
      case 'size':
        return sign * (a.widthCm * a.depthCm - b.widthCm * b.depthCm || a.heightCm - b.heightCm);
      case 'updated':
        return sign * (Date.parse(a.updatedAt) - Date.parse(b.updatedAt));
    }
  };
  return [...rows].sort((a, b) => by(a, b) || text(a.name, b.name) || a.id - b.id).map((e) => e.id);
}

const ids = (rows: { id: number }[]) => rows.map((e) => e.id);

describe('GET /api/enclosures: paging', () => {
  it('walks the pages without overlap or gap, with the total on each, and an empty page past the end', async () => {
    const pages = [];
    for (const offset of [0, 10, 20, 30]) {
      const r = await get(owner, `sort=name&dir=asc&offset=${offset}&limit=10`);
      expect(r.status).toBe(200);
      expect(r.body.total).toBe(37);
      expect(r.body).toMatchObject({ offset, limit: 10 });
      pages.push(r.body.items);
    }
    expect(pages.map((p) => p.length)).toEqual([10, 10, 10, 7]);
    expect(ids(pages.flat())).toEqual(expectedOrder(made, 'name', false));

    const past = await get(owner, 'sort=name&offset=37&limit=10');
    expect(past.status).toBe(200);
    expect(past.body.items).toEqual([]);
    expect(past.body.total).toBe(37);
  });

  it('is newest first by default, in pages of 50', async () => {
    const r = await get(owner, '');
    expect(r.body.items).toHaveLength(37);
    expect(ids(r.body.items)).toEqual(expectedOrder(made, 'updated', true));
    expect(r.body).toMatchObject({ offset: 0, limit: 50 });
  });
});

describe('GET /api/enclosures: names with numbers', () => {
  it('sorts them as people count ("Tub 5" before "Tub 10"), case aside, both ways', async () => {
    const { organisation, user } = await createMember('owner');
    for (const name of ['Tub 10', 'tub 9', 'Tub 5', 'Rack 2 tub 11', 'Rack 2 tub 3', 'Tub 100'])
      await createEnclosure(organisation, user, { name });
    const names = async (dir: string) => {
      const r = await call(collection.GET, {
        path: `/api/enclosures?organisationId=${organisation.id}&sort=name&dir=${dir}&limit=100`,
        as: user,
      });
      expect(r.status).toBe(200);
      return (r.body.items as Row[]).map((e) => e.name);
    };
    const ascending = ['Rack 2 tub 3', 'Rack 2 tub 11', 'Tub 5', 'tub 9', 'Tub 10', 'Tub 100'];
    expect(await names('asc')).toEqual(ascending);
    expect(await names('desc')).toEqual([...ascending].reverse());
  });
});

describe('GET /api/enclosures: every sort, both ways', () => {
  for (const column of ENCLOSURE_SORT_COLUMNS) {
    for (const dir of ['asc', 'desc'] as const) {
      it(`sorts by ${column} ${dir}, and pages of 7 add up to the same order`, async () => {
        const whole = await listAll(owner, `sort=${column}&dir=${dir}`);
        expect(ids(whole)).toEqual(expectedOrder(made, column, dir === 'desc'));
        const paged = await listAll(owner, `sort=${column}&dir=${dir}`, 7);
        expect(ids(paged)).toEqual(ids(whole));
      });
    }
  }

  it('still sorts when a production build renames the model class (the table alias follows it)', async () => {
    // Sequelize aliases the table by the class name, which the bundler minifies: a hard-coded
    // `Enclosure` in raw SQL broke every sort of the built app.
    const original = Object.getOwnPropertyDescriptor(Enclosure, 'name')!;
    Object.defineProperty(Enclosure, 'name', { ...original, value: 'q1' });
    try {
      for (const column of ENCLOSURE_SORT_COLUMNS) {
        const r = await get(owner, `sort=${column}&dir=asc&limit=100&q=vivarium`);
        expect(r.status).toBe(200);
        expect(ids(r.body.items)).toEqual(expectedOrder(made, column, false));
      }
    } finally {
      Object.defineProperty(Enclosure, 'name', original);
    }
    expect(Enclosure.name).toBe('Enclosure');
  });

  it('puts enclosures without an animal or species after the rest, in both directions', async () => {
    for (const dir of ['asc', 'desc']) {
      const rows = await listAll(owner, `sort=animal&dir=${dir}`);
      const firstEmpty = rows.findIndex((e) => !label(e));
      expect(firstEmpty).toBeGreaterThan(0);
      expect(rows.slice(firstEmpty).every((e) => !label(e))).toBe(true);
    }
  });
});

describe('GET /api/enclosures: search', () => {
  const names = async (as: User, q: string) =>
    (await listAll(as, `q=${encodeURIComponent(q)}&sort=name&dir=asc`)).map((e) => e.name);
  const expectedNames = (match: (e: Row) => boolean) =>
    made
      .filter(match)
      .sort((a, b) => text(a.name, b.name))
      .map((e) => e.name);

  it('finds by enclosure name, animal, species, keeper name and keeper e-mail', async () => {
    expect(await names(owner, 'vivarium 07')).toEqual(['Bench vivarium 07']);
    expect(await names(owner, 'saffron')).toEqual(expectedNames((e) => e.animalName === 'Saffron'));
    expect(await names(owner, 'bearded')).toEqual(
      expectedNames((e) => e.speciesName === 'Central bearded dragon'),
    );
    expect(await names(owner, 'brook')).toEqual(expectedNames((e) => e.keeperId === ana.id));
    expect(await names(owner, 'e.dunn@example')).toEqual(expectedNames((e) => e.keeperId === emile.id));
  });

  it('ignores case and accents, and needs every word in any order', async () => {
    expect(await names(owner, 'EMILE')).toEqual(expectedNames((e) => e.keeperId === emile.id));
    expect(await names(owner, 'gecko quill')).toEqual(
      expectedNames((e) => e.keeperId === zed.id && /gecko/i.test(e.speciesName ?? '')),
    );
    expect(await names(owner, 'gecko quill').then((n) => n.length)).toBeGreaterThan(0);
  });

  it('pages through search results with the total of the matches', async () => {
    const all = expectedNames((e) => /gecko/i.test(e.speciesName ?? ''));
    expect(all.length).toBeGreaterThan(10);
    const first = await get(owner, 'q=gecko&sort=name&dir=asc&limit=10');
    const second = await get(owner, 'q=gecko&sort=name&dir=asc&limit=10&offset=10');
    expect(first.body.total).toBe(all.length);
    expect([...first.body.items, ...second.body.items].map((e: Row) => e.name)).toEqual(all.slice(0, 20));
    // A search by the keeper's name counts through the keeper, as the page's rows are found.
    const anaRows = expectedNames((e) => e.keeperId === ana.id);
    expect((await get(owner, 'q=brook&limit=2')).body.total).toBe(anaRows.length);
  });

  it('takes wildcards literally and finds nothing in another organisation', async () => {
    const none = await get(owner, 'q=%25');
    expect(none.body).toMatchObject({ items: [], total: 0 });
    expect((await get(owner, 'q=_')).body.total).toBe(0);
    expect((await get(owner, 'q=elsewhere')).body.total).toBe(0);
  });
});

describe('GET /api/enclosures: a keeper sees only their own', () => {
  const anas = () => made.filter((e) => e.keeperId === ana.id);

  it('lists, sorts and pages their own enclosures only', async () => {
    const first = await get(ana, 'sort=size&dir=asc&limit=5');
    expect(first.status).toBe(200);
    expect(first.body.total).toBe(anas().length);
    const rows = await listAll(ana, 'sort=size&dir=asc', 5);
    expect(ids(rows)).toEqual(expectedOrder(anas(), 'size', false));
    expect(rows.every((e) => e.keeperId === ana.id)).toBe(true);
  });

  it('finds nothing of anyone else, even searching for them by name or e-mail', async () => {
    expect((await get(ana, 'q=dunn')).body).toMatchObject({ items: [], total: 0 });
    expect((await get(ana, 'q=zq%40example.com')).body).toMatchObject({ items: [], total: 0 });
    const gecko = await listAll(ana, 'q=gecko');
    expect(gecko.length).toBeGreaterThan(0);
    expect(gecko.every((e) => e.keeperId === ana.id)).toBe(true);
  });

  it('gets 404 for another keeper’s list and for another organisation', async () => {
    const other = await get(ana, `keeperId=${emile.id}&q=gecko`);
    expect(other.status).toBe(404);
    expect(other.text).not.toContain('vivarium');
    const foreign = await get(outsider, 'q=vivarium');
    expect(foreign.status).toBe(404);
  });

  it('lets the owner narrow the list to one keeper', async () => {
    const rows = await listAll(owner, `keeperId=${zed.id}&sort=name`);
    expect(ids(rows)).toEqual(
      expectedOrder(
        made.filter((e) => e.keeperId === zed.id),
        'name',
        false,
      ),
    );
  });
});

describe('GET /api/enclosures: refused queries', () => {
  it.each([
    ['sort', 'sort=notes', 'Sort by one of'],
    ['sort', 'sort=name;DROP', 'Sort by one of'],
    ['dir', 'dir=up', 'asc or desc'],
    ['offset', 'offset=-1', 'negative'],
    ['offset', 'offset=1.5', 'whole number'],
    ['limit', 'limit=0', 'at least 1'],
    ['q', `q=${'x'.repeat(121)}`, '120 characters'],
  ])('answers 400 naming %s for %s', async (field, query, message) => {
    const r = await get(owner, query);
    expect(r.status).toBe(400);
    expect(r.body.error.field).toBe(field);
    expect(r.body.error.message).toContain(message);
    expectNoInternals(r);
  });

  it('answers 401 without a session', async () => {
    expect((await get(null, 'q=gecko')).status).toBe(401);
  });
});
