import { DataTypes, type QueryInterface } from 'sequelize';
import { id, ref } from './columns';

/**
 * "Forgot your password?" links. Only the SHA-256 of a link's token is kept, so a database leak hands out
 * no working link; a link works once (`used_at`) and briefly (`expires_at`).
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('password_resets', {
    id: id(),
    user_id: ref('users', 'CASCADE'),
    token_hash: { type: DataTypes.CHAR(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('password_resets', ['user_id'], { name: 'password_resets_user_id' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('password_resets');
}
