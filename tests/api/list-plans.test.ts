import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { listEnclosures } from '@/lib/enclosures/queries';
import { ENCLOSURE_SORT_COLUMNS } from '@/lib/enclosures/list-view';
import { listKeepers, listPeople } from '@/lib/people/queries';
import { KEEPER_SORT_COLUMNS, MEMBER_SORT_COLUMNS } from '@/lib/people/list-view';
import { createMember, testDb, withTestDatabase } from '../helpers/db';

// The plans MariaDB picks for the enclosures table and the keepers list on an organisation with thousands
// of rows, read from the SQL those lists really send (captured from Sequelize's log): every one reads
// through an index that starts with the organisation, never the whole table; the table's default view,
// its name order and the keepers list also take their order from the index (no sort of the organisation).
// The lamp log's plans are checked in lamp-list.test.ts.
withTestDatabase();

type PlanRow = { table: string; type: string; key: string | null; Extra: string | null };

/** The SELECT statements `run` sends, as Sequelize logs them (values inlined). */
async function statementsOf(run: () => Promise<unknown>): Promise<string[]> {
  const sequelize = testDb() as unknown as { options: { logging: unknown } };
  const sql: string[] = [];
  const before = sequelize.options.logging;
  sequelize.options.logging = (line: string) => {
    sql.push(line.replace(/^Executing \([^)]*\): /, ''));
  };
  try {
    await run();
  } finally {
    sequelize.options.logging = before;
  }
  return sql.filter((s) => /^SELECT/i.test(s));
}

const explain = (sql: string) => testDb().query<PlanRow>(`EXPLAIN ${sql}`, { type: QueryTypes.SELECT });

async function busyOrganisation() {
  const sequelize = testDb();
  const { organisation, user: owner } = await createMember('owner');
  // Other organisations beside it, holding most of the rows, as on any shared server: the organisation
  // filter is what makes each list small, and the plan must use it.
  const { organisation: other, user: otherOwner } = await createMember('owner');
  await sequelize.query(
    `INSERT INTO enclosures (organisation_id, keeper_id, name, width_cm, height_cm, depth_cm, created_at,
       updated_at)
     SELECT :other, :keeper, CONCAT('Elsewhere ', seq), 60, 45, 45, NOW(), NOW() FROM seq_1_to_20000`,
    { replacements: { other: other.id, keeper: otherOwner.id } },
  );
  // 300 keepers here and 3,000 people elsewhere: the organisation filter is what makes the list small.
  await sequelize.query(
    `INSERT INTO users (email, name, password_hash, created_at, updated_at)
     SELECT CONCAT('plan.person.', seq, '@example.com'), CONCAT('Example person ', seq), 'x', NOW(), NOW()
       FROM seq_1_to_3300`,
  );
  await sequelize.query(
    `INSERT INTO memberships (organisation_id, user_id, role, created_at, updated_at)
     SELECT IF(u.seq <= 300, :org, :other), u.id, 'keeper', NOW(), NOW()
       FROM (SELECT id, CAST(SUBSTRING_INDEX(SUBSTRING_INDEX(email, '@', 1), '.', -1) AS UNSIGNED) AS seq
               FROM users WHERE email LIKE 'plan.person.%') u`,
    { replacements: { org: organisation.id, other: other.id } },
  );
  await sequelize.query(
    `INSERT INTO enclosures (organisation_id, keeper_id, name, width_cm, height_cm, depth_cm, species_name,
       created_at, updated_at)
     SELECT :org, :keeper, CONCAT('Example tub ', seq), 90, 45, 45, 'Leopard gecko', NOW(),
            NOW() - INTERVAL seq MINUTE
       FROM seq_1_to_3000`,
    { replacements: { org: organisation.id, keeper: owner.id } },
  );
  await sequelize.query('ANALYZE TABLE enclosures, memberships, users');
  return { organisation, owner };
}

function expectOrganisationIndex(rows: PlanRow[], table: string, what: string) {
  const row = rows.find((r) => r.table === table);
  expect(row, `${what}: ${JSON.stringify(rows)}`).toBeDefined();
  expect(row!.type, `${what}: ${JSON.stringify(rows)}`).not.toBe('ALL');
  expect(row!.key ?? '', `${what}: ${JSON.stringify(rows)}`).toMatch(/org/);
  // Every other table is reached through its primary key.
  for (const r of rows.filter((x) => x.table !== table))
    expect(r.type, `${what}: ${JSON.stringify(r)}`).toBe('eq_ref');
  return row!;
}

