import type { QueryInterface } from 'sequelize';
import { dropForeignKeys, ref } from './columns';

/**
 * A customer may later become a keeper of the shop (an account with enclosures of their own). The
 * nullable `keeper_user_id` links the two without copying anything: the customer page lists the keeper's
 * enclosure lamps beside the counter lamps, and the counter can add its reading to such a lamp. One
 * keeper is linked to at most one customer of an organisation (MariaDB's unique index lets any number of
 * customers have no link). Deleting the keeper's account only drops the link. `down` drops the column:
 * the link alone is lost, never a lamp or reading.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('customers', 'keeper_user_id', ref('users', 'SET NULL', true));
  await qi.addIndex('customers', ['organisation_id', 'keeper_user_id'], {
    name: 'customers_org_keeper',
    unique: true,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  // The foreign key goes first.
  await dropForeignKeys(qi, 'customers', 'keeper_user_id');
  await qi.sequelize.query('ALTER TABLE customers DROP INDEX customers_org_keeper');
  await qi.sequelize.query('ALTER TABLE customers DROP COLUMN keeper_user_id');
}
