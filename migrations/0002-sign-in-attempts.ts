import { DataTypes, type QueryInterface } from 'sequelize';
import { id, stamps } from './columns';

/**
 * Failed sign-in counters, kept in the database so every web process shares them (the web tier is stateless).
 * One row per key ("account:<hash>" or "address:<hash>"), a fixed window that starts at the first failure.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable('sign_in_attempts', {
    id: id(),
    key: { type: DataTypes.STRING(100), allowNull: false, unique: true },
    window_start: { type: DataTypes.DATE, allowNull: false },
    count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    ...stamps(),
  });
  await qi.addIndex('sign_in_attempts', ['window_start'], { name: 'sign_in_attempts_window_start' });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable('sign_in_attempts');
}
