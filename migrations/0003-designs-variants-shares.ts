import { DataTypes, type QueryInterface } from 'sequelize';
import { author, id, ref, stamps } from './columns';

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('designs', {
    id: id(),
    enclosure_id: ref('enclosures', 'CASCADE'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    created_by_id: author(),
    ...stamps(),
  });
  await qi.addIndex('designs', ['enclosure_id', 'id'], { name: 'designs_enclosure' });
  await qi.createTable('variants', {
    id: id(),
    design_id: ref('designs', 'CASCADE'),
    name: { type: DataTypes.STRING(120), allowNull: false },
    design_json: { type: DataTypes.TEXT('long'), allowNull: false },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    created_by_id: author(),
    updated_by_id: author(),
    ...stamps(),
  });
  await qi.addIndex('variants', ['design_id', 'id'], { name: 'variants_design' });
  await qi.createTable('share_links', {
    id: id(),
    variant_id: ref('variants', 'CASCADE'),
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    created_by_id: author(),
    ...stamps(),
  });
  await qi.addIndex('share_links', ['variant_id', 'id'], { name: 'share_links_variant' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('share_links');
  await qi.dropTable('variants');
  await qi.dropTable('designs');
}
