import { DataTypes, type QueryInterface } from 'sequelize';
import { ref } from './columns';

/**
 * Sessions ended by signing out. A session cookie is a signed JWT the server cannot take back, so signing
 * out records its session id here until the cookie would have expired anyway; a copied cookie is then
 * refused. Rows past `expires_at` are useless and are deleted as new ones arrive.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('ended_sessions', {
    sid: { type: DataTypes.STRING(64), allowNull: false, primaryKey: true },
    user_id: ref('users', 'CASCADE'),
    expires_at: { type: DataTypes.DATE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('ended_sessions', ['expires_at'], { name: 'ended_sessions_expires_at' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('ended_sessions');
}