describe('list query plans', () => {
  it('the enclosures table reads through an organisation index; its default view and name order need no sort', async () => {
    const { organisation } = await busyOrganisation();
    const ordered = new Set(['updated asc', 'updated desc', 'name asc', 'name desc']);
    for (const sort of ENCLOSURE_SORT_COLUMNS) {
      for (const descending of [false, true]) {
        const what = `${sort} ${descending ? 'desc' : 'asc'}`;
        const statements = await statementsOf(() =>
          listEnclosures({ organisationId: organisation.id, sort, descending, offset: 50, limit: 25 }),
        );
        const page = statements.find((s) => /LIMIT/i.test(s));
        expect(page, what).toBeDefined();
        const e = expectOrganisationIndex(await explain(page!), 'e', what);
        if (ordered.has(what)) expect(e.Extra ?? '', what).not.toMatch(/filesort|temporary/i);
        // The total counts the organisation's rows from an index, not the table.
        const count = statements.find((s) => /COUNT\(/i.test(s));
        expect(count, what).toBeDefined();
        expectOrganisationIndex(await explain(count!), 'e', `${what} count`);
        // Without a search the total needs no keeper: no join for the database to read or drop.
        expect(count, what).not.toMatch(/JOIN/i);
        // A row carries what the table shows; notes can be long and the list never shows them.
        expect(page, what).not.toMatch(/notes/);
      }
    }
  });

  it('the keepers and members lists read an organisation’s people through its index, each person by key', async () => {
    const { organisation } = await busyOrganisation();
    const runs: [string, boolean, () => Promise<unknown>][] = [];
    for (const sort of KEEPER_SORT_COLUMNS) {
      for (const descending of [false, true]) {
        runs.push([
          `keepers ${sort} ${descending ? 'desc' : 'asc'}`,
          // Who joined order is the index's own (organisation, role, id): no sort at all.
          sort === 'joined',
          () => listKeepers({ organisationId: organisation.id, sort, descending, offset: 50, limit: 25 }),
        ]);
      }
    }
    for (const sort of MEMBER_SORT_COLUMNS) {
      runs.push([
        `members ${sort}`,
        false,
        () => listPeople({ organisationId: organisation.id, sort, descending: false, offset: 25, limit: 25 }),
      ]);
    }
    runs.push([
      'keepers searched',
      false,
      () =>
        listKeepers({
          organisationId: organisation.id,
          q: 'person 12',
          sort: 'name',
          descending: false,
          offset: 0,
          limit: 25,
        }),
    ]);
    for (const [what, ordered, run] of runs) {
      const statements = await statementsOf(run);
      const page = statements.find((s) => /FROM memberships/i.test(s) && /LIMIT/i.test(s));
      expect(page, what).toBeDefined();
      const m = expectOrganisationIndex(await explain(page!), 'm', what);
      if (ordered) expect(m.Extra ?? '', what).not.toMatch(/filesort|temporary/i);
      // The total counts the organisation's memberships from the same index.
      const count = statements.find((s) => /COUNT\(/i.test(s) && /FROM memberships/i.test(s));
      expect(count, what).toBeDefined();
      expectOrganisationIndex(await explain(count!), 'm', `${what} count`);
      // Keepers' enclosure counts: one grouped query over the organisation's keeper index.
      const enclosures = statements.find((s) => /FROM enclosures e\b/i.test(s) && /GROUP BY/i.test(s));
      if (what.startsWith('keepers')) {
        expect(enclosures, what).toBeDefined();
        expectOrganisationIndex(await explain(enclosures!), 'e', `${what} enclosure counts`);
      }
    }
  });

  it('a page of 25 keepers asks the database as many queries as a page of 3: no query a person', async () => {
    const { organisation } = await busyOrganisation();
    const queries = async (limit: number) => {
      const statements = await statementsOf(() =>
        listKeepers({ organisationId: organisation.id, sort: 'name', descending: false, offset: 0, limit }),
      );
      return statements.length;
    };
    const small = await queries(3);
    const large = await queries(25);
    expect(large).toBe(small);
    // The page, its total and the page's enclosure counts.
    expect(small).toBeLessThanOrEqual(3);
  });
});
