import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * A customer may later become a keeper of the shop (an account with enclosures of their own). The
 * nullable `keeper_user_id` links the two without copying anything: the customer page lists the keeper's
 * enclosure lamps beside the counter lamps, and the counter can add its reading to such a lamp. One
 * keeper is linked to at most one customer of an organisation (MariaDB's unique index lets any number of
 * customers have no link). Deleting the keeper's account only drops the link. `down` drops the column:
 * the link alone is lost, never a lamp or reading.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('customers', 'keeper_user_id', {
    type: DataTypes.INTEGER.UNSIGNED,
    allowNull: true,
    references: { model: 'users', key: 'id' },
    onDelete: 'SET NULL',
  });
  await qi.addIndex('customers', ['organisation_id', 'keeper_user_id'], {
    name: 'customers_org_keeper',
    unique: true,
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  // Raw SQL: removeColumn through the mariadb driver trips a known Sequelize issue. The foreign key goes
  // first; its name is MariaDB's own.
  const [fks] = await qi.sequelize.query(
    `SELECT CONSTRAINT_NAME AS name FROM information_schema.KEY_COLUMN_USAGE
      WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = 'customers' AND COLUMN_NAME = 'keeper_user_id'
        AND REFERENCED_TABLE_NAME IS NOT NULL`,
  );
  for (const fk of fks as { name: string }[]) {
    await qi.sequelize.query(`ALTER TABLE customers DROP FOREIGN KEY \`${fk.name}\``);
  }
  await qi.sequelize.query('ALTER TABLE customers DROP INDEX customers_org_keeper');
  await qi.sequelize.query('ALTER TABLE customers DROP COLUMN keeper_user_id');
}
