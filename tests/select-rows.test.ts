import { QueryTypes } from 'sequelize';
import { describe, expect, it } from 'vitest';
import { selectRows } from '@/lib/db';
import { testDb, withTestDatabase } from './helpers/db';
import { createWorld } from './helpers/world';

// selectRows runs a SELECT on the driver, without Sequelize's per-query machinery: the pages read their
// rows through it, so it must answer exactly what `sequelize.query` answered for the same SQL.
withTestDatabase();

const viaSequelize = <T extends object>(sql: string, replacements: Record<string, unknown>) =>
  testDb().query<T>(sql, { replacements, type: QueryTypes.SELECT });

describe('selectRows', () => {
  it('answers the rows Sequelize answers: replacements, a list for IN, dates, counts and nulls', async () => {
    const world = await createWorld();
    const sql = `SELECT u.id, u.email, u.created_at AS createdAt, m.role, COUNT(*) OVER () AS n,
                        NULL AS nothing
                   FROM users u JOIN memberships m ON m.user_id = u.id
                  WHERE m.organisation_id = :organisationId AND u.id IN (:ids) AND u.created_at > :since
                  ORDER BY u.id`;
    const replacements = {
      organisationId: world.shop.id,
      ids: [world.owner.id, world.keeper.id],
      since: new Date('2000-01-01T00:00:00Z'),
    };
    const rows = await selectRows<Record<string, unknown>>(sql, replacements);
    expect(rows).toHaveLength(2);
    const reference = await viaSequelize<Record<string, unknown>>(sql, replacements);
    expect(rows).toEqual(reference);
    expect(rows[0]!.createdAt).toBeInstanceOf(Date);
    // Only the rows: not the driver's column metadata.
    expect(Object.getOwnPropertyNames(rows)).toEqual(['0', '1', 'length']);
  });

  it('a read the driver refuses is asked again through Sequelize, which throws its own error', async () => {
    await expect(selectRows('SELECT no_such_column FROM users')).rejects.toMatchObject({
      name: 'SequelizeDatabaseError',
    });
  });

  it('is logged, and so counted, when Sequelize is asked to log', async () => {
    const sequelize = testDb() as unknown as { options: { logging: unknown } };
    const logged: string[] = [];
    const before = sequelize.options.logging;
    sequelize.options.logging = (line: string) => void logged.push(line);
    try {
      await selectRows('SELECT :n AS n', { n: 7 });
    } finally {
      sequelize.options.logging = before;
    }
    expect(logged).toHaveLength(1);
    expect(logged[0]).toContain('SELECT 7 AS n');
  });
});
