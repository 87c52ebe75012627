import { DataTypes, type QueryInterface } from 'sequelize';

/**
 * A new account is confirmed by a link e-mailed to its address before it can sign in. `users` gains
 * `email_confirmed_at` (null = not yet confirmed); every account that exists already counts as confirmed
 * from its creation. The "forgot your password?" links become one table of e-mailed single-use links
 * (`account_links`) with a `purpose`, so both kinds share one token store; the existing links keep
 * working as password resets.
 */
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn('users', 'email_confirmed_at', { type: DataTypes.DATE, allowNull: true });
  await qi.sequelize.query('UPDATE users SET email_confirmed_at = created_at');
  await qi.renameTable('password_resets', 'account_links');
  await qi.addColumn('account_links', 'purpose', {
    type: DataTypes.STRING(20),
    allowNull: false,
    defaultValue: 'password-reset',
  });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  // Confirmation links mean nothing once accounts need no confirmation; the reset links stay.
  await qi.sequelize.query("DELETE FROM account_links WHERE purpose <> 'password-reset'");
  await qi.removeColumn('account_links', 'purpose');
  await qi.renameTable('account_links', 'password_resets');
  await qi.removeColumn('users', 'email_confirmed_at');
}
