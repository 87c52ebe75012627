import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import * as lampsRoute from '@/app/api/lamps/route';
import { encodeCursor, lampCounts, lampListQuery, lampListSql } from '@/lib/lamp-log/list-queries';
import { LAMP_SORT_COLUMNS } from '@/lib/lamp-log/list-view';
import { addDays, todayIso } from '@/lib/lamp-log/dates';
import { refreshStaleOutlooks } from '@/lib/lamp-log/stored-outlooks';
import { lampRow, summariseLive } from '@/lib/lamp-log/queries';
import { seedStartingCatalogue } from '@/lib/species/seed';
import { Enclosure, Lamp, LampType, Membership, User } from '@/models';
import {
  createEnclosure,
  createMember,
  createOrganisation,
  seedDemo,
  testDb,
  withTestDatabase,
} from '../helpers/db';
import { createLampKeepersWorld } from '../helpers/world';
import { call } from './http';

// The lamp log's list API: server-side search, filters, sort and pages from the stored outlooks; the
// same statuses as computing every lamp from scratch; indexes and a fixed number of queries.
withTestDatabase();

type Item = {
  id: number;
  label: string;
  status: string;
  enclosure: { keeperId: number };
  lampType: { tech: string };
};

async function world(lampsPerKeeper = 3) {
  const { org, staff, ann, bob, t5, heat } = await createLampKeepersWorld({ staff: true });
  const lamps: Lamp[] = [];
  for (const keeper of [ann, bob]) {
    const enclosure = await createEnclosure(org, keeper, { speciesName: 'Bearded dragon' });
    for (let i = 0; i < lampsPerKeeper; i++) {
      lamps.push(
        await Lamp.create({
          enclosureId: enclosure.id,
          lampTypeId: i === 0 ? heat.id : t5.id,
          label: `${keeper === ann ? 'Ann' : 'Bob'} lamp ${String(i).padStart(2, '0')}`,
          // From new to two years old: a mix of "test soon", "fine" and "replace".
          firstUsedOn: addDays(todayIso(), -((i * 97) % 730)),
          hoursPerDay: 12,
          baskingDistanceCm: 25,
          createdById: keeper.id,
        }),
      );
    }
  }
  return { org, staff: staff!, ann, bob, lamps };
}

const list = async (as: User, orgId: number, qs = '') => {
  const r = await call(lampsRoute.GET, { path: `/api/lamps?organisationId=${orgId}${qs}`, as });
  expect(r.status, r.text).toBe(200);
  return r.body as {
    items: Item[];
    total: number;
    counts: Record<string, number>;
    cursors: { next: string | null; prev: string | null };
  };
};

