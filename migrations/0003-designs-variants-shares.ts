import { DataTypes, type QueryInterface } from 'sequelize';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const stamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const parent = (table: string) => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: false,
  references: { model: table, key: 'id' },
  onDelete: 'CASCADE',
});
// Who made or changed a row: kept as history, so removing a user must not remove their work.
const author = {
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull: true,
  references: { model: 'users', key: 'id' },
  onDelete: 'SET NULL',
};

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('designs', {
    id,
    enclosure_id: parent('enclosures'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    created_by_id: author,
    ...stamps,
  });
  await qi.addIndex('designs', ['enclosure_id', 'id'], { name: 'designs_enclosure' });
  await qi.createTable('variants', {
    id,
    design_id: parent('designs'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    design_json: { type: DataTypes.TEXT('long'), allowNull: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    created_by_id: author,
    updated_by_id: author,
    ...stamps,
  });
  await qi.addIndex('variants', ['design_id', 'id'], { name: 'variants_design' });
  await qi.createTable('share_links', {
    id,
    variant_id: parent('variants'),
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    created_by_id: author,
    ...stamps,
  });
  await qi.addIndex('share_links', ['variant_id', 'id'], { name: 'share_links_variant' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('share_links');
  await qi.dropTable('variants');
  await qi.dropTable('designs');
}
