import { DataTypes, type QueryInterface } from 'sequelize';

// Column sets and steps the migrations share. FROZEN: migrations that have already run on real databases
// call these, and running them again on a new database must build exactly the same schema. Never change
// what a function here produces or does — not a type, a flag, nor the order of keys (it orders the
// columns). A migration that needs something else gets a new function, or writes it out itself.
// Each call returns fresh objects, so nothing Sequelize does to one definition reaches another table.
// tests/migrations.test.ts checks that the schema after each migration stays the one recorded.

/** `id`: INT UNSIGNED AUTO_INCREMENT PRIMARY KEY. */
export const id = () => ({ type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true });

/** `created_at` and `updated_at`: DATETIME NOT NULL, written by Sequelize. */
export const stamps = () => ({
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
});

/** INT UNSIGNED holding the id of a row of `table`, with a foreign key doing `onDelete` when it goes. */
export const ref = (table: string, onDelete: 'CASCADE' | 'RESTRICT' | 'SET NULL', allowNull = false) => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});

/**
 * Who made or changed a row (`created_by_id` and the like): history only, so removing the user keeps the
 * row and empties the field.
 */
export const author = () => ref('users', 'SET NULL', true);

/**
 * Drops the foreign keys on `table.column`, whatever names MariaDB gave them. Raw SQL: removeColumn through
 * the mariadb driver trips a known Sequelize issue, so a `down` drops the keys, then the column, itself.
 */
export async function dropForeignKeys(qi: QueryInterface, table: string, column: string): Promise<void> {
  const [fks] = await qi.sequelize.query(
    `SELECT CONSTRAINT_NAME AS name FROM information_schema.KEY_COLUMN_USAGE
      WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = :table AND COLUMN_NAME = :column
        AND REFERENCED_TABLE_NAME IS NOT NULL`,
    { replacements: { table, column } },
  );
  for (const fk of fks as { name: string }[]) {
    await qi.sequelize.query(`ALTER TABLE ${table} DROP FOREIGN KEY \`${fk.name}\``);
  }
}