describe('GET /api/lamps', () => {
  it('gives the demo lamps the statuses computing each one from scratch gives', async () => {
    await seedDemo();
    for (const staffMember of await Membership.findAll({ where: { role: 'owner' } })) {
      const user = (await User.findByPk(staffMember.userId))!;
      const page = await list(user, staffMember.organisationId, '&retired=1&limit=100');
      const lamps = await Lamp.findAll({
        include: [
          { model: Enclosure, as: 'enclosure', where: { organisationId: staffMember.organisationId } },
        ],
      });
      expect(page.total).toBe(lamps.length);
      const live = await summariseLive(lamps, todayIso());
      const byId = (xs: { id: number; status: string }[]) =>
        Object.fromEntries(xs.map((x) => [x.id, x.status]));
      expect(byId(page.items)).toEqual(byId(live));
      expect(page.counts.replace).toBe(live.filter((l) => l.status === 'replace').length);
      expect(page.counts.testSoon).toBe(live.filter((l) => l.status === 'test-soon').length);
      expect(page.counts.pending).toBe(0);
      // Each row, read from the stored outlooks in one plain query, is what the table would show of
      // the lamp computed from scratch.
      const rows = (xs: { id: number }[]) => [...xs].sort((a, b) => a.id - b.id);
      expect(rows(page.items)).toEqual(rows(live.map(lampRow)));
      // A lamp changed since (its version bumped, as a migration does) is recomputed for the page.
      await testDb().query('UPDATE lamps SET outlook_version = outlook_version + 1 WHERE id = :id', {
        replacements: { id: lamps[0]!.id },
      });
      const again = await list(user, staffMember.organisationId, '&retired=1&limit=100');
      expect(rows(again.items)).toEqual(rows(live.map(lampRow)));
      // Counted beside the page, before the page recomputed it; the next answer finds nothing waiting.
      expect(again.counts.pending).toBe(1);
      expect((await list(user, staffMember.organisationId)).counts.pending).toBe(0);
    }
  });

  it('filters by status, technology, keeper and due date, and a keeper never sees another’s lamps', async () => {
    const w = await world();
    const all = await list(w.staff, w.org.id, '&limit=100');
    expect(all.total).toBe(6);
    // The plain list's total comes from the status counts; the same lamps counted by the filtered
    // views' own query agree with it.
    const withRetired = await list(w.staff, w.org.id, '&retired=1');
    const retired = await list(w.staff, w.org.id, '&status=retired');
    expect(withRetired.total - retired.total).toBe(all.total);
    const statuses = new Set(all.items.map((l) => l.status));
    for (const status of statuses) {
      const page = await list(w.staff, w.org.id, `&status=${status}`);
      expect(page.items.length).toBeGreaterThan(0);
      expect(page.items.every((l) => l.status === status)).toBe(true);
      // The counts are of everything in view, not of the filtered list.
      expect(page.counts).toEqual(all.counts);
    }
    const t5 = await list(w.staff, w.org.id, '&tech=t5');
    expect(t5.total).toBe(4);
    expect(t5.items.every((l) => l.lampType.tech === 't5')).toBe(true);
    expect((await list(w.staff, w.org.id, `&keeper=${w.bob.id}`)).items.map((l) => l.label)).toEqual(
      expect.arrayContaining(['Bob lamp 00', 'Bob lamp 01', 'Bob lamp 02']),
    );
    const asAnn = await list(w.ann, w.org.id, `&keeper=${w.bob.id}&limit=100`);
    expect(asAnn.items.map((l) => l.enclosure.keeperId)).toEqual([w.ann.id, w.ann.id, w.ann.id]);
    expect(asAnn.counts.inUse).toBe(3);
    const due = await list(w.staff, w.org.id, '&due=14&limit=100');
    expect(due.total).toBe(
      all.items.filter((l) => l.status === 'replace' || l.status === 'test-soon').length,
    );
    const bad = await call(lampsRoute.GET, {
      path: `/api/lamps?organisationId=${w.org.id}&due=5`,
      as: w.staff,
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('due');
  });

  it('searches, sorts and pages on the server', async () => {
    const w = await world(12);
    const byLabel = await list(w.staff, w.org.id, '&sort=lamp&dir=asc&limit=5&offset=5');
    expect(byLabel.total).toBe(24);
    expect(byLabel.items.map((l) => l.label)).toEqual([
      'Ann lamp 05',
      'Ann lamp 06',
      'Ann lamp 07',
      'Ann lamp 08',
      'Ann lamp 09',
    ]);
    const desc = await list(w.staff, w.org.id, '&sort=lamp&dir=desc&limit=1');
    expect(desc.items[0]!.label).toBe('Bob lamp 11');
    const search = await list(w.staff, w.org.id, '&q=bob%2007');
    expect(search.items.map((l) => l.label)).toEqual(['Bob lamp 07']);
    // Most urgent first by default.
    const urgency = (await list(w.staff, w.org.id, '&limit=100')).items.map((l) => l.status);
    const rank = { replace: 0, 'test-soon': 1, fine: 2, 'heat-only': 3, retired: 4 } as Record<
      string,
      number
    >;
    expect(urgency.map((s) => rank[s])).toEqual([...urgency.map((s) => rank[s]!)].sort((a, b) => a - b));
  });

  it('pages by cursor, forwards and back, through the rows the offsets give, in every sort', async () => {
    const w = await world(12);
    // Retired lamps too, so every status and the lamps with no date, no reading and no UV are in it.
    await Lamp.update({ retiredOn: todayIso() }, { where: { id: [w.lamps[1]!.id, w.lamps[14]!.id] } });
    await refreshStaleOutlooks();
    const ids = (page: { items: Item[] }) => page.items.map((l) => l.id);
    const views = [
      ...LAMP_SORT_COLUMNS.flatMap((sort) => [`&sort=${sort}&dir=asc`, `&sort=${sort}&dir=desc`]),
      '&sort=due&dir=asc&due=90',
      '&tech=t5&sort=age',
    ];
    for (const view of views) {
      const qs = `&retired=1${view}`;
      const whole = ids(await list(w.staff, w.org.id, `${qs}&limit=100`));
      expect(whole.length, view).toBeGreaterThan(4);
      // Forwards: each page after the last row of the one before.
      const forwards: number[][] = [];
      let page = await list(w.staff, w.org.id, `${qs}&limit=5`);
      forwards.push(ids(page));
      while (page.cursors.next && forwards.length < 20) {
        page = await list(w.staff, w.org.id, `${qs}&limit=5&offset=0&after=${page.cursors.next}`);
        if (page.items.length === 0) break;
        forwards.push(ids(page));
      }
      expect(forwards.flat(), view).toEqual(whole);
      for (const [i, rows] of forwards.entries()) {
        const byOffset = await list(w.staff, w.org.id, `${qs}&limit=5&offset=${i * 5}`);
        expect(rows, `${view} page ${i + 1}`).toEqual(ids(byOffset));
      }
      // Backwards from the last page: each page before the first row of the one after.
      const backwards: number[][] = [forwards.at(-1)!];
      page = await list(w.staff, w.org.id, `${qs}&limit=5&offset=${(forwards.length - 1) * 5}`);
      while (page.cursors.prev && backwards.length < 20) {
        page = await list(w.staff, w.org.id, `${qs}&limit=5&offset=0&before=${page.cursors.prev}`);
        if (page.items.length === 0) break;
        backwards.unshift(ids(page));
      }
      expect(backwards, view).toEqual(forwards);
    }
    // A cursor made for another sort is not used: the page falls back to its offset.
    const byLabel = await list(w.staff, w.org.id, '&sort=lamp&limit=5');
    const other = await list(w.staff, w.org.id, `&sort=age&limit=5&offset=5&after=${byLabel.cursors.next}`);
    expect(ids(other)).toEqual(ids(await list(w.staff, w.org.id, '&sort=age&limit=5&offset=5')));
    const bad = await call(lampsRoute.GET, {
      path: `/api/lamps?organisationId=${w.org.id}&after=${encodeURIComponent('not a cursor!')}`,
      as: w.staff,
    });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('after');
  });

  it('gives every sort the order a plain sort of the stored outlooks gives, blanks last either way', async () => {
    const w = await world(12);
    await Lamp.update({ retiredOn: todayIso() }, { where: { id: [w.lamps[1]!.id, w.lamps[14]!.id] } });
    await refreshStaleOutlooks();
    const sequelize = testDb();
    // Ties and blanks in every sorted column, so the tie-breaks and the place of blanks decide the order.
    await sequelize.query(
      `UPDATE lamp_outlooks
          SET last_reading_at = IF(lamp_id % 3 = 0, NULL, '2026-03-01' + INTERVAL (lamp_id % 4) DAY),
              remaining_fraction = IF(lamp_id % 4 = 0, NULL, (lamp_id % 3) / 4),
              next_due_on = IF(lamp_id % 5 = 0, NULL, '2026-09-01' + INTERVAL (lamp_id % 2) DAY),
              first_used_on = '2025-01-01' + INTERVAL (lamp_id % 3) DAY
        WHERE organisation_id = :org`,
      { replacements: { org: w.org.id } },
    );
    // The status most of the lamps have, for a view filtered by it.
    const [common] = await sequelize.query<{ status: string }>(
      `SELECT status FROM lamp_outlooks WHERE organisation_id = :org
        GROUP BY status ORDER BY COUNT(*) DESC, status LIMIT 1`,
      { replacements: { org: w.org.id }, type: QueryTypes.SELECT },
    );
    // Each sort spelled out plainly (MariaDB puts NULL first ascending): `d` the direction asked, `o`
    // the other one.
    const plain: Record<(typeof LAMP_SORT_COLUMNS)[number], string> = {
      urgency: 'status_rank d, next_due_on d, lamp_id d',
      lamp: 'label d, lamp_id d',
      enclosure: 'enclosure_name d, label d, lamp_id d',
      age: 'first_used_on o, lamp_id d',
      lastReading: 'last_reading_at IS NULL, last_reading_at d, lamp_id d',
      remaining: 'remaining_fraction IS NULL, remaining_fraction d, lamp_id d',
      due: 'next_due_on IS NULL, next_due_on d, lamp_id d',
    };
    for (const sort of LAMP_SORT_COLUMNS) {
      for (const [dir, d, o] of [
        ['asc', 'ASC', 'DESC'],
        ['desc', 'DESC', 'ASC'],
      ] as const) {
        for (const filter of ['&retired=1', `&status=${common!.status}`, '']) {
          const order = plain[sort].replace(/ d\b/g, ` ${d}`).replace(/ o\b/g, ` ${o}`);
          const status = filter.match(/status=([\w-]+)/)?.[1];
          const expected = await sequelize.query<{ id: number }>(
            `SELECT lamp_id AS id FROM lamp_outlooks
              WHERE organisation_id = :org AND ${status ? 'status = :status' : filter ? 'TRUE' : "status <> 'retired'"}
              ORDER BY ${order}`,
            { replacements: { org: w.org.id, status }, type: QueryTypes.SELECT },
          );
          const view = `&sort=${sort}&dir=${dir}${filter}`;
          const page = await list(w.staff, w.org.id, `${view}&limit=100`);
          expect(expected.length, view).toBeGreaterThan(2);
          expect(
            page.items.map((l) => l.id),
            view,
          ).toEqual(expected.map((r) => r.id));
        }
      }
    }
  });

  it('asks the database the same number of queries for a page of 3 lamps as for a page of 24', async () => {
    const w = await world(12);
    await refreshStaleOutlooks();
    const sequelize = testDb() as unknown as { options: { logging: unknown } };
    const count = async (qs: string) => {
      let n = 0;
      const before = sequelize.options.logging;
      sequelize.options.logging = () => void n++;
      try {
        const page = await list(w.staff, w.org.id, qs);
        return { n, items: page.items.length };
      } finally {
        sequelize.options.logging = before;
      }
    };
    const small = await count('&limit=3');
    const large = await count('&limit=24');
    expect(small.items).toBe(3);
    expect(large.items).toBe(24);
    expect(large.n).toBe(small.n);
    expect(small.n).toBeLessThanOrEqual(8);
  });

  it('uses an index of the stored outlooks for its filter and order (EXPLAIN)', async () => {
    await world(2);
    const sequelize = testDb();
    // Thousands of lamps in one organisation: where a full scan would be a real choice for the optimiser.
    const other = await createOrganisation();
    await seedStartingCatalogue(other.id);
    const { user: keeper } = await createMember('keeper', other);
    const enclosure = await createEnclosure(other, keeper);
    const type = (await LampType.findOne({ where: { organisationId: other.id, tech: 't5' } }))!;
    await sequelize.query(
      `INSERT INTO lamps (enclosure_id, lamp_type_id, label, first_used_on, hours_per_day, created_at, updated_at)
       SELECT :enclosure, :type, CONCAT('Filler ', seq), '2025-01-01', 12, NOW(), NOW() FROM seq_1_to_3000`,
      { replacements: { enclosure: enclosure.id, type: type.id } },
    );
    await sequelize.query(
      `INSERT INTO lamp_outlooks (lamp_id, organisation_id, label, enclosure_name, first_used_on, status,
         status_rank, next_due_on, outlook_json, as_of, source_version, computed_at)
       SELECT l.id, :org, l.label, 'Filler', l.first_used_on, 'fine', 2, '2026-01-01', '{}', :today, 1, NOW()
         FROM lamps l WHERE l.enclosure_id = :enclosure`,
      { replacements: { org: other.id, enclosure: enclosure.id, today: todayIso() } },
    );
    // Readings and UV output for most of them, a blank for the rest: the sorts that put blanks last.
    await sequelize.query(
      `UPDATE lamp_outlooks
          SET last_reading_at = IF(lamp_id % 3 = 0, NULL, '2025-06-01' + INTERVAL (lamp_id % 500) HOUR),
              remaining_fraction = IF(lamp_id % 4 = 0, NULL, (lamp_id % 97) / 100)
        WHERE organisation_id = :org`,
      { replacements: { org: other.id } },
    );
    // As the app's writer does once the stored rows are of the lamps' versions.
    await sequelize.query('UPDATE lamps SET outlook_pending = 0 WHERE enclosure_id = :enclosure', {
      replacements: { enclosure: enclosure.id },
    });
    await sequelize.query('ANALYZE TABLE lamp_outlooks, lamps, enclosures');
    const plan = async (qs: Record<string, string>) => {
      // The organisation with thousands of lamps: where a plan matters.
      const query = lampListQuery.parse({ organisationId: String(other.id), ...qs });
      const { keeper: _k, ...rest } = query;
      const { pageSql, replacements } = lampListSql(rest, todayIso());
      return sequelize.query<{ table: string; type: string; key: string | null; Extra: string | null }>(
        `EXPLAIN ${pageSql}`,
        { replacements, type: QueryTypes.SELECT },
      );
    };
    const last = await Lamp.max<number, Lamp>('id');
    // A deep page by cursor: the lamps after one near the end, sought through the same index.
    const after = (sort: string, values: (string | number | null)[]) => encodeCursor(sort, values);
    const views: Record<string, string>[] = [
      {},
      { status: 'replace' },
      { due: '14', sort: 'due' },
      // Lamps without a date last, either way, with or without a status.
      { sort: 'due' },
      { sort: 'due', dir: 'desc' },
      { status: 'replace', sort: 'due' },
      { status: 'fine', sort: 'due', dir: 'desc' },
      { sort: 'due', after: after('due.a', ['2026-01-01', last - 25]) },
      { sort: 'lamp' },
      { after: after('urgency.a', [2, '2026-01-01', last - 25]) },
      { before: after('urgency.a', [2, '2026-01-01', last - 25]) },
      { sort: 'lamp', after: after('lamp.a', ['Filler 2900', last - 100]) },
      { sort: 'due', due: '90', after: after('due.a.f', ['2026-01-01', last - 25]) },
      // Every sort either way, over the lamps in use, one status (all of them or none), or all lamps.
      ...LAMP_SORT_COLUMNS.flatMap((sort) =>
        ['asc', 'desc'].flatMap((dir) =>
          ([{}, { status: 'fine' }, { status: 'replace' }, { retired: '1' }] as Record<string, string>[]).map(
            (f) => ({ sort, dir, ...f }),
          ),
        ),
      ),
      // Deep pages by cursor in the sorts whose blanks come last, and those that break ties on the label
      // or run against the id.
      { sort: 'lastReading', dir: 'asc', after: after('lastReading.a', ['2025-06-10 00:00:00', last - 25]) },
      { sort: 'lastReading', dir: 'asc', after: after('lastReading.a', ['9999-12-31 23:59:59', last - 25]) },
      { sort: 'lastReading', before: after('lastReading.d', [null, last - 25]) },
      { sort: 'remaining', after: after('remaining.a', [0.5, last - 25]) },
      { sort: 'remaining', dir: 'desc', status: 'fine', after: after('remaining.d', [null, last - 25]) },
      { sort: 'enclosure', after: after('enclosure.a', ['Filler', 'Filler 2900', last - 100]) },
      { sort: 'age', after: after('age.d', ['2025-01-01', last - 25]) },
      { sort: 'age', dir: 'asc', status: 'fine', before: after('age.a', ['2025-01-01', last - 25]) },
    ];
    for (const qs of views) {
      if (qs.after || qs.before) {
        const query = lampListQuery.parse({ organisationId: String(other.id), ...qs });
        // Sought, not counted off: no OFFSET however deep the page.
        expect(lampListSql(query, todayIso()).pageSql, JSON.stringify(qs)).not.toMatch(/OFFSET/);
      }
      const rows = await plan(qs);
      const outlook = rows.find((r) => r.table === 'o')!;
      expect(outlook, JSON.stringify(rows)).toBeDefined();
      expect(outlook.type, JSON.stringify(qs)).not.toBe('ALL');
      expect(outlook.key, JSON.stringify([qs, rows])).toMatch(/^lamp_outlooks_org_/);
      expect(outlook.Extra ?? '', JSON.stringify(qs)).not.toMatch(/filesort/);
      // Every join goes through a primary key.
      for (const r of rows.filter((x) => x.table !== 'o')) expect(r.type, JSON.stringify(r)).toBe('eq_ref');
    }
    // A view the counts rows cannot answer (a due date) is counted by its own query, which reads the
    // outlooks' index alone: no lamp is read to count it.
    for (const qs of [{ due: '14' }, { status: 'fine', due: '90' }]) {
      const query = lampListQuery.parse({ organisationId: String(other.id), ...qs });
      const { keeper: _k, ...rest } = query;
      const { countSql, replacements } = lampListSql(rest, todayIso());
      const rows = await sequelize.query<{ table: string; type: string; key: string | null }>(
        `EXPLAIN ${countSql}`,
        { replacements, type: QueryTypes.SELECT },
      );
      expect(
        rows.map((r) => r.table),
        JSON.stringify([qs, rows]),
      ).toEqual(['o']);
      expect(rows[0]!.type, JSON.stringify(qs)).not.toBe('ALL');
      expect(rows[0]!.key, JSON.stringify([qs, rows])).toMatch(/^lamp_outlooks_org_/);
    }
    // The summary counts read the organisation's few counts rows (kept by triggers), and the lamps
    // waiting to be recomputed through their flag's index: neither reads a row per lamp.
    const logged: string[] = [];
    const withLog = sequelize as unknown as { options: { logging: unknown } };
    const before = withLog.options.logging;
    withLog.options.logging = (line: string) => void logged.push(line.replace(/^Executing \([^)]*\): /, ''));
    try {
      expect(await lampCounts({ organisationId: other.id })).toEqual({
        replace: 0,
        testSoon: 0,
        inUse: 3000,
        pending: 0,
      });
    } finally {
      withLog.options.logging = before;
    }
    const explain = async (pattern: RegExp) => {
      const sql = logged.find((q) => pattern.test(q));
      expect(sql, JSON.stringify(logged)).toBeDefined();
      return sequelize.query<{ table: string; key: string | null; type: string; rows: number | string }>(
        `EXPLAIN ${sql!}`,
        { type: QueryTypes.SELECT },
      );
    };
    const [counted] = await explain(/FROM lamp_outlook_counts/i);
    expect(counted!.type).not.toBe('ALL');
    expect(counted!.key).toBe('PRIMARY');
    const waiting = await explain(/outlook_pending = 1/i);
    // From the waiting lamps, by their flag's index, to their enclosures and outlooks by key.
    expect(waiting[0]!.table, JSON.stringify(waiting)).toBe('l');
    expect(waiting[0]!.key, JSON.stringify(waiting)).toBe('lamps_outlook_pending');
    expect(waiting[0]!.type, JSON.stringify(waiting)).not.toBe('ALL');
    for (const r of waiting.slice(1)) expect(r.type, JSON.stringify(r)).toBe('eq_ref');
  });
});
