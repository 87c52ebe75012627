import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * How customers reach the shop: a phone number, an e-mail address and an address line, each optional, set
 * by the organisation's owner. The counter's test slip (PDF and e-mail) and the re-test reminders show
 * what is set. No existing row changes (all three start empty); `down` drops the three columns, losing only
 * what was typed into them since.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('organisations', 'contact_phone', { type: DataTypes.STRING(40), allowNull: true });
  await qi.addColumn('organisations', 'contact_email', { type: DataTypes.STRING(254), allowNull: true });
  await qi.addColumn('organisations', 'contact_address', { type: DataTypes.STRING(200), allowNull: true });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  // Raw SQL: removeColumn through the mariadb driver trips a known Sequelize issue.
  await qi.sequelize.query(
    'ALTER TABLE organisations DROP COLUMN contact_phone, DROP COLUMN contact_email, DROP COLUMN contact_address',
  );
}
